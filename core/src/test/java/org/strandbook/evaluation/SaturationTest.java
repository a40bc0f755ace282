package org.strandbook.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.strandbook.throughput.MaskReason;
import org.strandbook.throughput.MaskedRange;
import org.strandbook.throughput.ThroughputResult;

/**
 * A bright reference through a short cord saturates the detector; its flat top is not evidence of
 * low loss and is masked, never judged (common practice: keep references below roughly 80–90 % of
 * a 16-bit converter's 65 535 counts). Scans from {@link FieldScans}' own lamp model.
 */
class SaturationTest {

    private static PointEvaluation evaluate(FieldScans f) {
        f.dark(50, 50);
        f.reference(50, 50);
        f.loop(50, 50, 0.0);
        return PointEvaluator.withDefaults().evaluate(f.inputs());
    }

    /**
     * Grid wavelengths where the model's 50 ms reference reaches 65 535 counts: offset 800 + dark
     * current 2 counts/ms × 50 ms + lamp × 50 ms ≥ 65 535 (noise aside), first and last, nm.
     */
    private static double[] clippedByTheModel(FieldScans f) {
        double[] lamp = f.lampCountsPerMs();
        double first = Double.NaN;
        double last = Double.NaN;
        for (int i = 0; i < lamp.length; i++) {
            if (900 + 50 * lamp[i] >= FieldScans.FULL_SCALE_COUNTS) {
                first = Double.isNaN(first) ? f.grid().wavelengthNm(i) : first;
                last = f.grid().wavelengthNm(i);
            }
        }
        return new double[] {first, last};
    }

    // At 1400 counts/ms at its brightest the reference clips over part of the range; that part is masked with the
    // reason (widened by one reading each side) and the rest of the band is judged as it is.
    @Test
    void theClippedPartOfTheReferenceIsMaskedWithItsReason() {
        FieldScans f = new FieldScans().lampPeakCountsPerMs(1400);
        double[] expected = clippedByTheModel(f);
        PointEvaluation e = evaluate(f);

        ThroughputResult m = e.measured().orElseThrow();
        MaskedRange clipped = m.maskedRanges().stream().filter(r -> r.reason() == MaskReason.REFERENCE_SATURATED)
                .findFirst().orElseThrow();
        assertEquals(expected[0] - 2, clipped.fromNm(), 4.1, "model clips from " + expected[0] + " nm");
        assertEquals(expected[1] + 2, clipped.toNm(), 4.1, "model clips to " + expected[1] + " nm");
        assertTrue(clipped.description().endsWith("reference saturated: shorten the integration time and re-take it"),
                clipped.description());
        for (int i = 0; i < m.grid().size(); i++) {
            double nm = m.grid().wavelengthNm(i);
            if (nm >= expected[0] && nm <= expected[1]) {
                assertTrue(Double.isNaN(m.lossDb()[i]), "no loss where the reference was clipped, " + nm + " nm");
            }
        }
    }

    // 4000 counts/ms: the reference clips over most of the 1000–2200 nm range: refused, with the
    // reason, not judged.
    @Test
    void aReferenceClippedNearlyEverywhereIsRefused() {
        PointEvaluation e = evaluate(new FieldScans().lampPeakCountsPerMs(4000));

        assertEquals(Status.REVIEW, e.status());
        assertTrue(e.verdicts().get(0).reason().contains("reference saturated: shorten the integration time and"
                + " re-take it"), e.verdicts().get(0).reason());
        assertFalse(e.diagnosis().isPresent(), "a clipped scan is not diagnosed");
        assertTrue(e.measured().orElseThrow().saturatedFraction() > PointEvaluator.REFUSED_SATURATED_FRACTION);
    }

    // At 600 counts/ms the reference peaks near 31 000 counts: nothing is masked for saturation.
    @Test
    void aReferenceWithinFullScaleIsNotMasked() {
        PointEvaluation e = evaluate(new FieldScans());

        assertEquals(0.0, e.measured().orElseThrow().saturatedFraction());
        assertEquals(Status.PASS, e.status(), e.verdicts().get(0).reason());
    }
}
