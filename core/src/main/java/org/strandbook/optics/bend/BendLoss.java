package org.strandbook.optics.bend;

/**
 * Loss of one bend at one wavelength.
 *
 * @param lossDb loss (dB), ≥ 0
 * @param guidedFraction M_eff/M_∞ used for the loss
 * @param clamped true when Gloge's ratio left its range and was clamped
 */
public record BendLoss(double lossDb, double guidedFraction, boolean clamped) {
}
