package org.strandbook.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Collections;
import java.util.List;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

/**
 * The additive model Y = X₁ + X₂ + X₃ + X₄ of JCGM 101:2008, clause 9.2, run through both
 * propagation methods. The printed tables of clause 9.2 were not at hand, so the expected values
 * are derived analytically here (normal sum; exact sum of rectangles, {@link SumOfRectangles}) and
 * compared with the rounded figures of the clause as we recall them (from memory: ±3.92 for
 * 9.2.2, ±3.88 for 9.2.3, ±17.0 against the framework's ±19.9 for 9.2.4).
 */
class MonteCarloPropagationTest {

    private static final int TRIALS = 1_000_000;
    /**
     * Design choice: with M = 10⁶ the 2.5 % quantile of these sums scatters by about 0.005 (one
     * standard error, √(p(1−p)/M)/pdf), so ends are checked to 0.02 (four standard errors); the
     * standard uncertainty scatters by u/√(2M) ≈ 0.0014 and is checked to the 0.005 numerical
     * tolerance of a value printed to two decimals (JCGM 101:2008, 7.9.2).
     */
    private static final double END_TOLERANCE = 0.02;
    private static final double U_TOLERANCE = 0.005;
    private static final MeasurementModel SUM = x -> x[0] + x[1] + x[2] + x[3];
    private static final MonteCarloPropagation MCM = MonteCarloPropagation.standard().withTrials(TRIALS);

    @Test
    void normalInputsGiveTheNormalIntervalOfJcgm101Clause922() {
        // JCGM 101:2008, 9.2.2: Xᵢ ~ N(0, 1); Y ~ N(0, 4) so u(y) = 2 and the 95 % interval is ±1.95996·2.
        List<InputDistribution> inputs = Collections.nCopies(4, new InputDistribution.Normal(0, 1));
        MonteCarloResult r = MCM.propagate(inputs, SUM, 0.95, CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC);
        assertEquals(0.0, r.estimate(), U_TOLERANCE);
        assertEquals(2.0, r.standardUncertainty(), U_TOLERANCE);
        assertEquals(-3.92, r.interval().low(), END_TOLERANCE);
        assertEquals(3.92, r.interval().high(), END_TOLERANCE);
    }

    @Test
    void rectangularInputsGiveTheNarrowerExactIntervalOfJcgm101Clause923() {
        // JCGM 101:2008, 9.2.3: Xᵢ rectangular with u = 1 (half-width √3). The exact 97.5 % point of
        // the sum (Bradley & Gupta 2002) lies inside the framework's 3.92: the output is not normal.
        double a = Math.sqrt(3);
        double exact = new SumOfRectangles(a, a, a, a).quantile(0.975);
        assertEquals(3.88, exact, 0.005); // from memory: clause 9.2.3 prints ±3.88
        List<InputDistribution> inputs = Collections.nCopies(4, InputDistribution.Rectangular.around(0, a));
        MonteCarloResult r = MCM.propagate(inputs, SUM, 0.95, CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC);
        assertEquals(2.0, r.standardUncertainty(), U_TOLERANCE);
        assertEquals(-exact, r.interval().low(), END_TOLERANCE);
        assertEquals(exact, r.interval().high(), END_TOLERANCE);
        // For a symmetric unimodal output the shortest interval (7.7.2) has the symmetric one's
        // length; its position is poorly fixed by a sample (the length is flat around the optimum),
        // so only the length is checked.
        MonteCarloResult shortest = MCM.propagate(inputs, SUM, 0.95, CoverageInterval.Method.SHORTEST);
        assertEquals(2 * exact, shortest.interval().width(), END_TOLERANCE);
    }

    @Test
    void dominantRectangularInputGivesTheMuchNarrowerIntervalOfJcgm101Clause924() {
        // JCGM 101:2008, 9.2.4: X₁…X₃ rectangular with u = 1, X₄ rectangular with u = 10. The law of
        // propagation gives u = √103 and ±19.9; the exact interval is far narrower.
        double a = Math.sqrt(3);
        double a4 = 10 * Math.sqrt(3);
        double exact = new SumOfRectangles(a, a, a, a4).quantile(0.975);
        assertEquals(17.0, exact, 0.05); // from memory: clause 9.2.4 prints ±17.0
        List<InputDistribution> inputs = List.of(InputDistribution.Rectangular.around(0, a),
                InputDistribution.Rectangular.around(0, a), InputDistribution.Rectangular.around(0, a),
                InputDistribution.Rectangular.around(0, a4));
        MonteCarloResult r = MCM.propagate(inputs, SUM, 0.95, CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC);
        assertEquals(Math.sqrt(103), r.standardUncertainty(), 10 * U_TOLERANCE);
        // Design choice: the end scatters ten times more here (the pdf at the end is ten times lower).
        assertEquals(-exact, r.interval().low(), 10 * END_TOLERANCE);
        assertEquals(exact, r.interval().high(), 10 * END_TOLERANCE);
    }

    @Test
    void shortestIntervalOfASkewedOutputStartsAtItsMode() {
        // Triangular on [0, 1] with mode 0: F(y) = 1 − (1 − y)². The shortest 95 % interval
        // (JCGM 101:2008, 7.7.2) is [0, 1 − √0.05]; the symmetric one (7.7.1) is
        // [1 − √0.975, 1 − √0.025]. Derived from F.
        List<InputDistribution> inputs = List.of(new InputDistribution.Triangular(0, 0, 1));
        MeasurementModel identity = x -> x[0];
        MonteCarloResult shortest = MCM.propagate(inputs, identity, 0.95, CoverageInterval.Method.SHORTEST);
        MonteCarloResult symmetric = MCM.propagate(inputs, identity, 0.95,
                CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC);
        assertEquals(0.0, shortest.interval().low(), 0.002);
        assertEquals(1 - Math.sqrt(0.05), shortest.interval().high(), 0.002);
        assertEquals(1 - Math.sqrt(0.975), symmetric.interval().low(), 0.002);
        assertEquals(1 - Math.sqrt(0.025), symmetric.interval().high(), 0.002);
    }

    @Test
    void sameSeedGivesTheSameInterval() {
        // Design choice: a workbook evaluated twice must give the same interval.
        List<InputDistribution> inputs = List.of(InputDistribution.Rectangular.around(1, 0.5),
                new InputDistribution.Normal(0, 0.1));
        MeasurementModel model = x -> x[0] + x[1];
        MonteCarloPropagation small = MonteCarloPropagation.standard().withTrials(10_000);
        assertEquals(small.propagate(inputs, model, 0.95, CoverageInterval.Method.SHORTEST),
                small.propagate(inputs, model, 0.95, CoverageInterval.Method.SHORTEST));
    }

    @Test
    void chanceOfAnAllNormalLinearBudgetIsTheNormalDistributionFunction() {
        // A linear model in normal inputs has a normal output (JCGM 101:2008, 9.2.2), so the chance
        // that it stays at or below X is Φ((X − μ)/σ); Φ from Apache Commons Math's
        // NormalDistribution, a general-purpose reference library. Three joints and a fiber term
        // with made-up spreads (dB): μ = 1 + 0.8 + 0.6 + 2.5, σ² = 0.3² + 0.2² + 0.2² + 0.4².
        List<InputDistribution> inputs = List.of(new InputDistribution.Normal(1.0, 0.3),
                new InputDistribution.Normal(0.8, 0.2), new InputDistribution.Normal(0.6, 0.2),
                new InputDistribution.Normal(2.5, 0.4));
        double sigma = Math.sqrt(0.09 + 0.04 + 0.04 + 0.16);
        NormalDistribution output = new NormalDistribution(null, 4.9, sigma, 1e-12);
        for (double allowedDb : new double[] {4.5, 4.9, 5.6}) {
            Chance c = MCM.chanceAtMost(inputs, SUM, allowedDb);
            // Design choice: four binomial standard errors, √(P(1 − P)/M) ≤ 0.0005 at M = 10⁶.
            assertEquals(output.cumulativeProbability(allowedDb), c.probability(), 4 * 0.0005, "X = " + allowedDb);
            assertEquals(TRIALS, c.trials());
        }
    }

    @Test
    void chanceOfASumOfRectanglesFollowsItsExactDistributionFunction() {
        // JCGM 101:2008, 9.2.4's inputs (rectangular, one dominant); the exact distribution function
        // of the sum is Bradley & Gupta's (Ann. Inst. Statist. Math. 54 (2002) 689–700).
        double a = Math.sqrt(3);
        double a4 = 10 * Math.sqrt(3);
        SumOfRectangles exact = new SumOfRectangles(a, a, a, a4);
        List<InputDistribution> inputs = List.of(InputDistribution.Rectangular.around(0, a),
                InputDistribution.Rectangular.around(0, a), InputDistribution.Rectangular.around(0, a),
                InputDistribution.Rectangular.around(0, a4));
        for (double limit : new double[] {-16, 0, 12}) {
            assertEquals(exact.cumulative(limit), MCM.chanceAtMost(inputs, SUM, limit).probability(), 0.002,
                    "limit " + limit);
        }
    }
}
