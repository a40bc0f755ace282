package org.strandbook.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.WavelengthBand;
import org.strandbook.uncertainty.CoverageInterval;
import org.strandbook.uncertainty.LossUncertainty;
import org.strandbook.uncertainty.UncertaintyBudget;

/**
 * Acceptance on the coverage interval: the zones of a decision rule with a guard band — acceptance
 * inside the limit, rejection beyond the limit plus the guard band, neither in between (JCGM
 * 106:2012, clause 8; ILAC-G8:09/2019). The prediction's interval, the noise and the 0.2 dB guard
 * band below are design choices of the test; the widening in quadrature is the sum of variances of
 * independent normal quantities (JCGM 100:2008, 5.1.2).
 */
class IntervalAcceptanceTest {

    private static final WavelengthGrid GRID = WavelengthGrid.uniformNm(1000, 2000, 501);
    private static final WavelengthBand BAND = new WavelengthBand("test band", 1400, 1600);
    private static final double ALLOWED_DB = 20.0;
    private static final double PREDICTED_DB = 3.0;
    /** The prediction's 95 % interval: 0.30 dB either side. */
    private static final double HALF_WIDTH_DB = 0.30;
    private static final DecisionRule RULE = DecisionRule.interval();
    /** Measurement: no noise, repeatability 0.1 dB: U = 1.96 × 0.1 dB. */
    private static final double U_DB = 0.1 * MeasurementUncertainty.coverageFactor(0.95);
    private static final double UPPER_DB = Math.hypot(HALF_WIDTH_DB, U_DB);

    private static double[] flat(double db) {
        double[] a = new double[GRID.size()];
        Arrays.fill(a, db);
        return a;
    }

    private static BandUncertainty prediction() {
        UncertaintyBudget budget = new UncertaintyBudget(PREDICTED_DB, HALF_WIDTH_DB / 2, List.of(),
                new CoverageInterval(PREDICTED_DB - HALF_WIDTH_DB, PREDICTED_DB + HALF_WIDTH_DB, 0.95,
                        CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC));
        return new BandUncertainty(BAND, new LossUncertainty(BAND.centreNm(), PREDICTED_DB, budget,
                budget.interval()));
    }

    private static IntervalAcceptance.Judged judge(double[] measured) {
        return IntervalAcceptance.judge(GRID, measured, flat(0), flat(PREDICTED_DB), BAND, prediction(),
                MeasurementUncertainty.withDefaultRepeatability(0), RULE, 1.0, ALLOWED_DB);
    }

    @Test
    void theIntervalIsWidenedByTheMeasurementInQuadrature() {
        BandInterval limits = judge(flat(PREDICTED_DB)).interval();
        assertEquals(UPPER_DB, limits.upperDeviationDb(), 1e-12);
        assertEquals(-UPPER_DB, limits.lowerDeviationDb(), 1e-12);
        assertEquals(U_DB, limits.measurementExpandedDb(), 1e-12);
    }

    @Test
    void insideTheWidenedIntervalPasses() {
        BandVerdict v = judge(flat(PREDICTED_DB + UPPER_DB - 0.01)).verdict();
        assertEquals(Status.PASS, v.status(), v.reason());
        assertTrue(v.reason().startsWith("inside the prediction's 95 % interval"), v.reason());
    }

    @Test
    void withinTheGuardBandIsReviewAndSaysSo() {
        BandVerdict v = judge(flat(PREDICTED_DB + UPPER_DB + 0.1)).verdict();
        assertEquals(Status.REVIEW, v.status(), v.reason());
        assertTrue(v.reason().contains("within the guard band of 0.20 dB"), v.reason());
    }

    @Test
    void beyondTheGuardBandFailsAndSaysBy() {
        BandVerdict v = judge(flat(PREDICTED_DB + UPPER_DB + 0.3)).verdict();
        assertEquals(Status.FAIL, v.status(), v.reason());
        assertTrue(v.reason().contains("by 0.30 dB, more than the guard band of 0.20 dB"), v.reason());
    }

    @Test
    void aFixedToleranceOfOneDecibelWouldPassWhatTheIntervalFails() {
        // the short-loop case: 0.9 dB over a prediction known to ±0.3 dB
        double[] measured = flat(PREDICTED_DB + 0.9);
        assertEquals(Status.PASS, Acceptance.judge(GRID, measured, flat(PREDICTED_DB), BAND, 1.0, ALLOWED_DB).status());
        assertEquals(Status.FAIL, judge(measured).verdict().status());
    }

    @Test
    void theWorstSubBandIsHeldToTheSameLimits() {
        // loss growing inside one band: 1 dB over 1540–1560 nm only, so the band mean stays inside
        double[] measured = flat(PREDICTED_DB);
        for (int i = 0; i < GRID.size(); i++) {
            double nm = GRID.wavelengthNm(i);
            if (nm >= 1540 && nm < 1560) {
                measured[i] += 1.0;
            }
        }
        IntervalAcceptance.Judged j = judge(measured);
        assertTrue(j.verdict().meanDeviationDb() < UPPER_DB, "the band mean alone would pass");
        assertEquals(Status.FAIL, j.verdict().status(), j.verdict().reason());
        assertTrue(j.verdict().reason().contains("sub-band 1540–1560 nm"), j.verdict().reason());
    }

    @Test
    void lessLossThanTheIntervalAllowsPointsAtTheReference() {
        BandVerdict v = judge(flat(PREDICTED_DB - UPPER_DB - 0.05)).verdict();
        assertEquals(Status.REVIEW, v.status());
        assertTrue(v.reason().contains("check the reference scan"), v.reason());
    }

    @Test
    void detectorNoiseWidensTheIntervalOfANoisyBand() {
        // σ = 1 dB at each of the band's 101 points: the band mean's noise is 1/√101 dB
        IntervalAcceptance.Judged j = IntervalAcceptance.judge(GRID, flat(PREDICTED_DB), flat(1.0), flat(PREDICTED_DB),
                BAND, prediction(), MeasurementUncertainty.withDefaultRepeatability(0), RULE, 1.0, ALLOWED_DB);
        assertEquals(Math.hypot(1 / Math.sqrt(101), 0.1), j.interval().measurement().standardUncertaintyDb(), 1e-12);
    }

    @Test
    void aLossAboveTheAllowedLossFailsWhateverThePrediction() {
        BandVerdict v = IntervalAcceptance.judge(GRID, flat(20.5), flat(0), flat(20.4), BAND, prediction(),
                MeasurementUncertainty.withDefaultRepeatability(0), RULE, 1.0, ALLOWED_DB).verdict();
        assertEquals(Status.FAIL, v.status());
        assertTrue(v.reason().contains("exceeds the analyzer's allowed"), v.reason());
    }
}
