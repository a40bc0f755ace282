package org.strandbook.schedule;

import java.util.List;
import java.util.Optional;

import org.strandbook.site.Analyzer;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;

/**
 * The content of a filled cable schedule: analyzers, measurement points with their bands, the send
 * and return leg of every point, and the component types the contractor added.
 *
 * <p>{@link CableScheduleReader} returns one only after every rule passed: tags and IDs unique,
 * every reference resolved (in {@code addedCatalog} or the catalog the reader was given), every
 * point with both legs, in point order with SEND before RETURN. Code that builds a schedule itself
 * (the demo generator) keeps to the same shape; the record does not re-check it.
 *
 * @param analyzers    in sheet order
 * @param points       in sheet order, each with its bands in sheet order
 * @param legs         per point and direction, elements in the order light meets them
 * @param addedCatalog types defined on the schedule's catalog sheets (not the shipped ones)
 */
public record CableSchedule(List<Analyzer> analyzers, List<MeasurementPoint> points, List<PathLeg> legs,
                            ComponentCatalog addedCatalog) {

    public CableSchedule {
        analyzers = List.copyOf(analyzers);
        points = List.copyOf(points);
        legs = List.copyOf(legs);
        addedCatalog = addedCatalog == null ? ComponentCatalog.empty() : addedCatalog;
    }

    /** The leg of one point in one direction. */
    public Optional<PathLeg> leg(String pointTag, PathDirection direction) {
        return legs.stream().filter(l -> l.pointTag().equals(pointTag) && l.direction() == direction).findFirst();
    }

    public Optional<MeasurementPoint> point(String tag) {
        return points.stream().filter(p -> p.tag().equals(tag)).findFirst();
    }

    public Optional<Analyzer> analyzer(String tag) {
        return analyzers.stream().filter(a -> a.tag().equals(tag)).findFirst();
    }
}
