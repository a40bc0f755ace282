package org.strandbook.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

class LinearPropagationTest {

    private static UncertainInput input(String name, InputDistribution d) {
        return new UncertainInput(name, "dB", d, BasisKind.DESIGN_CHOICE, "test input");
    }

    @Test
    void additiveModelOfJcgm101Clause922ByTheLawOfPropagation() {
        // JCGM 101:2008, 9.2.2 (GUM uncertainty framework column): four N(0, 1) inputs, unit
        // sensitivities: u(y) = 2, 95 % interval ±3.92 with k = 1.96 (JCGM 100:2008, table G.1).
        List<SensitivityTerm> terms = List.of(
                new SensitivityTerm(input("X1", new InputDistribution.Normal(0, 1)), 1),
                new SensitivityTerm(input("X2", new InputDistribution.Normal(0, 1)), 1),
                new SensitivityTerm(input("X3", new InputDistribution.Normal(0, 1)), 1),
                new SensitivityTerm(input("X4", new InputDistribution.Normal(0, 1)), 1));
        UncertaintyBudget b = LinearPropagation.propagate(0, terms, 0.95);
        assertEquals(2.0, b.combinedStandardUncertainty(), 1e-12);
        assertEquals(-3.92, b.interval().low(), 0.005);
        assertEquals(3.92, b.interval().high(), 0.005);
    }

    @Test
    void dominantRectangularInputOfJcgm101Clause924GivesTheWideFrameworkInterval() {
        // JCGM 101:2008, 9.2.4 (framework column): u(y) = √(3·1² + 10²) = 10.15, interval ±1.96·10.15
        // = ±19.9, where the exact answer is ±17.0 (see MonteCarloPropagationTest).
        double a = Math.sqrt(3);
        List<SensitivityTerm> terms = List.of(
                new SensitivityTerm(input("X1", InputDistribution.Rectangular.around(0, a)), 1),
                new SensitivityTerm(input("X2", InputDistribution.Rectangular.around(0, a)), 1),
                new SensitivityTerm(input("X3", InputDistribution.Rectangular.around(0, a)), 1),
                new SensitivityTerm(input("X4", InputDistribution.Rectangular.around(0, 10 * a)), 1));
        UncertaintyBudget b = LinearPropagation.propagate(0, terms, 0.95);
        assertEquals(10.15, b.combinedStandardUncertainty(), 0.005);
        assertEquals(19.9, b.interval().high(), 0.05);
        assertEquals(100.0 / 103.0, b.rowsByContribution().get(0).share(), 1e-12);
        assertEquals("X4", b.rowsByContribution().get(0).input());
    }

    @Test
    void sensitivityScalesTheContributionAndOffsetAndExpectationsGiveTheEstimate() {
        // JCGM 100:2008, 5.1.3: uᵢ(y) = |cᵢ|·u(xᵢ); 4.1.4: y = f(expectations).
        List<SensitivityTerm> terms = List.of(
                new SensitivityTerm(input("length", new InputDistribution.Normal(100, 2)), 0.01),
                new SensitivityTerm(input("joint", new InputDistribution.Rectangular(0.5, 1.5)), 1));
        UncertaintyBudget b = LinearPropagation.propagate(0.3, terms, 0.95);
        assertEquals(0.3 + 1.0 + 1.0, b.estimate(), 1e-12);
        assertEquals(0.02, b.rows().get(0).contribution(), 1e-12);
        assertEquals(1 / Math.sqrt(12), b.rows().get(1).contribution(), 1e-12);
    }

    @Test
    void coverageFactorFor95PercentIsTheNormalOne() {
        // JCGM 100:2008, table G.1: p = 95 % → k = 1.960; p = 99 % → k = 2.576.
        assertEquals(1.960, LinearPropagation.coverageFactor(0.95), 0.0005);
        assertEquals(2.576, LinearPropagation.coverageFactor(0.99), 0.0005);
    }
}
