package org.strandbook.trend;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.descriptive.rank.Median;

/**
 * Robust straight-line trend of loss against time.
 *
 * <p>Slope: the median of the slopes (yⱼ − yᵢ)/(tⱼ − tᵢ) over all pairs of readings taken at
 * different times (H. Theil, "A rank-invariant method of linear and polynomial regression
 * analysis", Proc. Kon. Ned. Akad. Wetensch. 53 (1950); P. K. Sen, "Estimates of the regression
 * coefficient based on Kendall's tau", J. Am. Stat. Assoc. 63, 1379–1389 (1968)). One wild scan
 * moves it little: about 29 % of the readings must be bad before it can be dragged anywhere.
 *
 * <p>Intercept: Conover's choice, median(y) − slope·median(t) (W. J. Conover, <i>Practical
 * Nonparametric Statistics</i>, Wiley 1980), the form used by D. R. Helsel and R. M. Hirsch,
 * <i>Statistical Methods in Water Resources</i>, USGS TWRI 4-A3 (2002; 2020 edition USGS TM 4-A3).
 * It is reported at the time of the earliest reading.
 *
 * <p>Confidence interval: from the null distribution of Kendall's S in its normal approximation
 * (Sen 1968; Helsel &amp; Hirsch): with z the two-sided normal quantile and
 * Var S = [n(n−1)(2n+5) − Σ t(t−1)(2t+5)]/18, the sum running over groups of t tied loss values
 * and, as in Sen's treatment, over groups of readings at the same time, the limits are the
 * R_l-th and R_u-th smallest of the N ordered slopes with R_l = (N − z√Var S)/2 and
 * R_u = (N + z√Var S)/2 + 1. The ranks are rounded to the nearest integer, which reproduces
 * Sen's (1968) worked example; where a rank falls outside 1…N the data cannot bound the slope at
 * that confidence and the limit is reported as infinite rather than clamped to the extreme slope.
 *
 * <p>Time runs in Julian years ({@link YearScale}), so slopes are in dB/year. All N slopes are
 * formed and sorted: O(n² log n), fine for the tens to hundreds of scans a light path collects
 * over its life.
 */
public final class TheilSenTrend {

    /** Two-sided confidence of the slope limits unless stated otherwise. */
    public static final double DEFAULT_CONFIDENCE = 0.95;

    private final double confidenceLevel;
    /** The two-sided normal quantile of the confidence level: set up once, a site fits thousands of trends. */
    private final double z;

    private TheilSenTrend(double confidenceLevel) {
        this.confidenceLevel = confidenceLevel;
        this.z = new NormalDistribution().inverseCumulativeProbability(0.5 + confidenceLevel / 2);
    }

    /** 95 % confidence limits. */
    public static TheilSenTrend withDefaults() {
        return new TheilSenTrend(DEFAULT_CONFIDENCE);
    }

    /** The same estimator with two-sided confidence {@code level}, 0 &lt; level &lt; 1. */
    public TheilSenTrend withConfidence(double level) {
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("confidence level " + level + " must lie between 0 and 1 (e.g. 0.95)");
        }
        return new TheilSenTrend(level);
    }

    public double confidenceLevel() {
        return confidenceLevel;
    }

    /**
     * Fits the trend to readings in any order.
     *
     * @throws IllegalArgumentException with fewer than two readings at different times
     */
    public LossTrend fit(List<LossReading> readings) {
        List<LossReading> sorted = new ArrayList<>(readings);
        sorted.sort(Comparator.comparing(LossReading::time));
        int n = sorted.size();
        if (n < 2) {
            throw new IllegalArgumentException("a trend needs at least two readings, got " + n);
        }
        Instant reference = sorted.get(0).time();
        double[] t = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = YearScale.yearsBetween(reference, sorted.get(i).time());
            y[i] = sorted.get(i).lossDb();
        }

        double[] slopes = new double[n * (n - 1) / 2];
        int count = 0;
        long s = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (t[j] > t[i]) {
                    slopes[count++] = (y[j] - y[i]) / (t[j] - t[i]);
                    s += (long) Math.signum(y[j] - y[i]);
                }
            }
        }
        if (count == 0) {
            throw new IllegalArgumentException("all " + n + " readings were taken at the same time " + reference
                    + "; a trend needs readings at two different times");
        }
        slopes = Arrays.copyOf(slopes, count);
        Arrays.sort(slopes);
        double slope = medianOfSorted(slopes);
        Median median = new Median();
        double intercept = median.evaluate(y) - slope * median.evaluate(t);

        double varianceS = (n * (n - 1.0) * (2.0 * n + 5.0) - tieTerm(y) - tieTerm(t)) / 18.0;
        double halfWidth = z * Math.sqrt(Math.max(varianceS, 0));
        long lowerRank = Math.round((count - halfWidth) / 2);
        long upperRank = Math.round((count + halfWidth) / 2 + 1);
        double lower = lowerRank >= 1 ? slopes[(int) lowerRank - 1] : Double.NEGATIVE_INFINITY;
        double upper = upperRank <= count ? slopes[(int) upperRank - 1] : Double.POSITIVE_INFINITY;

        return new LossTrend(slope, intercept, reference, lower, upper, confidenceLevel, n, count, s, varianceS);
    }

    /** Σ t(t−1)(2t+5) over groups of t equal values. */
    private static double tieTerm(double[] values) {
        double[] v = values.clone();
        Arrays.sort(v);
        double sum = 0;
        int i = 0;
        while (i < v.length) {
            int j = i;
            while (j + 1 < v.length && v[j + 1] == v[i]) {
                j++;
            }
            double g = j - i + 1.0;
            sum += g * (g - 1) * (2 * g + 5);
            i = j + 1;
        }
        return sum;
    }

    private static double medianOfSorted(double[] sorted) {
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
    }
}
