package org.strandbook.app.bench;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.strandbook.evaluation.EvaluationGrid;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.evaluation.PointInputs;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.samplesite.DemoPlant;
import org.strandbook.samplesite.InMemoryScans;
import org.strandbook.samplesite.ScanGenerator;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Spectrum;
import org.strandbook.site.WavelengthBand;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook bench evaluate}: whole-point evaluations per second (prediction, pairing,
 * throughput of every loop scan, acceptance, diagnosis, trend and forecast) on one thread, against
 * the floor of the budget and deviation arithmetic alone: for every loop scan, the dark-corrected
 * loss ratio on spectra already on the grid, its deviation from a precomputed prediction and the
 * band means.
 */
@Command(name = "evaluate",
        mixinStandardHelpOptions = true,
        description = "Points evaluated per second (diagnosis and trend included) for a synthetic site of N "
            + "points with M visits each, against the bare budget and deviation arithmetic (with --uncertainty: "
            + "on the coverage interval against the fixed tolerance); last line 'ratio: R'.")
public final class EvaluateBenchCommand implements Callable<Integer> {

    private static final int TRIALS = 3;

    @Spec
    CommandSpec spec;

    @Option(names = "--points", defaultValue = "200", paramLabel = "N",
            description = "Measurement points in the synthetic site (default: ${DEFAULT-VALUE}).")
    int points;

    @Option(names = "--scans", defaultValue = "50", paramLabel = "M",
            description = "Loop scans per point, each with its reference and dark (default: ${DEFAULT-VALUE}).")
    int scans;

    @Option(names = "--uncertainty",
            description = "Time the evaluation on the coverage-interval rule (prediction intervals by Monte Carlo, "
                + "the measurement's own uncertainty) against today's fixed-tolerance evaluation of the same site; "
                + "the ratio is plain time over with-interval time.")
    boolean uncertainty;

    private volatile double sink;

    @Override
    public Integer call() {
        if (points < 1 || scans < 1) {
            throw new ParameterException(spec.commandLine(), "--points and --scans must be at least 1");
        }
        PrintWriter out = spec.commandLine().getOut();
        DemoPlant plant = new DemoPlant();
        out.printf(Locale.ROOT, "evaluate bench: %d points × %d visits (loop, reference and dark each), built from"
                + " the %d sample-site point types; generating scans ...%n", points, scans, plant.points().size());
        out.flush();
        InMemoryScans memory = new InMemoryScans(new ScanGenerator(plant, ScanGenerator.DEMO_SEED + 1, scans)
                .generate());
        List<PointInputs> templates = memory.inputs(plant);
        List<PointInputs> site = new ArrayList<>(points);
        for (int i = 0; i < points; i++) {
            site.add(templates.get(i % templates.size()));
        }
        PointEvaluator evaluator = PointEvaluator.withDefaults();
        if (uncertainty) {
            return compareRules(site, evaluator, out);
        }
        List<FloorPoint> floorSite = floorInputs(site, evaluator, memory);

        out.println("warming up both ...");
        out.flush();
        timeSite(site, evaluator);
        timeFloor(floorSite);
        double best = Double.MAX_VALUE;
        double bestFloor = Double.MAX_VALUE;
        for (int t = 0; t < TRIALS; t++) {
            best = Math.min(best, timeSite(site, evaluator));
            bestFloor = Math.min(bestFloor, timeFloor(floorSite));
        }
        out.printf(Locale.ROOT, "evaluation: %.3f s for the site, %.0f points per second (one thread, best of %d)%n",
                best, points / best, TRIALS);
        out.printf(Locale.ROOT, "floor:      %.3f s for the site, %.0f points per second (loss ratio, deviation"
                + " and band means of every loop scan on pre-gridded spectra)%n", bestFloor, points / bestFloor);
        out.printf(Locale.ROOT, "ratio: %.3f%n", bestFloor / best);
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    /**
     * The same site judged by the fixed tolerance and on the coverage interval, alternating, best of
     * each; the first (cold) trial of each is printed too.
     */
    private int compareRules(List<PointInputs> site, PointEvaluator evaluator, PrintWriter out) {
        DecisionRule interval = DecisionRule.interval();
        out.println("cold trials (JIT still compiling) ...");
        out.flush();
        double coldPlain = timeSite(site, evaluator, DecisionRule.FIXED);
        double coldWith = timeSite(site, evaluator, interval);
        out.printf(Locale.ROOT, "cold:          plain %.3f s, with intervals %.3f s%n", coldPlain, coldWith);
        double best = Double.MAX_VALUE;
        double bestWith = Double.MAX_VALUE;
        for (int t = 0; t < TRIALS; t++) {
            best = Math.min(best, timeSite(site, evaluator, DecisionRule.FIXED));
            bestWith = Math.min(bestWith, timeSite(site, evaluator, interval));
        }
        out.printf(Locale.ROOT, "plain:         %.3f s for the site, %.0f points per second (fixed tolerance, best of"
                + " %d)%n", best, points / best, TRIALS);
        out.printf(Locale.ROOT, "with interval: %.3f s for the site, %.0f points per second (95 %% coverage intervals"
                + " by Monte Carlo, measurement uncertainty, best of %d)%n", bestWith, points / bestWith, TRIALS);
        out.printf(Locale.ROOT, "ratio: %.3f%n", best / bestWith);
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    private double timeSite(List<PointInputs> site, PointEvaluator evaluator) {
        return timeSite(site, evaluator, DecisionRule.FIXED);
    }

    private double timeSite(List<PointInputs> site, PointEvaluator evaluator, DecisionRule rule) {
        long start = System.nanoTime();
        double acc = 0;
        for (PointInputs in : site) {
            PointEvaluation e = evaluator.evaluate(in, rule);
            acc += e.verdicts().size() + e.trends().size();
        }
        sink += acc;
        return (System.nanoTime() - start) * 1e-9;
    }

    /** One point's floor inputs: its scans already on the grid, its predicted total. */
    private record FloorPoint(double[] predicted, double[][] loops, double[][] refs, double[][] darks,
                              WavelengthGrid grid, List<WavelengthBand> bands) {
    }

    private static List<FloorPoint> floorInputs(List<PointInputs> site, PointEvaluator evaluator,
                                                InMemoryScans memory) {
        List<FloorPoint> out = new ArrayList<>();
        java.util.Map<PointInputs, FloorPoint> done = new java.util.IdentityHashMap<>();
        for (PointInputs in : site) {
            out.add(done.computeIfAbsent(in, k -> {
                WavelengthGrid grid = EvaluationGrid.forAnalyzer(k.analyzer());
                double[] predicted = evaluator.evaluate(k).predicted().totalLossDb();
                List<ScanRecord> loops = k.scans().stream().filter(s -> s.kind() == ScanKind.LOOP).toList();
                List<ScanRecord> refs = k.scans().stream().filter(s -> s.kind() == ScanKind.REFERENCE).toList();
                List<ScanRecord> darks = k.scans().stream().filter(s -> s.kind() == ScanKind.DARK).toList();
                return new FloorPoint(predicted, gridded(loops, memory, grid), gridded(refs, memory, grid),
                        gridded(darks, memory, grid), grid, k.point().bands());
            }));
        }
        return out;
    }

    private static double[][] gridded(List<ScanRecord> scans, InMemoryScans memory, WavelengthGrid grid) {
        double[][] out = new double[scans.size()][];
        for (int i = 0; i < out.length; i++) {
            Spectrum s = memory.spectrum(scans.get(i).id());
            out[i] = WavelengthGrid.ofNm(s.wavelengthsNm()).resample(s.values(), grid);
        }
        return out;
    }

    private double timeFloor(List<FloorPoint> site) {
        long start = System.nanoTime();
        double acc = 0;
        for (FloorPoint p : site) {
            int n = p.predicted().length;
            double[] dev = new double[n];
            for (int s = 0; s < p.loops().length; s++) {
                double[] loop = p.loops()[s];
                double[] ref = p.refs()[s];
                double[] dark = p.darks()[s];
                for (int i = 0; i < n; i++) {
                    double loss = -10 * Math.log10((loop[i] - dark[i]) / (ref[i] - dark[i]));
                    dev[i] = loss - p.predicted()[i];
                }
                for (WavelengthBand b : p.bands()) {
                    double sum = 0;
                    int count = 0;
                    for (int i = 0; i < n; i++) {
                        double w = p.grid().wavelengthNm(i);
                        if (w >= b.fromNm() && w <= b.toNm() && !Double.isNaN(dev[i])) {
                            sum += dev[i];
                            count++;
                        }
                    }
                    acc += count == 0 ? 0 : sum / count;
                }
            }
        }
        sink += acc;
        return (System.nanoTime() - start) * 1e-9;
    }
}
