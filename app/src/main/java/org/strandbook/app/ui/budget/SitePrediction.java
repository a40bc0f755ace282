package org.strandbook.app.ui.budget;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.strandbook.app.ui.sheet.Verdict;
import org.strandbook.evaluation.EvaluationGrid;
import org.strandbook.evaluation.PointBudgetBuilder;
import org.strandbook.evaluation.PredictedBudget;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;
import org.strandbook.site.Site;
import org.strandbook.site.WavelengthBand;

/**
 * The predicted loop loss of the points of the open site, computed from the records in memory.
 * It is pure arithmetic on spectra an {@link OpticsCache} already holds (one cache per analyzer
 * grid, kept for the session), so the window computes it on the FX thread and an edit shows its
 * effect in the same frame; nothing here reads the workbook file. A point's prediction is kept
 * until its record, its legs or the catalog change.
 *
 * <p>The budget is the one the evaluation uses ({@link PointBudgetBuilder}); margins and statuses
 * follow {@link MarginVerdict}. Not thread-safe: the window uses it from the FX thread only.
 */
public final class SitePrediction {

    private record Kept(MeasurementPoint point, List<PathLeg> legs, PointPrediction prediction) {
    }

    private Site site;
    private final Map<String, Analyzer> analyzers = new HashMap<>();
    private final Map<String, OpticsCache> caches = new HashMap<>();
    private Catalog catalog;
    private PointBudgetBuilder builder;
    private final Map<String, Kept> kept = new HashMap<>();

    public SitePrediction(Site site, Collection<Analyzer> analyzers, Catalog catalog) {
        this.site = site;
        setAnalyzers(analyzers);
        setCatalog(catalog);
    }

    public Site site() {
        return site;
    }

    public Catalog catalog() {
        return catalog;
    }

    public Optional<Analyzer> analyzer(String tag) {
        return Optional.ofNullable(analyzers.get(tag));
    }

    /** A changed catalog changes every budget that uses it: all predictions are recomputed on demand. */
    public void setCatalog(Catalog catalog) {
        this.catalog = catalog;
        this.builder = new PointBudgetBuilder(catalog);
        kept.clear();
    }

    public void setSite(Site site) {
        this.site = site;
        kept.clear();
    }

    public void setAnalyzers(Collection<Analyzer> list) {
        analyzers.clear();
        list.forEach(a -> analyzers.put(a.tag(), a));
        // an analyzer whose range changed needs a cache on its new grid
        caches.keySet().removeIf(tag -> !analyzers.containsKey(tag)
                || !caches.get(tag).grid().equals(EvaluationGrid.forAnalyzer(analyzers.get(tag))));
        kept.clear();
    }

    /** Drops a point's kept prediction, e.g. when it is deleted. */
    public void forget(String pointTag) {
        kept.remove(pointTag);
    }

    /**
     * The point's prediction with the given legs (its send and return leg, in any order). A point
     * without an analyzer, a leg or a catalog entry its legs name gets a prediction that says so.
     */
    public PointPrediction predict(MeasurementPoint point, List<PathLeg> legs) {
        Kept k = kept.get(point.tag());
        if (k != null && k.point().equals(point) && k.legs().equals(legs)) {
            return k.prediction();
        }
        PointPrediction p = compute(point, legs);
        kept.put(point.tag(), new Kept(point, List.copyOf(legs), p));
        return p;
    }

    private PointPrediction compute(MeasurementPoint point, List<PathLeg> legs) {
        Analyzer analyzer = analyzers.get(point.analyzerTag());
        if (analyzer == null) {
            return PointPrediction.failed(point.tag(), "analyzer " + point.analyzerTag() + " is not in the workbook");
        }
        Optional<PathLeg> send = leg(legs, PathDirection.SEND);
        Optional<PathLeg> ret = leg(legs, PathDirection.RETURN);
        if (send.isEmpty() || ret.isEmpty()) {
            return PointPrediction.failed(point.tag(), "no " + (send.isEmpty() ? "send" : "return") + " leg recorded");
        }
        OpticsCache cache = caches.computeIfAbsent(analyzer.tag(), t -> new OpticsCache(EvaluationGrid.forAnalyzer(analyzer)));
        PredictedBudget budget;
        try {
            budget = builder.build(point, send.get(), ret.get(), cache);
        } catch (IllegalArgumentException e) {
            return PointPrediction.failed(point.tag(), e.getMessage());
        }
        WavelengthGrid grid = cache.grid();
        double[] total = budget.totalLossDb();
        double tolerance = point.effectiveToleranceDb(site);
        List<BandPrediction> bands = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (WavelengthBand band : point.bands()) {
            if (!grid.covers(band.centreNm())) {
                problems.add(String.format(Locale.ROOT, "band %s (centre %.0f nm) lies outside analyzer %s's range %.0f\u2013%.0f nm",
                        band.name(), band.centreNm(), analyzer.tag(), analyzer.minNm(), analyzer.maxNm()));
                bands.add(new BandPrediction(band, Double.NaN, analyzer.allowedLossDb(), Double.NaN, null));
                continue;
            }
            double predicted = grid.interpolate(total, band.centreNm());
            double margin = analyzer.allowedLossDb() - predicted;
            Verdict verdict = MarginVerdict.of(margin, tolerance);
            bands.add(new BandPrediction(band, predicted, analyzer.allowedLossDb(), margin, verdict));
        }
        return new PointPrediction(point.tag(), budget, send.get().elements().size(), bands, String.join("; ", problems));
    }

    private static Optional<PathLeg> leg(List<PathLeg> legs, PathDirection direction) {
        return legs.stream().filter(l -> l.direction() == direction && !l.elements().isEmpty()).findFirst();
    }
}
