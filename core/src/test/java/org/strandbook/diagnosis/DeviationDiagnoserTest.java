package org.strandbook.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.attenuation.AttenuationShapes;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.OhGrade;
import org.strandbook.throughput.OneCordThroughput;
import org.strandbook.throughput.RawSpectrum;
import org.strandbook.throughput.ThroughputResult;
import org.strandbook.throughput.ThroughputScans;

/** The diagnosis inverts known deviations built from the published shapes and laws named per test. */
class DeviationDiagnoserTest {

    private static final WavelengthGrid GRID = WavelengthGrid.uniformNm(1000, 2200, 601);
    private static final double PREDICTED_DB = 8.0;

    /** Scans whose dark-corrected ratio gives exactly {@code predicted + deviation}, with a little noise. */
    private static ThroughputResult measured(double[] deviationDb, long seed) {
        Random rnd = new Random(seed);
        double[] w = GRID.wavelengthsNm();
        double[] dark = new double[w.length];
        double[] ref = new double[w.length];
        double[] loop = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            dark[i] = 500 + rnd.nextGaussian();
            ref[i] = 500 + 1.0e6 + rnd.nextGaussian();
            loop[i] = 500 + 1.0e6 * Math.pow(10, -(PREDICTED_DB + deviationDb[i]) / 10) + rnd.nextGaussian();
        }
        RawSpectrum d = RawSpectrum.ofNm(w, dark).withNoiseCounts(1);
        return OneCordThroughput.withDefaults().measure(new ThroughputScans(
                RawSpectrum.ofNm(w, loop).withNoiseCounts(1), d, RawSpectrum.ofNm(w, ref).withNoiseCounts(1), d),
                GRID);
    }

    private static double[] predicted() {
        double[] p = new double[GRID.size()];
        Arrays.fill(p, PREDICTED_DB);
        return p;
    }

    private static PathEvidence evidence(InspectionGrade j2Grade, double bendMm) {
        List<PathEvidence.JointEvidence> joints = List.of(
                new PathEvidence.JointEvidence("J1", InspectionGrade.CLEAN, true),
                new PathEvidence.JointEvidence("J2", j2Grade, true));
        List<PathEvidence.SegmentEvidence> segments = List.of(
                new PathEvidence.SegmentEvidence("C1", "LOH-200", 2, OhGrade.LOW_OH, OptionalDouble.empty(), 22),
                new PathEvidence.SegmentEvidence("C2", "LOH-200", 80, OhGrade.LOW_OH,
                        Double.isNaN(bendMm) ? OptionalDouble.empty() : OptionalDouble.of(bendMm), 22));
        return new PathEvidence(joints, segments, List.of("C2"), false, OptionalDouble.empty());
    }

    @Test
    void ohExcessIsMeasuredInPpmKilometres() {
        // Beer–Lambert in dB: the OH loss is (dB/km/ppm) × ppm × km, with the band strengths
        // AttenuationShapes carries (each names its source there)
        double ppmKm = 1.2;
        double[] dev = new double[GRID.size()];
        for (int i = 0; i < dev.length; i++) {
            dev[i] = ppmKm * AttenuationShapes.ohAbsorptionDbPerKmPerPpm(GRID.wavelengthNm(i));
        }
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(dev, 1), predicted(),
                evidence(InspectionGrade.CLEAN, Double.NaN));
        Finding f = d.first().orElseThrow();
        assertEquals(Cause.HIGH_OH_FIBER, f.cause());
        assertEquals(1240, f.atNm());
        assertEquals(ppmKm * AttenuationShapes.ohAbsorptionDbPerKmPerPpm(1240), f.amountDb(), 0.02);
    }

    @Test
    void flatExcessWithADirtyJointPutsTheConnectorFirst() {
        double[] dev = new double[GRID.size()];
        Arrays.fill(dev, 2.0);
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(dev, 2), predicted(),
                evidence(InspectionGrade.DIRTY, Double.NaN));
        Finding f = d.first().orElseThrow();
        assertEquals(List.of(Cause.DIRTY_CONNECTOR, Cause.TIGHT_BEND), f.candidates());
        assertEquals(2.0, f.amountDb(), 0.02);
        assertEquals("J2", f.checkFirst());
        assertTrue(f.text().startsWith("≈2.0 dB wavelength-flat excess; joint J2 was graded dirty"), f.text());
    }

    @Test
    void flatExcessWithARecordedTightBendPutsTheBendFirst() {
        // long-term minimum bend radius 200 × cladding radius: common practice
        double[] dev = new double[GRID.size()];
        Arrays.fill(dev, 1.5);
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(dev, 3), predicted(),
                evidence(InspectionGrade.CLEAN, 15));
        assertEquals(Cause.TIGHT_BEND, d.first().orElseThrow().cause());
        assertEquals("C2", d.first().orElseThrow().checkFirst());
    }

    @Test
    void flatExcessWithUninspectedJointsPutsCleaningFirst() {
        // common practice: inspect and clean before anything else, it is the quickest check
        double[] dev = new double[GRID.size()];
        Arrays.fill(dev, 1.5);
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(dev, 4), predicted(),
                evidence(InspectionGrade.NOT_INSPECTED, Double.NaN));
        assertEquals(Cause.DIRTY_CONNECTOR, d.first().orElseThrow().cause());
    }

    @Test
    void flatSignatureIsAlwaysNamedAsAmbiguousBetweenConnectorAndBend() {
        // Gloge, Appl. Opt. 11, 2506 (1972): for large cores the bend loss is nearly wavelength-flat
        double[] dev = new double[GRID.size()];
        Arrays.fill(dev, 1.5);
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(dev, 5), predicted(),
                evidence(InspectionGrade.CLEAN, Double.NaN));
        assertTrue(d.collinearNotes().stream().anyMatch(n -> n.contains("dirty connector and a tight bend")));
    }

    @Test
    void etalonFringesGiveTheGapWidth() {
        // Fabry–Pérot: fringe period Δν̃ = 1/(2·n·d) (Born & Wolf, Principles of Optics, §7.6)
        double gapUm = 30;
        double periodCm = 1.0 / (2 * gapUm * 1e-4);
        double[] dev = new double[GRID.size()];
        for (int i = 0; i < dev.length; i++) {
            double k = 1.0e7 / GRID.wavelengthNm(i);
            dev[i] = 0.4 * Math.cos(2 * Math.PI * k / periodCm);
        }
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(dev, 6), predicted(),
                evidence(InspectionGrade.CLEAN, Double.NaN));
        FringeReport f = d.fringes().orElseThrow();
        assertEquals(gapUm, f.gapUm(), 0.03 * gapUm);
        assertEquals(0.4, f.amplitudeDb(), 0.05);
    }

    @Test
    void noLightAnywhereIsABreak() {
        double[] dev = new double[GRID.size()];
        Arrays.fill(dev, 200);
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(dev, 7), predicted(),
                evidence(InspectionGrade.CLEAN, Double.NaN));
        assertEquals(Cause.BROKEN_FIBER, d.first().orElseThrow().cause());
        assertTrue(d.summary().contains("never look into a fiber end"));
    }

    @Test
    void pathAsPredictedHasNoFinding() {
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(new double[GRID.size()], 8), predicted(),
                evidence(InspectionGrade.CLEAN, Double.NaN));
        assertTrue(d.findings().isEmpty(), () -> d.findings().toString());
    }
}
