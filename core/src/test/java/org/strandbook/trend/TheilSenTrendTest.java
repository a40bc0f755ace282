package org.strandbook.trend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.junit.jupiter.api.Test;

class TheilSenTrendTest {

    private static final Instant ORIGIN = Instant.parse("2020-01-01T00:00:00Z");

    /** Readings at t = x Julian years after ORIGIN. */
    static List<LossReading> series(double[] xYears, double[] lossDb) {
        List<LossReading> readings = new ArrayList<>();
        for (int i = 0; i < xYears.length; i++) {
            readings.add(new LossReading(at(xYears[i]), lossDb[i]));
        }
        return readings;
    }

    static Instant at(double years) {
        return ORIGIN.plusSeconds(Math.round(years * YearScale.SECONDS_PER_YEAR));
    }

    // Source: the worked example of P. K. Sen, J. Am. Stat. Assoc. 63, 1379 (1968), as reproduced
    // in SciPy's test suite for scipy.stats.theilslopes: x = 1 2 3 4 10 12 18,
    // y = 9 15 19 20 45 55 78, 93 % limits: slope 4, lower 3.71, upper 4.38 (two decimals);
    // Conover intercept median(y) − slope·median(x) = 4.0.
    @Test
    void reproducesSenWorkedExample() {
        List<LossReading> readings = series(new double[] {1, 2, 3, 4, 10, 12, 18},
                new double[] {9, 15, 19, 20, 45, 55, 78});

        LossTrend trend = TheilSenTrend.withDefaults().withConfidence(0.93).fit(readings);

        double twoDecimals = 0.005 + 1e-12;
        assertEquals(4.0, trend.slopeDbPerYear(), 1e-12);
        assertEquals(3.71, trend.lowerSlopeDbPerYear(), twoDecimals);
        assertEquals(4.38, trend.upperSlopeDbPerYear(), twoDecimals);
        assertEquals(4.0, trend.lossDbAt(ORIGIN), 1e-9);
    }

    // Source: without ties Kendall's S has variance n(n−1)(2n+5)/18 under no trend (Sen 1968;
    // Helsel & Hirsch, Statistical Methods in Water Resources, USGS TWRI 4-A3, 2002). Sen's example
    // is monotone, so all 21 pairs are concordant (SciPy 1.17.1 kendalltau gives τ = 1 for it).
    @Test
    void kendallStatisticOfSenExample() {
        List<LossReading> readings = series(new double[] {1, 2, 3, 4, 10, 12, 18},
                new double[] {9, 15, 19, 20, 45, 55, 78});

        LossTrend trend = TheilSenTrend.withDefaults().fit(readings);

        assertEquals(21, trend.kendallS());
        assertEquals(7 * 6 * 19 / 18.0, trend.kendallVarianceS(), 1e-12);
        assertEquals(21, trend.slopeCount());
    }

    // Source: documentation example of ci.theil in the R package statpsych (Bonett), method of
    // Hollander & Wolfe, Nonparametric Statistical Methods (Wiley 1999): 15 points, x tied three
    // times at 28 and twice at 40; estimate 0.5, 95 % limits 0.3243243 and 0.75. Pairs at the same
    // x carry no slope and are left out.
    @Test
    void reproducesHollanderWolfeExampleWithTiedTimes() {
        List<LossReading> readings = series(
                new double[] {67, 28, 30, 28, 52, 40, 25, 37, 44, 10, 14, 20, 28, 40, 51},
                new double[] {21, 4, 9, 12, 35, 18, 10, 22, 24, 1, 6, 8, 13, 16, 19});

        LossTrend trend = TheilSenTrend.withDefaults().fit(readings);

        assertEquals(0.5, trend.slopeDbPerYear(), 1e-12);
        assertEquals(0.3243243, trend.lowerSlopeDbPerYear(), 5e-8);
        assertEquals(0.75, trend.upperSlopeDbPerYear(), 1e-12);
        assertEquals(105 - 4, trend.slopeCount());
    }

    // Source: reference library SciPy 1.17.1, scipy.stats.theilslopes(y, x, 0.95) (default
    // intercept method 'separate' = Conover) for losses read to 0.1 dB, so many losses tie:
    // slope 0.03484848484848485, intercept 0.05833333333333332, limits 0.02 and 0.05.
    // Without the ties correction of Var S the lower limit would be the 19th slope, 0.0142857.
    @Test
    void tieCorrectionMatchesReferenceLibrary() {
        List<LossReading> readings = series(new double[] {0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11},
                new double[] {0.2, 0.0, 0.2, 0.2, 0.2, 0.2, 0.4, 0.3, 0.4, 0.4, 0.4, 0.6});

        LossTrend trend = TheilSenTrend.withDefaults().fit(readings);

        assertEquals(0.03484848484848485, trend.slopeDbPerYear(), 1e-12);
        assertEquals(0.05833333333333332, trend.interceptLossDb(), 1e-12);
        assertEquals(0.02, trend.lowerSlopeDbPerYear(), 1e-12);
        assertEquals(0.05, trend.upperSlopeDbPerYear(), 1e-12);
    }

    // Property of the estimator (Theil 1950): every pairwise slope of points on a line is the
    // line's slope, so the median and both limits are exact.
    @Test
    void recoversExactLine() {
        double[] x = {0, 0.4, 1.1, 1.9, 3.0, 4.2, 5.5};
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = 1.2 + 0.15 * x[i];
        }

        LossTrend trend = TheilSenTrend.withDefaults().fit(series(x, y));

        assertEquals(0.15, trend.slopeDbPerYear(), 1e-12);
        assertEquals(1.2, trend.interceptLossDb(), 1e-12);
        assertEquals(0.15, trend.lowerSlopeDbPerYear(), 1e-12);
        assertEquals(0.15, trend.upperSlopeDbPerYear(), 1e-12);
    }

    // Robustness (Sen 1968): one wild reading among ten changes only 9 of the 45 pairwise
    // slopes, so the median stays on the line's slope.
    @Test
    void oneOutlierDoesNotMoveTheSlope() {
        double[] x = {0, 1, 2, 3, 4, 5, 6, 7, 8, 9};
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = 2.0 + 0.08 * x[i];
        }
        y[6] += 5.0;

        LossTrend trend = TheilSenTrend.withDefaults().fit(series(x, y));

        assertEquals(0.08, trend.slopeDbPerYear(), 1e-12);
        assertEquals(2.0, trend.interceptLossDb(), 1e-12);
    }

    @Test
    void slopeIsPerJulianYear() {
        Instant first = Instant.parse("2023-03-01T00:00:00Z");
        List<LossReading> readings = List.of(
                new LossReading(first, 1.00),
                new LossReading(first.plusSeconds(365L * 86_400 + 6 * 3_600), 1.10));

        LossTrend trend = TheilSenTrend.withDefaults().fit(readings);

        assertEquals(0.10, trend.slopeDbPerYear(), 1e-12);
        assertEquals(first, trend.referenceTime());
    }

    // With n = 3, N = 3 slopes but z·√Var S = 1.96·√(3·2·11/18) ≈ 3.75 > N: no rank of the ordered
    // slopes can serve as a 95 % limit (Helsel & Hirsch's rank formula leaves 1…N).
    @Test
    void tooFewReadingsLeaveTheSlopeUnbounded() {
        LossTrend trend = TheilSenTrend.withDefaults().fit(series(new double[] {0, 1, 2}, new double[] {1.0, 1.2, 1.1}));

        assertEquals(Double.NEGATIVE_INFINITY, trend.lowerSlopeDbPerYear());
        assertEquals(Double.POSITIVE_INFINITY, trend.upperSlopeDbPerYear());
        assertFalse(trend.slopeIsBounded());
    }

    @Test
    void readingOrderDoesNotMatter() {
        List<LossReading> readings = series(new double[] {0, 1, 2, 3, 4, 5, 6, 7},
                new double[] {1.0, 1.3, 1.1, 1.5, 1.4, 1.9, 1.6, 2.0});
        List<LossReading> shuffled = new ArrayList<>(readings);
        Collections.reverse(shuffled);

        assertEquals(TheilSenTrend.withDefaults().fit(readings), TheilSenTrend.withDefaults().fit(shuffled));
    }

    @Test
    void refusesReadingsWithoutTwoDistinctTimes() {
        IllegalArgumentException one = assertThrows(IllegalArgumentException.class,
                () -> TheilSenTrend.withDefaults().fit(List.of(new LossReading(ORIGIN, 1))));
        assertTrue(one.getMessage().contains("at least two"), one.getMessage());
        IllegalArgumentException same = assertThrows(IllegalArgumentException.class,
                () -> TheilSenTrend.withDefaults().fit(List.of(new LossReading(ORIGIN, 1), new LossReading(ORIGIN, 2))));
        assertTrue(same.getMessage().contains("same time"), same.getMessage());
        assertThrows(IllegalArgumentException.class, () -> TheilSenTrend.withDefaults().withConfidence(1.0));
    }
}
