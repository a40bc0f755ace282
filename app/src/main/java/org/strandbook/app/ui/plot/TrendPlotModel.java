package org.strandbook.app.ui.plot;

import java.time.Instant;
import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;


import org.strandbook.evaluation.BandTrend;
import org.strandbook.site.SignedDecimal;
import org.strandbook.site.WavelengthBand;
import org.strandbook.trend.LossReading;
import org.strandbook.trend.LossTrend;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.YearScale;

/**
 * What the loss-over-time plot shows: per band of interest, the highest loss of each loop scan in the
 * band's driving sub-band (the part whose margin runs out first),
 * the Theil–Sen trend line through them, its continuation to where the margin runs out (the
 * forecast), and the analyzer's allowed loss. Time runs across in days since 1970-01-01 (UTC); the
 * y axis follows the user's loss/transmittance choice and the band ranges follow the nm/cm⁻¹ one.
 */
public final class TrendPlotModel extends PlotModel<TrendPlotModel.TrendLine> {

    /** How far past the last scan the plot looks when the forecast gives no date, years. */
    static final double DEFAULT_LOOK_AHEAD_YEARS = 1;
    /** The furthest a forecast is drawn, years past the last scan: further says more about the line than the fiber. */
    static final double MAX_LOOK_AHEAD_YEARS = 10;
    private static final int TREND_POINTS = 40;
    /** Tick steps of 1, 3, 6, 12 and 24 average months (a Julian year is 365.25 days). */
    private static final double[] MONTH_STEPS_DAYS = {365.25 / 12, 365.25 / 4, 365.25 / 2, 365.25, 730.5};
    private static final DateTimeFormatter MONTH = DateTimeFormatter.ofPattern("uuuu-MM", Locale.ROOT);

    /** A point in time (days since 1970-01-01 UTC) and the chosen y unit. */
    public record TimePoint(double epochDay, double y) {
    }

    /**
     * One line or set of markers, with its legend text (empty for none) and the detail a legend
     * entry shows on hover. A line without points is a legend entry only.
     */
    public record TrendLine(String label, String detail, CurveStyle style, List<TimePoint> points) {

        public TrendLine {
            points = List.copyOf(points);
        }
    }

    /** A recorded event drawn across the plot at its date: a maintenance action or an inspection. */
    public record Mark(Instant at, String what) {
    }

    private List<BandTrend> trends = List.of();
    private List<Mark> marks = List.of();
    private double allowedLossDb = Double.NaN;

    public TrendPlotModel(PlotAxes axes) {
        super(axes);
    }

    public void show(String caption, List<BandTrend> bandTrends, double allowedDb) {
        if (caption.equals(title.get()) && bandTrends.equals(trends) && Double.compare(allowedDb, allowedLossDb) == 0) {
            // a re-evaluation after an edit of the path brings the same history: nothing to redraw
            return;
        }
        title.set(caption);
        trends = List.copyOf(bandTrends);
        allowedLossDb = allowedDb;
        boolean any = trends.stream().anyMatch(t -> !t.readings().isEmpty());
        placeholder.set(any ? "" : "No loop scan with light in a band yet: nothing to trend");
        recompute();
    }

    /** Shows the point's recorded actions and inspections as thin black lines across the plot at their dates. */
    public void marks(List<Mark> recorded) {
        if (recorded.equals(marks)) {
            return;
        }
        marks = List.copyOf(recorded);
        recompute();
    }

    public void clear(String caption, String message) {
        title.set(caption);
        placeholder.set(message);
        trends = List.of();
        recompute();
    }

    /** Days since 1970-01-01 UTC, fractional. */
    public static double epochDay(Instant t) {
        return t.getEpochSecond() / 86_400.0 + t.getNano() / 86_400e9;
    }

    /** A tick label for an epoch day: the nearest month, "2026-03" (ticks a whole number of average months apart drift by a day or two). */
    public static String monthOf(double epochDay) {
        return MONTH.format(LocalDate.ofEpochDay((long) Math.floor(epochDay + 15)));
    }

    @Override
    protected void recompute() {
        LossScale y = axes().scaleProperty().get();
        SpectralAxis x = axes().axisProperty().get();
        List<TrendLine> out = new ArrayList<>();
        Instant first = null;
        Instant end = null;
        boolean trended = false;
        double fanned = 0;
        for (int b = 0; b < trends.size(); b++) {
            BandTrend t = trends.get(b);
            if (t.readings().isEmpty()) {
                continue;
            }
            String colour = CurveStyle.series(b);
            List<LossReading> readings = t.readings();
            Instant from = readings.get(0).time();
            Instant last = readings.get(readings.size() - 1).time();
            Instant until = lookAhead(t, last);
            first = first == null || from.isBefore(first) ? from : first;
            end = end == null || until.isAfter(end) ? until : end;

            // one legend entry per band (its markers); the trend and forecast lines explain themselves once, below
            String band = bandText(t.band(), x) + drivingText(t, x);
            String summary = t.trend().map(tr -> ": " + SignedDecimal.of(tr.slopeDbPerYear(), 2) + " dB/yr, "
                    + forecastText(t)).orElse(": too few scans for a trend");
            out.add(new TrendLine(band + summary + (t.noLight().isEmpty() ? "" : " (" + t.noLight().size() + " scans without light)"),
                    t.trend().map(TrendPlotModel::trendText).orElse(""),
                    CurveStyle.markers(colour),
                    readings.stream().map(r -> new TimePoint(epochDay(r.time()), y.fromLossDb(r.lossDb()))).toList()));
            if (t.trend().isPresent()) {
                LossTrend trend = t.trend().get();
                trended = true;
                // after a repair the trend is fitted to the readings since it: draw it over those only
                Instant fitted = trend.referenceTime().isAfter(from) ? trend.referenceTime() : from;
                out.add(new TrendLine("", "", CurveStyle.line(colour, 2), along(trend, fitted, last, y)));
                out.add(new TrendLine("", "", CurveStyle.dashed(colour, 2), along(trend, last, until, y)));
                if (trend.slopeIsBounded()) {
                    // the forecast's interval: the slope's confidence limits from the trend's value at the last scan,
                    // the lines whose crossings of the allowed loss give the earliest and latest run-out dates
                    out.add(new TrendLine("", "", CurveStyle.dashed(colour, 1),
                            fan(trend, trend.lowerSlopeDbPerYear(), last, until, y)));
                    out.add(new TrendLine("", "", CurveStyle.dashed(colour, 1),
                            fan(trend, trend.upperSlopeDbPerYear(), last, until, y)));
                    fanned = Math.max(fanned, trend.confidenceLevel());
                }
            }
        }
        if (first != null && Double.isFinite(allowedLossDb)) {
            double a = y.fromLossDb(allowedLossDb);
            out.add(new TrendLine(y == LossScale.LOSS_DB
                    ? String.format(Locale.ROOT, "allowed loss %.1f dB", allowedLossDb)
                    : String.format(Locale.ROOT, "allowed: %.2g %% transmittance (%.1f dB)", a, allowedLossDb),
                    "", CurveStyle.dashed(CurveStyle.VERMILLION, 2.5),
                    List.of(new TimePoint(epochDay(first), a), new TimePoint(epochDay(end), a))));
        }
        if (first != null && !marks.isEmpty()) {
            addMarks(out, first, end);
        }
        if (trended) {
            out.add(new TrendLine("Theil\u2013Sen trend", "", CurveStyle.line(CurveStyle.GREY, 2), List.of()));
            out.add(new TrendLine("forecast", "", CurveStyle.dashed(CurveStyle.GREY, 2), List.of()));
        }
        if (fanned > 0) {
            out.add(new TrendLine(String.format(Locale.ROOT, "forecast interval (slope's %.0f %% confidence limits)",
                    100 * fanned), "", CurveStyle.dashed(CurveStyle.GREY, 1), List.of()));
        }
        lines.set(List.copyOf(out));
        ranges(out);
    }

    /** One vertical line per mark inside the time shown, spanning the plotted values; one legend entry for all. */
    private void addMarks(List<TrendLine> out, Instant first, Instant end) {
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (TrendLine line : out) {
            for (TimePoint p : line.points()) {
                low = Math.min(low, p.y());
                high = Math.max(high, p.y());
            }
        }
        int shown = 0;
        for (Mark m : marks) {
            if (m.at().isBefore(first) || m.at().isAfter(end) || !(low <= high)) {
                continue;
            }
            double d = epochDay(m.at());
            out.add(new TrendLine("", m.what(), CurveStyle.line(CurveStyle.BLACK, 1),
                    List.of(new TimePoint(d, low), new TimePoint(d, high))));
            shown++;
        }
        if (shown > 0) {
            out.add(new TrendLine("maintenance and inspections (" + shown + ")", "", CurveStyle.line(CurveStyle.BLACK, 1),
                    List.of()));
        }
    }

    private void ranges(List<TrendLine> shown) {
        double xLo = Double.POSITIVE_INFINITY;
        double xHi = Double.NEGATIVE_INFINITY;
        double yLo = Double.POSITIVE_INFINITY;
        double yHi = Double.NEGATIVE_INFINITY;
        for (TrendLine l : shown) {
            for (TimePoint p : l.points()) {
                xLo = Math.min(xLo, p.epochDay());
                xHi = Math.max(xHi, p.epochDay());
                yLo = Math.min(yLo, p.y());
                yHi = Math.max(yHi, p.y());
            }
        }
        if (xLo > xHi) {
            xRange.set(null);
            yRange.set(null);
            return;
        }
        double spanDays = Math.max(xHi - xLo, 30);
        double tick = MONTH_STEPS_DAYS[MONTH_STEPS_DAYS.length - 1];
        for (double step : MONTH_STEPS_DAYS) {
            if (spanDays / step <= 6) {
                tick = step;
                break;
            }
        }
        // start on the first of a month so the month labels fall where the ticks are
        double start = LocalDate.ofEpochDay((long) Math.floor(xLo)).withDayOfMonth(1).toEpochDay();
        xRange.set(new AxisRange(start, Math.max(xHi, start + tick), tick));
        yRange.set(AxisRange.rounded(yLo, yHi, 5));
    }

    private static Instant lookAhead(BandTrend t, Instant last) {
        double years = DEFAULT_LOOK_AHEAD_YEARS;
        if (t.outlook().isPresent() && t.outlook().get().status() == MarginForecast.Status.PROJECTED) {
            years = Math.max(years, Math.min(MAX_LOOK_AHEAD_YEARS, t.outlook().get().yearsToZero() * 1.1));
        }
        return YearScale.plusYears(last, years);
    }

    /** From the trend's value at {@code from}, on at {@code slopeDbPerYear} until {@code to}. */
    private static List<TimePoint> fan(LossTrend trend, double slopeDbPerYear, Instant from, Instant to, LossScale y) {
        double start = trend.lossDbAt(from);
        double span = YearScale.yearsBetween(from, to);
        List<TimePoint> points = new ArrayList<>(TREND_POINTS + 1);
        for (int i = 0; i <= TREND_POINTS; i++) {
            double years = span * i / TREND_POINTS;
            points.add(new TimePoint(epochDay(YearScale.plusYears(from, years)),
                    y.fromLossDb(start + slopeDbPerYear * years)));
        }
        return points;
    }

    private static List<TimePoint> along(LossTrend trend, Instant from, Instant to, LossScale y) {
        List<TimePoint> points = new ArrayList<>(TREND_POINTS + 1);
        double span = YearScale.yearsBetween(from, to);
        for (int i = 0; i <= TREND_POINTS; i++) {
            Instant t = YearScale.plusYears(from, span * i / TREND_POINTS);
            points.add(new TimePoint(epochDay(t), y.fromLossDb(trend.lossDbAt(t))));
        }
        return points;
    }

    static String bandText(WavelengthBand band, SpectralAxis x) {
        if (x == SpectralAxis.WAVELENGTH_NM) {
            return String.format(Locale.ROOT, "%s %.0f\u2013%.0f nm", band.name(), band.fromNm(), band.toNm());
        }
        return String.format(Locale.ROOT, "%s %.0f\u2013%.0f cm\u207B\u00B9", band.name(), x.fromNm(band.toNm()),
                x.fromNm(band.fromNm()));
    }

    /** The driving sub-band, when it is narrower than the band: the slope and date are its. */
    static String drivingText(BandTrend t, SpectralAxis x) {
        if (t.drivingFromNm() == t.band().fromNm() && t.drivingToNm() == t.band().toNm()) {
            return "";
        }
        String range = x == SpectralAxis.WAVELENGTH_NM
                ? String.format(Locale.ROOT, "%.0f\u2013%.0f nm", t.drivingFromNm(), t.drivingToNm())
                : String.format(Locale.ROOT, "%.0f\u2013%.0f cm\u207B\u00B9", x.fromNm(t.drivingToNm()),
                        x.fromNm(t.drivingFromNm()));
        return " (worst loss in " + range + ")";
    }

    private static String trendText(LossTrend trend) {
        String slope = "Theil\u2013Sen trend " + SignedDecimal.of(trend.slopeDbPerYear(), 2) + " dB/year";
        if (!trend.slopeIsBounded()) {
            return slope + " (too few scans to bound it)";
        }
        return slope + String.format(Locale.ROOT, ", %.0f %% confidence interval %s to %s dB/year",
                100 * trend.confidenceLevel(), SignedDecimal.of(trend.lowerSlopeDbPerYear(), 2),
                SignedDecimal.of(trend.upperSlopeDbPerYear(), 2));
    }

    private static String forecastText(BandTrend t) {
        if (t.outlook().isEmpty()) {
            return "no forecast";
        }
        MarginForecast.Outlook o = t.outlook().get();
        return switch (o.status()) {
            case ALREADY_EXHAUSTED -> "margin used up";
            case NOT_SHRINKING -> "margin holds";
            case BEYOND_HORIZON -> "margin lasts " + Math.round(MarginForecast.DEFAULT_HORIZON_YEARS) + "+ yr";
            case PROJECTED -> "margin used up \u2248 " + o.expectedDate().map(d -> MONTH.format(d)).orElse("?")
                    + o.earliestDate().map(d -> " (" + MONTH.format(d)
                    + o.latestDate().map(l -> "\u2026" + MONTH.format(l)).orElse("\u2026") + ")").orElse("");
        };
    }
}
