package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.strandbook.evaluation.BandTrend;
import org.strandbook.site.WavelengthBand;
import org.strandbook.trend.LossReading;
import org.strandbook.trend.LossTrend;
import org.strandbook.trend.TheilSenTrend;

class TrendColumnsTest {

    private static final WavelengthBand BAND = new WavelengthBand("C-H 1st overtone", 1650, 1780);
    private static final Instant CLEANED = Instant.parse("2026-05-03T00:00:00Z");

    @Test
    void theTrendLineOfTheChartStartsAtTheFirstReadingAfterARepair() {
        // invented readings: 12 dB before a cleaning, then 10 dB growing 1 dB/year; the trend is fitted
        // to the readings after the cleaning only (Theil–Sen, Sen 1968, J. Am. Stat. Assoc. 63, 1379),
        // so the chart must not draw that line back over the dirty regime
        List<LossReading> after = List.of(new LossReading(CLEANED, 10), new LossReading(CLEANED.plusSeconds(7_889_400), 10.25),
                new LossReading(CLEANED.plusSeconds(15_778_800), 10.5));
        List<LossReading> all = new ArrayList<>(List.of(new LossReading(CLEANED.minusSeconds(15_778_800), 12),
                new LossReading(CLEANED.minusSeconds(7_889_400), 12.1)));
        all.addAll(after);
        LossTrend sinceCleaning = TheilSenTrend.withDefaults().fit(after);

        TrendColumns c = TrendColumns.of(new BandTrend(BAND, all, List.of(), Optional.of(sinceCleaning), List.of(),
                Optional.empty()));

        assertTrue(Double.isNaN(c.trendDb()[0]) && Double.isNaN(c.trendDb()[1]), "no line before the cleaning");
        assertEquals(10, c.trendDb()[2], 0.01);
        assertEquals(10.5, c.trendDb()[4], 0.01);
    }
}
