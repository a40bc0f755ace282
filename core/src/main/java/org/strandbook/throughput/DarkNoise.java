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
        double centre = median(differences);
        for (int i = 0; i < differences.length; i++) {
            differences[i] = Math.abs(differences[i] - centre);
        }
        return MAD_TO_SIGMA * median(differences) / Math.sqrt(2);
    }

    /**
     * Median by in-place selection (Hoare's FIND, Commun. ACM 4, 321 (1961)); the values are
     * reordered. Written out because a site evaluation estimates thousands of dark scans and the
     * general-purpose percentile copies and checks its input on every call. Even counts average the
     * two middle values, as {@code org.apache.commons.math3.stat.descriptive.rank.Median} does.
     */
    static double median(double[] values) {
        int n = values.length;
        double upper = select(values, n / 2);
        if (n % 2 == 1) {
            return upper;
        }
        double lower = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n / 2; i++) {
            lower = Math.max(lower, values[i]);
        }
        return lower + 0.5 * (upper - lower);
    }

    /** The k-th smallest value (0-based); afterwards values[0..k-1] ≤ values[k] ≤ values[k+1..]. */
    private static double select(double[] a, int k) {
        int lo = 0;
        int hi = a.length - 1;
        while (lo < hi) {
            double pivot = a[(lo + hi) >>> 1];
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (a[i] < pivot) {
                    i++;
                }
                while (a[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    double t = a[i];
                    a[i] = a[j];
                    a[j] = t;
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                return a[k];
            }
        }
        return a[k];
    }
}
