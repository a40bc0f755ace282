package org.strandbook.optics;

/**
 * Loss in decibels and its transmittance: L = −10·log₁₀(T), T = 10^(−L/10).
 * Attenuation coefficients convert with 1 dB/km = 0.001 dB/m.
 */
public final class Decibel {

    private Decibel() {
    }

    public static double lossDbFromTransmittance(double transmittance) {
        return -10.0 * Math.log10(transmittance);
    }

    public static double transmittanceFromLossDb(double lossDb) {
        return Math.pow(10.0, -lossDb / 10.0);
    }

    public static double dbPerMFromDbPerKm(double dbPerKm) {
        return dbPerKm * 1.0e-3;
    }

    public static double dbPerKmFromDbPerM(double dbPerM) {
        return dbPerM * 1.0e3;
    }

    /** Element-wise transmittance of a loss spectrum. */
    public static double[] transmittanceFromLossDb(double[] lossDb) {
        double[] t = new double[lossDb.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = transmittanceFromLossDb(lossDb[i]);
        }
        return t;
    }
}
