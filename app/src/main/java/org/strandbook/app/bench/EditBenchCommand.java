package org.strandbook.app.bench;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.function.IntToDoubleFunction;

import org.strandbook.app.ui.budget.PointPrediction;
import org.strandbook.app.ui.budget.SitePrediction;
import org.strandbook.evaluation.EvaluationGrid;
import org.strandbook.optics.path.LightPath;
import org.strandbook.optics.path.LossBudget;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.samplesite.DemoPlant;
import org.strandbook.site.Analyzer;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook bench edit}: what the window computes on the FX thread for every typed segment
 * length: the point's prediction from its records (records to optics elements, the budget, the
 * figures at each band centre), on the sample plant's points. The floor is the bare budget of the
 * same light path from the same optics cache, with nothing mapped and nothing read out.
 */
@Command(name = "edit",
        mixinStandardHelpOptions = true,
        description = "Re-predictions per second after a segment-length edit, the window's work per typed cell, "
            + "on the sample plant's points, against the floor: the bare loss budget of the same path.")
public final class EditBenchCommand implements Callable<Integer> {

    private static final int TRIALS = 3;
    /** Lengths a trunk is edited through, m: every prediction sees legs it has not kept. */
    private static final double[] TRUNK_M = {40, 55, 70, 85, 100, 115, 130};

    @Spec
    CommandSpec spec;

    @Option(names = "--trial-ms", defaultValue = "700", paramLabel = "ms",
            description = "Minimum time per timed trial in ms (default: ${DEFAULT-VALUE}); "
                    + "warm-up takes two trials of each kind.")
    int trialMs;

    private record Edit(DemoPlant.DemoPoint point, List<PathLeg> legs, LightPath path, OpticsCache cache) {
    }

    @Override
    public Integer call() {
        if (trialMs < 1) {
            throw new ParameterException(spec.commandLine(), "--trial-ms must be at least 1, was " + trialMs);
        }
        PrintWriter out = spec.commandLine().getOut();
        DemoPlant plant = new DemoPlant();
        Catalog catalog = Catalog.of(plant.fiberTypes(), plant.connectorTypes(), plant.probeTypes());
        SitePrediction prediction = new SitePrediction(plant.site(), plant.analyzers(), catalog);
        List<Edit> edits = new ArrayList<>();
        // lengths outside, points inside: consecutive edits of one point always change its legs
        for (double trunkM : TRUNK_M) {
            for (DemoPlant.DemoPoint p : plant.points()) {
                Analyzer analyzer = plant.analyzers().stream().filter(a -> a.tag().equals(p.point().analyzerTag()))
                        .findFirst().orElseThrow();
                OpticsCache floorCache = new OpticsCache(EvaluationGrid.forAnalyzer(analyzer));
                List<PathLeg> legs = List.of(withTrunk(p.send(), trunkM), p.ret());
                PointPrediction once = prediction.predict(p.point(), legs);
                edits.add(new Edit(p, legs, once.budget().orElseThrow().budget().path(), floorCache));
            }
        }
        int elements = edits.get(0).path().elements().size();
        out.println(String.format(Locale.ROOT, "edit bench: %d points of the sample plant, %d trunk lengths each, "
                + "%d elements per loop, grid %s", plant.points().size(), TRUNK_M.length, elements,
                EvaluationGrid.forAnalyzer(plant.analyzers().get(0))));

        IntToDoubleFunction predict = i -> {
            Edit e = edits.get(i);
            return prediction.predict(e.point().point(), e.legs()).lossDbAt(e.point().point().bands().get(0).centreNm());
        };
        IntToDoubleFunction floor = i -> {
            Edit e = edits.get(i);
            return LossBudget.of(e.path(), e.cache()).totalLossDbAt(i % 100);
        };
        TrialRate rate = new TrialRate(trialMs);
        out.println("warming up both ...");
        out.flush();
        for (int w = 0; w < 2; w++) {
            rate.perSecond(predict, edits.size());
            rate.perSecond(floor, edits.size());
        }
        double best = 0;
        double bestFloor = 0;
        for (int t = 0; t < TRIALS; t++) {
            best = Math.max(best, rate.perSecond(predict, edits.size()));
            bestFloor = Math.max(bestFloor, rate.perSecond(floor, edits.size()));
        }
        out.println(String.format(Locale.ROOT, "predictions: %.0f per second, %.1f \u00B5s each (records mapped, budget, "
                + "figures at each band centre; best of %d trials)", best, 1e6 / best, TRIALS));
        out.println(String.format(Locale.ROOT, "floor:       %.0f per second, %.1f \u00B5s each (the bare budget of the "
                + "same light path)", bestFloor, 1e6 / bestFloor));
        out.println(String.format(Locale.ROOT, "ratio: %.2f", best / bestFloor));
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    private static PathLeg withTrunk(PathLeg leg, double trunkM) {
        List<PathElement> elements = new ArrayList<>(leg.elements());
        for (int i = 0; i < elements.size(); i++) {
            if (elements.get(i) instanceof CableSegment s && s.label().endsWith("2")) {
                elements.set(i, new CableSegment(s.label(), s.fiberTypeCode(), trunkM, s.bends()));
            }
        }
        return new PathLeg(leg.pointTag(), leg.direction(), elements);
    }
}
