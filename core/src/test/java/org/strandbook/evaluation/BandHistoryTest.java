package org.strandbook.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.WavelengthBand;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.StepDetector;
import org.strandbook.trend.TheilSenTrend;

/**
 * The margin forecast follows the quantity whose margin it states. Slopes by Theil–Sen (P. K. Sen,
 * J. Am. Stat. Assoc. 63, 1379 (1968)); on noise-free straight lines every pairwise slope is the
 * same, so the dates below follow from plain arithmetic.
 */
class BandHistoryTest {

    private static final WavelengthGrid GRID = WavelengthGrid.uniformNm(1100, 1300, 101);
    /** 60 nm: three sub-bands of 20 nm, 1190–1210, 1210–1230 and 1230–1250 nm. */
    private static final WavelengthBand BAND = new WavelengthBand("C-H 2nd overtone", 1190, 1250);
    private static final double ALLOWED_DB = 15.0;
    private static final Instant FIRST = Instant.parse("2020-01-01T00:00:00Z");
    /** A Julian year, the trend's time unit. */
    private static final Duration YEAR = Duration.ofSeconds(31_557_600);

    /**
     * 10 dB everywhere, plus growth of {@code growthDbPerYear}·t only inside a narrow feature at
     * 1240 nm (full at 1240 nm, half at 1238 and 1242 nm: 6 nm of the 60 nm band).
     */
    private static double[] lossAt(double years, double growthDbPerYear) {
        double[] loss = new double[GRID.size()];
        Arrays.fill(loss, 10.0);
        for (int i = 0; i < GRID.size(); i++) {
            double nm = GRID.wavelengthNm(i);
            double shape = nm == 1240 ? 1 : nm == 1238 || nm == 1242 ? 0.5 : 0;
            loss[i] += growthDbPerYear * years * shape;
        }
        return loss;
    }

    private static BandTrend yearlyScans(int scans, java.util.function.DoubleFunction<double[]> loss) {
        BandHistory h = new BandHistory(BAND);
        Instant t = FIRST;
        for (int k = 0; k < scans; k++) {
            t = FIRST.plus(YEAR.multipliedBy(k));
            h.add(t, GRID, loss.apply(k));
        }
        return h.trend(ALLOWED_DB, t, Optional.empty(), TheilSenTrend.withDefaults(), StepDetector.withDefaults(),
                MarginForecast.withDefaults());
    }

    // Hand arithmetic: five yearly scans, the 1240 nm loss grows 0.5 dB/year, so at the latest scan
    // (2024-01-01, 4 Julian years = 1461 days after 2020-01-01) it is 10 + 2.0 = 12.0 dB; margin
    // 15 − 12 = 3.0 dB; 3.0 / 0.5 = 6 Julian years = 2191.5 days → 2029-12-31 12:00 UTC.
    // The band mean would grow only (1 + 0.5 + 0.5)·0.5/31 = 0.032 dB/year (31 grid points in the
    // band) and put the date 93 years out, beyond the 30-year horizon.
    @Test
    void lossGrowingInsideANarrowFeatureDatesTheRunOutByThatFeature() {
        BandTrend trend = yearlyScans(5, years -> lossAt(years, 0.5));

        MarginForecast.Outlook o = trend.outlook().orElseThrow();
        assertEquals(MarginForecast.Status.PROJECTED, o.status());
        assertEquals(3.0, o.marginDb(), 1e-9);
        assertEquals(0.5, trend.trend().orElseThrow().slopeDbPerYear(), 1e-9);
        assertEquals(Optional.of(LocalDate.of(2029, 12, 31)), o.expectedDate());
        assertEquals(1230, trend.drivingFromNm(), 1e-9);
        assertEquals(1250, trend.drivingToNm(), 1e-9);
    }

    // The forecast margin is the stated one: the band's margin (allowed minus the highest measured
    // loss, the acceptance rule) equals the driving sub-band's when that sub-band holds the worst point.
    @Test
    void forecastStartsFromTheMarginTheVerdictStates() {
        double[] latest = lossAt(4, 0.5);
        BandVerdict verdict = Acceptance.judge(GRID, latest, lossAt(0, 0), BAND, 1.0, ALLOWED_DB);
        BandTrend trend = yearlyScans(5, years -> lossAt(years, 0.5));

        assertEquals(verdict.marginDb(), trend.outlook().orElseThrow().marginDb(), 1e-12);
    }

    // A sub-band with less margin that is not shrinking does not date the band; the one that
    // shrinks does. 1190–1210 nm sits at a steady 12.5 dB (margin 2.5 dB, never used up); the
    // 1240 nm feature's margin of 3.0 dB runs out first, on 2029-12-31 as above.
    @Test
    void theRegionThatShrinksFirstDrivesTheDateNotTheOneWithLeastMargin() {
        BandTrend trend = yearlyScans(5, years -> {
            double[] loss = lossAt(years, 0.5);
            for (int i = 0; i < GRID.size(); i++) {
                if (GRID.wavelengthNm(i) >= 1190 && GRID.wavelengthNm(i) < 1210) {
                    loss[i] = 12.5;
                }
            }
            return loss;
        });

        assertEquals(1230, trend.drivingFromNm(), 1e-9);
        assertEquals(Optional.of(LocalDate.of(2029, 12, 31)), trend.outlook().orElseThrow().expectedDate());
    }

    // With nothing growing, the sub-band with the least margin is the one reported (design choice).
    @Test
    void withNoGrowthTheLeastMarginSubBandIsShown() {
        BandTrend trend = yearlyScans(4, years -> {
            double[] loss = lossAt(0, 0);
            loss[GRID.nearestIndex(1220)] = 11.0;
            return loss;
        });

        assertEquals(1210, trend.drivingFromNm(), 1e-9);
        assertEquals(MarginForecast.Status.NOT_SHRINKING, trend.outlook().orElseThrow().status());
        assertEquals(4.0, trend.outlook().orElseThrow().marginDb(), 1e-12);
    }

    // Sub-band edges: 60 nm makes three sub-bands of 20 nm, 130 nm makes seven of 18.6 nm (design choice).
    @Test
    void bandsAreCutIntoTheFewestSubBandsNoWiderThanTwentyNm() {
        assertEquals(3, SubBands.of(BAND).count());
        assertEquals(7, SubBands.of(new WavelengthBand("C-H 1st overtone", 1650, 1780)).count());
        assertTrue(SubBands.of(new WavelengthBand("narrow", 1200, 1210)).count() == 1);
    }
}
