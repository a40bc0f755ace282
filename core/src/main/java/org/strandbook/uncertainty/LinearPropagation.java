package org.strandbook.uncertainty;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * The law of propagation of uncertainty for a model linear in uncorrelated inputs,
 * Y = c₀ + Σ cᵢ·Xᵢ (JCGM 100:2008, 5.1.2, equation (10)): u_c²(y) = Σ cᵢ²·u²(xᵢ). For a linear
 * model this is exact for the standard uncertainty whatever the input distributions; only the
 * interval y ± k·u_c assumes the output is near normal (JCGM 100:2008, G.6.6), which
 * {@link MonteCarloPropagation} checks when a rectangular input dominates.
 */
public final class LinearPropagation {

    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1,
            NormalDistribution.DEFAULT_INVERSE_ABSOLUTE_ACCURACY);

    private LinearPropagation() {
    }

    /**
     * @param offset c₀, the part of the model with no uncertainty attached
     * @param terms the inputs and their sensitivities
     * @param coverageProbability p of the interval y ± k·u_c, k = Φ⁻¹((1 + p)/2)
     */
    public static UncertaintyBudget propagate(double offset, List<SensitivityTerm> terms, double coverageProbability) {
        Objects.requireNonNull(terms, "terms");
        double y = offset;
        double variance = 0;
        for (SensitivityTerm t : terms) {
            y += t.sensitivity() * t.input().distribution().expectation();
            double ui = t.contribution();
            variance += ui * ui;
        }
        double uc = Math.sqrt(variance);
        List<BudgetRow> rows = new ArrayList<>(terms.size());
        for (SensitivityTerm t : terms) {
            UncertainInput in = t.input();
            double ui = t.contribution();
            rows.add(new BudgetRow(in.name(), in.unit(), in.distribution().describe(), in.basis(), in.basisText(),
                    in.standardUncertainty(), t.sensitivity(), ui, variance > 0 ? ui * ui / variance : 0));
        }
        double k = coverageFactor(coverageProbability);
        return new UncertaintyBudget(y, uc, rows, new CoverageInterval(y - k * uc, y + k * uc, coverageProbability,
                CoverageInterval.Method.NORMAL_COVERAGE_FACTOR));
    }

    /** k with Φ(k) − Φ(−k) = p: 1.960 for 95 % (JCGM 100:2008, G.1.3, table G.1). */
    public static double coverageFactor(double coverageProbability) {
        if (!(coverageProbability > 0 && coverageProbability < 1)) {
            throw new IllegalArgumentException("coverage probability must lie in (0, 1), was " + coverageProbability);
        }
        return STANDARD_NORMAL.inverseCumulativeProbability(0.5 * (1 + coverageProbability));
    }
}
