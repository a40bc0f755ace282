package org.strandbook.dossier;

import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.usermodel.XSSFDrawing;
import org.strandbook.evaluation.PointEvaluation;

/**
 * The Measured vs predicted sheet: per point a caption (tag, service, status, scan time, band
 * verdicts, the diagnosis in one line) and a chart of predicted loss with its coverage interval,
 * measured and deviation loss
 * against wavelength, plotting the point's rows of the Spectra sheet.
 */
final class SpectrumChartRows {

    private SpectrumChartRows() {
    }

    static int fill(TableSheet t, DossierContent content, List<SpectraRows.Block> blocks, ChartCaches caches) {
        t.sheet().createDrawingPatriarch();
        XSSFDrawing drawing = t.sheet().getDrawingPatriarch();
        int charts = 0;
        for (SpectraRows.Block b : blocks) {
            DossierPoint p = b.point();
            PointEvaluation e = b.evaluation();
            Row caption = t.newRow();
            t.textAt(caption, 0, p.tag() + " · " + p.point().service() + " · " + p.status().label()
                    + e.latest().map(pair -> " · latest loop scan " + DossierText.time(pair.loop().takenAt()))
                    .orElse(" · no paired loop scan: predicted loss only"), null, DossierStyles.Look.EMPHASIS);
            t.textSpanning(t.newRow(), 0, ChartPlacement.COLUMNS,
                    verdicts(e) + e.diagnosis().map(d -> " · " + d.summary()).orElse(""), DossierStyles.Look.PLAIN);
            String wl = b.wavelengthRange();
            String predicted = b.predictedRange();
            String measured = b.measuredRange();
            String deviation = b.deviationRange();
            SpectrumColumns columns = b.columns();
            boolean banded = Double.isFinite(columns.lowDb()[0]);
            caches.register(wl, columns::wavelengthNm);
            caches.register(predicted, columns::predictedDb);
            caches.register(measured, columns::measuredDb);
            caches.register(deviation, columns::deviationDb);
            if (banded) {
                caches.register(b.lowRange(), columns::lowDb);
                caches.register(b.highRange(), columns::highDb);
            }
            double[] grid = columns.wavelengthNm();
            double top = DossierCharts.lossScaleTopDb(allowedDb(content, p), max(columns.measuredDb()),
                    max(columns.predictedDb()));
            double lowest = Math.min(min(columns.deviationDb()), min(columns.predictedDb()));
            DossierCharts.spectrum(drawing, t.nextRowIndex(), p.tag() + ": measured against predicted loop loss", wl,
                    predicted, banded ? Optional.of(new DossierCharts.IntervalSeries(b.lowRange(), b.highRange(),
                            percent(content))) : Optional.empty(), measured, deviation, grid[0], grid[grid.length - 1],
                    top, lowest);
            t.skipRows(ChartPlacement.SPECTRUM_ROWS + 1);
            charts++;
            t.sheet().setRowBreak(t.nextRowIndex() - 1);
        }
        return charts;
    }

    private static String percent(DossierContent content) {
        return content.decisionRule().percent() + " %";
    }

    private static double allowedDb(DossierContent content, DossierPoint p) {
        return content.analyzer(p.point().analyzerTag()).map(a -> a.allowedLossDb()).orElse(Double.NaN);
    }

    /** Largest finite value, NaN when none. */
    private static double max(double[] values) {
        double m = Double.NaN;
        for (double v : values) {
            if (Double.isFinite(v) && !(v <= m)) {
                m = v;
            }
        }
        return m;
    }

    /** Smallest finite value, 0 when none. */
    private static double min(double[] values) {
        double m = 0;
        for (double v : values) {
            if (Double.isFinite(v) && v < m) {
                m = v;
            }
        }
        return m;
    }

    private static String verdicts(PointEvaluation e) {
        if (e.verdicts().isEmpty()) {
            return e.problems().isEmpty() ? "not judged" : e.problems().get(0);
        }
        return e.verdicts().stream()
                .map(v -> v.band().name() + " " + v.status().label()
                        + (Double.isNaN(v.marginDb()) ? "" : " (margin " + DossierText.decimal(v.marginDb(), 2) + " dB)"))
                .collect(Collectors.joining("; "));
    }
}
