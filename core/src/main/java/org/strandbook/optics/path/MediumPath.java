package org.strandbook.optics.path;

import java.util.Objects;

/**
 * Light crossing {@code pathLengthMm} of a reference medium inside the probe (Beer–Lambert).
 *
 * @param medium the medium
 * @param pathLengthMm optical path length in the medium (mm), ≥ 0
 */
public record MediumPath(ReferenceMedium medium, double pathLengthMm) {

    public MediumPath {
        Objects.requireNonNull(medium, "medium");
        if (!(pathLengthMm >= 0) || !Double.isFinite(pathLengthMm)) {
            throw new IllegalArgumentException("path length must be a finite number ≥ 0 mm, was " + pathLengthMm);
        }
    }

    /** Loss in dB at a wavelength: 10 × decadic absorbance. */
    public double lossDb(double wavelengthNm) {
        return 10.0 * medium.absorbancePerMm(wavelengthNm) * pathLengthMm;
    }
}
