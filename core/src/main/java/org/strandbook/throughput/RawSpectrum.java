package org.strandbook.throughput;

import java.util.Arrays;
import java.util.Objects;
import java.util.OptionalDouble;

import org.strandbook.optics.LinearResampling;
import org.strandbook.optics.WavelengthGrid;

/**
 * One scan as the analyzer delivered it, on its own wavelength axis: detector counts (or any
 * quantity linear in optical power) per wavelength, optionally with the noise width of one
 * reading.
 *
 * <p>The four scans of a throughput measurement must share the detector unit, gain and
 * integration time; scans taken otherwise are to be normalised before they come here.
 *
 * @param axis        the scan's own ascending wavelength axis, nm
 * @param counts      one finite value per axis point
 * @param noiseCounts standard deviation of one reading in counts, if known (≥ 0); when empty it is
 *                    estimated (see {@link OneCordThroughput})
 */
public record RawSpectrum(WavelengthGrid axis, double[] counts, OptionalDouble noiseCounts) {

    public RawSpectrum {
        Objects.requireNonNull(axis, "axis");
        Objects.requireNonNull(noiseCounts, "noiseCounts");
        axis.requireSameLength(counts);
        counts = counts.clone();
        for (int i = 0; i < counts.length; i++) {
            if (!Double.isFinite(counts[i])) {
                throw new IllegalArgumentException("value " + counts[i] + " at " + axis.wavelengthNm(i)
                        + " nm is not a finite number");
            }
        }
        if (noiseCounts.isPresent() && !(noiseCounts.getAsDouble() >= 0 && Double.isFinite(noiseCounts.getAsDouble()))) {
            throw new IllegalArgumentException("noise width " + noiseCounts.getAsDouble()
                    + " counts must be a finite number ≥ 0");
        }
    }

    /**
     * A scan from its axis (strictly ascending wavelengths, nm) and values, noise to be estimated.
     */
    public static RawSpectrum ofNm(double[] wavelengthsNm, double[] counts) {
        if (wavelengthsNm.length != counts.length) {
            throw new IllegalArgumentException("scan has " + wavelengthsNm.length + " wavelengths but "
                    + counts.length + " values");
        }
        return new RawSpectrum(WavelengthGrid.ofNm(wavelengthsNm), counts, OptionalDouble.empty());
    }

    /** The same scan with a known noise width of one reading, counts (≥ 0). */
    public RawSpectrum withNoiseCounts(double sigmaCounts) {
        return new RawSpectrum(axis, counts, OptionalDouble.of(sigmaCounts));
    }

    @Override
    public double[] counts() {
        return counts.clone();
    }

    /** The counts without a copy, for this package's read-only passes over every scan. */
    double[] countsView() {
        return counts;
    }

    /** True when {@code wavelengthNm} lies within the scan's axis. */
    public boolean covers(double wavelengthNm) {
        return axis.covers(wavelengthNm);
    }

    /** The scan carried onto another grid by {@code resampling}, whose source is this scan's axis. */
    double[] resampledBy(LinearResampling resampling) {
        if (!resampling.source().equals(axis)) {
            throw new IllegalArgumentException("resampling from " + resampling.source() + " given a scan on " + axis);
        }
        return resampling.apply(counts);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RawSpectrum r && axis.equals(r.axis) && Arrays.equals(counts, r.counts)
                && noiseCounts.equals(r.noiseCounts);
    }

    @Override
    public int hashCode() {
        return Objects.hash(axis, Arrays.hashCode(counts), noiseCounts);
    }

    @Override
    public String toString() {
        return "RawSpectrum[" + axis + ", noiseCounts=" + noiseCounts + "]";
    }
}
