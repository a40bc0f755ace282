package org.strandbook.optics.path;

import java.util.Arrays;
import java.util.Objects;

import org.strandbook.optics.WavelengthRange;

/**
 * A medium in the probe's optical path with a decadic absorbance per mm of path (Beer–Lambert:
 * A = a(λ)·path, transmittance 10^(−A), loss 10·A dB). Either constant or a spectrum interpolated
 * linearly between its points; a spectrum is valid only between its first and last point.
 */
public final class ReferenceMedium {

    private final String name;
    private final double[] wavelengthsNm;
    private final double[] absorbancePerMm;
    private final WavelengthRange range;
    private final int hash;

    private ReferenceMedium(String name, double[] wavelengthsNm, double[] absorbancePerMm, WavelengthRange range) {
        this.name = Objects.requireNonNull(name, "name");
        this.wavelengthsNm = wavelengthsNm;
        this.absorbancePerMm = absorbancePerMm;
        this.range = range;
        this.hash = 31 * (31 * name.hashCode() + Arrays.hashCode(wavelengthsNm)) + Arrays.hashCode(absorbancePerMm);
    }

    /** A medium with the same absorbance per mm (decadic, ≥ 0) at every wavelength. */
    public static ReferenceMedium constant(String name, double absorbancePerMm) {
        requireAbsorbance(absorbancePerMm, name);
        return new ReferenceMedium(name, new double[0], new double[] {absorbancePerMm}, WavelengthRange.ALL);
    }

    /**
     * A medium given by its absorbance per mm (decadic) at ascending wavelengths.
     */
    public static ReferenceMedium ofSpectrum(String name, double[] wavelengthsNm, double[] absorbancePerMm) {
        if (wavelengthsNm.length != absorbancePerMm.length || wavelengthsNm.length < 2) {
            throw new IllegalArgumentException(name + ": need at least two wavelengths with one absorbance each");
        }
        double[] w = wavelengthsNm.clone();
        double[] a = absorbancePerMm.clone();
        for (int i = 0; i < w.length; i++) {
            if (!(w[i] > 0) || (i > 0 && !(w[i] > w[i - 1]))) {
                throw new IllegalArgumentException(name + ", point " + (i + 1) + ": wavelengths must be positive and ascending");
            }
            requireAbsorbance(a[i], name);
        }
        return new ReferenceMedium(name, w, a, new WavelengthRange(w[0], w[w.length - 1]));
    }

    /**
     * A medium from an absorbance spectrum measured over a known path length: absorbance per mm =
     * absorbance / path.
     */
    public static ReferenceMedium ofMeasuredAbsorbance(String name, double[] wavelengthsNm, double[] absorbance,
            double measuredPathMm) {
        if (!(measuredPathMm > 0) || !Double.isFinite(measuredPathMm)) {
            throw new IllegalArgumentException(name + ": measured path must be a positive number, was " + measuredPathMm + " mm");
        }
        double[] perMm = new double[absorbance.length];
        for (int i = 0; i < perMm.length; i++) {
            perMm[i] = absorbance[i] / measuredPathMm;
        }
        return ofSpectrum(name, wavelengthsNm, perMm);
    }

    public String name() {
        return name;
    }

    public WavelengthRange validRange() {
        return range;
    }

    /** Decadic absorbance per mm at a wavelength; throws outside {@link #validRange()}. */
    public double absorbancePerMm(double wavelengthNm) {
        if (wavelengthsNm.length == 0) {
            return absorbancePerMm[0];
        }
        range.require(wavelengthNm, "reference medium " + name);
        int pos = Arrays.binarySearch(wavelengthsNm, wavelengthNm);
        if (pos >= 0) {
            return absorbancePerMm[pos];
        }
        int hi = -pos - 1;
        int lo = hi - 1;
        double f = (wavelengthNm - wavelengthsNm[lo]) / (wavelengthsNm[hi] - wavelengthsNm[lo]);
        return absorbancePerMm[lo] + f * (absorbancePerMm[hi] - absorbancePerMm[lo]);
    }

    @Override
    public boolean equals(Object o) {
        return o == this || (o instanceof ReferenceMedium m && hash == m.hash && name.equals(m.name)
                && Arrays.equals(wavelengthsNm, m.wavelengthsNm) && Arrays.equals(absorbancePerMm, m.absorbancePerMm));
    }

    @Override
    public int hashCode() {
        return hash;
    }

    @Override
    public String toString() {
        return name;
    }

    private static void requireAbsorbance(double a, String name) {
        if (!(a >= 0) || !Double.isFinite(a)) {
            throw new IllegalArgumentException(name + ": absorbance must be a finite number ≥ 0, was " + a);
        }
    }
}
