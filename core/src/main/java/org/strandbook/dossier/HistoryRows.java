package org.strandbook.dossier;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import org.apache.poi.ss.usermodel.Row;
import org.strandbook.evaluation.BandTrend;
import org.strandbook.trend.StepEvent;

/**
 * The Trend history appendix: every loss reading (highest in the band's driving sub-band) of every point and band in time order,
 * the Theil–Sen line at its time and any step or outlier the scan marks; then the loop scans that
 * returned no light in the band. Tells where each band's readings went, for the trend chart.
 */
final class HistoryRows {

    /** Where a band's readings went: the cell ranges of time, loss and trend line. */
    record Block(DossierPoint point, BandTrend trend, String timeRange, String lossRange, String trendRange) {
    }

    /** Rows a point takes on the sheet. */
    static int rowsOf(DossierPoint p) {
        return p.evaluation().map(e -> e.trends().stream().mapToInt(b -> b.readings().size() + b.noLight().size()).sum())
                .orElse(0);
    }

    private HistoryRows() {
    }

    static List<Block> fill(TableSheet t, DossierContent content, Runnable afterPoint) {
        List<Block> blocks = new ArrayList<>();
        for (DossierPoint p : content.points()) {
            t.ensureRoom(rowsOf(p));
            for (BandTrend trend : p.evaluation().map(e -> e.trends()).orElse(List.of())) {
                TrendColumns c = TrendColumns.of(trend);
                int first = t.nextRowIndex();
                for (int i = 0; i < c.size(); i++) {
                    Row r = start(t, p, trend);
                    t.number(r, DossierColumn.HISTORY_TAKEN, c.excelTime()[i]);
                    t.number(r, DossierColumn.HISTORY_LOSS_DB, c.lossDb()[i]);
                    t.number(r, DossierColumn.HISTORY_TREND_DB, c.trendDb()[i]);
                    t.text(r, DossierColumn.HISTORY_EVENT, event(trend, trend.readings().get(i).time()));
                }
                if (c.size() > 0) {
                    int last = t.nextRowIndex() - 1;
                    blocks.add(new Block(p, trend, t.range(DossierColumn.HISTORY_TAKEN, first, last),
                            t.range(DossierColumn.HISTORY_LOSS_DB, first, last),
                            t.range(DossierColumn.HISTORY_TREND_DB, first, last)));
                }
                for (Instant dark : trend.noLight()) {
                    Row r = start(t, p, trend);
                    t.time(r, DossierColumn.HISTORY_TAKEN, dark);
                    t.text(r, DossierColumn.HISTORY_EVENT, "no light returned in the band");
                }
            }
            afterPoint.run();
        }
        return blocks;
    }

    private static Row start(TableSheet t, DossierPoint p, BandTrend trend) {
        Row r = t.newRow();
        t.text(r, DossierColumn.HISTORY_TAG, p.tag());
        t.text(r, DossierColumn.HISTORY_BAND, trend.band().name());
        return r;
    }

    private static String event(BandTrend trend, Instant time) {
        for (StepEvent s : trend.steps()) {
            if (s.after().equals(time)) {
                return (s.kind() == StepEvent.Kind.STEP ? "step of " : "outlier of ") + DossierText.signed(s.stepDb(), 2)
                        + " dB (" + DossierText.decimal(s.sizeInNoiseWidths(), 1) + " noise widths)";
            }
        }
        return "";
    }
}
