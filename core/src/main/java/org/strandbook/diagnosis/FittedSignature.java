package org.strandbook.diagnosis;

/**
 * One fitted signature as a loss spectrum on the evaluation grid: coefficient × shape, dB. The
 * signed terms (flat, drift) may be negative.
 */
public record FittedSignature(Signature signature, double[] lossDb) {

    public FittedSignature {
        lossDb = lossDb.clone();
    }

    @Override
    public double[] lossDb() {
        return lossDb.clone();
    }
}
