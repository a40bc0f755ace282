package org.strandbook.optics;

import java.util.Arrays;

/**
 * The shared wavelength axis of every spectrum in Strandbook: strictly ascending wavelengths in nm.
 *
 * <p>Spectra are plain {@code double[]} of the same length as the grid; index {@code i} of a
 * spectrum belongs to {@link #wavelengthNm(int)}. A grid built on an even wavenumber spacing is
 * stored in nm too, ascending, so that every consumer reads one axis convention.
 */
public final class WavelengthGrid {

    private final double[] wavelengthsNm;

    private WavelengthGrid(double[] wavelengthsNm) {
        if (wavelengthsNm.length == 0) {
            throw new IllegalArgumentException("a wavelength grid needs at least one point");
        }
        for (int i = 0; i < wavelengthsNm.length; i++) {
            double w = wavelengthsNm[i];
            if (!Double.isFinite(w) || w <= 0) {
                throw new IllegalArgumentException("wavelength " + w + " nm at index " + i + " is not a positive number");
            }
            if (i > 0 && w <= wavelengthsNm[i - 1]) {
                throw new IllegalArgumentException("wavelengths must be strictly ascending: "
                        + wavelengthsNm[i - 1] + " nm then " + w + " nm");
            }
        }
        this.wavelengthsNm = wavelengthsNm;
    }

    /** A grid of the given wavelengths (nm), which must be strictly ascending and positive. */
    public static WavelengthGrid ofNm(double... wavelengthsNm) {
        return new WavelengthGrid(wavelengthsNm.clone());
    }

    /** Evenly spaced in wavelength from {@code startNm} to {@code endNm} inclusive. */
    public static WavelengthGrid uniformNm(double startNm, double endNm, int count) {
        if (count < 2) {
            return ofNm(startNm);
        }
        double[] w = new double[count];
        double step = (endNm - startNm) / (count - 1);
        for (int i = 0; i < count; i++) {
            w[i] = startNm + i * step;
        }
        w[count - 1] = endNm;
        return new WavelengthGrid(w);
    }

    /**
     * Evenly spaced in wavenumber (cm⁻¹) between the two given wavenumbers inclusive, stored as
     * ascending wavelengths: the natural axis of a Fourier-transform analyzer.
     */
    public static WavelengthGrid uniformWavenumberCm(double firstCm, double lastCm, int count) {
        double lo = Math.min(firstCm, lastCm);
        double hi = Math.max(firstCm, lastCm);
        double[] w = new double[Math.max(count, 1)];
        if (count < 2) {
            w[0] = Wavenumber.nmFromWavenumberCm(lo);
            return new WavelengthGrid(w);
        }
        double step = (hi - lo) / (count - 1);
        for (int i = 0; i < count; i++) {
            // highest wavenumber first gives ascending wavelength
            w[i] = Wavenumber.nmFromWavenumberCm(hi - i * step);
        }
        return new WavelengthGrid(w);
    }

    /** Wavenumbers (cm⁻¹) given in any order, stored as ascending wavelengths. */
    public static WavelengthGrid ofWavenumbersCm(double... wavenumbersCm) {
        double[] w = new double[wavenumbersCm.length];
        for (int i = 0; i < w.length; i++) {
            w[i] = Wavenumber.nmFromWavenumberCm(wavenumbersCm[i]);
        }
        Arrays.sort(w);
        return new WavelengthGrid(w);
    }

    public int size() {
        return wavelengthsNm.length;
    }

    public double wavelengthNm(int index) {
        return wavelengthsNm[index];
    }

    public double firstNm() {
        return wavelengthsNm[0];
    }

    public double lastNm() {
        return wavelengthsNm[wavelengthsNm.length - 1];
    }

    /** A copy of the axis in nm. */
    public double[] wavelengthsNm() {
        return wavelengthsNm.clone();
    }

    /** The axis in cm⁻¹, index for index (so descending). */
    public double[] wavenumbersCm() {
        double[] k = new double[wavelengthsNm.length];
        for (int i = 0; i < k.length; i++) {
            k[i] = Wavenumber.wavenumberCmFromNm(wavelengthsNm[i]);
        }
        return k;
    }

    /** True when {@code wavelengthNm} lies within the grid's first and last point. */
    public boolean covers(double wavelengthNm) {
        return wavelengthNm >= firstNm() && wavelengthNm <= lastNm();
    }

    /** Index of the grid point nearest to the given wavelength. */
    public int nearestIndex(double wavelengthNm) {
        int pos = Arrays.binarySearch(wavelengthsNm, wavelengthNm);
        if (pos >= 0) {
            return pos;
        }
        int insertion = -pos - 1;
        if (insertion == 0) {
            return 0;
        }
        if (insertion == wavelengthsNm.length) {
            return wavelengthsNm.length - 1;
        }
        return (wavelengthNm - wavelengthsNm[insertion - 1]) <= (wavelengthsNm[insertion] - wavelengthNm)
                ? insertion - 1 : insertion;
    }

    /**
     * Linear interpolation of a spectrum given on this grid at an arbitrary wavelength; outside the
     * grid the end value is held (callers that must not extrapolate check {@link #covers} first).
     */
    public double interpolate(double[] values, double wavelengthNm) {
        requireSameLength(values);
        int n = wavelengthsNm.length;
        if (n == 1 || wavelengthNm <= wavelengthsNm[0]) {
            return values[0];
        }
        if (wavelengthNm >= wavelengthsNm[n - 1]) {
            return values[n - 1];
        }
        int pos = Arrays.binarySearch(wavelengthsNm, wavelengthNm);
        if (pos >= 0) {
            return values[pos];
        }
        int hi = -pos - 1;
        int lo = hi - 1;
        double f = (wavelengthNm - wavelengthsNm[lo]) / (wavelengthsNm[hi] - wavelengthsNm[lo]);
        return values[lo] + f * (values[hi] - values[lo]);
    }

    /**
     * The spectrum {@code values} (on this grid) linearly resampled onto {@code target}, end values
     * held outside this grid. Callers resampling many spectra of this grid keep
     * {@link #resamplingOnto} instead.
     */
    public double[] resample(double[] values, WavelengthGrid target) {
        requireSameLength(values);
        return resamplingOnto(target).apply(values);
    }

    /**
     * The linear interpolation from this grid onto {@code target}, worked out once for any number of
     * spectra on this grid.
     */
    public LinearResampling resamplingOnto(WavelengthGrid target) {
        return new LinearResampling(this, target);
    }

    /** Throws unless {@code spectrum} has one value per grid point. */
    public void requireSameLength(double[] spectrum) {
        if (spectrum.length != wavelengthsNm.length) {
            throw new IllegalArgumentException("spectrum has " + spectrum.length
                    + " values but the grid has " + wavelengthsNm.length + " points");
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WavelengthGrid other && Arrays.equals(wavelengthsNm, other.wavelengthsNm);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(wavelengthsNm);
    }

    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT, "WavelengthGrid[%d points, %.1f–%.1f nm]",
                size(), firstNm(), lastNm());
    }
}
