package org.strandbook.uncertainty;

/**
 * The uncertainty of a predicted loss at one wavelength.
 *
 * @param wavelengthNm where (nm)
 * @param predictedLossDb the loss budget's total there (dB)
 * @param budget the uncertainty budget (rows by input; standard uncertainty by the law of
 *        propagation) with the Monte Carlo coverage interval of the loss (dB)
 * @param frameworkInterval y ± k·u_c, for comparison: wider than the Monte Carlo one when
 *        rectangular inputs dominate, possibly misplaced when a bend term is far from linear
 */
public record LossUncertainty(double wavelengthNm, double predictedLossDb, UncertaintyBudget budget,
        CoverageInterval frameworkInterval) {

    /** Lower end of the interval relative to the prediction (dB, ≤ 0 unless inputs are one-sided). */
    public double lowOffsetDb() {
        return budget.interval().low() - predictedLossDb;
    }

    /** Upper end of the interval relative to the prediction (dB). */
    public double highOffsetDb() {
        return budget.interval().high() - predictedLossDb;
    }
}
