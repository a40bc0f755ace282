package org.strandbook.trend;

import java.time.Instant;
import java.util.Objects;

/**
 * A sudden change of loss between two consecutive scans, after slow ageing has been taken out.
 *
 * @param kind               a lasting step, or a single reading that jumps and comes back
 * @param before             time of the scan before the change (for an outlier: the scan before it)
 * @param after              time of the first scan after the change (for an outlier: the outlying scan)
 * @param stepDb             the change in dB, positive when loss went up
 * @param sizeInNoiseWidths  |stepDb| divided by the noise width of a scan-to-scan difference
 */
public record StepEvent(Kind kind, Instant before, Instant after, double stepDb, double sizeInNoiseWidths) {

    /** What the change looks like in the series. */
    public enum Kind {
        /** Loss moved and stayed: a new connector, a bend, a darkened window, a repair. */
        STEP,
        /** One reading away from its neighbours on both sides: usually a bad scan or reference. */
        OUTLIER
    }

    public StepEvent {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(before, "before");
        Objects.requireNonNull(after, "after");
    }
}
