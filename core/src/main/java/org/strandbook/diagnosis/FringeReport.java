package org.strandbook.diagnosis;

/**
 * Periodic fringes found in the fit residual: an air gap or a crack acting as an etalon.
 *
 * @param periodCm     fringe period in wavenumber, cm⁻¹ (Δν̃ = 1/(2·n·d))
 * @param amplitudeDb  fringe half peak-to-peak amplitude, dB
 * @param gapUm        the gap width the period implies for an air gap (n = 1), µm
 * @param varianceShare share of the residual variance the fringes explain (0–1)
 */
public record FringeReport(double periodCm, double amplitudeDb, double gapUm, double varianceShare) {
}
