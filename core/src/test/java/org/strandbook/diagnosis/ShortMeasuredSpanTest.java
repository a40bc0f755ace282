package org.strandbook.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.OhGrade;
import org.strandbook.throughput.OneCordThroughput;
import org.strandbook.throughput.RawSpectrum;
import org.strandbook.throughput.ThroughputResult;
import org.strandbook.throughput.ThroughputScans;

/**
 * A reference clipped at full scale over most of the range leaves a short measured span beside it,
 * over which the fault shapes cannot be told apart: the diagnosis names no cause there and says why.
 * A 16-bit converter stops at 65 535 counts (common practice: keep references below roughly
 * 80–90 % of full scale, where detectors are still linear).
 */
class ShortMeasuredSpanTest {

    private static final WavelengthGrid GRID = WavelengthGrid.uniformNm(1000, 2200, 601);
    private static final double FULL_SCALE_COUNTS = 65_535;
    private static final double PREDICTED_DB = 6.0;
    /** A dirty joint: a flat 1.5 dB excess, well above the 0.3 dB reporting threshold (common practice). */
    private static final double DIRTY_JOINT_DB = 1.5;

    /** Reference held at full scale below {@code clippedUpToNm}; the loop honest, with a dirty joint. */
    private static ThroughputResult clippedReference(double clippedUpToNm) {
        Random rnd = new Random(11);
        double[] w = GRID.wavelengthsNm();
        double[] dark = new double[w.length];
        double[] ref = new double[w.length];
        double[] loop = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            double trueRef = 40_000 + rnd.nextGaussian();
            dark[i] = 500 + rnd.nextGaussian();
            ref[i] = w[i] <= clippedUpToNm ? FULL_SCALE_COUNTS : 500 + trueRef;
            loop[i] = 500 + trueRef * Math.pow(10, -(PREDICTED_DB + DIRTY_JOINT_DB) / 10) + rnd.nextGaussian();
        }
        RawSpectrum d = RawSpectrum.ofNm(w, dark).withNoiseCounts(1);
        return OneCordThroughput.withDefaults().measure(new ThroughputScans(
                RawSpectrum.ofNm(w, loop).withNoiseCounts(1), d, RawSpectrum.ofNm(w, ref).withNoiseCounts(1), d),
                GRID);
    }

    private static Diagnosis diagnose(ThroughputResult measured) {
        double[] predicted = new double[GRID.size()];
        Arrays.fill(predicted, PREDICTED_DB);
        PathEvidence evidence = new PathEvidence(
                List.of(new PathEvidence.JointEvidence("J1", InspectionGrade.CLEAN, true),
                        new PathEvidence.JointEvidence("J2", InspectionGrade.DIRTY, true)),
                List.of(new PathEvidence.SegmentEvidence("C1", "LOH-200", 40, OhGrade.LOW_OH, OptionalDouble.empty(),
                        22)),
                List.of("C1"), false, OptionalDouble.empty());
        return DeviationDiagnoser.withDefaults().diagnose(measured, predicted, evidence);
    }

    @Test
    void aSpanBesideAClippedReferenceTooShortToTellShapesApartNamesNoCause() {
        // usable 1902–2200 nm: 13 % of 1000–2200 nm in photon energy, below the third the
        // diagnosis needs (design choice)
        Diagnosis d = diagnose(clippedReference(1900));
        assertTrue(d.findings().isEmpty(), () -> d.findings().toString());
        assertTrue(d.summary().contains("too short a span") && d.summary().contains("reference saturated"),
                d::summary);
    }

    @Test
    void theSameJointIsNamedWhenTheClippedPartLeavesEnoughSpan() {
        // usable 1302–2200 nm: 56 % of the range in photon energy; the same light, the same fault
        Diagnosis d = diagnose(clippedReference(1300));
        assertEquals(Cause.DIRTY_CONNECTOR, d.first().orElseThrow().cause(), d::summary);
    }
}
