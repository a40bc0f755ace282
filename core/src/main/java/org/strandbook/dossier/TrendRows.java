package org.strandbook.dossier;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.usermodel.XSSFDrawing;
import org.strandbook.evaluation.BandTrend;
import org.strandbook.trend.LossReading;
import org.strandbook.trend.LossTrend;
import org.strandbook.trend.MarginForecast;

/**
 * The Trend sheet, one block per point: a caption, one row per band (readings, slope with its
 * confidence limits, steps, margin now and when it runs out, all of the highest loss in the band's
 * driving sub-band), and a chart of that loss history with the Theil–Sen lines, plotting the point's rows of the Trend history sheet. Each
 * point with a chart ends its printed page.
 */
final class TrendRows {

    private TrendRows() {
    }

    static int fill(TableSheet t, DossierContent content, List<HistoryRows.Block> blocks, ChartCaches caches) {
        t.sheet().createDrawingPatriarch();
        XSSFDrawing drawing = t.sheet().getDrawingPatriarch();
        Map<String, List<HistoryRows.Block>> byPoint = blocks.stream()
                .collect(Collectors.groupingBy(b -> b.point().tag()));
        int charts = 0;
        for (DossierPoint p : content.points()) {
            Row caption = t.newRowStyled();
            t.text(caption, DossierColumn.TREND_TAG, p.tag(), DossierStyles.Look.EMPHASIS);
            t.text(caption, DossierColumn.TREND_BAND, p.status().label() + " · " + p.point().service(),
                    DossierStyles.Look.EMPHASIS);
            List<BandTrend> trends = p.evaluation().map(e -> e.trends()).orElse(List.of());
            if (trends.isEmpty()) {
                Row r = t.newRowStyled();
                t.text(r, DossierColumn.TREND_TAG, p.tag());
                t.text(r, DossierColumn.TREND_OUTLOOK, "no paired loop scans: no history yet");
                t.skipRows(1);
                continue;
            }
            for (BandTrend trend : trends) {
                band(t, p, trend);
            }
            List<HistoryRows.Block> own = byPoint.getOrDefault(p.tag(), List.of());
            if (own.isEmpty()) {
                t.skipRows(1);
                continue;
            }
            List<DossierCharts.BandSeries> series = new ArrayList<>();
            for (HistoryRows.Block b : own) {
                String time = b.timeRange();
                String loss = b.lossRange();
                String line = b.trendRange();
                BandTrend trend = b.trend();
                caches.register(time, () -> TrendColumns.of(trend).excelTime());
                caches.register(loss, () -> TrendColumns.of(trend).lossDb());
                caches.register(line, () -> TrendColumns.of(trend).trendDb());
                series.add(new DossierCharts.BandSeries(trend.band().name(), time, loss, line));
            }
            double lowest = trends.stream().flatMap(b -> b.readings().stream()).mapToDouble(LossReading::lossDb)
                    .min().orElse(0);
            double highest = trends.stream().flatMap(b -> b.readings().stream()).mapToDouble(LossReading::lossDb)
                    .max().orElse(1);
            DossierCharts.trend(drawing, t.nextRowIndex(), t.columnCount(), p.tag() + ": highest loss in each band's driving range",
                    series, lowest, highest);
            t.skipRows(ChartPlacement.TREND_ROWS + 1);
            t.sheet().setRowBreak(t.nextRowIndex() - 1);
            charts++;
        }
        return charts;
    }

    private static void band(TableSheet t, DossierPoint p, BandTrend trend) {
        Row r = t.newRowStyled();
        t.text(r, DossierColumn.TREND_TAG, p.tag());
        t.text(r, DossierColumn.TREND_BAND, trend.band().name() + "\ndriving range " + trend.drivingRange());
        List<LossReading> readings = trend.readings();
        t.number(r, DossierColumn.TREND_READINGS, readings.size());
        if (!readings.isEmpty()) {
            t.time(r, DossierColumn.TREND_FIRST, readings.get(0).time());
            t.time(r, DossierColumn.TREND_LAST, readings.get(readings.size() - 1).time());
            t.number(r, DossierColumn.TREND_LATEST_DB, readings.get(readings.size() - 1).lossDb());
        }
        trend.trend().ifPresent(f -> slope(t, r, f));
        t.text(r, DossierColumn.TREND_STEPS, trend.steps().isEmpty() ? "none" : trend.steps().stream()
                .map(s -> DossierText.date(s.after()) + " " + DossierText.words(s.kind()) + " "
                        + DossierText.signed(s.stepDb(), 2) + " dB")
                .collect(Collectors.joining("\n")));
        if (trend.outlook().isPresent()) {
            MarginForecast.Outlook o = trend.outlook().get();
            t.number(r, DossierColumn.TREND_MARGIN_DB, o.marginDb());
            t.text(r, DossierColumn.TREND_OUTLOOK, outlook(o));
            if (o.status() == MarginForecast.Status.PROJECTED || o.status() == MarginForecast.Status.ALREADY_EXHAUSTED) {
                o.expectedDate().ifPresent(d -> t.date(r, DossierColumn.TREND_EXPECTED, d));
                o.earliestDate().ifPresent(d -> t.date(r, DossierColumn.TREND_EARLIEST, d));
                o.latestDate().ifPresent(d -> t.date(r, DossierColumn.TREND_LATEST, d));
            }
        } else {
            t.text(r, DossierColumn.TREND_OUTLOOK, readings.size() < 2 ? "too few readings for a trend"
                    : "no forecast: the band returned no light at the latest scan");
        }
    }

    private static void slope(TableSheet t, Row r, LossTrend f) {
        t.number(r, DossierColumn.TREND_SLOPE, f.slopeDbPerYear());
        t.number(r, DossierColumn.TREND_SLOPE_LOW, f.lowerSlopeDbPerYear());
        t.number(r, DossierColumn.TREND_SLOPE_HIGH, f.upperSlopeDbPerYear());
        t.number(r, DossierColumn.TREND_CONFIDENCE, 100 * f.confidenceLevel());
    }

    /**
     * The forecast in words. Dates come only with a projection: a date range from slope limits
     * around a slope that does not use the margin up says little, and an unbounded upper limit would
     * put the earliest date at the last scan.
     */
    static String outlook(MarginForecast.Outlook o) {
        return switch (o.status()) {
            case ALREADY_EXHAUSTED -> "margin already used up";
            case PROJECTED -> "margin runs out about " + o.expectedDate().map(DossierText::date).orElse("?")
                    + ", between " + o.earliestDate().map(DossierText::date).orElse("now")
                    + " and " + o.latestDate().map(DossierText::date).orElse("no later limit");
            case BEYOND_HORIZON -> "loss growing, but the margin lasts beyond the "
                    + DossierText.decimal(MarginForecast.DEFAULT_HORIZON_YEARS, 0) + "-year forecast horizon";
            case NOT_SHRINKING -> "margin not shrinking";
        };
    }
}
