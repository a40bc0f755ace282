package org.strandbook.diagnosis;

/**
 * Periodic fringes found in the fit residual: an air gap or a crack acting as an etalon.
 *
 * @param periodCm      fringe period in wavenumber, cm⁻¹ (Δν̃ = 1/(2·n·d))
 * @param amplitudeDb   fringe half peak-to-peak amplitude, dB
 * @param gapUm         the gap width the period implies for an air gap (n = 1), µm
 * @param varianceShare share of the (detrended, noise-weighted) residual variance the fringes explain (0–1)
 * @param cosineDb      the ripple's cosine component, dB: ripple = cos·cos(2πν̃/P) + sin·sin(2πν̃/P)
 * @param sineDb        the ripple's sine component, dB
 * @param significance  amplitude over its standard error (the residual's own scatter), a z-score
 */
public record FringeReport(double periodCm, double amplitudeDb, double gapUm, double varianceShare, double cosineDb,
                           double sineDb, double significance) {

    /** Peak-to-peak ripple, dB. */
    public double peakToPeakDb() {
        return 2 * amplitudeDb;
    }

    /** The fitted ripple at one wavelength, dB. */
    public double rippleDb(double wavelengthNm) {
        double phase = 2 * Math.PI * (1.0e7 / wavelengthNm) / periodCm;
        return cosineDb * Math.cos(phase) + sineDb * Math.sin(phase);
    }
}
