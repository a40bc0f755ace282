package org.strandbook.dossier;

import java.util.HexFormat;
import java.util.List;
import java.util.Optional;

import org.apache.poi.xddf.usermodel.PresetLineDash;
import org.apache.poi.xddf.usermodel.XDDFColor;
import org.apache.poi.xddf.usermodel.XDDFLineProperties;
import org.apache.poi.xddf.usermodel.XDDFPresetLineDash;
import org.apache.poi.xddf.usermodel.XDDFShapeProperties;
import org.apache.poi.xddf.usermodel.XDDFSolidFillProperties;
import org.apache.poi.xddf.usermodel.chart.AxisCrosses;
import org.apache.poi.xddf.usermodel.chart.AxisPosition;
import org.apache.poi.xddf.usermodel.chart.AxisTickLabelPosition;
import org.apache.poi.xddf.usermodel.chart.ChartTypes;
import org.apache.poi.xddf.usermodel.chart.DisplayBlanks;
import org.apache.poi.xddf.usermodel.chart.LegendPosition;
import org.apache.poi.xddf.usermodel.chart.MarkerStyle;
import org.apache.poi.xddf.usermodel.chart.ScatterStyle;
import org.apache.poi.xddf.usermodel.chart.XDDFScatterChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFValueAxis;
import org.apache.poi.xssf.usermodel.XSSFChart;
import org.apache.poi.xssf.usermodel.XSSFClientAnchor;
import org.apache.poi.xssf.usermodel.XSSFDrawing;

/**
 * The dossier's two native chart kinds, both XY charts drawn with lines so that the horizontal axis
 * is a true scale (wavelength in nm, or time): a point's predicted, measured and deviation spectra,
 * and a point's loss history (driving range of each band) with its Theil–Sen lines. Series refer to cell ranges; their
 * caches are filled when the file is written. Lines get explicit colours and widths: some programs
 * draw markers only otherwise.
 */
final class DossierCharts {

    static final String PREDICTED = "Predicted";
    static final String MEASURED = "Measured";
    static final String DEVIATION = "Deviation (measured − predicted)";

    /** How far a spectrum chart's scale reaches above the allowed loss, dB. */
    static final double ABOVE_ALLOWED_DB = 10.0;

    /** Least span of a trend chart's loss scale, dB. */
    static final double MIN_TREND_SPAN_DB = 2.0;

    private static final String BLUE = "1F4E9A";
    private static final String LIGHT_BLUE = "7FA7D9";
    private static final String ORANGE = "C8500A";
    private static final String GREY = "4D4D4D";
    private static final String GRID = "D9D9D9";
    private static final List<String> BAND_COLOURS = List.of(BLUE, ORANGE, "2E7D32", "6A1B9A", "00838F", "8D6E63");

    /** The prediction's coverage interval on a spectrum chart: its two ends and the coverage in words. */
    record IntervalSeries(String lowRange, String highRange, String coverage) {
    }

    /** One band's series of a trend chart. */
    record BandSeries(String band, String timeRange, String lossRange, String trendRange) {
    }

    private DossierCharts() {
    }

    /**
     * @param lossScaleDb the top of the loss scale, dB (see {@link #lossScaleTopDb})
     * @param lowestDb    the lowest value plotted (a deviation may be negative), dB
     */
    static XSSFChart spectrum(XSSFDrawing drawing, int firstRow, String title, String wavelengthRange,
                              String predictedRange, Optional<IntervalSeries> interval, String measuredRange,
                              String deviationRange,
                              double firstNm, double lastNm, double lossScaleDb, double lowestDb) {
        XSSFChart chart = chart(drawing, firstRow, ChartPlacement.SPECTRUM_ROWS, ChartPlacement.COLUMNS, title);
        XDDFValueAxis x = chart.createValueAxis(AxisPosition.BOTTOM);
        x.setTitle("Wavelength (nm)");
        x.setMinimum(firstNm);
        x.setMaximum(lastNm);
        x.setMajorUnit(niceStep(lastNm - firstNm));
        x.setNumberFormat("0");
        XDDFValueAxis y = chart.createValueAxis(AxisPosition.LEFT);
        y.setTitle("Loss (dB)");
        y.setNumberFormat("0.0#");
        double bottom = Math.min(0, Math.floor(lowestDb));
        double step = niceStep(lossScaleDb - bottom);
        y.setMinimum(Math.floor(bottom / step) * step);
        y.setMaximum(Math.ceil(lossScaleDb / step) * step);
        y.setMajorUnit(step);
        XDDFScatterChartData data = axes(chart, x, y);
        RangeSource wl = new RangeSource(wavelengthRange);
        series(data, wl, predictedRange, PREDICTED, BLUE, 2.0, false, false);
        // a native chart has no band between two series: its ends are drawn as thin dashed lines in the prediction's colour
        interval.ifPresent(i -> {
            series(data, wl, i.lowRange(), PREDICTED + ", " + i.coverage() + " coverage interval, low", LIGHT_BLUE, 1.0,
                    true, false);
            series(data, wl, i.highRange(), PREDICTED + ", " + i.coverage() + " coverage interval, high", LIGHT_BLUE,
                    1.0, true, false);
        });
        series(data, wl, measuredRange, MEASURED, ORANGE, 2.0, false, false);
        series(data, wl, deviationRange, DEVIATION, GREY, 1.25, true, false);
        chart.plot(data);
        return chart;
    }

    /**
     * @param columns   columns the chart spans from column A
     * @param lowestDb  the lowest reading plotted, dB
     * @param highestDb the highest reading plotted, dB
     */
    static XSSFChart trend(XSSFDrawing drawing, int firstRow, int columns, String title, List<BandSeries> bands,
                           double lowestDb, double highestDb) {
        XSSFChart chart = chart(drawing, firstRow, ChartPlacement.TREND_ROWS, columns, title);
        XDDFValueAxis x = chart.createValueAxis(AxisPosition.BOTTOM);
        x.setTitle("Loop scan taken (UTC date)");
        x.setNumberFormat("yyyy-mm-dd");
        XDDFValueAxis y = chart.createValueAxis(AxisPosition.LEFT);
        y.setTitle("Band-mean loss (dB)");
        y.setNumberFormat("0.0#");
        // a scale of at least MIN_TREND_SPAN_DB keeps scan-to-scan noise of hundredths of a dB from looking like a trend
        double min = Math.floor(lowestDb - 0.5);
        double max = Math.max(Math.ceil(highestDb + 0.5), min + MIN_TREND_SPAN_DB);
        y.setMinimum(min);
        y.setMaximum(max);
        y.setMajorUnit(niceStep(max - min));
        XDDFScatterChartData data = axes(chart, x, y);
        for (int i = 0; i < bands.size(); i++) {
            BandSeries b = bands.get(i);
            String colour = BAND_COLOURS.get(i % BAND_COLOURS.size());
            RangeSource time = new RangeSource(b.timeRange());
            series(data, time, b.lossRange(), b.band(), colour, 1.5, false, true);
            series(data, time, b.trendRange(), b.band() + ", Theil–Sen line", colour, 1.0, true, false);
        }
        chart.plot(data);
        return chart;
    }

    private static XSSFChart chart(XSSFDrawing drawing, int firstRow, int rows, int columns, String title) {
        XSSFClientAnchor anchor = drawing.createAnchor(0, 0, 0, 0, 0, firstRow, columns, firstRow + rows);
        XSSFChart chart = drawing.createChart(anchor);
        chart.setTitleText(title);
        chart.setTitleOverlay(false);
        chart.getOrAddLegend().setPosition(LegendPosition.BOTTOM);
        chart.displayBlanksAs(DisplayBlanks.GAP);
        return chart;
    }

    private static XDDFScatterChartData axes(XSSFChart chart, XDDFValueAxis x, XDDFValueAxis y) {
        // both axes sit at the other's minimum, so negative deviations never pull the scale into the plot
        x.setCrosses(AxisCrosses.MIN);
        y.setCrosses(AxisCrosses.MIN);
        x.setTickLabelPosition(AxisTickLabelPosition.LOW);
        y.setTickLabelPosition(AxisTickLabelPosition.LOW);
        XDDFShapeProperties grid = y.getOrAddMajorGridProperties();
        grid.setLineProperties(line(GRID, 0.5, false));
        XDDFScatterChartData data = (XDDFScatterChartData) chart.createData(ChartTypes.SCATTER, x, y);
        data.setStyle(ScatterStyle.LINE_MARKER);
        data.setVaryColors(false);
        return data;
    }

    private static void series(XDDFScatterChartData data, RangeSource x, String yRange, String title, String colour,
                               double widthPt, boolean dashed, boolean markers) {
        XDDFScatterChartData.Series s = (XDDFScatterChartData.Series) data.addSeries(x, new RangeSource(yRange));
        s.setTitle(title, null);
        s.setSmooth(false);
        s.setMarkerStyle(markers ? MarkerStyle.CIRCLE : MarkerStyle.NONE);
        s.setLineProperties(line(colour, widthPt, dashed));
    }

    private static XDDFLineProperties line(String colour, double widthPt, boolean dashed) {
        XDDFLineProperties line = new XDDFLineProperties();
        line.setFillProperties(new XDDFSolidFillProperties(XDDFColor.from(HexFormat.of().parseHex(colour))));
        line.setWidth(widthPt);
        if (dashed) {
            line.setPresetDash(new XDDFPresetLineDash(PresetLineDash.DASH));
        }
        return line;
    }

    /**
     * The top of a spectrum chart's loss scale: enough for the highest measured loss and a little
     * above the analyzer's allowed loss, but no higher: beyond it the analyzer sees no light, and a
     * prediction climbing to hundreds of dB at the fiber's infrared edge would flatten the part
     * that matters. A predicted line above the top is cut at the plot's edge.
     */
    static double lossScaleTopDb(double allowedDb, double highestMeasuredDb, double highestPredictedDb) {
        double top = Math.max(Double.isFinite(allowedDb) ? allowedDb + ABOVE_ALLOWED_DB : 0,
                Double.isFinite(highestMeasuredDb) ? highestMeasuredDb + 2 : 0);
        return Math.max(1, Math.min(top > 0 ? top : highestPredictedDb + 2, highestPredictedDb + 2));
    }

    /** A round axis step giving five to ten labels over {@code spanNm}. */
    static double niceStep(double span) {
        double raw = span / 8;
        double magnitude = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 2.5, 5, 10}) {
            if (m * magnitude >= raw) {
                return m * magnitude;
            }
        }
        return 10 * magnitude;
    }
}
