package org.strandbook.dossier;

import java.util.Optional;

import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PredictionSpread;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.throughput.ThroughputResult;

/**
 * The wavelength table of one point as the Spectra sheet holds it and its chart plots it: the
 * evaluation grid, the predicted loop loss, the latest measured loss (NaN where masked or not
 * measured) and the deviation, measured minus predicted. Computed the same way for the cells and
 * for the chart caches, so both hold the same numbers. Losses are kept to {@link #LOSS_STEP_DB}: a
 * tenth of a millidecibel is far below what any loss measurement resolves, and seventeen digits
 * of noise would make the file five times larger and slower to write.
 */
record SpectrumColumns(double[] wavelengthNm, double[] predictedDb, double[] lowDb, double[] highDb,
                       double[] measuredDb, double[] deviationDb, Optional<ThroughputResult> measured) {

    /** Resolution losses are written to, dB. */
    static final double LOSS_STEP_DB = 1e-4;
    /** Steps per dB; a division by it gives the double nearest the decimal, which prints short. */
    private static final double STEPS_PER_DB = 1e4;

    static SpectrumColumns of(PointEvaluation evaluation) {
        return of(evaluation, Optional.empty());
    }

    /** With the prediction's coverage band (NaN where there is none). */
    static SpectrumColumns of(PointEvaluation evaluation, Optional<PredictionSpread> spread) {
        WavelengthGrid grid = evaluation.predicted().grid();
        double[] predicted = evaluation.predicted().totalLossDb();
        double[] measured = new double[predicted.length];
        java.util.Arrays.fill(measured, Double.NaN);
        if (evaluation.measured().isPresent()) {
            ThroughputResult r = evaluation.measured().get();
            measured = r.grid().equals(grid) ? r.lossDb() : r.grid().resample(r.lossDb(), grid);
        }
        double[] low = new double[predicted.length];
        double[] high = new double[predicted.length];
        java.util.Arrays.fill(low, Double.NaN);
        java.util.Arrays.fill(high, Double.NaN);
        if (spread.isPresent() && spread.get().grid().equals(grid)) {
            low = spread.get().lowDb();
            high = spread.get().highDb();
        }
        double[] deviation = new double[predicted.length];
        for (int i = 0; i < deviation.length; i++) {
            low[i] = round(low[i]);
            high[i] = round(high[i]);
            predicted[i] = round(predicted[i]);
            measured[i] = round(measured[i]);
            deviation[i] = round(measured[i] - predicted[i]);
        }
        return new SpectrumColumns(grid.wavelengthsNm(), predicted, low, high, measured, deviation,
                evaluation.measured());
    }

    /** {@code lossDb} to the nearest {@link #LOSS_STEP_DB}; NaN stays NaN. */
    static double round(double lossDb) {
        return Double.isFinite(lossDb) ? Math.rint(lossDb * STEPS_PER_DB) / STEPS_PER_DB : lossDb;
    }

    int size() {
        return wavelengthNm.length;
    }
}
