package org.strandbook.app.ui.workbook;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.strandbook.app.ui.budget.PointPrediction;
import org.strandbook.app.ui.budget.SitePrediction;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeType;
import org.strandbook.site.Site;

/**
 * The open site as the window holds it in memory: the records the sheets show, each point's legs,
 * and the predictions computed from them. It is what the FX thread reads and changes; the workbook
 * file follows in the background. Plain Java, used from the FX thread only.
 */
final class OpenSite {

    private Optional<Path> file = Optional.empty();
    private Site site = new Site("No workbook open");
    private List<Analyzer> analyzers = List.of();
    private final Map<String, MeasurementPoint> points = new LinkedHashMap<>();
    private List<FiberType> fibers = List.of();
    private List<ConnectorType> connectors = List.of();
    private List<ProbeType> probes = List.of();
    private final Map<String, List<PathLeg>> legs = new HashMap<>();
    /** Cable ID in lower case → the point whose legs use it. */
    private final Map<String, String> cableOwners = new HashMap<>();
    private double coverage = DecisionRule.DEFAULT_COVERAGE;
    private SitePrediction prediction = new SitePrediction(site, List.of(), Catalog.of(List.of(), List.of(), List.of()));

    void load(LoadedSite loaded) {
        file = Optional.of(loaded.file());
        site = loaded.site();
        analyzers = loaded.analyzers();
        points.clear();
        loaded.points().stream().sorted(Comparator.comparing(MeasurementPoint::tag))
                .forEach(p -> points.put(p.tag(), p));
        fibers = sorted(loaded.fibers(), FiberType::code);
        connectors = sorted(loaded.connectors(), ConnectorType::code);
        probes = sorted(loaded.probes(), ProbeType::code);
        legs.clear();
        cableOwners.clear();
        loaded.legs().forEach(this::setLegs);
        prediction = new SitePrediction(site, analyzers, catalog());
        coverage = loaded.decisionRule().coverage();
    }

    /** The coverage probability of the site's decision rule: the window's intervals use it too. */
    double coverage() {
        return coverage;
    }

    private static <T> List<T> sorted(List<T> list, java.util.function.Function<T, String> key) {
        return list.stream().sorted(Comparator.comparing(key)).toList();
    }

    boolean isOpen() {
        return file.isPresent();
    }

    Optional<Path> file() {
        return file;
    }

    void setFile(Path saved) {
        file = Optional.of(saved);
    }

    Site site() {
        return site;
    }

    List<Analyzer> analyzers() {
        return analyzers;
    }

    Optional<Analyzer> analyzer(String tag) {
        return analyzers.stream().filter(a -> a.tag().equals(tag)).findFirst();
    }

    List<MeasurementPoint> points() {
        return List.copyOf(points.values());
    }

    Optional<MeasurementPoint> point(String tag) {
        return Optional.ofNullable(points.get(tag));
    }

    /** Replaces points by tag; returns those that differ from what was held. */
    List<MeasurementPoint> replacePoints(List<MeasurementPoint> rows) {
        List<MeasurementPoint> changed = new ArrayList<>();
        for (MeasurementPoint p : rows) {
            MeasurementPoint before = points.put(p.tag(), p);
            if (!p.equals(before)) {
                changed.add(p);
            }
        }
        return changed;
    }

    List<FiberType> fibers() {
        return fibers;
    }

    List<ConnectorType> connectors() {
        return connectors;
    }

    List<ProbeType> probes() {
        return probes;
    }

    Catalog catalog() {
        return Catalog.of(fibers, connectors, probes);
    }

    void setCatalog(List<FiberType> f, List<ConnectorType> c, List<ProbeType> p) {
        fibers = List.copyOf(f);
        connectors = List.copyOf(c);
        probes = List.copyOf(p);
        prediction.setCatalog(catalog());
    }

    List<PathLeg> legs(String pointTag) {
        return legs.getOrDefault(pointTag, List.of());
    }

    void setLegs(String pointTag, List<PathLeg> newLegs) {
        List<PathLeg> before = legs.put(pointTag, List.copyOf(newLegs));
        if (before != null) {
            before.forEach(l -> l.segments().forEach(s -> cableOwners.remove(key(s.label()), pointTag)));
        }
        newLegs.forEach(l -> l.segments().forEach(s -> cableOwners.put(key(s.label()), pointTag)));
    }

    /** The point other than {@code pointTag} whose legs use cable {@code label}, if any. */
    Optional<String> cableOwnerOtherThan(String label, String pointTag) {
        String owner = cableOwners.get(key(label));
        return owner == null || owner.equals(pointTag) ? Optional.empty() : Optional.of(owner);
    }

    private static String key(String label) {
        return label.strip().toLowerCase(Locale.ROOT);
    }

    /** The point's prediction from its legs in memory. */
    PointPrediction predict(MeasurementPoint point) {
        return prediction.predict(point, legs(point.tag()));
    }

    /** The point's prediction with legs not yet taken into the site (a sheet's candidate rows). */
    PointPrediction predict(MeasurementPoint point, List<PathLeg> candidateLegs) {
        return prediction.predict(point, candidateLegs);
    }
}
