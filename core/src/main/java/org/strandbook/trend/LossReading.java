package org.strandbook.trend;

import java.time.Instant;
import java.util.Objects;

/**
 * One loss value of a light path at one time, e.g. the band-averaged loss of a loop scan.
 *
 * @param time   when the scan was taken
 * @param lossDb loss in dB (finite; may be negative for a bad reference, which the trend keeps)
 */
public record LossReading(Instant time, double lossDb) {

    public LossReading {
        Objects.requireNonNull(time, "time");
        if (!Double.isFinite(lossDb)) {
            throw new IllegalArgumentException("loss at " + time + " is not a finite number of dB: " + lossDb);
        }
    }
}
