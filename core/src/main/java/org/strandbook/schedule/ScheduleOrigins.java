package org.strandbook.schedule;

import java.util.Map;
import java.util.Optional;

/**
 * Where each item of an accepted schedule was entered: the cell holding its tag, ID, label or
 * code. Lookups ignore letter case (keys are unique that way). Catalog lookups find only the types
 * added on the schedule's catalog sheets.
 */
public final class ScheduleOrigins {

    private final KeyIndex analyzers;
    private final KeyIndex points;
    private final KeyIndex cables;
    private final Map<String, KeyIndex> jointsByPoint;
    private final KeyIndex fiberTypes;
    private final KeyIndex connectorTypes;
    private final KeyIndex probeTypes;

    ScheduleOrigins(KeyIndex analyzers, KeyIndex points, KeyIndex cables, Map<String, KeyIndex> jointsByPoint,
                    KeyIndex fiberTypes, KeyIndex connectorTypes, KeyIndex probeTypes) {
        this.analyzers = analyzers;
        this.points = points;
        this.cables = cables;
        this.jointsByPoint = Map.copyOf(jointsByPoint);
        this.fiberTypes = fiberTypes;
        this.connectorTypes = connectorTypes;
        this.probeTypes = probeTypes;
    }

    public Optional<ScheduleCell> analyzer(String tag) {
        return analyzers.placeOf(tag);
    }

    public Optional<ScheduleCell> point(String tag) {
        return points.placeOf(tag);
    }

    /** The cable ID's cell on sheet 'Segments'. */
    public Optional<ScheduleCell> cable(String cableId) {
        return cables.placeOf(cableId);
    }

    /** The joint label's cell on sheet 'Joints'. */
    public Optional<ScheduleCell> joint(String pointTag, String label) {
        KeyIndex labels = jointsByPoint.get(pointTag);
        return labels == null ? Optional.empty() : labels.placeOf(label);
    }

    public Optional<ScheduleCell> fiberType(String code) {
        return fiberTypes.placeOf(code);
    }

    public Optional<ScheduleCell> connectorType(String code) {
        return connectorTypes.placeOf(code);
    }

    public Optional<ScheduleCell> probeType(String code) {
        return probeTypes.placeOf(code);
    }
}
