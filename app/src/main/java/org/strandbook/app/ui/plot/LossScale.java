package org.strandbook.app.ui.plot;

import org.strandbook.optics.Decibel;

/** The y axis of a loss plot: loss in dB, or transmittance in % (T = 10^(−L/10)). */
public enum LossScale {
    LOSS_DB("Loss (dB)"),
    TRANSMITTANCE_PERCENT("Transmittance (%)");

    private final String label;

    LossScale(String label) {
        this.label = label;
    }

    /** The axis label, unit included. */
    public String label() {
        return label;
    }

    public double fromLossDb(double lossDb) {
        return this == LOSS_DB ? lossDb : 100.0 * Decibel.transmittanceFromLossDb(lossDb);
    }
}
