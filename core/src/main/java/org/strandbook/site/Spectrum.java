package org.strandbook.site;

import java.util.Arrays;

/**
 * A scan's spectrum on its own axis: strictly ascending wavelengths (nm) and one value per point
 * (detector counts or any linear intensity). Arrays are copied in and out.
 */
public final class Spectrum {

    private final double[] wavelengthsNm;
    private final double[] values;

    public Spectrum(double[] wavelengthsNm, double[] values) {
        if (wavelengthsNm.length != values.length) {
            throw new IllegalArgumentException("spectrum has " + wavelengthsNm.length + " wavelengths but "
                    + values.length + " values");
        }
        if (wavelengthsNm.length < 2) {
            throw new IllegalArgumentException("spectrum needs at least two points");
        }
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i]) || !Double.isFinite(wavelengthsNm[i]) || wavelengthsNm[i] <= 0) {
                throw new IllegalArgumentException("spectrum point " + i + " is not a finite number");
            }
            if (i > 0 && wavelengthsNm[i] <= wavelengthsNm[i - 1]) {
                throw new IllegalArgumentException("spectrum wavelengths must be strictly ascending at point " + i);
            }
        }
        this.wavelengthsNm = wavelengthsNm.clone();
        this.values = values.clone();
    }

    public int size() {
        return values.length;
    }

    public double[] wavelengthsNm() {
        return wavelengthsNm.clone();
    }

    public double[] values() {
        return values.clone();
    }

    /** True when this spectrum lies on exactly these wavelengths, nm; compares without a copy. */
    public boolean hasAxisNm(double[] wavelengthsNm) {
        return Arrays.equals(this.wavelengthsNm, wavelengthsNm);
    }

    public double minNm() {
        return wavelengthsNm[0];
    }

    public double maxNm() {
        return wavelengthsNm[wavelengthsNm.length - 1];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Spectrum s && Arrays.equals(wavelengthsNm, s.wavelengthsNm) && Arrays.equals(values, s.values);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(wavelengthsNm) + Arrays.hashCode(values);
    }
}
