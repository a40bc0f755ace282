package org.strandbook.app.bench;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;
import java.util.function.IntToDoubleFunction;

import org.strandbook.optics.ConstantIndexMaterial;
import org.strandbook.optics.SellmeierMaterial;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.attenuation.SilicaAttenuation;
import org.strandbook.optics.attenuation.SilicaFiberGrade;
import org.strandbook.optics.joint.ConnectorAllowance;
import org.strandbook.optics.joint.JointGeometry;
import org.strandbook.optics.joint.JointMechanics;
import org.strandbook.optics.path.Contribution;
import org.strandbook.optics.path.FaceElement;
import org.strandbook.optics.path.FiberSegment;
import org.strandbook.optics.path.FiberSpec;
import org.strandbook.optics.path.JointElement;
import org.strandbook.optics.path.LightPath;
import org.strandbook.optics.path.LossBudget;
import org.strandbook.optics.path.MediumPath;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.optics.path.ProbeElement;
import org.strandbook.optics.path.ProbeWindow;
import org.strandbook.optics.path.ReferenceMedium;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook bench optics}: full loss budgets (total and every contribution) of N typical
 * light paths on a 2,000-point grid, against the arithmetic floor of adding as many precomputed
 * spectra per path as the path has elements into a fresh total.
 */
@Command(name = "optics",
        mixinStandardHelpOptions = true,
        description = "Loss budgets per second for N typical light paths (launch face, forward fiber, 4 joints, "
            + "probe, return fiber, detector face) on a 2000-point grid, contributions included, "
            + "against the floor: adding 9 precomputed spectra per path into a fresh total.")
public final class OpticsBenchCommand implements Callable<Integer> {

    static final int GRID_POINTS = 2000;
    private static final long SEED = 20_240_501L;
    private static final int TRIALS = 3;

    @Spec
    CommandSpec spec;

    @Option(names = "--paths", defaultValue = "2000", paramLabel = "N",
            description = "Number of light paths (default: ${DEFAULT-VALUE}).")
    int paths;

    @Option(names = "--trial-ms", defaultValue = "700", paramLabel = "ms",
            description = "Minimum time per timed trial in ms (default: ${DEFAULT-VALUE}); "
                    + "warm-up takes two trials of each kind.")
    int trialMs;

    @Override
    public Integer call() {
        if (paths < 1) {
            throw new ParameterException(spec.commandLine(), "--paths must be at least 1, was " + paths);
        }
        if (trialMs < 1) {
            throw new ParameterException(spec.commandLine(), "--trial-ms must be at least 1, was " + trialMs);
        }
        PrintWriter out = spec.commandLine().getOut();
        WavelengthGrid grid = WavelengthGrid.uniformNm(400, 2500, GRID_POINTS);
        List<LightPath> lightPaths = typicalPaths(paths, new SplittableRandom(SEED));
        int elements = lightPaths.get(0).elements().size();
        out.println(String.format(Locale.ROOT,
                "optics bench: %d light paths, %d elements each (2 fibers, 4 joints, 1 probe, 2 faces), grid %s",
                paths, elements, grid));

        OpticsCache cache = new OpticsCache(grid);
        IntToDoubleFunction budget = i -> {
            LossBudget b = LossBudget.of(lightPaths.get(i), cache);
            int k = i % GRID_POINTS;
            double v = b.totalLossDbAt(k);
            for (Contribution c : b.contributions()) {
                v += c.lossDbAt(k);
            }
            return v;
        };

        // the floor reads from a pool of precomputed spectra, as the budgets read cached catalog terms
        SplittableRandom random = new SplittableRandom(SEED + 1);
        double[][] pool = new double[32][GRID_POINTS];
        for (double[] spectrum : pool) {
            for (int i = 0; i < GRID_POINTS; i++) {
                spectrum[i] = random.nextDouble();
            }
        }
        int[][] picks = new int[paths][elements];
        for (int[] p : picks) {
            for (int e = 0; e < elements; e++) {
                p[e] = random.nextInt(pool.length);
            }
        }
        IntToDoubleFunction floor = i -> {
            double[] total = new double[GRID_POINTS];
            for (int e : picks[i]) {
                double[] s = pool[e];
                for (int k = 0; k < GRID_POINTS; k++) {
                    total[k] += s[k];
                }
            }
            return total[i % GRID_POINTS];
        };

        TrialRate rate = new TrialRate(trialMs);
        out.println("warming up both ...");
        out.flush();
        for (int w = 0; w < 2; w++) {
            rate.perSecond(budget, paths);
            rate.perSecond(floor, paths);
        }
        double bestBudget = 0;
        double bestFloor = 0;
        for (int t = 0; t < TRIALS; t++) {
            bestBudget = Math.max(bestBudget, rate.perSecond(budget, paths));
            bestFloor = Math.max(bestFloor, rate.perSecond(floor, paths));
        }
        out.println(String.format(Locale.ROOT, "budgets: %.0f per second (total + %d contributions each, contributions held as scaled cached spectra; best of %d trials)",
                bestBudget, elements, TRIALS));
        out.println(String.format(Locale.ROOT, "floor:   %.0f per second (adding %d precomputed spectra into a new total)",
                bestFloor, elements));
        out.println(String.format(Locale.ROOT, "cached spectra: %d", cache.entries()));
        out.println(String.format(Locale.ROOT, "ratio: %.2f", bestBudget / bestFloor));
        out.flush();
        return CommandLine.ExitCode.OK;
    }


    /** Light paths as a site catalog would give them: few fiber and connector types, varied lengths. */
    static List<LightPath> typicalPaths(int count, SplittableRandom random) {
        FiberSpec lowOh200 = FiberSpec.silicaCore(200, 220, 0.22, SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 5));
        FiberSpec lowOh400 = FiberSpec.silicaCore(400, 440, 0.22, SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 2));
        FiberSpec highOh200 = FiberSpec.silicaCore(200, 220, 0.22, SilicaAttenuation.of(SilicaFiberGrade.HIGH_OH));
        FiberSpec[] fibers = {lowOh200, lowOh400, highOh200};
        JointMechanics[] joints = {
            ConnectorAllowance.DEFAULT,
            ConnectorAllowance.TIA_568_MATED_PAIR,
            JointGeometry.airGap(5, 20, 0.5),
            JointGeometry.indexMatched(10, 50, 1.0, 1.46),
        };
        ReferenceMedium solvent = ReferenceMedium.ofSpectrum("reference solvent",
                new double[] {380, 1000, 1700, 2600}, new double[] {0.001, 0.002, 0.01, 0.05});
        ProbeElement[] probes = {
            new ProbeElement("probe", List.of(ProbeWindow.inAir(SellmeierMaterial.SAPPHIRE_ORDINARY, 2),
                    ProbeWindow.inAir(SellmeierMaterial.SAPPHIRE_ORDINARY, 2)), 1.5,
                    Optional.of(new MediumPath(solvent, 2.0))),
            new ProbeElement("probe", List.of(new ProbeWindow(SellmeierMaterial.FUSED_SILICA, 4,
                    new ConstantIndexMaterial("process liquid", 1.40))), 3.0, Optional.empty()),
        };
        double[] radiiMm = {40, 60, 100};
        List<LightPath> out = new ArrayList<>(count);
        for (int p = 0; p < count; p++) {
            FiberSpec fiber = fibers[random.nextInt(fibers.length)];
            String tag = "MP-" + (100 + p);
            FiberSegment forward = FiberSegment.bent(tag + " forward", fiber, 5 + 195 * random.nextDouble(),
                    radiiMm[random.nextInt(radiiMm.length)], random.nextInt(5));
            FiberSegment back = random.nextBoolean()
                    ? FiberSegment.straight(tag + " return", fiber, 5 + 195 * random.nextDouble())
                    : FiberSegment.bent(tag + " return", fiber, 5 + 195 * random.nextDouble(),
                            radiiMm[random.nextInt(radiiMm.length)], 1 + random.nextInt(4));
            out.add(LightPath.of(tag,
                    FaceElement.inAir("launch face", fiber),
                    forward,
                    new JointElement("patch panel out", fiber, fiber, joints[random.nextInt(joints.length)]),
                    new JointElement("probe in", fiber, fiber, joints[random.nextInt(joints.length)]),
                    probes[random.nextInt(probes.length)],
                    new JointElement("probe out", fiber, fiber, joints[random.nextInt(joints.length)]),
                    new JointElement("patch panel in", fiber, fiber, joints[random.nextInt(joints.length)]),
                    back,
                    FaceElement.inAir("detector face", fiber)));
        }
        return out;
    }
}
