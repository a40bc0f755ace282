package org.strandbook.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collections;
import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The adaptive Monte Carlo procedure of JCGM 101:2008, 7.9, on the additive model of its clause 9.2.
 * The numerical tolerance follows the definition of 7.9.2 (u(y) = c·10^ℓ with c of n_dig digits,
 * δ = ½·10^ℓ); the stabilised results are held to the exact values derived in
 * {@link MonteCarloPropagationTest} (normal sum; exact sum of rectangles).
 */
class AdaptiveMonteCarloTest {

    private static final MeasurementModel SUM = x -> x[0] + x[1] + x[2] + x[3];

    @Test
    void theNumericalToleranceIsHalfTheLastSignificantDigitOfU() {
        // JCGM 101:2008, 7.9.2: u = 2.0 to two digits is 20·10⁻¹, δ = 0.05; to one digit 2·10⁰, δ = 0.5
        assertEquals(0.05, MonteCarloPropagation.numericalTolerance(2.0, 2), 1e-15);
        assertEquals(0.5, MonteCarloPropagation.numericalTolerance(2.0, 1), 1e-15);
        assertEquals(0.005, MonteCarloPropagation.numericalTolerance(0.35, 2), 1e-15);
        // 0.0996 to two digits rounds to 0.10 = 10·10⁻², so δ = 0.005
        assertEquals(0.005, MonteCarloPropagation.numericalTolerance(0.0996, 2), 1e-15);
    }

    @Test
    void normalInputsStabiliseOnTheIntervalOfClause922WithinTheTolerance() {
        // JCGM 101:2008, 9.2.2: Y ~ N(0, 4), 95 % interval ±1.95996·2 = ±3.92
        List<InputDistribution> inputs = Collections.nCopies(4, new InputDistribution.Normal(0, 1));
        MonteCarloResult r = MonteCarloPropagation.standard().propagateAdaptive(inputs, SUM, 0.95,
                CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC, 2);
        double delta = MonteCarloPropagation.numericalTolerance(2.0, 2);
        // stabilised means 2 s ≤ δ for the batch average: the end lies within about δ of the truth
        assertEquals(2 * 1.959964, r.interval().high(), 2 * delta);
        assertEquals(-2 * 1.959964, r.interval().low(), 2 * delta);
        assertEquals(2.0, r.standardUncertainty(), delta);
        assertTrue(r.trials() % 10_000 == 0 && r.trials() <= MonteCarloPropagation.DEFAULT_TRIALS, "" + r.trials());
    }

    @Test
    void rectangularInputsStabiliseOnTheExactIntervalOfClause923() {
        double a = Math.sqrt(3);
        double exact = new SumOfRectangles(a, a, a, a).quantile(0.975);
        List<InputDistribution> inputs = Collections.nCopies(4, InputDistribution.Rectangular.around(0, a));
        MonteCarloResult r = MonteCarloPropagation.standard().propagateAdaptive(inputs, SUM, 0.95,
                CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC, 2);
        double delta = MonteCarloPropagation.numericalTolerance(2.0, 2);
        assertEquals(exact, r.interval().high(), 2 * delta);
        assertEquals(-exact, r.interval().low(), 2 * delta);
    }

    @Test
    void theSplitMixGeneratorGivesTheSameExactIntervalOfClause924() {
        // JCGM 101:2008, 9.2.4 (one dominant rectangle, the least normal output of the clause): the
        // faster generator must reproduce the exact sum of rectangles as the Mersenne Twister does
        double a = Math.sqrt(3);
        double a4 = 10 * Math.sqrt(3);
        double exact = new SumOfRectangles(a, a, a, a4).quantile(0.975);
        List<InputDistribution> inputs = List.of(InputDistribution.Rectangular.around(0, a),
                InputDistribution.Rectangular.around(0, a), InputDistribution.Rectangular.around(0, a),
                InputDistribution.Rectangular.around(0, a4));
        MonteCarloResult r = MonteCarloPropagation.standard().withGenerator(MonteCarloPropagation.Generator.SPLITMIX64)
                .withTrials(1_000_000).propagate(inputs, SUM, 0.95, CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC);
        // design choice as in MonteCarloPropagationTest: 0.2, ten times the normal case's four standard errors
        assertEquals(exact, r.interval().high(), 0.2);
        assertEquals(-exact, r.interval().low(), 0.2);
        assertEquals(Math.sqrt(103), r.standardUncertainty(), 0.05);
    }

    @Test
    void selectionFindsTheSameEndsAsSortingAllValues() {
        // JCGM 101:2008, 7.7.1: the ends are the r-th and (r+q)-th ordered values, however found;
        // ties and an odd M included
        java.util.SplittableRandom random = new java.util.SplittableRandom(7);
        for (int m : new int[] {101, 10_000, 10_001}) {
            double[] values = new double[m];
            for (int i = 0; i < m; i++) {
                values[i] = Math.floor(random.nextDouble() * 50);
            }
            double[] sorted = values.clone();
            java.util.Arrays.sort(sorted);
            CoverageInterval bySort = MonteCarloPropagation.interval(sorted, 0.95,
                    CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC);
            CoverageInterval bySelection = MonteCarloPropagation.symmetricBySelection(values, 0.95);
            assertEquals(bySort, bySelection);
        }
    }

    @Test
    void oneSignificantDigitStopsAfterFewBatches() {
        List<InputDistribution> inputs = Collections.nCopies(4, new InputDistribution.Normal(0, 1));
        MonteCarloResult r = MonteCarloPropagation.standard().propagateAdaptive(inputs, SUM, 0.95,
                CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC, 1);
        // JCGM 101:2008, 7.9.4: at least two batches of 10⁴; δ = 0.5 is reached at once
        assertEquals(20_000, r.trials());
    }
}
