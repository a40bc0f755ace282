package org.strandbook.trend;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.Objects;
import java.util.Optional;

/**
 * When will the loss margin of a light path be used up if the trend goes on?
 *
 * <p>With margin M (allowed loss minus current loss, dB) and trend slope b (dB/year) the margin
 * reaches zero after M/b years. The slope's confidence limits turn into a date range: the upper
 * limit gives the earliest date, the lower limit the latest; a lower limit ≤ 0 means the data are
 * consistent with no further growth, so there is no latest date. Dates beyond the horizon are not
 * given: a straight line extrapolated for decades says more about the line than about the fiber.
 * This is an extrapolation for planning maintenance, not a guarantee.
 */
public final class MarginForecast {

    /**
     * Horizon unless stated otherwise, in years: the design life commonly planned for a process
     * analyzer installation (common practice).
     */
    public static final double DEFAULT_HORIZON_YEARS = 30;

    /** What the forecast can say. */
    public enum Status {
        /** The margin is already zero or negative. */
        ALREADY_EXHAUSTED,
        /** The trend line reaches zero margin within the horizon. */
        PROJECTED,
        /** The loss is growing, but zero margin lies beyond the horizon. */
        BEYOND_HORIZON,
        /** The trend slope is zero or negative: the margin is not being used up. */
        NOT_SHRINKING
    }

    /**
     * The forecast.
     *
     * @param status       what the forecast can say
     * @param marginDb     the margin it started from, dB
     * @param yearsToZero  years from {@code asOf} to zero margin on the trend line; {@code NaN}
     *                     unless {@link Status#PROJECTED} or {@link Status#ALREADY_EXHAUSTED} (0)
     * @param expectedDate date of zero margin on the trend line
     * @param earliestDate date of zero margin at the upper slope limit, if that limit is bounded and
     *                     the date lies within the horizon
     * @param latestDate   date of zero margin at the lower slope limit, if it is positive and the
     *                     date lies within the horizon
     */
    public record Outlook(Status status, double marginDb, double yearsToZero, Optional<LocalDate> expectedDate,
                          Optional<LocalDate> earliestDate, Optional<LocalDate> latestDate) {

        public Outlook {
            Objects.requireNonNull(status, "status");
            Objects.requireNonNull(expectedDate, "expectedDate");
            Objects.requireNonNull(earliestDate, "earliestDate");
            Objects.requireNonNull(latestDate, "latestDate");
        }
    }

    private final double horizonYears;

    private MarginForecast(double horizonYears) {
        this.horizonYears = horizonYears;
    }

    /** How far ahead a run-out date is still given, years. */
    public double horizonYears() {
        return horizonYears;
    }

    /** Horizon {@link #DEFAULT_HORIZON_YEARS}. */
    public static MarginForecast withDefaults() {
        return new MarginForecast(DEFAULT_HORIZON_YEARS);
    }

    /** The same forecast looking at most {@code years} ahead (&gt; 0). */
    public MarginForecast withHorizonYears(double years) {
        if (!(years > 0) || !Double.isFinite(years)) {
            throw new IllegalArgumentException("forecast horizon " + years + " years must be a positive number");
        }
        return new MarginForecast(years);
    }

    /**
     * Forecast from margin {@code marginDb} at time {@code asOf} along {@code trend}; dates are the
     * calendar dates in {@code zone} (the plant's time zone, passed explicitly).
     */
    public Outlook forecast(double marginDb, Instant asOf, LossTrend trend, ZoneId zone) {
        if (!Double.isFinite(marginDb)) {
            throw new IllegalArgumentException("margin " + marginDb + " dB is not a finite number");
        }
        Objects.requireNonNull(asOf, "asOf");
        Objects.requireNonNull(zone, "zone");
        if (marginDb <= 0) {
            Optional<LocalDate> today = Optional.of(LocalDate.ofInstant(asOf, zone));
            return new Outlook(Status.ALREADY_EXHAUSTED, marginDb, 0, today, today, today);
        }
        Optional<LocalDate> earliest = dateAtSlope(marginDb, trend.upperSlopeDbPerYear(), asOf, zone);
        Optional<LocalDate> latest = dateAtSlope(marginDb, trend.lowerSlopeDbPerYear(), asOf, zone);
        double slope = trend.slopeDbPerYear();
        if (slope <= 0) {
            return new Outlook(Status.NOT_SHRINKING, marginDb, Double.NaN, Optional.empty(), earliest, latest);
        }
        double years = marginDb / slope;
        if (years > horizonYears) {
            return new Outlook(Status.BEYOND_HORIZON, marginDb, Double.NaN, Optional.empty(), earliest, latest);
        }
        Optional<LocalDate> expected = Optional.of(LocalDate.ofInstant(YearScale.plusYears(asOf, years), zone));
        return new Outlook(Status.PROJECTED, marginDb, years, expected, earliest, latest);
    }

    private Optional<LocalDate> dateAtSlope(double marginDb, double slopeDbPerYear, Instant asOf, ZoneId zone) {
        // an unbounded limit (too few readings, as just after a repair) gives no date: "at the last
        // scan" would read as a date already past
        if (!(slopeDbPerYear > 0) || Double.isInfinite(slopeDbPerYear)) {
            return Optional.empty();
        }
        double years = marginDb / slopeDbPerYear;
        if (years > horizonYears) {
            return Optional.empty();
        }
        return Optional.of(LocalDate.ofInstant(YearScale.plusYears(asOf, years), zone));
    }
}
