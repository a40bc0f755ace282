package org.strandbook.evaluation;

import java.time.Clock;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.Site;
import org.strandbook.store.Workbook;

/**
 * Evaluates the points of a workbook. It reads records and scan listings up front and fetches each
 * spectrum only when its point is evaluated, so a site with years of scans never holds them all.
 */
public final class SiteEvaluator {

    /** Told after each point; returns false to cancel the rest. */
    @FunctionalInterface
    public interface Progress {
        boolean pointDone(int done, int total, String pointTag);

        Progress NONE = (done, total, tag) -> true;
    }

    private final PointEvaluator evaluator;
    private final Clock clock;

    public SiteEvaluator(PointEvaluator evaluator, Clock clock) {
        this.evaluator = evaluator;
        this.clock = clock;
    }

    public static SiteEvaluator withDefaults() {
        return new SiteEvaluator(PointEvaluator.withDefaults(), Clock.systemUTC());
    }

    /**
     * Evaluates the given points (all when {@code pointTags} is empty).
     *
     * @throws IllegalArgumentException naming an unknown point tag
     */
    public SiteEvaluation evaluate(Workbook workbook, Collection<String> pointTags, Progress progress) {
        Site site = workbook.site().get();
        Map<String, Analyzer> analyzers = workbook.site().analyzers().stream()
                .collect(Collectors.toMap(Analyzer::tag, Function.identity()));
        Catalog catalog = Catalog.of(workbook.catalog().fiberTypes(), workbook.catalog().connectorTypes(),
                workbook.catalog().probeTypes());
        List<MeasurementPoint> all = workbook.points().list();
        List<MeasurementPoint> chosen = new ArrayList<>();
        if (pointTags.isEmpty()) {
            chosen.addAll(all);
        } else {
            for (String tag : pointTags) {
                chosen.add(all.stream().filter(p -> p.tag().equals(tag)).findFirst()
                        .orElseThrow(() -> new IllegalArgumentException("no point tagged '" + tag + "' in this workbook")));
            }
        }
        DecisionRule rule = workbook.site().decisionRule();
        List<PointEvaluation> done = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (int i = 0; i < chosen.size(); i++) {
            MeasurementPoint point = chosen.get(i);
            try {
                done.add(evaluator.evaluate(inputs(workbook, site, point, analyzers, catalog), rule));
            } catch (IllegalArgumentException e) {
                problems.add(e.getMessage());
            }
            if (!progress.pointDone(i + 1, chosen.size(), point.tag())) {
                problems.add("cancelled after " + (i + 1) + " of " + chosen.size() + " points");
                break;
            }
        }
        return new SiteEvaluation(site, clock.instant(), evaluator.pairing().describe(), Urgency.rank(done),
                problems, rule);
    }

    private static PointInputs inputs(Workbook workbook, Site site, MeasurementPoint point,
                                      Map<String, Analyzer> analyzers, Catalog catalog) {
        Analyzer analyzer = analyzers.get(point.analyzerTag());
        if (analyzer == null) {
            throw new IllegalArgumentException("point " + point.tag() + ": unknown analyzer '" + point.analyzerTag() + "'");
        }
        return WorkbookInputs.of(workbook, site, point, analyzer, catalog, workbook.scans().list(point.tag()));
    }
}
