package org.strandbook.evaluation;

import java.util.Locale;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.WavelengthBand;

/**
 * A band of interest cut into equal sub-bands no wider than {@link #MAX_WIDTH_NM}: the regions a
 * margin forecast follows one by one.
 *
 * <p>Why: the margin of a band is set by its single worst wavelength, and loss often grows at one
 * place only (a hydrogen or OH band, a darkening edge). A trend of the band mean grows several
 * times slower than that place and dates the run-out years too late. Each sub-band's worst loss is
 * trended instead; the band's margin is the least sub-band margin, and its run-out date is that of
 * the sub-band that reaches zero first.
 *
 * @param band  the band
 * @param count number of equal sub-bands (≥ 1)
 */
public record SubBands(WavelengthBand band, int count) {

    /**
     * Design choice: 20 nm is narrower than the OH and hydrogen absorption bands of silica (tens
     * of nm wide) and still holds ten points of the 2 nm evaluation grid, so a sub-band's worst
     * loss is one band feature, not a single noisy reading.
     */
    public static final double MAX_WIDTH_NM = 20.0;

    public SubBands {
        if (count < 1) {
            throw new IllegalArgumentException("a band is cut into at least one sub-band, not " + count);
        }
    }

    /** The band cut into the fewest equal sub-bands no wider than {@link #MAX_WIDTH_NM}. */
    public static SubBands of(WavelengthBand band) {
        // a hair of tolerance so that a 60 nm band makes three sub-bands, not four
        return new SubBands(band, Math.max(1, (int) Math.ceil((band.toNm() - band.fromNm()) / MAX_WIDTH_NM - 1e-9)));
    }

    public double widthNm() {
        return (band.toNm() - band.fromNm()) / count;
    }

    /** Lower edge of sub-band {@code k}, nm. */
    public double fromNm(int k) {
        return band.fromNm() + k * widthNm();
    }

    /** Upper edge of sub-band {@code k}, nm. */
    public double toNm(int k) {
        return k == count - 1 ? band.toNm() : band.fromNm() + (k + 1) * widthNm();
    }

    /** The sub-band holding {@code wavelengthNm} (a shared edge belongs to the upper one); −1 outside the band. */
    public int indexOf(double wavelengthNm) {
        if (!band.contains(wavelengthNm)) {
            return -1;
        }
        return Math.min(count - 1, (int) Math.floor((wavelengthNm - band.fromNm()) / widthNm()));
    }

    /**
     * The highest measured loss in each sub-band, dB; NaN for a sub-band with no measured point.
     *
     * @param lossDb measured loss on {@code grid}, NaN where masked
     */
    public double[] worstLossDb(WavelengthGrid grid, double[] lossDb) {
        grid.requireSameLength(lossDb);
        double[] worst = new double[count];
        java.util.Arrays.fill(worst, Double.NaN);
        for (int i = 0; i < grid.size(); i++) {
            int k = indexOf(grid.wavelengthNm(i));
            if (k >= 0 && !Double.isNaN(lossDb[i]) && !(lossDb[i] <= worst[k])) {
                worst[k] = lossDb[i];
            }
        }
        return worst;
    }

    /** Sub-band {@code k} in words, e.g. "1230–1250 nm". */
    public String describe(int k) {
        return String.format(Locale.ROOT, "%.0f–%.0f nm", fromNm(k), toNm(k));
    }
}
