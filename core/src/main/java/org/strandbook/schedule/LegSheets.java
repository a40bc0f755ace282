package org.strandbook.schedule;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apache.poi.ss.usermodel.Workbook;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.StatedSpreads;

/**
 * The sheets that describe the light paths: cable segments, their bends, and joints, placed in
 * legs by point tag, direction and position.
 *
 * <p>Leg rule (Strandbook's own): the elements of one leg (point and direction) are numbered 1, 2,
 * 3 ... without gaps or repeats, segments and joints sharing one numbering in the order light meets
 * them; the leg holds at least one cable segment; and it alternates, a joint between any two
 * segments and a segment between any two joints. A leg may begin and end with either kind: a joint
 * for a connection at the analyzer port, a patch panel or the probe, a segment for a pigtail fixed
 * to the analyzer or the probe.
 */
final class LegSheets {

    private static final WholeRange POSITION = new WholeRange("position", 1, 10_000);
    private static final Quantity LENGTH_M = Quantity.positive("length", "metres", 10_000);
    private static final Quantity BEND_RADIUS_MM = Quantity.positive("bend radius", "mm", 100_000);
    private static final WholeRange BEND_COUNT = new WholeRange("bend count", 1, 10_000);
    private static final Quantity JOINT_LOSS_DB = Quantity.zeroOrMore("loss", "dB", 100);

    private record LegKey(String pointTag, PathDirection direction) {
        @Override
        public String toString() {
            return pointTag + " " + direction;
        }
    }

    /** An element whose row passed its cell checks. */
    private sealed interface Draft permits SegmentDraft, JointDraft {
    }

    /** A segment as entered; becomes a {@link CableSegment} once its bends are known. */
    private record SegmentDraft(String cableId, String fiberTypeCode, double lengthM, StatedSpreads spreads)
            implements Draft {
    }

    private record JointDraft(Joint joint) implements Draft {
    }

    /** One element of a leg at its position; {@code draft} is null when its row had problems. */
    private record Entry(int position, ScheduleCell positionCell, boolean segment, Draft draft) {
    }

    /**
     * @param legs          every leg found, by point tag and direction; empty when a leg sheet could not be read
     * @param cableIds      defined cable IDs and their cells
     * @param jointsByPoint joint labels and their cells, per point tag
     */
    record Result(Map<String, Map<PathDirection, PathLeg>> legs, KeyIndex cableIds, Map<String, KeyIndex> jointsByPoint) {
    }

    private final Workbook workbook;
    private final PlantSheets.Result plant;
    private final CatalogSheets.Result catalog;
    private final ProblemLog log;
    private final Map<LegKey, List<Entry>> entries = new LinkedHashMap<>();
    private final KeyIndex cableIds = new KeyIndex();
    private final Map<String, KeyIndex> labelsByPoint = new HashMap<>();

    private LegSheets(Workbook workbook, PlantSheets.Result plant, CatalogSheets.Result catalog, ProblemLog log) {
        this.workbook = workbook;
        this.plant = plant;
        this.catalog = catalog;
        this.log = log;
    }

    static Result read(Workbook workbook, PlantSheets.Result plant, CatalogSheets.Result catalog, ProblemLog log) {
        return new LegSheets(workbook, plant, catalog, log).read();
    }

    private Result read() {
        boolean segmentsRead = segments();
        Map<String, List<Bend>> bends = bends();
        boolean jointsRead = joints();
        Map<String, Map<PathDirection, PathLeg>> legs = new HashMap<>();
        if (!segmentsRead || !jointsRead) {
            // half a leg cannot be judged; the missing or unreadable sheet is reported already
            return new Result(legs, cableIds, labelsByPoint);
        }
        for (Map.Entry<LegKey, List<Entry>> leg : entries.entrySet()) {
            List<Entry> ordered = checkOrder(leg.getKey(), leg.getValue());
            List<PathElement> elements = new ArrayList<>();
            for (Entry e : ordered) {
                if (e.draft() instanceof SegmentDraft s) {
                    elements.add(new CableSegment(s.cableId(), s.fiberTypeCode(), s.lengthM(),
                            bends.getOrDefault(s.cableId(), List.of()), s.spreads()));
                } else if (e.draft() instanceof JointDraft j) {
                    elements.add(j.joint());
                }
            }
            legs.computeIfAbsent(leg.getKey().pointTag(), k -> new HashMap<>())
                    .put(leg.getKey().direction(), new PathLeg(leg.getKey().pointTag(), leg.getKey().direction(), elements));
        }
        for (PlantSheets.PointDraft p : plant.points().values()) {
            for (PathDirection d : PathDirection.values()) {
                if (!legs.getOrDefault(p.tag, Map.of()).containsKey(d)) {
                    p.row.problem(ScheduleColumn.POINT_TAG, "point " + p.tag + " has no " + d + " leg: enter its"
                            + " cable segments and joints on sheets 'Segments' and 'Joints'");
                }
            }
        }
        return new Result(legs, cableIds, labelsByPoint);
    }

    private boolean segments() {
        Optional<List<SheetRow>> rows = SheetTable.rows(workbook, ScheduleSheet.SEGMENTS, log);
        if (rows.isEmpty()) {
            cableIds.markIncomplete();
            return false;
        }
        for (SheetRow row : rows.get()) {
            String pointTag = pointReference(row, ScheduleColumn.SEGMENT_POINT);
            LegKey key = legKey(pointTag, row.choice(ScheduleColumn.SEGMENT_DIRECTION, PathDirection.class, null,
                    "direction"));
            int position = row.whole(ScheduleColumn.SEGMENT_POSITION, POSITION);
            String cableId = row.uniqueKey(ScheduleColumn.SEGMENT_CABLE_ID, cableIds, "cable ID");
            String fiber = row.reference(ScheduleColumn.SEGMENT_FIBER_TYPE, catalog.fiberCodes(),
                    "fiber type", "in the catalog nor on sheet 'Fiber types'");
            double lengthM = row.number(ScheduleColumn.SEGMENT_LENGTH_M, LENGTH_M);
            StatedSpreads spreads = row.spreads();
            Draft draft = row.faulty() ? null : new SegmentDraft(cableId, fiber, lengthM, spreads);
            place(key, position, row.place(ScheduleColumn.SEGMENT_POSITION), true, draft);
        }
        return true;
    }

    private Map<String, List<Bend>> bends() {
        Map<String, List<Bend>> bends = new HashMap<>();
        Optional<List<SheetRow>> rows = SheetTable.rows(workbook, ScheduleSheet.BENDS, log);
        if (rows.isEmpty()) {
            return bends;
        }
        for (SheetRow row : rows.get()) {
            String cableId = row.reference(ScheduleColumn.BEND_CABLE_ID, cableIds, "cable ID",
                    "on sheet 'Segments'");
            double radiusMm = row.number(ScheduleColumn.BEND_RADIUS_MM, BEND_RADIUS_MM);
            int count = row.whole(ScheduleColumn.BEND_COUNT, BEND_COUNT);
            if (!row.faulty()) {
                Bend bend = row.guard(ScheduleColumn.BEND_RADIUS_MM, () -> new Bend(radiusMm, count));
                if (bend != null) {
                    bends.computeIfAbsent(cableId, k -> new ArrayList<>()).add(bend);
                }
            }
        }
        return bends;
    }

    private boolean joints() {
        Optional<List<SheetRow>> rows = SheetTable.rows(workbook, ScheduleSheet.JOINTS, log);
        if (rows.isEmpty()) {
            return false;
        }
        for (SheetRow row : rows.get()) {
            String pointTag = pointReference(row, ScheduleColumn.JOINT_POINT);
            LegKey key = legKey(pointTag, row.choice(ScheduleColumn.JOINT_DIRECTION, PathDirection.class, null,
                    "direction"));
            int position = row.whole(ScheduleColumn.JOINT_POSITION, POSITION);
            String label = row.identifier(ScheduleColumn.JOINT_LABEL, "joint label");
            if (label != null && pointTag != null) {
                Optional<ScheduleCell> earlier = labelsByPoint.computeIfAbsent(pointTag, k -> new KeyIndex())
                        .define(label, row.place(ScheduleColumn.JOINT_LABEL));
                if (earlier.isPresent()) {
                    row.problem(ScheduleColumn.JOINT_LABEL, "joint label '" + label + "' is already used for point "
                            + pointTag + " (row " + earlier.get().row() + ")");
                }
            }
            String upstream = row.reference(ScheduleColumn.JOINT_UPSTREAM_CONNECTOR,
                    catalog.connectorCodes(), "connector type", "in the catalog nor on sheet 'Connector types'");
            String downstream = optionalReference(row, ScheduleColumn.JOINT_DOWNSTREAM_CONNECTOR,
                    catalog.connectorCodes(), "connector type", "in the catalog nor on sheet 'Connector types'");
            checkMating(row, upstream, downstream);
            InspectionGrade grade = row.choice(ScheduleColumn.JOINT_GRADE, InspectionGrade.class,
                    InspectionGrade.NOT_INSPECTED, "inspection grade");
            OptionalDouble lossDb = row.optionalNumber(ScheduleColumn.JOINT_LOSS_DB, JOINT_LOSS_DB);
            LossBasis basis = row.choice(ScheduleColumn.JOINT_LOSS_BASIS, LossBasis.class, LossBasis.ASSUMED,
                    "loss basis");
            if (basis == LossBasis.MEASURED && lossDb.isEmpty() && !row.faulty()) {
                row.problem(ScheduleColumn.JOINT_LOSS_DB, "loss basis MEASURED needs the measured loss in dB");
            }
            StatedSpreads spreads = row.spreads();
            Joint joint = row.faulty() ? null : row.guard(ScheduleColumn.JOINT_LABEL,
                    () -> new Joint(label, upstream, downstream, grade, lossDb, basis, spreads));
            place(key, position, row.place(ScheduleColumn.JOINT_POSITION), false,
                    joint == null ? null : new JointDraft(joint));
        }
        return true;
    }

    private void checkMating(SheetRow row, String upstream, String downstream) {
        if (upstream == null || downstream == null) {
            return;
        }
        Optional<ConnectorType> a = catalog.available().connectorType(upstream);
        Optional<ConnectorType> b = catalog.available().connectorType(downstream);
        if (a.isPresent() && b.isPresent() && !a.get().matesWith(b.get())) {
            row.problem(ScheduleColumn.JOINT_DOWNSTREAM_CONNECTOR, "connector type '" + downstream + "' (family "
                    + b.get().family() + ") does not mate with upstream connector type '" + upstream + "' (family "
                    + a.get().family() + ")");
        }
    }

    /** A blank cell means the same as upstream (null here, as the Joint record reads it). */
    private static String optionalReference(SheetRow row, ScheduleColumn column, KeyIndex keys, String what,
                                            String whereDefined) {
        if (row.isBlank(column)) {
            return null;
        }
        return row.reference(column, keys, what, whereDefined);
    }

    private String pointReference(SheetRow row, ScheduleColumn column) {
        return row.reference(column, plant.pointTags(), "point tag", "on sheet 'Points'");
    }

    private static LegKey legKey(String pointTag, PathDirection direction) {
        return pointTag == null || direction == null ? null : new LegKey(pointTag, direction);
    }

    private void place(LegKey key, int position, ScheduleCell positionCell, boolean segment, Draft draft) {
        if (key != null && position > 0) {
            entries.computeIfAbsent(key, k -> new ArrayList<>()).add(new Entry(position, positionCell, segment, draft));
        }
    }

    /** Applies the leg rule; returns the entries in position order without repeated positions. */
    private List<Entry> checkOrder(LegKey leg, List<Entry> found) {
        List<Entry> sorted = new ArrayList<>(found);
        sorted.sort(Comparator.comparingInt(Entry::position));
        List<Entry> ordered = new ArrayList<>();
        for (Entry e : sorted) {
            Entry previous = ordered.isEmpty() ? null : ordered.get(ordered.size() - 1);
            if (previous != null && previous.position() == e.position()) {
                log.add(e.positionCell().problem("position " + e.position() + " of leg " + leg
                        + " is taken already by " + previous.positionCell().address()));
                continue;
            }
            int expected = previous == null ? 1 : previous.position() + 1;
            if (e.position() != expected) {
                String missing = e.position() - 1 == expected ? "position " + expected
                        : "positions " + expected + " to " + (e.position() - 1);
                log.add(e.positionCell().problem("leg " + leg + " has nothing at " + missing
                        + ": number its elements 1, 2, 3 ... without gaps"));
            } else if (previous != null && previous.segment() == e.segment()) {
                log.add(e.positionCell().problem(e.segment()
                        ? "two cable segments in a row in leg " + leg + " (positions " + previous.position() + " and "
                                + e.position() + "): a joint must join them"
                        : "two joints in a row in leg " + leg + " (positions " + previous.position() + " and "
                                + e.position() + "): a cable segment must lie between them"));
            }
            ordered.add(e);
        }
        if (ordered.stream().noneMatch(Entry::segment)) {
            log.add(ordered.get(0).positionCell().problem("leg " + leg + " has no cable segment"));
        }
        return ordered;
    }
}
