package org.strandbook.optics.bend;

/** Loss of one bend (dB) at every point of a grid, with the number of clamped points. */
public final class BendLossSpectrum {

    private final double[] lossDb;
    private final int clampedPoints;

    BendLossSpectrum(double[] lossDb, int clampedPoints) {
        this.lossDb = lossDb;
        this.clampedPoints = clampedPoints;
    }

    /** Loss per bend (dB), one value per grid point (a copy). */
    public double[] lossDb() {
        return lossDb.clone();
    }

    public double lossDbAt(int index) {
        return lossDb[index];
    }

    /** Grid points where Gloge's ratio left its range and was clamped. */
    public int clampedPoints() {
        return clampedPoints;
    }

    public boolean anyClamped() {
        return clampedPoints > 0;
    }
}
