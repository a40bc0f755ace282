package org.strandbook.trend;

import java.time.Duration;
import java.time.Instant;

/**
 * The time axis of every trend: years of 365.25 days (the Julian year, 31 557 600 s), so that a
 * slope in dB/year does not depend on leap years or time zones.
 */
public final class YearScale {

    /** Seconds in a Julian year of 365.25 days. */
    public static final double SECONDS_PER_YEAR = 365.25 * 86_400;

    private YearScale() {
    }

    /** Years from {@code from} to {@code to}; negative when {@code to} is earlier. */
    public static double yearsBetween(Instant from, Instant to) {
        Duration d = Duration.between(from, to);
        return (d.getSeconds() + d.getNano() * 1e-9) / SECONDS_PER_YEAR;
    }

    /** {@code start} plus {@code years} Julian years, to the nearest millisecond. */
    public static Instant plusYears(Instant start, double years) {
        if (!Double.isFinite(years)) {
            throw new IllegalArgumentException("cannot add " + years + " years to a date");
        }
        return start.plusMillis(Math.round(years * SECONDS_PER_YEAR * 1000));
    }
}
