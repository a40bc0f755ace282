package org.strandbook.uncertainty;

import java.util.List;
import java.util.Locale;

/**
 * The repeatability of a reading from several small groups of repeated readings, each group taken
 * under the same conditions (one visit, one cord, one integration time): the pooled experimental
 * standard deviation s_p = √(Σᵢ Σⱼ (xᵢⱼ − x̄ᵢ)² / Σᵢ (nᵢ − 1)) of JCGM 100:2008, 4.2.4 and H.3.6, the
 * within-group mean square of a one-way analysis of variance (the repeatability standard deviation
 * of ISO 5725-2). Groups of one reading carry no degree of freedom and are skipped. A level that
 * moves between visits (lamp ageing, a new cord) leaves it untouched: only the spread inside a
 * group counts. Two-pass sums, centred on each group's mean, so readings with many equal leading
 * digits keep their precision.
 *
 * @param standardDeviation s_p, in the readings' unit
 * @param degreesOfFreedom ν = Σ (nᵢ − 1) ≥ 1
 * @param groups groups that contributed (two readings or more)
 */
public record PooledRepeatability(double standardDeviation, int degreesOfFreedom, int groups) {

    public PooledRepeatability {
        if (!(standardDeviation >= 0) || !Double.isFinite(standardDeviation)) {
            throw new IllegalArgumentException("pooled standard deviation must be a finite number ≥ 0, was "
                    + standardDeviation);
        }
        if (degreesOfFreedom < 1) {
            throw new IllegalArgumentException("a pooled standard deviation needs at least one degree of freedom");
        }
    }

    /**
     * @param groups readings per group; NaN readings are left out
     * @return the pooled estimate, or null when no group holds two readings
     */
    public static PooledRepeatability of(List<double[]> groups) {
        double squares = 0;
        int dof = 0;
        int used = 0;
        for (double[] group : groups) {
            double sum = 0;
            int n = 0;
            for (double x : group) {
                if (!Double.isNaN(x)) {
                    sum += x;
                    n++;
                }
            }
            if (n < 2) {
                continue;
            }
            double mean = sum / n;
            for (double x : group) {
                if (!Double.isNaN(x)) {
                    squares += (x - mean) * (x - mean);
                }
            }
            dof += n - 1;
            used++;
        }
        return dof == 0 ? null : new PooledRepeatability(Math.sqrt(squares / dof), dof, used);
    }

    /** In words, e.g. "pooled from 3 repeated references (ν = 4)". */
    public String describe(String readings) {
        return String.format(Locale.ROOT, "pooled standard deviation of %s, %d group%s (ν = %d), JCGM 100:2008 4.2.4",
                readings, groups, groups == 1 ? "" : "s", degreesOfFreedom);
    }
}
