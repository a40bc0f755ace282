package org.strandbook.samplesite;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Random;

import org.strandbook.diagnosis.DeviationDiagnoser;
import org.strandbook.evaluation.PointBudgetBuilder;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.Wavenumber;
import org.strandbook.optics.attenuation.AttenuationShapes;
import org.strandbook.optics.bend.GlogeBend;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.optics.SellmeierMaterial;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.FiberType;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanKind;

/**
 * Makes the demo plant's scans from the physics model plus noise and the injected faults. Seeded:
 * the same seed gives the same scans, bit for bit.
 *
 * <p>How a scan comes about:
 * <ul>
 *   <li>Visits every 91 days for two years from commissioning, nine in all; at each visit every point
 *       gets a dark scan, a lamp reference through the short patch cord, and a loop scan.</li>
 *   <li>Lamp: a tungsten-halogen filament as a 2850 K Planck radiator times a smooth detector
 *       response (extended InGaAs for the NIR analyzer, silicon for the short-wave one), about
 *       30,000 counts at its peak. Dark: an offset of ~800 counts with 4 counts of read noise; signal
 *       shot noise of 10 photo-electrons per count.</li>
 *   <li>Loop: the reference's lamp light times the true loop transmittance, where the true loop is the
 *       recorded one with each joint re-mated at every visit (±0.05 dB) and the fault applied; the lamp
 *       also drifts a little between reference and loop (a tilt of ±0.02 dB).</li>
 *   <li>Faults, with seed-drawn sizes: a dirty junction-box joint (+1.5 to 3 dB), at one point until the
 *       recorded cleaning, after which it is gone; a crushed trunk
 *       (a Gloge bend of 38–48 mm on a 400 µm core, not in the records); a high-OH patch cord in place
 *       of a low-OH one (500–1000 ppm); hydrogen darkening growing linearly to 1.5–3 dB at 1240 nm over
 *       two years; a return trunk that breaks at visit 5, 6 or 7.</li>
 * </ul>
 * All names and numbers are invented for the demonstration.
 */
public final class ScanGenerator {

    /** The demo's own seed; tests use others. */
    public static final long DEMO_SEED = 20_241_104L;
    public static final Instant COMMISSIONING = Instant.parse("2024-11-04T08:00:00Z");
    public static final Duration VISIT_INTERVAL = Duration.ofDays(91);
    public static final int VISITS = 9;

    private static final double LAMP_TEMPERATURE_K = 2850;
    private static final double PEAK_COUNTS = 30_000;
    private static final double DARK_OFFSET_COUNTS = 800;
    private static final double READ_NOISE_COUNTS = 4;
    private static final double ELECTRONS_PER_COUNT = 10;
    private static final String[] OPERATORS = {"I. Marsh", "T. Okonjo", "R. Valdés", "K. Lindqvist"};

    private final DemoPlant plant;
    private final long seed;
    private final int visits;
    private final Catalog catalog;
    private final Map<String, InjectedFault> injected = new HashMap<>();

    public ScanGenerator(DemoPlant plant, long seed) {
        this(plant, seed, VISITS);
    }

    /** A generator with another number of visits (the benchmark's long histories). */
    public ScanGenerator(DemoPlant plant, long seed, int visits) {
        if (visits < 1) {
            throw new IllegalArgumentException("visits must be 1 or more, was " + visits);
        }
        this.plant = plant;
        this.seed = seed;
        this.visits = visits;
        this.catalog = Catalog.of(plant.fiberTypes(), plant.connectorTypes(), plant.probeTypes());
    }

    /** The scan axis of an analyzer: 4 cm⁻¹ steps for the Fourier-transform one, 0.5 nm for the diode array. */
    public static WavelengthGrid axisOf(Analyzer analyzer) {
        if (analyzer.detector() == org.strandbook.site.DetectorType.SILICON) {
            int n = (int) Math.round((analyzer.maxNm() - analyzer.minNm()) / 0.5) + 1;
            return WavelengthGrid.uniformNm(analyzer.minNm(), analyzer.maxNm(), n);
        }
        double hi = Wavenumber.wavenumberCmFromNm(analyzer.minNm());
        double lo = Wavenumber.wavenumberCmFromNm(analyzer.maxNm());
        int n = (int) Math.round((hi - lo) / 4.0) + 1;
        return WavelengthGrid.uniformWavenumberCm(lo, hi, n);
    }

    /** Every scan of every point, visit by visit. */
    public List<GeneratedScan> generate() {
        List<GeneratedScan> out = new ArrayList<>();
        List<DemoPlant.DemoPoint> points = plant.points();
        for (int p = 0; p < points.size(); p++) {
            out.addAll(generate(points.get(p), p));
        }
        return out;
    }

    /** What was injected at each point, keyed by tag; filled by {@link #generate()}. */
    public Map<String, InjectedFault> injected() {
        return Map.copyOf(injected);
    }

    private List<GeneratedScan> generate(DemoPlant.DemoPoint dp, int index) {
        MeasurementPoint point = dp.point();
        Analyzer analyzer = plant.analyzers().stream().filter(a -> a.tag().equals(point.analyzerTag()))
                .findFirst().orElseThrow();
        Random rnd = new Random(seed * 1_000_003L + index);
        WavelengthGrid axis = axisOf(analyzer);
        OpticsCache cache = new OpticsCache(axis);
        double[] lamp = lampCounts(axis, analyzer);

        double drawnDirtyDb = 1.5 + 1.5 * rnd.nextDouble();
        double dirtyDb = Double.isNaN(dp.faultSizeDb()) ? drawnDirtyDb : dp.faultSizeDb();
        double bendRadiusMm = 38 + 10 * rnd.nextDouble();
        double highOhPpm = 500 + 500 * rnd.nextDouble();
        double hydrogenFinalDb = 1.5 + 1.5 * rnd.nextDouble();
        int breakVisit = 5 + rnd.nextInt(3);

        List<GeneratedScan> out = new ArrayList<>();
        double[] lastFaultDb = null;
        for (int v = 0; v < visits; v++) {
            Instant t0 = COMMISSIONING.plus(VISIT_INTERVAL.multipliedBy(v)).plus(Duration.ofMinutes(40L * index));
            String operator = OPERATORS[(v + index) % OPERATORS.length];
            double integrationMs = analyzer.detector() == org.strandbook.site.DetectorType.SILICON ? 20 : 50;
            double yearFraction = Duration.between(COMMISSIONING, t0).toHours() / (24 * 365.25);

            String stillDirty = dp.cleaning().filter(c -> t0.isBefore(c.cleanedAt()))
                    .map(DemoPlant.JointCleaning::jointLabel).orElse("");
            PathLeg send = truthLeg(dp, dp.send(), rnd, dirtyDb, bendRadiusMm, stillDirty);
            PathLeg ret = truthLeg(dp, dp.ret(), rnd, dirtyDb, bendRadiusMm, stillDirty);
            Catalog truthCatalog = dp.fault() == DemoPlant.Fault.HIGH_OH_FIBER ? withHighOh(highOhPpm) : catalog;
            double[] lossDb = new PointBudgetBuilder(truthCatalog).build(point, send, ret, cache).totalLossDb();
            double[] faultDb = new double[axis.size()];
            if (dp.fault() == DemoPlant.Fault.HYDROGEN_DARKENING) {
                double scale = hydrogenFinalDb * yearFraction / (VISIT_INTERVAL.toDays() * (VISITS - 1) / 365.25)
                        / AttenuationShapes.hydrogenBandShape(1240, DeviationDiagnoser.HYDROGEN_2420_RELATIVE);
                for (int i = 0; i < faultDb.length; i++) {
                    faultDb[i] = scale * AttenuationShapes.hydrogenBandShape(axis.wavelengthNm(i),
                            DeviationDiagnoser.HYDROGEN_2420_RELATIVE);
                }
            }
            lastFaultDb = faultDb;
            boolean broken = dp.fault() == DemoPlant.Fault.BROKEN_FIBER && v >= breakVisit;
            double tilt = 0.02 * rnd.nextGaussian();

            double[] darkBase = darkBase(axis);
            out.add(scan(dp, analyzer, ScanKind.DARK, t0, operator, integrationMs, axis, noisy(darkBase, rnd)));
            double[] ref = new double[axis.size()];
            for (int i = 0; i < ref.length; i++) {
                ref[i] = darkBase[i] + lamp[i];
            }
            out.add(scan(dp, analyzer, ScanKind.REFERENCE, t0.plusSeconds(300), operator, integrationMs, axis,
                    noisy(ref, rnd)));
            double[] loop = new double[axis.size()];
            double mid = 0.5 * (axis.firstNm() + axis.lastNm());
            double span = axis.lastNm() - axis.firstNm();
            for (int i = 0; i < loop.length; i++) {
                double drift = tilt * (axis.wavelengthNm(i) - mid) / span;
                double t = broken ? 0 : Math.pow(10, -(lossDb[i] + faultDb[i] + drift) / 10);
                loop[i] = darkBase[i] + lamp[i] * t;
            }
            out.add(scan(dp, analyzer, ScanKind.LOOP, t0.plusSeconds(600), operator, integrationMs, axis,
                    noisy(loop, rnd)));
        }
        injected.put(dp.point().tag(), describe(dp, dirtyDb, bendRadiusMm, highOhPpm, lastFaultDb, axis));
        return out;
    }

    private InjectedFault describe(DemoPlant.DemoPoint dp, double dirtyDb, double bendRadiusMm, double highOhPpm,
                                   double[] lastFaultDb, WavelengthGrid axis) {
        return switch (dp.fault()) {
            case NONE -> new InjectedFault(DemoPlant.Fault.NONE, "", dp.jointExcessDb() * (dp.send().joints().size() + dp.ret().joints().size()), Double.NaN);
            case DIRTY_CONNECTOR -> new InjectedFault(dp.fault(), dp.faultyElement(), dirtyDb, Double.NaN);
            case TIGHT_BEND -> {
                FiberType f = catalog.fiber(trunkFiber(dp));
                double db = GlogeBend.lossPerBend(f.coreUm(), f.na(),
                        SellmeierMaterial.FUSED_SILICA.refractiveIndex(1500), bendRadiusMm, 1500).lossDb();
                yield new InjectedFault(dp.fault(), dp.faultyElement(), db, Double.NaN);
            }
            case HIGH_OH_FIBER -> {
                CableSegment cord = (CableSegment) dp.send().elements().get(0);
                double excessPpm = highOhPpm - catalog.fiber(cord.fiberTypeCode()).ohPpm();
                double db = AttenuationShapes.ohAbsorptionDbPerKmPerPpm(1240) * excessPpm * cord.lengthM() * 1e-3;
                yield new InjectedFault(dp.fault(), dp.faultyElement(), db, 1240);
            }
            case HYDROGEN_DARKENING -> new InjectedFault(dp.fault(), dp.faultyElement(),
                    axis.interpolate(lastFaultDb, 1240), 1240);
            case BROKEN_FIBER -> new InjectedFault(dp.fault(), dp.faultyElement(), Double.POSITIVE_INFINITY,
                    Double.NaN);
        };
    }

    private static String trunkFiber(DemoPlant.DemoPoint dp) {
        return dp.ret().segments().get(1).fiberTypeCode();
    }

    /**
     * The leg as it really is at one visit: re-mated joints, the fault where it sits, and the
     * dirty-connector excess at a joint not yet cleaned ({@code stillDirty}, empty when none).
     */
    private PathLeg truthLeg(DemoPlant.DemoPoint dp, PathLeg recorded, Random rnd, double dirtyDb,
                             double bendRadiusMm, String stillDirty) {
        List<PathElement> out = new ArrayList<>();
        for (PathElement e : recorded.elements()) {
            if (e instanceof Joint j) {
                // a joint measured at commissioning truly loses what was measured, else its type's typical loss
                double asRecorded = j.lossDb().orElse(catalog.connector(j.connectorTypeA()).typicalLossDb());
                double loss = Math.max(0, asRecorded + dp.jointExcessDb() + 0.05 * rnd.nextGaussian());
                boolean dirty = dp.fault() == DemoPlant.Fault.DIRTY_CONNECTOR && j.label().equals(dp.faultyElement());
                if (dirty || j.label().equals(stillDirty)) {
                    loss += dirtyDb;
                }
                out.add(new Joint(j.label(), j.connectorTypeA(), j.connectorTypeB(), j.grade(),
                        OptionalDouble.of(loss), LossBasis.MEASURED));
            } else if (e instanceof CableSegment s) {
                boolean spoiled = s.label().equals(dp.faultyElement());
                if (spoiled && dp.fault() == DemoPlant.Fault.TIGHT_BEND) {
                    out.add(new CableSegment(s.label(), s.fiberTypeCode(), s.lengthM(),
                            List.of(new Bend(bendRadiusMm, 1))));
                } else if (spoiled && dp.fault() == DemoPlant.Fault.HIGH_OH_FIBER) {
                    out.add(new CableSegment(s.label(), HIGH_OH_TRUTH, s.lengthM(), s.bends()));
                } else {
                    out.add(s);
                }
            }
        }
        return new PathLeg(recorded.pointTag(), recorded.direction(), out);
    }

    private static final String HIGH_OH_TRUTH = "HOH-TRUTH";

    private Catalog withHighOh(double ppm) {
        List<FiberType> fibers = new ArrayList<>(plant.fiberTypes());
        FiberType hoh = catalog.fiber("HOH-200");
        fibers.add(new FiberType(HIGH_OH_TRUTH, hoh.description(), hoh.coreUm(), hoh.claddingUm(), hoh.bufferUm(),
                hoh.na(), hoh.coreMaterial(), hoh.ohGrade(), ppm, hoh.datasheet()));
        return Catalog.of(fibers, plant.connectorTypes(), plant.probeTypes());
    }

    private static GeneratedScan scan(DemoPlant.DemoPoint dp, Analyzer analyzer, ScanKind kind, Instant t,
                                      String operator, double integrationMs, WavelengthGrid axis, double[] counts) {
        return new GeneratedScan(dp.point().tag(), analyzer.tag(), kind, t, operator, integrationMs,
                axis.wavelengthsNm(), counts);
    }

    private static double[] darkBase(WavelengthGrid axis) {
        double[] d = new double[axis.size()];
        for (int i = 0; i < d.length; i++) {
            d[i] = DARK_OFFSET_COUNTS + 20 * (axis.wavelengthNm(i) - axis.firstNm()) / (axis.lastNm() - axis.firstNm());
        }
        return d;
    }

    private static double[] noisy(double[] mean, Random rnd) {
        double[] out = new double[mean.length];
        for (int i = 0; i < out.length; i++) {
            double signal = Math.max(0, mean[i] - DARK_OFFSET_COUNTS);
            double sigma = Math.sqrt(READ_NOISE_COUNTS * READ_NOISE_COUNTS + signal / ELECTRONS_PER_COUNT);
            out[i] = mean[i] + sigma * rnd.nextGaussian();
        }
        return out;
    }

    /** Lamp counts through the reference patch cord: a Planck radiator times the detector response. */
    static double[] lampCounts(WavelengthGrid axis, Analyzer analyzer) {
        double[] c = new double[axis.size()];
        double max = 0;
        for (int i = 0; i < c.length; i++) {
            double w = axis.wavelengthNm(i);
            c[i] = planck(w) * response(w, analyzer);
            max = Math.max(max, c[i]);
        }
        for (int i = 0; i < c.length; i++) {
            c[i] *= PEAK_COUNTS / max;
        }
        return c;
    }

    private static double planck(double wavelengthNm) {
        double um = wavelengthNm * 1e-3;
        // second radiation constant c2 = 14387.77 µm·K (CODATA)
        return 1.0 / (Math.pow(um, 5) * (Math.exp(14387.77 / (um * LAMP_TEMPERATURE_K)) - 1));
    }

    private static double response(double wavelengthNm, Analyzer analyzer) {
        if (analyzer.detector() == org.strandbook.site.DetectorType.SILICON) {
            double x = (wavelengthNm - 850) / 220;
            return Math.exp(-x * x);
        }
        double x = (wavelengthNm - 1750) / 700;
        return 0.25 + 0.75 * Math.exp(-x * x);
    }
}
