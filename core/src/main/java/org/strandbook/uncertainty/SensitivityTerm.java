package org.strandbook.uncertainty;

import java.util.Objects;

/**
 * One input of a model linear in its inputs, with its sensitivity coefficient cᵢ = ∂f/∂xᵢ
 * (JCGM 100:2008, 5.1.3).
 *
 * @param input the input and its distribution
 * @param sensitivity cᵢ, output units per input unit
 */
public record SensitivityTerm(UncertainInput input, double sensitivity) {

    public SensitivityTerm {
        Objects.requireNonNull(input, "input");
        if (!Double.isFinite(sensitivity)) {
            throw new IllegalArgumentException(input.name() + ": sensitivity must be finite, was " + sensitivity);
        }
    }

    /** uᵢ(y) = |cᵢ|·u(xᵢ), the input's contribution to the output's standard uncertainty. */
    public double contribution() {
        return Math.abs(sensitivity) * input.standardUncertainty();
    }
}
