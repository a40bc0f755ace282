package org.strandbook.throughput;

import java.util.Arrays;

import org.strandbook.uncertainty.OrderStatistics;

/**
 * The median of a {@code double[]} without sorting it.
 *
 * <p>Large arrays are narrowed down before anything is selected, after the sampling idea of Floyd
 * and Rivest (Commun. ACM 18, 165 (1975), "Expected time bounds for selection"): the central
 * quantiles of a small sorted sample span {@value #BUCKETS} equal value buckets, one pass counts
 * the values per bucket (those outside fall into an end bucket each), a second pass gathers the
 * values of the bucket or two that hold the middle ranks into a scratch array, and only those few
 * are selected from. A value's bucket never decreases as the value grows, so every value of a
 * lower bucket is below every gathered one and the median's rank among the gathered is known.
 * Neither pass has a data-dependent branch, which matters because a dark scan's differences are
 * noise and defeat branch prediction. A degenerate sample (no spread, infinities) or a NaN among
 * the values falls back to Hoare's FIND (Commun. ACM 4, 321 (1961)) over the whole array, so the
 * result is always the exact median, never an estimate.
 *
 * <p>Even counts average the two middle values as
 * {@code org.apache.commons.math3.stat.descriptive.rank.Median} does.
 */
final class MedianSelection {

    /** Below this many values the passes would cost more than they save. */
    static final int SAMPLED_FROM = 256;

    static final int SAMPLE_SIZE = 32;

    /** The sample's order statistics that bound the buckets: its central three quarters. */
    private static final int SAMPLE_LOW_RANK = 4;
    private static final int SAMPLE_HIGH_RANK = SAMPLE_SIZE - 1 - SAMPLE_LOW_RANK;

    /** About 1.5 % of Gaussian noise falls into the middle bucket. */
    private static final int BUCKETS = 64;

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
            double bucketed = bucketedMedian(values, scratch);
            if (!Double.isNaN(bucketed)) {
                return bucketed;
            }
        }
        return wholeArrayMedian(values, n);
    }

    /** The median from the gathered middle buckets, or NaN for a degenerate sample or a NaN value. */
    private static double bucketedMedian(double[] values, double[] scratch) {
        int n = values.length;
        double[] sample = new double[SAMPLE_SIZE];
        for (int i = 0; i < SAMPLE_SIZE; i++) {
            sample[i] = values[(int) ((long) i * n / SAMPLE_SIZE)];
        }
        Arrays.sort(sample);
        double low = sample[SAMPLE_LOW_RANK];
        double bucketsPerUnit = BUCKETS / (sample[SAMPLE_HIGH_RANK] - low);
        if (!Double.isFinite(low) || !(bucketsPerUnit > 0 && bucketsPerUnit < Double.POSITIVE_INFINITY)) {
            return Double.NaN;
        }
        int[] counts = new int[BUCKETS + 2];
        int nans = 0;
        for (int i = 0; i < n; i++) {
            double v = values[i];
            counts[bucket(v, low, bucketsPerUnit)]++;
            nans += v != v ? 1 : 0;
        }
        if (nans > 0) {
            return Double.NaN;
        }
        int upperRank = n / 2;
        int lowerRank = n % 2 == 1 ? upperRank : upperRank - 1;
        int below = 0;
        int first = 0;
        while (below + counts[first] <= lowerRank) {
            below += counts[first];
            first++;
        }
        int last = first;
        int throughLast = below + counts[first];
        while (throughLast <= upperRank) {
            last++;
            throughLast += counts[last];
        }
        int gathered = 0;
        for (int i = 0; i < n; i++) {
            double v = values[i];
            int b = bucket(v, low, bucketsPerUnit);
            scratch[gathered] = v;
            gathered += (b >= first ? 1 : 0) & (b <= last ? 1 : 0);
        }
        double upper = OrderStatistics.select(scratch, 0, gathered - 1, upperRank - below);
        if (lowerRank == upperRank) {
            return upper;
        }
        double lower = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < upperRank - below; i++) {
            lower = Math.max(lower, scratch[i]);
        }
        return lower + 0.5 * (upper - lower);
    }

    /**
     * 0 below the sample's low quantile, 1 to {@value #BUCKETS} across its central range,
     * {@value #BUCKETS} + 1 above; never decreasing as {@code v} grows.
     */
    private static int bucket(double v, double low, double bucketsPerUnit) {
        int b = (int) ((v - low) * bucketsPerUnit + 1.0);
        return Math.min(Math.max(b, 0), BUCKETS + 1);
    }

    private static double wholeArrayMedian(double[] values, int n) {
        double upper = OrderStatistics.select(values, 0, n - 1, n / 2);
        if (n % 2 == 1) {
            return upper;
        }
        double lower = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n / 2; i++) {
            lower = Math.max(lower, values[i]);
        }
        return lower + 0.5 * (upper - lower);
    }
}
