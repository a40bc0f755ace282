package org.strandbook.app.ui.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.strandbook.app.ui.MemoryPreferences;
import org.strandbook.evaluation.BandTrend;
import org.strandbook.site.WavelengthBand;
import org.strandbook.trend.LossReading;
import org.strandbook.trend.LossTrend;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.TheilSenTrend;

class TrendPlotModelTest {

    private static final WavelengthBand BAND = new WavelengthBand("C-H 1st overtone", 1650, 1780);
    private static final Instant T0 = Instant.parse("2025-01-01T00:00:00Z");

    private static BandTrend growing() {
        // invented readings: 1 dB/year exactly, one a quarter
        List<LossReading> readings = List.of(new LossReading(T0, 10), new LossReading(T0.plusSeconds(7_889_400), 10.25),
                new LossReading(T0.plusSeconds(15_778_800), 10.5), new LossReading(T0.plusSeconds(23_668_200), 10.75));
        LossTrend trend = TheilSenTrend.withDefaults().fit(readings);
        MarginForecast.Outlook outlook = MarginForecast.withDefaults().forecast(2.0, readings.get(3).time(), trend, ZoneOffset.UTC);
        return new BandTrend(BAND, readings, List.of(), Optional.of(trend), List.of(), Optional.of(outlook));
    }

    @Test
    void forecastLineRunsOnFromTheLastScanAlongTheTrend() {
        TrendPlotModel model = new TrendPlotModel(new PlotAxes(new MemoryPreferences()));

        model.show("test", List.of(growing()), 12.75);

        List<TrendPlotModel.TrendLine> lines = model.linesProperty().get();
        TrendPlotModel.TrendLine forecast = lines.get(2);
        TrendPlotModel.TimePoint last = forecast.points().get(forecast.points().size() - 1);
        // Theil–Sen through exactly collinear readings is that line: 1 dB/year; 2 dB of margin is
        // used up two years after the last scan (MarginForecast: margin / slope)
        assertEquals(10.75 + 2 * 1.1, last.y(), 0.01);
        assertTrue(lines.get(0).label().contains("+1.00 dB/yr, margin used up \u2248 2027-10"), lines.get(0).label());
        assertTrue(lines.stream().anyMatch(l -> l.label().equals("allowed loss 12.8 dB")));
    }

    @Test
    void forecastIntervalLinesReachTheAllowedLossAtTheEarliestAndLatestDates() {
        // MarginForecast: the earliest run-out date is where the slope's upper confidence limit uses up the
        // margin, the latest where the lower one does; the plotted interval lines must cross the allowed
        // loss there. Invented readings with scatter, a quarter apart.
        double[] loss = {10.0, 10.35, 10.45, 10.8, 10.95, 11.35, 11.45, 11.8};
        List<LossReading> readings = new java.util.ArrayList<>();
        for (int i = 0; i < loss.length; i++) {
            readings.add(new LossReading(T0.plusSeconds(7_889_400L * i), loss[i]));
        }
        LossTrend trend = TheilSenTrend.withDefaults().fit(readings);
        assertTrue(trend.slopeIsBounded() && trend.lowerSlopeDbPerYear() > 0, trend.toString());
        Instant last = readings.get(loss.length - 1).time();
        double allowedDb = trend.lossDbAt(last) + 1.5;
        MarginForecast.Outlook outlook = MarginForecast.withDefaults().forecast(1.5, last, trend, ZoneOffset.UTC);
        TrendPlotModel model = new TrendPlotModel(new PlotAxes(new MemoryPreferences()));
        model.show("test", List.of(new BandTrend(BAND, readings, List.of(), Optional.of(trend), List.of(),
                Optional.of(outlook))), allowedDb);
        List<TrendPlotModel.TrendLine> thin = model.linesProperty().get().stream()
                .filter(l -> l.label().isEmpty() && l.style().widthPx() == 1 && l.style().dashed()).toList();
        assertEquals(2, thin.size());
        double earliest = outlook.earliestDate().orElseThrow().toEpochDay();
        double latest = outlook.latestDate().orElseThrow().toEpochDay();
        // a month either way: the lines are drawn in 40 steps and the dates are calendar days. The plot ends
        // near the expected date, so the lower line may not reach the allowed loss inside it at all.
        assertEquals(earliest, crossing(thin.get(1), allowedDb), 31);
        double lower = crossing(thin.get(0), allowedDb);
        assertTrue(Double.isNaN(lower) || Math.abs(lower - latest) <= 31, lower + " against " + latest);
        assertTrue(earliest < latest);
        assertTrue(model.linesProperty().get().stream().anyMatch(l -> l.label().startsWith("forecast interval")));
    }

    /** The day a rising line first reaches {@code levelDb}, linearly between its points. */
    private static double crossing(TrendPlotModel.TrendLine line, double levelDb) {
        List<TrendPlotModel.TimePoint> p = line.points();
        for (int i = 1; i < p.size(); i++) {
            if (p.get(i).y() >= levelDb) {
                double f = (levelDb - p.get(i - 1).y()) / (p.get(i).y() - p.get(i - 1).y());
                return p.get(i - 1).epochDay() + f * (p.get(i).epochDay() - p.get(i - 1).epochDay());
            }
        }
        return Double.NaN;
    }

    @Test
    void aRecordedCleaningIsAVerticalLineAtItsDateAndOneLegendEntry() {
        TrendPlotModel model = new TrendPlotModel(new PlotAxes(new MemoryPreferences()));
        Instant cleaned = T0.plusSeconds(10_000_000);
        model.show("test", List.of(growing()), 12.75);
        model.marks(List.of(new TrendPlotModel.Mark(cleaned, "action J2: clean joint"),
                new TrendPlotModel.Mark(T0.minusSeconds(86_400 * 400L), "before the plotted time")));

        List<TrendPlotModel.TrendLine> marks = model.linesProperty().get().stream()
                .filter(l -> l.detail().startsWith("action")).toList();
        // design choice: one line per event inside the plotted time, spanning the plotted values
        assertEquals(1, marks.size());
        assertEquals(TrendPlotModel.epochDay(cleaned), marks.get(0).points().get(0).epochDay(), 1e-9);
        assertEquals(marks.get(0).points().get(0).epochDay(), marks.get(0).points().get(1).epochDay());
        assertTrue(model.linesProperty().get().stream().anyMatch(l -> l.label().equals("maintenance and inspections (1)")));
    }

    @Test
    void aTrendRestartedAfterARepairIsDrawnFromTheFirstReadingAfterIt() {
        // invented readings: 12 dB before a cleaning, then 10 dB growing 1 dB/year; the trend is
        // fitted to the readings after the cleaning only (Sen 1968 on that subset), so its line must
        // not reach back over the dirty regime
        List<LossReading> before = List.of(new LossReading(T0.minusSeconds(15_778_800), 12),
                new LossReading(T0.minusSeconds(7_889_400), 12.1));
        List<LossReading> after = List.of(new LossReading(T0, 10), new LossReading(T0.plusSeconds(7_889_400), 10.25),
                new LossReading(T0.plusSeconds(15_778_800), 10.5));
        LossTrend sinceRepair = TheilSenTrend.withDefaults().fit(after);
        List<LossReading> all = new ArrayList<>(before);
        all.addAll(after);
        BandTrend t = new BandTrend(BAND, all, List.of(), Optional.of(sinceRepair), List.of(), Optional.empty());
        TrendPlotModel model = new TrendPlotModel(new PlotAxes(new MemoryPreferences()));

        model.show("test", List.of(t), 12.75);

        TrendPlotModel.TrendLine line = model.linesProperty().get().get(1);
        assertEquals(TrendPlotModel.epochDay(T0), line.points().get(0).epochDay(), 1e-6);
        assertEquals(10, line.points().get(0).y(), 1e-9);
    }

    @Test
    void aFlatHistoryShowsNoSignedZeroSlope() {
        // invented readings falling by 0.0004 dB a quarter: the slope rounds to zero, and a legend
        // reading "-0.00 dB/yr" would suggest a change (ISO 80000-1 writes zero unsigned)
        List<LossReading> readings = List.of(new LossReading(T0, 10), new LossReading(T0.plusSeconds(7_889_400), 9.9996),
                new LossReading(T0.plusSeconds(15_778_800), 9.9992), new LossReading(T0.plusSeconds(23_668_200), 9.9988));
        LossTrend trend = TheilSenTrend.withDefaults().fit(readings);
        BandTrend flat = new BandTrend(BAND, readings, List.of(), Optional.of(trend), List.of(), Optional.empty());
        TrendPlotModel model = new TrendPlotModel(new PlotAxes(new MemoryPreferences()));

        model.show("test", List.of(flat), 12.75);

        String label = model.linesProperty().get().get(0).label();
        assertTrue(label.contains(": +0.00 dB/yr"), label);
    }

    @Test
    void bandRangeFollowsTheChosenSpectralUnit() {
        PlotAxes axes = new PlotAxes(new MemoryPreferences());
        TrendPlotModel model = new TrendPlotModel(axes);
        model.show("test", List.of(growing()), 12.75);

        axes.axisProperty().set(SpectralAxis.WAVENUMBER_CM);

        // 10⁷ / 1780 nm = 5618 cm⁻¹ and 10⁷ / 1650 nm = 6061 cm⁻¹ (ISO 80000-7, wavenumber = 1/λ)
        assertTrue(model.linesProperty().get().get(0).label().startsWith("C-H 1st overtone 5618\u20136061 cm\u207B\u00B9"),
                model.linesProperty().get().get(0).label());
    }

    @Test
    void monthTicksLabelTheNearestMonth() {
        double jan2025 = TrendPlotModel.epochDay(T0);

        assertEquals("2025-01", TrendPlotModel.monthOf(jan2025));
        assertEquals("2025-04", TrendPlotModel.monthOf(jan2025 + 365.25 / 4));
    }
}
