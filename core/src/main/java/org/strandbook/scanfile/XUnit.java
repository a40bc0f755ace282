package org.strandbook.scanfile;

import org.strandbook.optics.Wavenumber;

/**
 * The unit of a spectrum file's abscissa (x axis), as the analyzer wrote it.
 *
 * <p>Strandbook keeps every spectrum on a wavelength axis in nm; this enum remembers what the file
 * held so that an export can write the axis back in the same unit. Conversions: 1 µm = 1000 nm,
 * ν̃[cm⁻¹] = 10⁷ / λ[nm] (IUPAC Green Book, "Quantities, Units and Symbols in Physical
 * Chemistry", 3rd ed., 2007: wavenumber ν̃ = 1/λ).
 */
public enum XUnit {
    /** Wavelength in nanometres. */
    NM("nm", "NANOMETERS"),
    /** Wavelength in micrometres. */
    UM("µm", "MICROMETERS"),
    /** Wavenumber in reciprocal centimetres. */
    WAVENUMBER_CM("cm⁻¹", "1/CM");

    private final String symbol;
    private final String jcampName;

    XUnit(String symbol, String jcampName) {
        this.symbol = symbol;
        this.jcampName = jcampName;
    }

    /** The unit symbol for display: nm, µm, cm⁻¹. */
    public String symbol() {
        return symbol;
    }

    /** The value of the JCAMP-DX {@code ##XUNITS=} record for this unit (McDonald &amp; Wilks 1988). */
    public String jcampName() {
        return jcampName;
    }

    /**
     * An abscissa value in this unit converted to a wavelength in nm.
     *
     * @param x a positive, finite abscissa in this unit
     * @throws IllegalArgumentException if {@code x} is not positive and finite
     */
    public double toNm(double x) {
        if (!(x > 0) || !Double.isFinite(x)) {
            throw new IllegalArgumentException("abscissa must be a positive number, was " + x + " " + symbol);
        }
        return switch (this) {
            case NM -> x;
            case UM -> x * 1000.0;
            case WAVENUMBER_CM -> Wavenumber.nmFromWavenumberCm(x);
        };
    }

    /**
     * A wavelength in nm expressed in this unit.
     *
     * @param wavelengthNm a positive, finite wavelength in nm
     * @throws IllegalArgumentException if the wavelength is not positive and finite
     */
    public double fromNm(double wavelengthNm) {
        if (!(wavelengthNm > 0) || !Double.isFinite(wavelengthNm)) {
            throw new IllegalArgumentException("wavelength must be a positive number of nm, was " + wavelengthNm);
        }
        return switch (this) {
            case NM -> wavelengthNm;
            case UM -> wavelengthNm / 1000.0;
            case WAVENUMBER_CM -> Wavenumber.wavenumberCmFromNm(wavelengthNm);
        };
    }
}
