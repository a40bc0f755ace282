package org.strandbook.diagnosis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.OptionalDouble;

import org.strandbook.optics.bend.MinimumBendRadius;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.FiberType;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathLeg;

/**
 * What the workbook records about a point that helps rank causes the spectrum alone cannot tell
 * apart: inspection grades, bends against the minimum radius, fiber grades and core sizes, the
 * core sizes the catalog offers, hydrogen service.
 *
 * @param catalogCoresUm the distinct core diameters of the catalog's fiber types, µm, ascending
 */
public record PathEvidence(List<JointEvidence> joints, List<SegmentEvidence> segments, List<String> probeTails,
                           boolean hydrogenService, OptionalDouble processTemperatureC, List<Double> catalogCoresUm) {

    public PathEvidence {
        joints = List.copyOf(joints);
        segments = List.copyOf(segments);
        probeTails = List.copyOf(probeTails);
        catalogCoresUm = catalogCoresUm.stream().distinct().sorted().toList();
    }

    /** Evidence without catalog core sizes: no core-size step can be named. */
    public PathEvidence(List<JointEvidence> joints, List<SegmentEvidence> segments, List<String> probeTails,
                        boolean hydrogenService, OptionalDouble processTemperatureC) {
        this(joints, segments, probeTails, hydrogenService, processTemperatureC, List.of());
    }

    /** A joint as inspected. */
    public record JointEvidence(String label, InspectionGrade grade, boolean airGap) {
    }

    /**
     * A cable segment as recorded.
     *
     * @param tightestBendMm the tightest recorded bend radius, mm, if any
     * @param longTermMinMm  the long-term minimum bend radius for its cladding (common practice), mm
     * @param coreUm         core diameter of its fiber type, µm; NaN when not known
     */
    public record SegmentEvidence(String label, String fiberTypeCode, double lengthM, OhGrade ohGrade,
                                  OptionalDouble tightestBendMm, double longTermMinMm, double coreUm) {

        /** A segment whose core diameter is not known. */
        public SegmentEvidence(String label, String fiberTypeCode, double lengthM, OhGrade ohGrade,
                               OptionalDouble tightestBendMm, double longTermMinMm) {
            this(label, fiberTypeCode, lengthM, ohGrade, tightestBendMm, longTermMinMm, Double.NaN);
        }

        public boolean bendBelowMinimum() {
            return tightestBendMm.isPresent() && tightestBendMm.getAsDouble() < longTermMinMm;
        }
    }

    public static PathEvidence of(MeasurementPoint point, PathLeg send, PathLeg ret, Catalog catalog) {
        List<JointEvidence> joints = new ArrayList<>();
        List<SegmentEvidence> segments = new ArrayList<>();
        for (PathLeg leg : List.of(send, ret)) {
            for (Joint j : leg.joints()) {
                boolean gap = catalog.connector(j.connectorTypeA()).airGap()
                        || catalog.connector(j.connectorTypeB()).airGap();
                joints.add(new JointEvidence(j.label(), j.grade(), gap));
            }
            for (CableSegment s : leg.segments()) {
                FiberType f = catalog.fiber(s.fiberTypeCode());
                OptionalDouble tightest = s.bends().stream().mapToDouble(Bend::radiusMm).min();
                segments.add(new SegmentEvidence(s.label(), f.code(), s.lengthM(), f.ohGrade(), tightest,
                        MinimumBendRadius.longTermMm(f.claddingUm()), f.coreUm()));
            }
        }
        List<String> tails = new ArrayList<>();
        tails.add(send.segments().get(send.segments().size() - 1).label());
        tails.add(ret.segments().get(0).label());
        List<Double> catalogCores = catalog.fiberTypes().values().stream().map(FiberType::coreUm).toList();
        return new PathEvidence(joints, segments, tails, point.hydrogenService(), point.processTemperatureC(),
                catalogCores);
    }

    public List<JointEvidence> jointsNeedingAction() {
        return joints.stream().filter(j -> j.grade().needsAction()).toList();
    }

    public List<JointEvidence> jointsNotInspected() {
        return joints.stream().filter(j -> j.grade() == InspectionGrade.NOT_INSPECTED).toList();
    }

    public List<SegmentEvidence> segmentsWithTightBends() {
        return segments.stream().filter(SegmentEvidence::bendBelowMinimum).toList();
    }

    /** The distinct core diameters recorded along the path, µm, ascending. */
    public List<Double> pathCoresUm() {
        return segments.stream().mapToDouble(SegmentEvidence::coreUm).filter(Double::isFinite).sorted().distinct()
                .boxed().toList();
    }

    public SegmentEvidence longestSegment() {
        return segments.stream().max(Comparator.comparingDouble(SegmentEvidence::lengthM)).orElseThrow();
    }
}
