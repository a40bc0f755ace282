package org.strandbook.throughput;

import java.util.Arrays;

/**
 * The median of a {@code double[]} without sorting it.
 *
 * <p>Large arrays follow Floyd and Rivest (Commun. ACM 18, 165 (1975), "Expected time bounds for
 * selection"): a small sample brackets the median between two of its order statistics, one pass
 * counts the values below the bracket and gathers those inside it into a scratch array, and only
 * the gathered few are selected from. The pass has no data-dependent branch, which matters
 * because a dark scan's differences are noise and defeat branch prediction; it replaces most of
 * the comparisons of a full selection. A bracket the sample misjudged, or a NaN among the values,
 * falls back to Hoare's FIND (Commun. ACM 4, 321 (1961)) over the whole array, so the result is
 * always the exact median, never an estimate.
 *
 * <p>Even counts average the two middle values as
 * {@code org.apache.commons.math3.stat.descriptive.rank.Median} does.
 */
final class MedianSelection {

    /** Below this many values the sample would cost more than it saves. */
    static final int SAMPLED_FROM = 256;

    static final int SAMPLE_SIZE = 128;

    /**
     * Half-width of the bracket in sample ranks: 2.5 standard deviations of the sample rank of the
     * median (√(s/4) = 5.7 for s = 128), so the bracket misses in about 1 % of arrays.
     */
    private static final int BRACKET_HALF_RANKS = 14;

    private MedianSelection() {
    }

    /**
     * Median of {@code values}.
     *
     * @param values  reordered when the whole array is selected from
     * @param scratch at least {@code values.length} long; overwritten
     */
    static double median(double[] values, double[] scratch) {
        int n = values.length;
        if (n >= SAMPLED_FROM) {
            double sampled = sampledMedian(values, scratch);
            if (!Double.isNaN(sampled)) {
                return sampled;
            }
        }
        return wholeArrayMedian(values, n);
    }

    /** The median from the gathered bracket, or NaN when the bracket missed it or a value is NaN. */
    private static double sampledMedian(double[] values, double[] scratch) {
        int n = values.length;
        double[] sample = new double[SAMPLE_SIZE];
        for (int i = 0; i < SAMPLE_SIZE; i++) {
            sample[i] = values[(int) ((long) i * n / SAMPLE_SIZE)];
        }
        Arrays.sort(sample);
        int sampleRank = SAMPLE_SIZE / 2;
        double low = sample[sampleRank - BRACKET_HALF_RANKS];
        double high = sample[sampleRank + BRACKET_HALF_RANKS];
        int below = 0;
        int above = 0;
        int inside = 0;
        for (int i = 0; i < n; i++) {
            double v = values[i];
            scratch[inside] = v;
            inside += (v >= low ? 1 : 0) & (v <= high ? 1 : 0);
            below += v < low ? 1 : 0;
            above += v > high ? 1 : 0;
        }
        int upperRank = n / 2;
        int lowerRank = n % 2 == 1 ? upperRank : upperRank - 1;
        if (below + inside + above != n || lowerRank < below || upperRank >= below + inside) {
            return Double.NaN;
        }
        double upper = select(scratch, inside, upperRank - below);
        if (lowerRank == upperRank) {
            return upper;
        }
        double lower = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < upperRank - below; i++) {
            lower = Math.max(lower, scratch[i]);
        }
        return lower + 0.5 * (upper - lower);
    }

    private static double wholeArrayMedian(double[] values, int n) {
        double upper = select(values, n, n / 2);
        if (n % 2 == 1) {
            return upper;
        }
        double lower = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n / 2; i++) {
            lower = Math.max(lower, values[i]);
        }
        return lower + 0.5 * (upper - lower);
    }

    /**
     * The k-th smallest of a[0..length-1] (k 0-based); afterwards a[0..k-1] ≤ a[k] ≤ a[k+1..].
     */
    private static double select(double[] a, int length, int k) {
        int lo = 0;
        int hi = length - 1;
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
