package org.strandbook.uncertainty;

import java.util.Objects;

/**
 * One input quantity of a measurement model with the distribution assigned to it and why.
 *
 * @param name what it is, e.g. "J3 connector pair loss"
 * @param unit unit of the quantity, e.g. "dB", "m", "ppm"
 * @param distribution what is known about it
 * @param basis where the distribution comes from
 * @param basisText the words a report shows beside it
 */
public record UncertainInput(String name, String unit, InputDistribution distribution, BasisKind basis,
        String basisText) {

    public UncertainInput {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(distribution, "distribution");
        Objects.requireNonNull(basis, "basis");
        Objects.requireNonNull(basisText, "basisText");
    }

    public double standardUncertainty() {
        return distribution.standardUncertainty();
    }
}
