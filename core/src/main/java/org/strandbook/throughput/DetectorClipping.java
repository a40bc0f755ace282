package org.strandbook.throughput;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * Finds where a scan's detector was saturated or its converter clipped: counts there are not
 * light, and a clipped reference makes the loop look better than it is.
 *
 * <p>Three signs, each common practice with array spectrometers (keep references below roughly
 * 80–90 % of full scale, where detectors are still linear):
 * <ol>
 *   <li>counts at or above a declared full scale (a 16-bit converter stops at 65 535);</li>
 *   <li>a run of {@value #MIN_EQUAL_RUN} or more consecutive readings equal to the scan's maximum,
 *       when that maximum stands {@value #RISE_NOISE_WIDTHS} noise widths above the scan's minimum:
 *       noise never repeats the highest value exactly, a converter or amplifier limit does;</li>
 *   <li>a flattened top: the readings within {@value #TOP_NOISE_WIDTHS} noise widths of the maximum
 *       form a top that straight lines through the flanks beside it overshoot by more than
 *       {@value #FLAT_TOP_OVERSHOOT_NOISE_WIDTHS} noise widths: the flanks still climb where the
 *       readings stopped. This catches saturation below full scale with noise on it.</li>
 * </ol>
 * Each run found is widened by one reading on either side, whose value the limit may already
 * have bent.
 */
public final class DetectorClipping {

    /** Design choice: three equal highest readings in a row are not noise. */
    public static final int MIN_EQUAL_RUN = 3;
    /**
     * Design choice: the top is the readings within this many noise widths of the maximum (the
     * maximum itself sits about 3 widths above a flat top's middle, noise takes 3 more below it).
     */
    public static final double TOP_NOISE_WIDTHS = 6;
    /**
     * Design choice: flank lines overshooting the top by more than this many noise widths mark it
     * flattened. A parabolic top (lamp times detector response near their peak) overshoots by
     * about 2.25·6 ≈ 14 noise widths with flanks half as long as the top. A much flatter natural
     * top (x⁴ overshoots by about 15·6) would be taken for a flattened one: a limitation.
     */
    public static final double FLAT_TOP_OVERSHOOT_NOISE_WIDTHS = 30;
    /** Design choice: a scan whose maximum is not this many noise widths above its minimum has no top. */
    public static final double RISE_NOISE_WIDTHS = 10;
    /** Fewest readings of a flank through which its line is drawn. */
    private static final int MIN_FLANK_POINTS = 6;

    private DetectorClipping() {
    }

    /** A run of clipped readings, as indices into the scan's axis (inclusive). */
    public record Run(int from, int to) {
    }

    /**
     * The clipped runs of a scan, in axis order, not overlapping.
     *
     * @param counts          the scan's readings
     * @param noiseCounts     noise width of one reading (&gt; 0 for the flattened-top test; 0 skips it)
     * @param fullScaleCounts the converter's declared full scale, if known
     */
    public static List<Run> find(double[] counts, double noiseCounts, OptionalDouble fullScaleCounts) {
        int n = counts.length;
        boolean[] clipped = new boolean[n];
        if (n == 0) {
            return List.of();
        }
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        for (double c : counts) {
            max = Math.max(max, c);
            min = Math.min(min, c);
        }
        if (fullScaleCounts.isPresent()) {
            for (int i = 0; i < n; i++) {
                clipped[i] |= counts[i] >= fullScaleCounts.getAsDouble();
            }
        }
        // a scan that does not rise well above its lowest reading (a dark, a loop at its dark level)
        // has no top to clip: its repeated highest value is quantisation, not a limit
        if (max > min + Math.max(RISE_NOISE_WIDTHS * noiseCounts, Math.ulp(max))) {
            markEqualMaximumRuns(counts, max, clipped);
            if (noiseCounts > 0) {
                markFlattenedTop(counts, max, noiseCounts, clipped);
            }
        }
        return runs(clipped);
    }

    private static void markEqualMaximumRuns(double[] counts, double max, boolean[] clipped) {
        int i = 0;
        while (i < counts.length) {
            if (counts[i] != max) {
                i++;
                continue;
            }
            int j = i;
            while (j + 1 < counts.length && counts[j + 1] == max) {
                j++;
            }
            if (j - i + 1 >= MIN_EQUAL_RUN) {
                for (int k = i; k <= j; k++) {
                    clipped[k] = true;
                }
            }
            i = j + 1;
        }
    }

    /**
     * The contiguous top around the maximum, and straight lines through the flanks just beside it
     * carried in to the top's middle. A smooth top of any power law x^p stays within δ of its
     * maximum and its flank lines overshoot it by about (p − 1)·δ; a top cut off by a limit leaves
     * flanks still climbing steeply, whose lines overshoot by far more.
     */
    private static void markFlattenedTop(double[] counts, double max, double noiseCounts, boolean[] clipped) {
        double topLevel = max - TOP_NOISE_WIDTHS * noiseCounts;
        int peak = 0;
        while (counts[peak] != max) {
            peak++;
        }
        int left = extend(counts, peak, -1, topLevel);
        int right = extend(counts, peak, +1, topLevel);
        if (right - left + 1 < MIN_EQUAL_RUN) {
            return;
        }
        double middle = 0.5 * (left + right);
        // a flank as long as half the top keeps the line's noise, carried in to the middle, near σ
        int flank = Math.max(MIN_FLANK_POINTS, (right - left + 1) / 2);
        double leftOvershoot = flankLineAt(counts, left - 1, -1, flank, middle) - max;
        double rightOvershoot = flankLineAt(counts, right + 1, +1, flank, middle) - max;
        double overshoot = Double.isNaN(leftOvershoot) ? rightOvershoot
                : Double.isNaN(rightOvershoot) ? leftOvershoot : Math.min(leftOvershoot, rightOvershoot);
        if (overshoot > FLAT_TOP_OVERSHOOT_NOISE_WIDTHS * noiseCounts) {
            for (int k = left; k <= right; k++) {
                clipped[k] = true;
            }
        }
    }

    /** From {@code from} outwards while readings stay above {@code level} (one reading may dip below). */
    private static int extend(double[] counts, int from, int step, double level) {
        int edge = from;
        int i = from + step;
        while (i >= 0 && i < counts.length) {
            if (counts[i] >= level) {
                edge = i;
            } else if (!(i + step >= 0 && i + step < counts.length && counts[i + step] >= level)) {
                break;
            }
            i += step;
        }
        return edge;
    }

    /**
     * The least-squares line through {@code points} readings from {@code start} outwards,
     * evaluated at index {@code at}; NaN when the scan ends first.
     */
    private static double flankLineAt(double[] counts, int start, int step, int points, double at) {
        int end = start + step * (points - 1);
        if (start < 0 || start >= counts.length || end < 0 || end >= counts.length) {
            return Double.NaN;
        }
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        for (int k = 0; k < points; k++) {
            double x = start + step * k;
            double y = counts[start + step * k];
            sx += x;
            sy += y;
            sxx += x * x;
            sxy += x * y;
        }
        double slope = (points * sxy - sx * sy) / (points * sxx - sx * sx);
        double intercept = (sy - slope * sx) / points;
        return intercept + slope * at;
    }

    private static List<Run> runs(boolean[] clipped) {
        List<Run> runs = new ArrayList<>();
        int n = clipped.length;
        int i = 0;
        while (i < n) {
            if (!clipped[i]) {
                i++;
                continue;
            }
            int j = i;
            while (j + 1 < n && clipped[j + 1]) {
                j++;
            }
            runs.add(new Run(Math.max(0, i - 1), Math.min(n - 1, j + 1)));
            i = j + 1;
        }
        // widened runs may now touch: merge them
        List<Run> merged = new ArrayList<>();
        for (Run r : runs) {
            if (!merged.isEmpty() && merged.get(merged.size() - 1).to() >= r.from() - 1) {
                Run last = merged.remove(merged.size() - 1);
                merged.add(new Run(last.from(), Math.max(last.to(), r.to())));
            } else {
                merged.add(r);
            }
        }
        return merged;
    }
}
