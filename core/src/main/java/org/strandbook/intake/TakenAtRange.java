package org.strandbook.intake;

import java.time.Duration;
import java.time.Instant;
import java.util.Optional;

/**
 * The times a scan can have been taken: not before 1980 (no fiber-coupled process analyzer wrote
 * spectrum files earlier; a year 0000 or 1970-01-01 is a clock that was never set) and not more than
 * a day after now (a day covers clocks set to another time zone) [design choice].
 */
public final class TakenAtRange {

    /** The earliest time accepted: 1980-01-01T00:00:00Z. */
    public static final Instant EARLIEST = Instant.parse("1980-01-01T00:00:00Z");

    /** How far past now a time may lie. */
    public static final Duration FUTURE_ALLOWANCE = Duration.ofDays(1);

    private TakenAtRange() {
    }

    /** Why {@code takenAt} cannot be when a scan was taken, judged at {@code now}; empty when it can. */
    public static Optional<String> problem(Instant takenAt, Instant now) {
        if (takenAt.isBefore(EARLIEST)) {
            return Optional.of("time taken " + takenAt + " is before 1980: the analyzer's clock was not set, "
                    + "or the date is damaged; give the time with --taken-at");
        }
        if (takenAt.isAfter(now.plus(FUTURE_ALLOWANCE))) {
            return Optional.of("time taken " + takenAt + " is more than a day in the future (now " + now
                    + "): the analyzer's clock is wrong, or the date is damaged; give the time with --taken-at");
        }
        return Optional.empty();
    }
}
