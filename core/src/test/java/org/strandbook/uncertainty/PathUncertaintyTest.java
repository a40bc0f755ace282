package org.strandbook.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.attenuation.SilicaAttenuation;
import org.strandbook.optics.attenuation.SilicaFiberGrade;
import org.strandbook.optics.joint.ConnectorAllowance;
import org.strandbook.optics.path.FiberSegment;
import org.strandbook.optics.path.FiberSpec;
import org.strandbook.optics.path.JointElement;
import org.strandbook.optics.path.LightPath;
import org.strandbook.optics.path.LossBudget;
import org.strandbook.optics.path.ProbeElement;

class PathUncertaintyTest {

    private static final WavelengthGrid GRID = WavelengthGrid.ofNm(1050, 1380, 2300);
    private static final int AT_1050 = 0;
    private static final int AT_1380 = 1;
    private static final int AT_2300 = 2;
    private static final SilicaAttenuation HIGH_OH = SilicaAttenuation.of(SilicaFiberGrade.HIGH_OH, 600);
    private static final FiberSpec FIBER = FiberSpec.silicaCore(400, 440, 0.22, HIGH_OH);
    private static final PathUncertainty ENGINE = PathUncertainty.standard();

    private static JointElement airGap(String label) {
        return new JointElement(label, FIBER, FIBER, ConnectorAllowance.SMA_905_TYPICAL);
    }

    private static LightPath loop(double lengthM, double bendRadiusMm, double ohPpm) {
        FiberSpec fiber = FiberSpec.silicaCore(400, 440, 0.22, HIGH_OH.withOhPpm(ohPpm));
        return LightPath.of("loop",
                FiberSegment.bent("send", fiber, lengthM, bendRadiusMm, 1),
                airGap("J1"),
                new ProbeElement("probe", List.of(), 1.0, Optional.empty()),
                airGap("J2"),
                FiberSegment.straight("return", fiber, lengthM));
    }

    private static final List<JointSource> TWO_AIR_GAPS = List.of(JointSource.ASSUMED_AIR_GAP,
            JointSource.ASSUMED_AIR_GAP);

    private static BudgetRow row(LossUncertainty u, String input) {
        return u.budget().rows().stream().filter(r -> r.input().equals(input)).findFirst().orElseThrow();
    }

    @Test
    void sensitivitiesAreTheSlopesOfThePredictionItself() {
        // JCGM 100:2008, 5.1.3 and its note 2: cᵢ = ∂f/∂xᵢ, which may be found numerically by
        // re-evaluating the model; here the optics engine rebuilt with the input changed.
        LossUncertainty u = ENGINE.at(LossBudget.of(loop(100, 30, 600), GRID), AT_1380, shipped(loop(100, 30, 600), TWO_AIR_GAPS));
        double base = LossBudget.of(loop(100, 30, 600), GRID).totalLossDbAt(AT_1380);
        double longer = LossBudget.of(loop(101, 30, 600), GRID).totalLossDbAt(AT_1380)
                - LossBudget.of(loop(100, 30, 600), GRID).totalLossDbAt(AT_1380);
        // the send and the return segments both get 1 m longer in `longer`
        assertEquals(longer, row(u, "send length").sensitivity() + row(u, "return length").sensitivity(), 1e-9);
        double doubledOh = LossBudget.of(loop(100, 30, 1200), GRID).totalLossDbAt(AT_1380) - base;
        assertEquals(doubledOh, row(u, "send OH content").sensitivity() + row(u, "return OH content").sensitivity(),
                1e-6 * doubledOh);
        double wider = LossBudget.of(loop(100, 30.3, 600), GRID).totalLossDbAt(AT_1380);
        double tighter = LossBudget.of(loop(100, 29.7, 600), GRID).totalLossDbAt(AT_1380);
        assertEquals((wider - tighter) / 0.02, row(u, "send bend radius").sensitivity(), 1e-9);
    }

    @Test
    void twoAirGapPairsDominateAShortLoopAndMakeItsIntervalTriangular() {
        // Two equal rectangles ±0.5 dB sum to a triangle on ±1 dB whose central 95 % is
        // ±(1 − √0.05) = ±0.776 dB (the triangle's distribution function, JCGM 100:2008, 4.3.9);
        // the law-of-propagation interval ±1.96·√(2·0.5²/3) = ±0.800 dB is wider (JCGM 101:2008, 9.2.3).
        LightPath shortLoop = LightPath.of("short", FiberSegment.straight("send", FIBER, 0.5), airGap("J1"),
                airGap("J2"), FiberSegment.straight("return", FIBER, 0.5));
        LossUncertainty u = ENGINE.at(LossBudget.of(shortLoop, GRID), AT_1050, shipped(shortLoop, TWO_AIR_GAPS));
        double exact = new SumOfRectangles(0.5, 0.5).quantile(0.975);
        assertEquals(1 - Math.sqrt(0.05), exact, 1e-9);
        assertEquals(exact, u.highOffsetDb(), 0.01);
        assertEquals(-exact, u.lowOffsetDb(), 0.01);
        assertEquals(1.96 * Math.sqrt(2 * 0.25 / 3), u.frameworkInterval().high() - u.predictedLossDb(), 0.01);
        assertEquals("J1 connector pair loss", u.budget().rowsByContribution().get(0).input().substring(0, 22));
    }

    @Test
    void aTightBendMakesTheIntervalReachFurtherUpThanDown() {
        // Gloge, Appl. Opt. 11 (1972) 2506: bend loss grows ever faster as the radius shrinks, so an
        // equal spread of radius moves the loss more up than down; the Monte Carlo interval carries
        // that, the symmetric framework interval cannot. No OH in the fiber, so no other input is
        // one-sided.
        LossUncertainty u = ENGINE.at(LossBudget.of(loop(2, 35, 0), GRID), AT_2300, shipped(loop(2, 35, 0), TWO_AIR_GAPS));
        assertTrue(u.budget().rows().stream().noneMatch(r -> r.input().contains("OH")));
        assertTrue(u.highOffsetDb() > -u.lowOffsetDb() + 0.05, u.lowOffsetDb() + " … " + u.highOffsetDb());
    }

    @Test
    void aMeasuredJointNarrowsTheInterval() {
        // Design choice: a joint measured on site carries its reading's 0.1 dB, not the type's range.
        LossBudget budget = LossBudget.of(loop(50, 100, 600), GRID);
        LossUncertainty assumed = ENGINE.at(budget, AT_1050, shipped(budget.path(), TWO_AIR_GAPS));
        LossUncertainty measured = ENGINE.at(budget, AT_1050,
                shipped(budget.path(), List.of(JointSource.MEASURED, JointSource.MEASURED)));
        assertTrue(measured.budget().interval().width() < assumed.budget().interval().width() - 0.2);
    }

    @Test
    void jointSourcesMustMatchTheJoints() {
        // Design choice: a missing or extra source is a wiring error, never a silent default.
        LossBudget budget = LossBudget.of(loop(50, 100, 600), GRID);
        assertThrows(IllegalArgumentException.class,
                () -> shipped(budget.path(), List.of(JointSource.MEASURED)));
        assertThrows(IllegalArgumentException.class, () -> shipped(budget.path(),
                List.of(JointSource.MEASURED, JointSource.MEASURED, JointSource.MEASURED)));
    }

    @Test
    void chanceWithinTheAllowedLossFollowsTheTwoAirGapTriangle() {
        // As above: two ±0.5 dB rectangles dominate a 1 m loop, their sum is the triangle on ±1 dB,
        // F(s) = (1 + s)²/2 below 0 (JCGM 100:2008, 4.3.9); the fiber terms add a few thousandths.
        LightPath shortLoop = LightPath.of("short", FiberSegment.straight("send", FIBER, 0.5), airGap("J1"),
                airGap("J2"), FiberSegment.straight("return", FIBER, 0.5));
        LossBudget budget = LossBudget.of(shortLoop, GRID);
        double predicted = budget.totalLossDbAt(AT_1050);
        Chance c = ENGINE.chanceWithin(budget, AT_1050, shipped(budget.path(), TWO_AIR_GAPS), predicted - 0.5);
        assertEquals(new SumOfRectangles(0.5, 0.5).cumulative(-0.5), c.probability(), 0.01);
        assertEquals(0.125, c.probability(), 0.01);
        assertEquals(1.0, ENGINE.chanceWithin(budget, AT_1050, shipped(budget.path(), TWO_AIR_GAPS), predicted + 1.1).probability());
    }

    @Test
    void chanceAgreesWithTheCoverageIntervalFromTheSameTrials() {
        // JCGM 101:2008, 7.7.1: the probabilistically symmetric interval's upper end is the 97.5 %
        // point of the output's distribution; the interval comes from the adaptive run (7.9), whose
        // ends are fixed only to its numerical tolerance δ (7.9.4), so the 97.5 % point of the
        // chance's own trials lies within δ of it.
        LossBudget budget = LossBudget.of(loop(100, 30, 600), GRID);
        LossUncertainty u = ENGINE.at(budget, AT_2300, shipped(budget.path(), TWO_AIR_GAPS));
        double high = u.budget().interval().high();
        double delta = MonteCarloPropagation.numericalTolerance(u.budget().combinedStandardUncertainty(),
                PathUncertainty.SIGNIFICANT_DIGITS);
        Chance below = ENGINE.chanceWithin(budget, AT_2300, shipped(budget.path(), TWO_AIR_GAPS), high - delta);
        Chance above = ENGINE.chanceWithin(budget, AT_2300, shipped(budget.path(), TWO_AIR_GAPS), high + delta);
        assertTrue(below.probability() <= 0.975 && 0.975 <= above.probability(),
                below.probability() + " … " + above.probability());
    }

    private static PathAllowances shipped(LightPath path, List<JointSource> joints) {
        return PathAllowances.shipped(path, joints);
    }
}
