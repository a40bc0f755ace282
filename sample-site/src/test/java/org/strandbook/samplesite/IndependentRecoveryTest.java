package org.strandbook.samplesite;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.strandbook.diagnosis.Cause;
import org.strandbook.diagnosis.Finding;
import org.strandbook.evaluation.PointBudgetBuilder;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.evaluation.PointInputs;
import org.strandbook.evaluation.Status;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.DetectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.ScanKind;

/**
 * The diagnosis on light it did not make: raw dark, reference and loop counts from {@link
 * IndependentLoopModel} (a Planck lamp times a detector response, published band forms, Gloge bends,
 * Airy fringes, shot and read noise, integration time, 16-bit clipping, wavelength offsets) go
 * through the real evaluation path (pairing, throughput, acceptance, diagnosis) over many seeds.
 *
 * <p>The healthy path's loss is taken from the recorded path's predicted budget: what is tested here
 * is whether the deviation from a correct prediction is read right; the prediction's physics is
 * checked against published values in core. Fault sizes are drawn per seed in ranges a technician
 * meets (design choice), each large enough to matter (≥ 0.5 dB where the fault shows most).
 *
 * <p>Done-when of the recovery table (design choice, from the issue): the right first cause in
 * ≥ 95 % of seeds per class, and ≥ 95 % of healthy points without a false finding.
 */
class IndependentRecoveryTest {

    private static final int SEEDS = Integer.getInteger("seeds", 40);
    private static final double REQUIRED_SHARE = 0.95;

    /** The situations tried, each on a demo point whose records suit it. */
    enum Case {
        HEALTHY(null),
        DIRTY_CONNECTOR(Cause.DIRTY_CONNECTOR),
        TIGHT_BEND(Cause.TIGHT_BEND),
        HIGH_OH_CORD(Cause.HIGH_OH_FIBER),
        HYDROGEN(Cause.HYDROGEN_DARKENING),
        DARKENING(Cause.RADIATION_DARKENING),
        BROKEN_FIBER(Cause.BROKEN_FIBER),
        AIR_GAP_FRINGES(Cause.AIR_GAP),
        LAMP_DRIFT(Cause.REFERENCE_DRIFT),
        WAVELENGTH_OFFSET(null),
        DIRTY_PLUS_HYDROGEN(Cause.DIRTY_CONNECTOR),
        LONG_INTEGRATION(null),
        LONG_INTEGRATION_DIRTY(Cause.DIRTY_CONNECTOR),
        SATURATED_REFERENCE(null);

        final Cause expected;

        Case(Cause expected) {
            this.expected = expected;
        }
    }

    private static final Map<Case, Integer> RIGHT = new EnumMap<>(Case.class);
    private static final Map<Case, List<String>> MISSES = new EnumMap<>(Case.class);
    private static final Map<Case, Integer> IN_SPAN_NOTES = new EnumMap<>(Case.class);
    private static final Map<Case, Integer> EXTRA_FINDINGS = new EnumMap<>(Case.class);
    private static final Map<Case, java.util.Set<Cause>> EXTRA_CAUSES = new EnumMap<>(Case.class);
    /** Loops the independent model keeps healthy, and the one fault no rule may pass. */
    private static final java.util.Set<Case> JUDGED_ON_INTERVAL = java.util.EnumSet.of(Case.HEALTHY,
            Case.WAVELENGTH_OFFSET, Case.LONG_INTEGRATION, Case.BROKEN_FIBER);
    private static final Map<Case, Integer> INTERVAL_PASSES = new EnumMap<>(Case.class);

    @BeforeAll
    static void runEverySeed() {
        DemoPlant plant = new DemoPlant();
        Catalog catalog = Catalog.of(plant.fiberTypes(), plant.connectorTypes(), plant.probeTypes());
        PointEvaluator evaluator = PointEvaluator.withDefaults();
        Map<String, OpticsCache> caches = new LinkedHashMap<>();
        for (Case c : Case.values()) {
            int right = 0;
            for (int seed = 1; seed <= SEEDS; seed++) {
                Random rnd = new Random(seed * 7919L + c.ordinal());
                DemoPlant.DemoPoint host = host(plant, c, seed);
                Analyzer analyzer = plant.analyzers().stream()
                        .filter(a -> a.tag().equals(host.point().analyzerTag())).findFirst().orElseThrow();
                WavelengthGrid axis = ScanGenerator.axisOf(analyzer);
                OpticsCache cache = caches.computeIfAbsent(analyzer.tag(), t -> new OpticsCache(axis));
                double[] healthyDb = new PointBudgetBuilder(catalog).build(host.point(), host.send(), host.ret(), cache)
                        .totalLossDb();
                Situation s = situation(c, host, catalog, axis, rnd);
                List<GeneratedScan> scans = scans(host, analyzer, axis, healthyDb, s, rnd);
                InMemoryScans stored = new InMemoryScans(scans);
                PointInputs in = stored.inputs(plant).stream()
                        .filter(p -> p.point().tag().equals(host.point().tag())).findFirst().orElseThrow();
                PointEvaluation e = evaluator.evaluate(in);
                if (JUDGED_ON_INTERVAL.contains(c)
                        && evaluator.evaluate(in, DecisionRule.interval()).status() == Status.PASS) {
                    INTERVAL_PASSES.merge(c, 1, Integer::sum);
                }
                if (e.diagnosis().map(d -> d.collinearNotes().stream().anyMatch(n -> n.contains("span"))).orElse(false)) {
                    IN_SPAN_NOTES.merge(c, 1, Integer::sum);
                }
                if (e.diagnosis().map(d -> d.findings().stream()
                        .anyMatch(f -> f.cause() != c.expected && f.cause() != s.second)).orElse(false)) {
                    EXTRA_FINDINGS.merge(c, 1, Integer::sum);
                    e.diagnosis().orElseThrow().findings().stream()
                            .filter(f -> f.cause() != c.expected && f.cause() != s.second)
                            .forEach(f -> EXTRA_CAUSES.computeIfAbsent(c, k -> java.util.EnumSet.noneOf(Cause.class))
                                    .add(f.cause()));
                }
                String miss = judge(c, e, s);
                if (miss == null) {
                    right++;
                } else {
                    MISSES.computeIfAbsent(c, k -> new ArrayList<>()).add("seed " + seed + " " + host.point().tag()
                            + " (" + s.truth + "): " + miss);
                }
            }
            RIGHT.put(c, right);
            System.out.printf("recovery %-24s %2d/%d right first cause, %2d with a further finding, %2d with a finding"
                            + " resting on a term in the others' span%n",
                    c, right, SEEDS, EXTRA_FINDINGS.getOrDefault(c, 0), IN_SPAN_NOTES.getOrDefault(c, 0));
            if (EXTRA_CAUSES.containsKey(c)) {
                System.out.println("recovery   further findings: " + EXTRA_CAUSES.get(c));
            }
            MISSES.getOrDefault(c, List.of()).stream().limit(3).forEach(m -> System.out.println("recovery   miss " + m));
        }
    }

    @ParameterizedTest
    @EnumSource(Case.class)
    void rightFirstCauseInNineteenSeedsOfTwenty(Case c) {
        assertTrue(RIGHT.get(c) >= REQUIRED_SHARE * SEEDS,
                () -> c + ": " + RIGHT.get(c) + "/" + SEEDS + "; " + MISSES.getOrDefault(c, List.of()));
    }

    @ParameterizedTest
    @EnumSource(value = Case.class, names = {"HEALTHY", "WAVELENGTH_OFFSET", "LONG_INTEGRATION"})
    void theCoverageIntervalRulePassesHealthyLoopsItDidNotModel(Case c) {
        // the interval rule on spectra from the independent forward model (not the prediction's own
        // shapes): a healthy loop stays inside its widened interval in 19 seeds of 20 (design choice,
        // the same share as the recovery table)
        int passes = INTERVAL_PASSES.getOrDefault(c, 0);
        assertTrue(passes >= REQUIRED_SHARE * SEEDS, c + ": " + passes + "/" + SEEDS + " pass on the interval");
    }

    @org.junit.jupiter.api.Test
    void theCoverageIntervalRulePassesNoBrokenFiber() {
        // design choice: no light is FAIL under either rule, whatever the prediction's interval
        assertTrue(INTERVAL_PASSES.getOrDefault(Case.BROKEN_FIBER, 0) == 0,
                INTERVAL_PASSES.get(Case.BROKEN_FIBER) + " broken-fiber seeds passed on the interval");
    }

    /** What one seed does to the host point's light, in dB on the scan axis and in how it is scanned. */
    private record Situation(String truth, double[] faultDb, boolean broken, double loopLampDeltaK,
                             double loopOffsetNm, double referenceIntegrationMs, double loopIntegrationMs,
                             double referencePeakCounts, Cause second, double gapUm) {
    }

    private static DemoPlant.DemoPoint host(DemoPlant plant, Case c, int seed) {
        String tag = switch (c) {
            case HEALTHY -> List.of("AT-4101", "AT-4104", "AT-4107", "AT-4201").get(seed % 4);
            case DIRTY_CONNECTOR, DIRTY_PLUS_HYDROGEN, LONG_INTEGRATION_DIRTY -> "AT-4102";
            case TIGHT_BEND -> "AT-4103";
            case HIGH_OH_CORD -> "AT-4106";
            case HYDROGEN -> "AT-4105";
            case DARKENING -> "AT-4201";
            case BROKEN_FIBER -> "AT-4108";
            case AIR_GAP_FRINGES -> List.of("AT-4101", "AT-4107").get(seed % 2);
            case LAMP_DRIFT -> "AT-4202";
            case WAVELENGTH_OFFSET -> List.of("AT-4104", "AT-4107").get(seed % 2);
            case LONG_INTEGRATION -> "AT-4107";
            case SATURATED_REFERENCE -> "AT-4101";
        };
        return plant.points().stream().filter(p -> p.point().tag().equals(tag)).findFirst().orElseThrow();
    }

    private static Situation situation(Case c, DemoPlant.DemoPoint host, Catalog catalog, WavelengthGrid axis,
                                       Random rnd) {
        double[] fault = new double[axis.size()];
        double refMs = 20;
        double loopMs = 20;
        double refPeak = 30_000 + 25_000 * rnd.nextDouble();
        double lampDeltaK = 0;
        double offsetNm = 0;
        boolean broken = false;
        Cause second = null;
        double gap = Double.NaN;
        String truth;
        switch (c) {
            case HEALTHY, WAVELENGTH_OFFSET -> {
                if (c == Case.WAVELENGTH_OFFSET) {
                    offsetNm = (rnd.nextBoolean() ? 1 : -1) * (1 + rnd.nextDouble());
                }
                truth = offsetNm == 0 ? "healthy" : String.format("healthy, loop axis off by %+.1f nm", offsetNm);
            }
            case DIRTY_CONNECTOR, LONG_INTEGRATION_DIRTY -> {
                double db = 1 + 2 * rnd.nextDouble();
                add(fault, axis, w -> db);
                truth = String.format("dirty J2 +%.2f dB", db);
                if (c == Case.LONG_INTEGRATION_DIRTY) {
                    loopMs = 4 * refMs;
                    refPeak = 12_000 + 4_000 * rnd.nextDouble();
                }
            }
            case TIGHT_BEND -> {
                FiberType f = catalog.fiber(host.ret().segments().get(1).fiberTypeCode());
                double radiusMm = 40 + 25 * rnd.nextDouble();
                add(fault, axis, w -> IndependentLoopModel.glogeBendLossDb(w, f.coreUm(), f.na(), radiusMm));
                truth = String.format("crush of %.0f mm radius on the return trunk", radiusMm);
            }
            case HIGH_OH_CORD -> {
                double ppm = 100 + 400 * rnd.nextDouble();
                double ppmKm = ppm * host.send().segments().get(0).lengthM() * 1e-3;
                add(fault, axis, w -> IndependentLoopModel.ohLossDb(w, ppmKm));
                truth = String.format("send patch cord with %.0f ppm OH", ppm);
            }
            case HYDROGEN -> {
                double db = 0.6 + 2 * rnd.nextDouble();
                double ratio = 2 + 8 * rnd.nextDouble();
                add(fault, axis, w -> IndependentLoopModel.hydrogenLossDb(w, db, ratio));
                truth = String.format("hydrogen %.2f dB at 1240 nm, 2420/1240 ratio %.1f", db, ratio);
            }
            case DIRTY_PLUS_HYDROGEN -> {
                double dirty = 1.5 + 1.5 * rnd.nextDouble();
                double h2 = 0.6 + 0.6 * rnd.nextDouble();
                double ratio = 2 + 8 * rnd.nextDouble();
                add(fault, axis, w -> dirty + IndependentLoopModel.hydrogenLossDb(w, h2, ratio));
                truth = String.format("dirty J2 +%.2f dB and hydrogen %.2f dB at 1240 nm", dirty, h2);
                second = Cause.HYDROGEN_DARKENING;
            }
            case DARKENING -> {
                double db = 1 + 3 * rnd.nextDouble();
                double urbach = 0.25 + 0.3 * rnd.nextDouble();
                double band = 0.5 * rnd.nextDouble();
                add(fault, axis, w -> IndependentLoopModel.darkeningLossDb(w, db, urbach, band));
                truth = String.format("darkening %.2f dB at 600 nm, Urbach %.2f eV", db, urbach);
            }
            case BROKEN_FIBER -> {
                broken = true;
                truth = "return trunk broken";
            }
            case AIR_GAP_FRINGES -> {
                double gapUm = 15 + 65 * rnd.nextDouble();
                gap = gapUm;
                double peakToPeakDb = 0.1 + 0.2 * rnd.nextDouble();
                double visibility = peakToPeakDb / IndependentLoopModel.airyPeakToPeakDb(1.0);
                add(fault, axis, w -> IndependentLoopModel.airyGapLossDb(w, gapUm, visibility));
                truth = String.format("air gap %.1f µm, ripple ≈%.2f dB peak to peak", gapUm, peakToPeakDb);
            }
            case LAMP_DRIFT -> {
                lampDeltaK = (rnd.nextBoolean() ? 1 : -1) * (50 + 250 * rnd.nextDouble());
                truth = String.format("lamp %+.0f K between reference and loop", lampDeltaK);
            }
            case LONG_INTEGRATION -> {
                loopMs = 4 * refMs;
                refPeak = 12_000 + 4_000 * rnd.nextDouble();
                truth = "healthy, loop at 4× the reference's integration";
            }
            case SATURATED_REFERENCE -> {
                refPeak = 80_000 + 40_000 * rnd.nextDouble();
                truth = String.format("healthy, reference peak %.0f counts clipped at full scale", refPeak);
            }
            default -> throw new IllegalStateException(c.toString());
        }
        return new Situation(truth, fault, broken, lampDeltaK, offsetNm, refMs, loopMs, refPeak, second, gap);
    }

    private static void add(double[] faultDb, WavelengthGrid axis, DoubleUnaryOperator db) {
        for (int i = 0; i < faultDb.length; i++) {
            faultDb[i] += db.applyAsDouble(axis.wavelengthNm(i));
        }
    }

    /** One visit: a dark per integration time, the reference through the patch cord, the loop. */
    private static List<GeneratedScan> scans(DemoPlant.DemoPoint host, Analyzer analyzer, WavelengthGrid axis,
                                             double[] healthyDb, Situation s, Random rnd) {
        double lampK = 2800 + 300 * rnd.nextDouble();
        boolean silicon = analyzer.detector() == DetectorType.SILICON;
        DoubleUnaryOperator response = silicon ? IndependentLoopModel::siliconResponse
                : IndependentLoopModel::extendedIngaasResponse;
        double[] nm = axis.wavelengthsNm();
        double peak = 0;
        for (double w : nm) {
            peak = Math.max(peak, IndependentLoopModel.planck(w, lampK) * response.applyAsDouble(w));
        }
        double countsPerMs = s.referencePeakCounts / peak / s.referenceIntegrationMs;
        double[] loss = new double[nm.length];
        for (int i = 0; i < nm.length; i++) {
            loss[i] = healthyDb[i] + s.faultDb[i];
        }
        double[] ref = new double[nm.length];
        double[] loop = new double[nm.length];
        for (int i = 0; i < nm.length; i++) {
            double w = nm[i];
            ref[i] = countsPerMs * s.referenceIntegrationMs * IndependentLoopModel.planck(w, lampK)
                    * response.applyAsDouble(w);
            // the loop scan's axis is off by loopOffsetNm: its pixel i saw light of w + offset
            double seen = w + s.loopOffsetNm;
            double lossSeen = axis.interpolate(loss, Math.max(axis.firstNm(), Math.min(axis.lastNm(), seen)));
            loop[i] = s.broken ? 0 : countsPerMs * s.loopIntegrationMs
                    * IndependentLoopModel.planck(seen, lampK + s.loopLampDeltaK) * response.applyAsDouble(seen)
                    * Math.pow(10, -lossSeen / 10);
        }
        Instant t0 = Instant.parse("2026-06-01T08:00:00Z");
        String tag = host.point().tag();
        List<GeneratedScan> out = new ArrayList<>();
        out.add(scan(tag, analyzer, ScanKind.DARK, t0, s.referenceIntegrationMs, nm, record(new double[nm.length], rnd)));
        out.add(scan(tag, analyzer, ScanKind.REFERENCE, t0.plusSeconds(120), s.referenceIntegrationMs, nm,
                record(ref, rnd)));
        if (s.loopIntegrationMs != s.referenceIntegrationMs) {
            out.add(scan(tag, analyzer, ScanKind.DARK, t0.plusSeconds(400), s.loopIntegrationMs, nm,
                    record(new double[nm.length], rnd)));
        }
        out.add(scan(tag, analyzer, ScanKind.LOOP, t0.plusSeconds(600), s.loopIntegrationMs, nm, record(loop, rnd)));
        return out;
    }

    /** What the converter records of a light signal in counts: offset, shot and read noise, 16-bit integers. */
    private static double[] record(double[] signal, Random rnd) {
        double[] out = new double[signal.length];
        for (int i = 0; i < out.length; i++) {
            double sigma = Math.sqrt(IndependentLoopModel.READ_NOISE_COUNTS * IndependentLoopModel.READ_NOISE_COUNTS
                    + signal[i] / IndependentLoopModel.ELECTRONS_PER_COUNT);
            double v = IndependentLoopModel.DARK_OFFSET_COUNTS + signal[i] + sigma * rnd.nextGaussian();
            out[i] = Math.max(0, Math.min(IndependentLoopModel.FULL_SCALE_COUNTS, Math.rint(v)));
        }
        return out;
    }

    private static GeneratedScan scan(String tag, Analyzer analyzer, ScanKind kind, Instant t, double integrationMs,
                                      double[] nm, double[] counts) {
        return new GeneratedScan(tag, analyzer.tag(), kind, t, "test", integrationMs, nm, counts);
    }

    /** null when the evaluation read the situation right, else what it got wrong. */
    private static String judge(Case c, PointEvaluation e, Situation s) {
        Optional<org.strandbook.diagnosis.Diagnosis> d = e.diagnosis();
        if (d.isEmpty()) {
            return "no diagnosis: " + e.problems();
        }
        List<Finding> findings = d.get().findings();
        if (c.expected == null) {
            if (!findings.isEmpty()) {
                return "false finding: " + findings.get(0).text();
            }
            String reason = e.worstBand().map(v -> v.reason()).orElse("");
            // a clipped reference may only be refused, with its reason (issue 10 item 3), never misjudged
            boolean refusedForClipping = c == Case.SATURATED_REFERENCE && e.status() == Status.REVIEW
                    && reason.contains("saturated");
            return e.status() == Status.PASS || refusedForClipping ? null : "judged " + e.status() + ": " + reason;
        }
        if (findings.isEmpty()) {
            return "nothing found (residual " + String.format("%.2f", d.get().residualRmsDb()) + " dB RMS)";
        }
        if (findings.get(0).cause() != c.expected) {
            return "first cause " + findings.get(0).cause() + " (" + findings.get(0).text() + ")";
        }
        if (s.second != null && findings.stream().noneMatch(f -> f.cause() == s.second)) {
            return "second fault " + s.second + " not found";
        }
        // Fabry–Pérot: the period Δν̃ = 1/(2·n·d) gives the gap (Born & Wolf, Principles of Optics, §7.6);
        // 5 % is a design choice, a few sample steps of the period over the range
        if (!Double.isNaN(s.gapUm)) {
            double found = d.get().fringes().orElseThrow().gapUm();
            if (Math.abs(found - s.gapUm) > 0.05 * s.gapUm) {
                return String.format("gap %.1f µm, true %.1f µm", found, s.gapUm);
            }
        }
        return null;
    }
}
