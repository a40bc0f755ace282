package org.strandbook.throughput;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * The noise width of a detector from its dark scan.
 *
 * <p>σ = 1.4826·MAD(Δ)/√2 over the point-to-point differences Δᵢ = Dᵢ₊₁ − Dᵢ of the dark scan.
 * Differencing removes the smooth dark baseline (thermal slope, stray light) that would otherwise
 * count as noise (J. von Neumann et al., Ann. Math. Stat. 12, 153 (1941)); the median absolute
 * deviation scaled by 1/Φ⁻¹(3/4) ≈ 1.4826 estimates the standard deviation of Gaussian noise while
 * ignoring a few hot pixels or spikes (F. R. Hampel, J. Am. Stat. Assoc. 69, 383 (1974)); the
 * difference of two independent readings has √2 times the noise of one.
 */
public final class DarkNoise {

    /** Fewest points from which a noise width is estimated. */
    public static final int MIN_POINTS = 10;

    private static final double MAD_TO_SIGMA = 1 / new NormalDistribution().inverseCumulativeProbability(0.75);

    private DarkNoise() {
    }

    /**
     * Standard deviation of one reading, in the unit of {@code darkCounts}.
     *
     * @throws IllegalArgumentException with fewer than {@link #MIN_POINTS} points
     */
    public static double sigmaCounts(double[] darkCounts) {
        if (darkCounts.length < MIN_POINTS) {
            throw new IllegalArgumentException("a dark scan of " + darkCounts.length
                    + " points is too short to estimate its noise (need " + MIN_POINTS
                    + "); give the noise width of the scans explicitly");
        }
        double[] differences = new double[darkCounts.length - 1];
        for (int i = 0; i < differences.length; i++) {
            differences[i] = darkCounts[i + 1] - darkCounts[i];
        }
        double[] scratch = new double[differences.length];
        double centre = MedianSelection.median(differences, scratch);
        for (int i = 0; i < differences.length; i++) {
            differences[i] = Math.abs(differences[i] - centre);
        }
        return MAD_TO_SIGMA * MedianSelection.median(differences, scratch) / Math.sqrt(2);
    }

    /** Median of {@code values}, which may be reordered; see {@link MedianSelection}. */
    static double median(double[] values) {
        return MedianSelection.median(values, new double[values.length]);
    }
}
