package org.strandbook.app.ui.plot;

import org.strandbook.optics.Wavenumber;

/** The x axis of a spectrum plot: wavelength in nm or wavenumber in cm⁻¹ (ν̃ = 10⁷ / λ[nm]). */
public enum SpectralAxis {
    WAVELENGTH_NM("Wavelength (nm)"),
    WAVENUMBER_CM("Wavenumber (cm\u207B\u00B9)");

    private final String label;

    SpectralAxis(String label) {
        this.label = label;
    }

    /** The axis label, unit included. */
    public String label() {
        return label;
    }

    public double fromNm(double wavelengthNm) {
        return this == WAVELENGTH_NM ? wavelengthNm : Wavenumber.wavenumberCmFromNm(wavelengthNm);
    }
}
