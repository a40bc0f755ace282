package org.strandbook.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.WavelengthBand;

/**
 * The acceptance rules. The criterion "measured installed loss within the calculated budget" is
 * the acceptance test of installed-loss measurement (from memory: IEC 61280-4-1 and TIA-526-14
 * describe the measurement; cabling standards set the budget); the tolerances and factors are
 * design choices.
 */
class AcceptanceTest {

    private static final WavelengthGrid GRID = WavelengthGrid.uniformNm(1000, 2000, 501);
    private static final WavelengthBand BAND = new WavelengthBand("test band", 1400, 1600);
    private static final double TOLERANCE_DB = 1.0;
    private static final double ALLOWED_DB = 20.0;

    private static double[] flat(double db) {
        double[] a = new double[GRID.size()];
        Arrays.fill(a, db);
        return a;
    }

    private static BandVerdict judge(double[] measured, double[] predicted) {
        return Acceptance.judge(GRID, measured, predicted, BAND, TOLERANCE_DB, ALLOWED_DB);
    }

    @Test
    void measuredAsPredictedPassesWithItsMargin() {
        BandVerdict v = judge(flat(10.2), flat(10.0));
        assertEquals(Status.PASS, v.status());
        assertEquals(0.2, v.meanDeviationDb(), 1e-12);
        assertEquals(ALLOWED_DB - 10.2, v.marginDb(), 1e-12);
    }

    @Test
    void meanExcessBeyondToleranceFails() {
        BandVerdict v = judge(flat(11.5), flat(10.0));
        assertEquals(Status.FAIL, v.status());
        assertTrue(v.reason().contains("1.50 dB more than predicted"), v.reason());
    }

    @Test
    void lossAboveTheAnalyzersAllowanceFailsEvenWhenPredicted() {
        BandVerdict v = judge(flat(20.5), flat(20.4));
        assertEquals(Status.FAIL, v.status());
        assertEquals(-0.5, v.marginDb(), 1e-12);
    }

    @Test
    void lessLossThanPredictedAsksForReview() {
        // a negative deviation beyond tolerance points at the reference (IEC 61280-4-1 family: a loss
        // below the reference means a bad reference) or at wrong records
        BandVerdict v = judge(flat(8.5), flat(10.0));
        assertEquals(Status.REVIEW, v.status());
    }

    @Test
    void localExcessOfTwoTolerancesAsksForReviewAndOfThreeFails() {
        double[] m = flat(10.0);
        m[GRID.nearestIndex(1500)] = 12.5;
        assertEquals(Status.REVIEW, judge(m, flat(10.0)).status());
        m[GRID.nearestIndex(1500)] = 13.5;
        BandVerdict v = judge(m, flat(10.0));
        assertEquals(Status.FAIL, v.status());
        assertEquals(1500, v.worstAtNm(), 1.0);
    }

    @Test
    void bandWithNoMeasuredPointFailsAsNoLight() {
        BandVerdict v = judge(flat(Double.NaN), flat(10.0));
        assertEquals(Status.FAIL, v.status());
        assertEquals(0, v.measuredFraction());
    }

    @Test
    void bandOutsideTheGridIsAClearError() {
        WavelengthBand outside = new WavelengthBand("far", 2200, 2300);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Acceptance.judge(GRID, flat(1), flat(1), outside, 1, 20));
        assertTrue(e.getMessage().contains("outside the evaluation grid"));
    }
}
