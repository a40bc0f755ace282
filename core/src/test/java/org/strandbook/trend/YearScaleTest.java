package org.strandbook.trend;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.Instant;

import org.junit.jupiter.api.Test;

class YearScaleTest {

    // The Julian year is defined as exactly 365.25 days of 86 400 s (IAU, used for astronomical
    // time scales); a leap-year boundary must not change it.
    @Test
    void oneJulianYearIs365AndAQuarterDays() {
        Instant start = Instant.parse("2024-01-01T00:00:00Z");

        assertEquals(1.0, YearScale.yearsBetween(start, start.plusSeconds(31_557_600L)), 0);
        assertEquals(-2.0, YearScale.yearsBetween(start.plusSeconds(2 * 31_557_600L), start), 0);
    }

    @Test
    void addingYearsInvertsYearsBetween() {
        Instant start = Instant.parse("2019-07-15T08:30:00Z");

        Instant later = YearScale.plusYears(start, 3.7);

        assertEquals(3.7, YearScale.yearsBetween(start, later), 1e-10);
    }
}
