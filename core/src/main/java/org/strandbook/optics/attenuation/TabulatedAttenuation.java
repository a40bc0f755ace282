package org.strandbook.optics.attenuation;

import java.util.Arrays;
import java.util.Locale;

import org.strandbook.optics.WavelengthRange;

/**
 * Attenuation from datasheet points (wavelength nm, dB/km), interpolated log-linearly: ln α is
 * linear in wavelength between neighbouring points, so a loss that changes by a constant factor
 * per nm (an absorption edge) is followed exactly. Valid only between the first and last point.
 */
public final class TabulatedAttenuation implements AttenuationModel {

    private final String name;
    private final double[] wavelengthsNm;
    private final double[] lnDbPerKm;
    private final double[] dbPerKm;
    private final WavelengthRange range;
    private final int hash;

    /**
     * @param name what the table is, e.g. "datasheet 200/220 low-OH"
     * @param wavelengthsNm at least two, strictly ascending
     * @param dbPerKm one positive value per wavelength
     */
    public TabulatedAttenuation(String name, double[] wavelengthsNm, double[] dbPerKm) {
        this.name = name == null || name.isBlank() ? "attenuation table" : name;
        if (wavelengthsNm.length != dbPerKm.length) {
            throw new IllegalArgumentException(this.name + ": " + wavelengthsNm.length + " wavelengths but "
                    + dbPerKm.length + " attenuation values");
        }
        if (wavelengthsNm.length < 2) {
            throw new IllegalArgumentException(this.name + ": a table needs at least two points");
        }
        this.wavelengthsNm = wavelengthsNm.clone();
        this.dbPerKm = dbPerKm.clone();
        this.lnDbPerKm = new double[dbPerKm.length];
        for (int i = 0; i < dbPerKm.length; i++) {
            if (!(this.wavelengthsNm[i] > 0) || !Double.isFinite(this.wavelengthsNm[i])) {
                throw new IllegalArgumentException(this.name + ", point " + (i + 1) + ": wavelength "
                        + this.wavelengthsNm[i] + " nm is not a positive number");
            }
            if (i > 0 && !(this.wavelengthsNm[i] > this.wavelengthsNm[i - 1])) {
                throw new IllegalArgumentException(this.name + ", point " + (i + 1) + ": wavelengths must ascend ("
                        + this.wavelengthsNm[i - 1] + " nm then " + this.wavelengthsNm[i] + " nm)");
            }
            if (!(this.dbPerKm[i] > 0) || !Double.isFinite(this.dbPerKm[i])) {
                throw new IllegalArgumentException(this.name + ", point " + (i + 1) + ": attenuation "
                        + this.dbPerKm[i] + " dB/km must be positive for log-linear interpolation");
            }
            lnDbPerKm[i] = Math.log(this.dbPerKm[i]);
        }
        this.range = new WavelengthRange(this.wavelengthsNm[0], this.wavelengthsNm[this.wavelengthsNm.length - 1]);
        this.hash = 31 * (31 * this.name.hashCode() + Arrays.hashCode(this.wavelengthsNm)) + Arrays.hashCode(this.dbPerKm);
    }

    @Override
    public WavelengthRange validRange() {
        return range;
    }

    @Override
    public double attenuationDbPerKm(double wavelengthNm) {
        range.require(wavelengthNm, describe());
        int pos = Arrays.binarySearch(wavelengthsNm, wavelengthNm);
        if (pos >= 0) {
            return dbPerKm[pos];
        }
        int hi = -pos - 1;
        int lo = hi - 1;
        double f = (wavelengthNm - wavelengthsNm[lo]) / (wavelengthsNm[hi] - wavelengthsNm[lo]);
        return Math.exp(lnDbPerKm[lo] + f * (lnDbPerKm[hi] - lnDbPerKm[lo]));
    }

    public double firstNm() {
        return range.minNm();
    }

    public double lastNm() {
        return range.maxNm();
    }

    public double[] wavelengthsNm() {
        return wavelengthsNm.clone();
    }

    public double[] dbPerKm() {
        return dbPerKm.clone();
    }

    @Override
    public String describe() {
        return String.format(Locale.ROOT, "%s (%d points)", name, wavelengthsNm.length);
    }

    @Override
    public boolean equals(Object o) {
        return o == this || (o instanceof TabulatedAttenuation t && hash == t.hash && name.equals(t.name)
                && Arrays.equals(wavelengthsNm, t.wavelengthsNm) && Arrays.equals(dbPerKm, t.dbPerKm));
    }

    @Override
    public int hashCode() {
        return hash;
    }

    @Override
    public String toString() {
        return describe();
    }
}
