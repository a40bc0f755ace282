package org.strandbook.dossier;

import org.apache.poi.xddf.usermodel.chart.XDDFNumericalDataSource;

/**
 * A chart series' data as a cell range only: the chart refers to the cells, and its cache is filled
 * when the file is written ({@link ChartCaches}).
 */
record RangeSource(String range) implements XDDFNumericalDataSource<Double> {

    @Override
    public String getFormatCode() {
        return null;
    }

    @Override
    public void setFormatCode(String formatCode) {
        // the cache written later carries the general format
    }

    @Override
    public int getPointCount() {
        return 0;
    }

    @Override
    public Double getPointAt(int index) {
        return null;
    }

    @Override
    public boolean isCellRange() {
        return true;
    }

    @Override
    public boolean isLiteral() {
        return false;
    }

    @Override
    public boolean isNumeric() {
        return true;
    }

    @Override
    public boolean isReference() {
        return true;
    }

    @Override
    public int getColIndex() {
        return 0;
    }

    @Override
    public String getDataRangeReference() {
        return range;
    }
}
