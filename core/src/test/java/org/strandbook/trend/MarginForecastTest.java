package org.strandbook.trend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.Optional;

import org.junit.jupiter.api.Test;

class MarginForecastTest {

    private static final Instant AS_OF = Instant.parse("2024-01-01T00:00:00Z");

    private static LossTrend trend(double slope, double lower, double upper) {
        return new LossTrend(slope, 2.0, Instant.parse("2020-01-01T00:00:00Z"), lower, upper, 0.95, 16, 120, 40, 493.3);
    }

    // Linear extrapolation: margin M shrinking at b dB/year is used up after M/b years; 3 dB at
    // 0.5 dB/year is 6 Julian years = 2191.5 days after 2024-01-01 00:00 UTC, i.e. 2029-12-31 12:00.
    @Test
    void projectsDateWhenMarginIsUsedUp() {
        MarginForecast.Outlook o = MarginForecast.withDefaults()
                .forecast(3.0, AS_OF, trend(0.5, 0.25, 1.0), ZoneOffset.UTC);

        assertEquals(MarginForecast.Status.PROJECTED, o.status());
        assertEquals(6.0, o.yearsToZero(), 1e-12);
        assertEquals(Optional.of(LocalDate.of(2029, 12, 31)), o.expectedDate());
        assertEquals(Optional.of(LocalDate.of(2026, 12, 31)), o.earliestDate(), "3 dB at 1.0 dB/year: 1095.75 days");
        assertEquals(Optional.of(LocalDate.of(2036, 1, 1)), o.latestDate(), "3 dB at 0.25 dB/year: 4383 days");
    }

    @Test
    void earliestDateWithinHorizonIsGivenEvenWhenLossIsFalling() {
        MarginForecast.Outlook o = MarginForecast.withDefaults()
                .forecast(3.0, AS_OF, trend(-0.05, -0.2, 0.5), ZoneOffset.UTC);

        assertEquals(MarginForecast.Status.NOT_SHRINKING, o.status());
        assertEquals(Optional.of(LocalDate.of(2029, 12, 31)), o.earliestDate(), "3 dB at 0.5 dB/year: 6 years");
    }

    @Test
    void noLatestDateWhenDataAllowNoGrowth() {
        MarginForecast.Outlook o = MarginForecast.withDefaults()
                .forecast(3.0, AS_OF, trend(0.5, -0.1, 1.0), ZoneOffset.UTC);

        assertEquals(MarginForecast.Status.PROJECTED, o.status());
        assertTrue(o.latestDate().isEmpty());
    }

    @Test
    void shrinkingLossGivesNoDate() {
        MarginForecast.Outlook o = MarginForecast.withDefaults()
                .forecast(3.0, AS_OF, trend(-0.05, -0.2, 0.08), ZoneOffset.UTC);

        assertEquals(MarginForecast.Status.NOT_SHRINKING, o.status());
        assertTrue(o.expectedDate().isEmpty());
        assertTrue(o.latestDate().isEmpty());
        // the default 30-year horizon is a design choice
        assertTrue(o.earliestDate().isEmpty(), "3 dB at 0.08 dB/year is 37.5 years, beyond 30");
    }

    @Test
    void dateBeyondHorizonIsNotGiven() {
        MarginForecast.Outlook o = MarginForecast.withDefaults().withHorizonYears(10)
                .forecast(3.0, AS_OF, trend(0.2, 0.1, 0.5), ZoneOffset.UTC);

        assertEquals(MarginForecast.Status.BEYOND_HORIZON, o.status());
        assertTrue(o.expectedDate().isEmpty());
        assertEquals(Optional.of(LocalDate.of(2029, 12, 31)), o.earliestDate());
        assertTrue(o.latestDate().isEmpty());
    }

    @Test
    void exhaustedMarginIsReportedAsToday() {
        MarginForecast.Outlook o = MarginForecast.withDefaults()
                .forecast(-0.4, AS_OF, trend(0.5, 0.25, 1.0), ZoneOffset.UTC);

        assertEquals(MarginForecast.Status.ALREADY_EXHAUSTED, o.status());
        assertEquals(Optional.of(LocalDate.of(2024, 1, 1)), o.expectedDate());
    }

    @Test
    void unboundedUpperSlopeGivesNoEarliestDate() {
        // Sen (1968), J. Am. Stat. Assoc. 63, 1379: with too few readings the order statistics do not
        // bound the slope, so no earliest date follows from it (the as-of date would read as a date past)
        MarginForecast.Outlook o = MarginForecast.withDefaults()
                .forecast(3.0, AS_OF, trend(0.5, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY), ZoneOffset.UTC);

        assertEquals(MarginForecast.Status.PROJECTED, o.status());
        assertTrue(o.earliestDate().isEmpty());
        assertTrue(o.latestDate().isEmpty());
    }

    @Test
    void calendarDateFollowsThePlantTimeZone() {
        MarginForecast.Outlook utc = MarginForecast.withDefaults()
                .forecast(3.0, AS_OF, trend(0.5, 0.25, 1.0), ZoneOffset.UTC);
        MarginForecast.Outlook auckland = MarginForecast.withDefaults()
                .forecast(3.0, AS_OF, trend(0.5, 0.25, 1.0), ZoneId.of("Pacific/Auckland"));

        assertEquals(Optional.of(LocalDate.of(2029, 12, 31)), utc.expectedDate());
        assertEquals(Optional.of(LocalDate.of(2030, 1, 1)), auckland.expectedDate());
    }
}
