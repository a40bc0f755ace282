package org.strandbook.optics;

/** Conversion between wavelength in nm and wavenumber in cm⁻¹ (ν̃ = 10⁷ / λ[nm]). */
public final class Wavenumber {

    private static final double NM_CM_PRODUCT = 1.0e7;

    private Wavenumber() {
    }

    public static double wavenumberCmFromNm(double wavelengthNm) {
        requirePositive(wavelengthNm, "wavelength (nm)");
        return NM_CM_PRODUCT / wavelengthNm;
    }

    public static double nmFromWavenumberCm(double wavenumberCm) {
        requirePositive(wavenumberCm, "wavenumber (cm⁻¹)");
        return NM_CM_PRODUCT / wavenumberCm;
    }

    private static void requirePositive(double value, String what) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " must be a positive number, was " + value);
        }
    }
}
