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

    /** Planck's law up to a constant, B ∝ λ⁻⁵/(e^(c₂/λT) − 1), c₂ = 14387.769 µm·K (Planck, Ann. Phys. 4, 553 (1901)). */
    private static double planck(double wavelengthNm, double temperatureK) {
        double um = wavelengthNm * 1e-3;
        return Math.pow(um, -5) / Math.expm1(14387.769 / (um * temperatureK));
    }

    @Test
    void aLampThatCooledIsLampDriftNotAFlatExcess() {
        // the loop scan sees the lamp at 2850 K, the reference saw it at 3000 K: the apparent extra
        // loss is 10·log10(B(λ, 3000 K)/B(λ, 2850 K)) by Planck's law, 1.1–1.9 dB, more at short λ
        double[] dev = new double[GRID.size()];
        for (int i = 0; i < dev.length; i++) {
            double w = GRID.wavelengthNm(i);
            dev[i] = 10 * Math.log10(planck(w, 3000) / planck(w, 2850));
        }
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(dev, 9), predicted(),
                evidence(InspectionGrade.CLEAN, Double.NaN));

        Finding f = d.first().orElseThrow();
        assertEquals(Cause.REFERENCE_DRIFT, f.cause(), f.text());
        assertTrue(d.findings().stream().noneMatch(x -> x.signature() == Signature.FLAT_EXCESS),
                () -> d.findings().toString());
        // the amount is the tilt across the range: dev(2200 nm) − dev(1000 nm) of the same law
        assertEquals(dev[dev.length - 1] - dev[0], f.amountDb(), 0.05 * Math.abs(dev[dev.length - 1] - dev[0]));
        assertTrue(f.text().contains("cooler"), f.text());
    }

    /** The deviation plus Gaussian scatter of {@code sigmaDb}, as a typical scan's noise shows in dB. */
    private static double[] withScatter(double[] deviationDb, double sigmaDb, long seed) {
        Random rnd = new Random(seed);
        double[] out = deviationDb.clone();
        for (int i = 0; i < out.length; i++) {
            out[i] += sigmaDb * rnd.nextGaussian();
        }
        return out;
    }

    @Test
    void aTenthOfADecibelRippleIsFoundWithItsGapAndTheDirtyAirGapJointFirst() {
        // Fabry–Pérot: fringe period Δν̃ = 1/(2·n·d) (Born & Wolf, Principles of Optics, §7.6); a 45 µm
        // air gap rings every 111 cm⁻¹. 0.1 dB peak to peak under 0.02 dB of scatter (the median noise
        // of the independent test model's scans; design choice)
        double gapUm = 45;
        double periodCm = 1.0 / (2 * gapUm * 1e-4);
        double[] dev = new double[GRID.size()];
        for (int i = 0; i < dev.length; i++) {
            dev[i] = 0.05 * Math.cos(2 * Math.PI * (1.0e7 / GRID.wavelengthNm(i)) / periodCm);
        }
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(withScatter(dev, 0.02, 10), 10), predicted(),
                evidence(InspectionGrade.DIRTY, Double.NaN));

        FringeReport f = d.fringes().orElseThrow();
        assertEquals(gapUm, f.gapUm(), 0.03 * gapUm);
        assertEquals(0.1, f.peakToPeakDb(), 0.02);
        Finding finding = d.findings().stream().filter(x -> x.cause() == Cause.AIR_GAP).findFirst().orElseThrow();
        assertEquals("J2", finding.checkFirst(), finding.text());
        // the plot draws the fitted ripple: its peak to peak over the grid is the reported one
        double[] ripple = d.fitted().stream().filter(x -> x.signature() == Signature.FRINGES).findFirst()
                .orElseThrow().lossDb();
        double max = Arrays.stream(ripple).max().orElseThrow();
        double min = Arrays.stream(ripple).min().orElseThrow();
        assertEquals(f.peakToPeakDb(), max - min, 0.01);
    }

    @Test
    void scatterAloneRaisesNoFringes() {
        // the same 0.02 dB scatter with no etalon: the search must stay silent (design choice: 10 seeds)
        for (long seed = 20; seed < 30; seed++) {
            Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(
                    measured(withScatter(new double[GRID.size()], 0.02, seed), seed), predicted(),
                    evidence(InspectionGrade.CLEAN, Double.NaN));
            assertTrue(d.fringes().isEmpty(), "seed " + seed + ": " + d.fringes());
        }
    }

    @Test
    void aDarkeningFindingSaysItRestsOnATermInTheSpanOfFlatAndDrift() {
        // over 1000–2200 nm the darkening tail is close to a level plus a 1/λ tilt: variance inflation
        // above 10 (Kutner et al., Applied Linear Statistical Models, 5th ed. 2005, §10.5)
        double[] dev = new double[GRID.size()];
        for (int i = 0; i < dev.length; i++) {
            dev[i] = 1.5 * AttenuationShapes.radiationDarkeningShape(GRID.wavelengthNm(i))
                    / AttenuationShapes.radiationDarkeningShape(1000);
        }
        Diagnosis d = DeviationDiagnoser.withDefaults().diagnose(measured(dev, 11), predicted(),
                evidence(InspectionGrade.CLEAN, Double.NaN));

        assertEquals(Cause.RADIATION_DARKENING, d.first().orElseThrow().cause());
        assertTrue(d.collinearNotes().stream().anyMatch(n -> n.startsWith("the darkening finding rests on a shape"
                + " largely in the span")), () -> d.collinearNotes().toString());
    }
}
