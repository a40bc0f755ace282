package org.strandbook.optics.joint;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class JointEfficiencyTest {

    // Lateral offset between uniformly filled step-index fibers, η = (2/π)[arccos u − u√(1 − u²)],
    // u = d/2a (from memory: G. Keiser and J. Senior, Optical Fiber Communications). Values by hand:
    // u = 0.1: (2/π)(1.470629 − 0.099499) = 0.872889 → 0.590 dB ("10 % offset ≈ 0.6 dB");
    // u = 0.5: (2/π)(π/3 − √3/4) = 2/3 − √3/(2π) = 0.391002 → 4.078 dB.
    @ParameterizedTest
    @CsvSource(textBlock = """
            0,   200, 0.0
            20,  200, 0.5904
            100, 200, 4.0782
            5,   50,  0.5904
            """)
    void lateralOffsetMatchesTheTextbookFormula(double offsetUm, double coreUm, double lossDb) {
        assertEquals(lossDb, JointEfficiency.lossDb(JointEfficiency.lateralOffset(offsetUm, coreUm)), 1e-4);
    }

    @Test
    void offsetOfAWholeCoreDiameterIsRefused() {
        // u = 1: the circles no longer overlap, η = 0 (same formula)
        assertThrows(IllegalArgumentException.class, () -> JointEfficiency.lateralOffset(200, 200));
    }

    @Test
    void coreMismatchFromTwoHundredToOneHundredMicronsCostsSixDecibels() {
        // η = (d2/d1)² = 1/4 → 6.02 dB, and 0 dB from smaller to larger (from memory: Keiser; Senior)
        assertEquals(6.0206, JointEfficiency.lossDb(JointEfficiency.coreMismatch(200, 100)), 1e-4);
        assertEquals(0.0, JointEfficiency.lossDb(JointEfficiency.coreMismatch(100, 200)), 0);
    }

    @Test
    void naMismatchCostsTheSquareOfTheRatioOnlyFromLargerToSmaller() {
        // η = (NA2/NA1)² (from memory: Keiser; Senior): 0.22 → 0.11 is 6.02 dB
        assertEquals(6.0206, JointEfficiency.lossDb(JointEfficiency.naMismatch(0.22, 0.11)), 1e-4);
        assertEquals(0.0, JointEfficiency.lossDb(JointEfficiency.naMismatch(0.11, 0.22)), 0);
    }

    @Test
    void endGapOfZeroLosesNothingAndLossGrowsWithTheGap() {
        // our own derivation (phase-space overlap, JointEfficiency): its limit and monotonicity
        assertEquals(1.0, JointEfficiency.endGap(0, 200, 0.22, 1.0), 0);
        double previous = 1.0;
        for (double gap = 5; gap <= 5000; gap *= 1.5) {
            double eta = JointEfficiency.endGap(gap, 200, 0.22, 1.0);
            assertTrue(eta < previous, "gap " + gap);
            previous = eta;
        }
    }

    @Test
    void smallEndGapFollowsTheFirstOrderExpansion() {
        // our own derivation (JointEfficiency): η ≈ 1 − (4/3π)·s·NA/(a·n0) for s·tanθa ≪ a
        double a = 100;
        double s = 2;
        double expected = 1 - 4 / (3 * Math.PI) * s * 0.22 / a;
        assertEquals(1 - expected, 1 - JointEfficiency.endGap(s, 2 * a, 0.22, 1.0), 0.02 * (1 - expected));
    }

    @Test
    void largeEndGapApproachesTheInverseSquareLaw() {
        // our own derivation (JointEfficiency), far field: the core subtends sin²(atan(a/s)) ≈ (a/s)² of
        // direction space out of sin²θa = (NA/n0)², so η → (a·n0/(s·NA))²
        double s = 50_000;
        double expected = Math.pow(100 * 1.0 / (s * 0.22), 2);
        assertEquals(expected, JointEfficiency.endGap(s, 200, 0.22, 1.0), 0.02 * expected);
    }

    @Test
    void farGapAgreesWithTheTextbookExpandingConeFormula() {
        // a published case: the expanding-cone end-gap formula η = [a/(a + s·tanθc)]² for a step-index
        // fiber (from memory: G. Keiser, Optical Fiber Communications, ch. 5). The textbooks' near-gap
        // forms disagree by factors of two; far from the face both are the cone's spreading, so they
        // must agree there to within tan²θ against sin²θ (5 % at NA 0.22) and the textbook's a in
        // a + s·tanθ (3.6 % at s = 250a)
        double a = 100;
        double s = 25_000;
        double thetaA = Math.asin(0.22);
        double keiser = Math.pow(a / (a + s * Math.tan(thetaA)), 2);
        assertEquals(keiser, JointEfficiency.endGap(s, 2 * a, 0.22, 1.0), 0.10 * keiser);
    }

    @Test
    void indexMatchingGelNarrowsTheConeAndReducesGapLoss() {
        // sin θa = NA/n0: a denser gap medium spreads the light less (Snell's law)
        assertTrue(JointEfficiency.endGap(100, 200, 0.22, 1.46) > JointEfficiency.endGap(100, 200, 0.22, 1.0));
    }

    @Test
    void tiltOfZeroLosesNothingAndTwiceTheAcceptanceAngleCouplesNothing() {
        // our own derivation (cone overlap, JointEfficiency): its limits
        assertEquals(1.0, JointEfficiency.tilt(0, 0.22, 1.0), 0);
        double thetaA = Math.toDegrees(Math.asin(0.22));
        assertTrue(JointEfficiency.tilt(2 * thetaA - 0.01, 0.22, 1.0) < 1e-4);
        assertThrows(IllegalArgumentException.class, () -> JointEfficiency.tilt(2 * thetaA, 0.22, 1.0));
    }

    @Test
    void tiltLossGrowsWithTheAngle() {
        // our own derivation (cone overlap, JointEfficiency): monotonic in the angle
        double previous = 1.0;
        for (double deg = 0.5; deg < 25; deg += 0.5) {
            double eta = JointEfficiency.tilt(deg, 0.22, 1.0);
            assertTrue(eta < previous, "tilt " + deg);
            previous = eta;
        }
    }

    @Test
    void smallNaTiltMatchesTheOffsetFormulaInAngle() {
        // our own derivation, paraxial limit: two discs of radius θa in direction space, τ apart → the
        // published offset formula (from memory: Keiser; Senior) with u = τ/2θa
        double na = 0.05;
        double thetaA = Math.asin(na);
        for (double deg : new double[] {0.3, 1.0, 2.0, 4.0}) {
            double u = Math.toRadians(deg) / (2 * thetaA);
            double expected = 2 / Math.PI * (Math.acos(u) - u * Math.sqrt(1 - u * u));
            assertEquals(expected, JointEfficiency.tilt(deg, na, 1.0), 0.003, "tilt " + deg);
        }
    }
}
