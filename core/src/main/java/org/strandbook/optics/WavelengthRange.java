package org.strandbook.optics;

import java.util.Locale;

/**
 * A closed wavelength interval in nm within which a formula or a data table is valid.
 *
 * <p>Models, materials and tables declare one so that callers get a clear
 * {@link IllegalArgumentException} instead of a silent extrapolation.
 *
 * @param minNm shortest valid wavelength (nm), positive
 * @param maxNm longest valid wavelength (nm), not below {@code minNm}
 */
public record WavelengthRange(double minNm, double maxNm) {

    /** Every positive wavelength: for media whose index is taken as constant. */
    public static final WavelengthRange ALL = new WavelengthRange(Double.MIN_VALUE, Double.MAX_VALUE);

    public WavelengthRange {
        if (!(minNm > 0) || !(maxNm >= minNm) || Double.isNaN(maxNm)) {
            throw new IllegalArgumentException("invalid wavelength range " + minNm + "–" + maxNm + " nm");
        }
    }

    public boolean contains(double wavelengthNm) {
        return wavelengthNm >= minNm && wavelengthNm <= maxNm;
    }

    /** True when every point of the grid lies in this range. */
    public boolean covers(WavelengthGrid grid) {
        return contains(grid.firstNm()) && contains(grid.lastNm());
    }

    /**
     * Throws an {@link IllegalArgumentException} naming {@code what} unless the wavelength lies in
     * this range.
     */
    public void require(double wavelengthNm, String what) {
        if (!contains(wavelengthNm)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "wavelength %s nm is outside the valid range of %s (%s)",
                    format(wavelengthNm), what, this));
        }
    }

    /** Throws unless the whole grid lies in this range; the message names the first offending end. */
    public void require(WavelengthGrid grid, String what) {
        require(grid.firstNm(), what);
        require(grid.lastNm(), what);
    }

    /** The overlap of two ranges; throws when they do not overlap. */
    public WavelengthRange intersect(WavelengthRange other) {
        double lo = Math.max(minNm, other.minNm);
        double hi = Math.min(maxNm, other.maxNm);
        if (hi < lo) {
            throw new IllegalArgumentException("wavelength ranges " + this + " and " + other + " do not overlap");
        }
        return new WavelengthRange(lo, hi);
    }

    @Override
    public String toString() {
        if (this.equals(ALL)) {
            return "all wavelengths";
        }
        return format(minNm) + "–" + format(maxNm) + " nm";
    }

    private static String format(double nm) {
        return nm == Math.rint(nm) && Math.abs(nm) < 1e9
                ? String.format(Locale.ROOT, "%.0f", nm)
                : String.format(Locale.ROOT, "%.4g", nm);
    }
}
