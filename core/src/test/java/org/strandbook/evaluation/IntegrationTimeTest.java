package org.strandbook.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Loop and reference taken at different integration times. Counts grow in proportion to
 * integration time, so loop and reference are compared as (S − D_t)/t, each with a dark of its own
 * time (common practice); the loss is then that of the one-cord reference method (IEC 61280-4-1
 * family). Scans from {@link FieldScans}' own lamp and detector model.
 */
class IntegrationTimeTest {

    private static PointEvaluation evaluate(FieldScans f) {
        return PointEvaluator.withDefaults().evaluate(f.inputs());
    }

    // 10·log10(200/50) = 6.02 dB: read without normalising, a loop at 4× the reference's time hides
    // a real 6 dB excess almost exactly (it would read about 0 dB from prediction).
    @Test
    void aLoopAtFourTimesTheReferenceTimeShowsItsRealExcess() {
        FieldScans f = new FieldScans();
        f.dark(50, 50);
        f.reference(50, 50);
        f.dark(200, 200);
        f.loop(200, 200, 6.0);

        PointEvaluation e = evaluate(f);

        BandVerdict v = e.verdicts().get(0);
        assertEquals(6.0, v.meanDeviationDb(), 0.1, v.reason());
        assertEquals(Status.FAIL, v.status());
        assertEquals(4.0, e.latest().orElseThrow().exposure().loopToReferenceRatio(), 1e-12);
    }

    // The same scans with equal times need no normalisation and read the same excess.
    @Test
    void equalTimesAreComparedAsTheyAre() {
        FieldScans f = new FieldScans();
        f.dark(50, 50);
        f.reference(50, 50);
        f.loop(50, 50, 2.0);

        BandVerdict v = evaluate(f).verdicts().get(0);
        assertEquals(2.0, v.meanDeviationDb(), 0.1, v.reason());
    }

    // A loop taken at 200 ms whose file did not record it cannot be shown to match the 50 ms
    // reference: the band is not judged (REVIEW, with the reason), never guessed.
    @Test
    void anUnrecordedLoopTimeIsNotGuessed() {
        FieldScans f = new FieldScans();
        f.dark(50, 50);
        f.reference(50, 50);
        f.dark(0, 200);
        f.loop(0, 200, 6.0);

        PointEvaluation e = evaluate(f);

        assertEquals(Status.REVIEW, e.status());
        BandVerdict v = e.verdicts().get(0);
        assertTrue(v.reason().startsWith("not judged: integration time of the loop scan is not recorded"), v.reason());
        assertTrue(e.diagnosis().isEmpty(), "no diagnosis of a loss that is not on one scale");
        assertTrue(e.finding().contains("not recorded"), e.finding());
    }

    // A dark whose time is not recorded cannot be shown to belong to the loop it would correct.
    @Test
    void aDarkOfUnrecordedTimeIsNotTrusted() {
        FieldScans f = new FieldScans();
        f.dark(0, 50);
        f.reference(50, 50);
        f.loop(50, 50, 0.0);

        PointEvaluation e = evaluate(f);

        assertEquals(Status.REVIEW, e.status());
        assertTrue(e.verdicts().get(0).reason().contains("dark (scan 1) cannot be shown to have its integration time"),
                e.verdicts().get(0).reason());
    }

    // Dark counts grow with integration time: a 50 ms dark cannot correct a 200 ms loop, so a loop
    // with only such a dark is left unpaired and says why.
    @Test
    void aDarkOfAnotherTimeNeverCorrectsTheLoop() {
        FieldScans f = new FieldScans();
        f.dark(50, 50);
        f.reference(50, 50);
        f.loop(200, 200, 0.0);

        PointEvaluation e = evaluate(f);

        assertEquals(Status.REVIEW, e.status());
        assertTrue(e.latest().isEmpty());
        assertTrue(e.problems().stream().anyMatch(p -> p.contains("no dark scan of AT-301 with the integration time"
                + " 200 ms of within 12 h")), e.problems().toString());
    }
}
