package org.strandbook.uncertainty;

/**
 * A probability estimated by Monte Carlo: the share of M trials that met a condition.
 *
 * @param probability the share, 0–1
 * @param trials M
 */
public record Chance(double probability, int trials) {

    public Chance {
        if (!(probability >= 0 && probability <= 1)) {
            throw new IllegalArgumentException("a probability lies in [0, 1], was " + probability);
        }
        if (trials < 1) {
            throw new IllegalArgumentException("a chance needs at least one trial, was " + trials);
        }
    }

    /** √(P(1 − P)/M): how far another seed would typically move it (binomial counting). */
    public double standardError() {
        return Math.sqrt(probability * (1 - probability) / trials);
    }
}
