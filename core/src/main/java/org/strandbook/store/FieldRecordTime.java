package org.strandbook.store;

import java.time.Duration;
import java.time.Instant;

/** The time of a record made in the field: an inspection, an action, a note, a signature. */
final class FieldRecordTime {

    /**
     * How far ahead of this computer's clock a record may be dated: a field tablet's clock runs a
     * little off (design choice). Anything later is a typing error, such as a wrong year.
     */
    static final Duration CLOCK_SKEW = Duration.ofMinutes(10);

    private FieldRecordTime() {
    }

    /** Refuses a missing time or one in the future. */
    static Instant require(Instant at, String what) {
        if (at == null) {
            throw new IllegalArgumentException(what + ": time missing");
        }
        Instant now = StoredTime.now();
        if (at.isAfter(now.plus(CLOCK_SKEW))) {
            throw new IllegalArgumentException(what + ": dated " + at + ", which is in the future (now " + now
                    + "); check the date");
        }
        return at;
    }
}
