package org.strandbook.dossier;

import java.util.List;

import org.strandbook.evaluation.BandTrend;
import org.strandbook.trend.LossReading;

/**
 * The loss history of one band as the Trend history sheet holds it and the trend chart plots it:
 * scan times (spreadsheet serial dates, UTC), the highest losses of the driving sub-band and the Theil–Sen line at each time
 * (NaN without a trend, and before the first reading the trend was fitted to), losses to {@link SpectrumColumns#LOSS_STEP_DB}.
 */
record TrendColumns(double[] excelTime, double[] lossDb, double[] trendDb) {

    static TrendColumns of(BandTrend trend) {
        List<LossReading> readings = trend.readings();
        double[] t = new double[readings.size()];
        double[] loss = new double[readings.size()];
        double[] line = new double[readings.size()];
        for (int i = 0; i < t.length; i++) {
            LossReading r = readings.get(i);
            t[i] = TableSheet.excelTime(r.time());
            loss[i] = SpectrumColumns.round(r.lossDb());
            // after a repair the trend is fitted to the readings since it; earlier readings get no line
            line[i] = SpectrumColumns.round(trend.trend().filter(f -> !r.time().isBefore(f.referenceTime()))
                    .map(f -> f.lossDbAt(r.time())).orElse(Double.NaN));
        }
        return new TrendColumns(t, loss, line);
    }

    int size() {
        return excelTime.length;
    }
}
