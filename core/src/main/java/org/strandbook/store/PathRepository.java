package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.SpreadInput;

/**
 * The light path of each point: a send and a return leg, each an ordered list of cable segments
 * (with their bends) and joints. A point's legs are replaced as a whole, in one transaction, so a
 * reader never sees half of an edit. A cable ID names one run of fiber on the whole site.
 */
public final class PathRepository {

    /** The spread columns of a path element, in the order of {@link #INSERT_ELEMENT}. */
    static final SpreadInput[] ELEMENT_SPREADS = {SpreadInput.JOINT_LOSS, SpreadInput.LENGTH, SpreadInput.BEND_RADIUS};

    private static final String SELECT_ELEMENTS = "SELECT e.id, e.direction, e.kind, e.label, f.code AS fiber_code, "
            + "e.length_m, ca.code AS connector_a, cb.code AS connector_b, e.grade, e.loss_db, e.loss_basis, "
            + "e.loss_spread, e.length_spread, e.bend_spread, e.spread_basis "
            + "FROM path_element e LEFT JOIN fiber_type f ON f.id = e.fiber_type_id "
            + "LEFT JOIN connector_type ca ON ca.id = e.connector_type_a_id "
            + "LEFT JOIN connector_type cb ON cb.id = e.connector_type_b_id "
            + "WHERE e.point_id = ? ORDER BY e.direction = 'RETURN', e.position";
    private static final String INSERT_ELEMENT = "INSERT INTO path_element (point_id, direction, position, kind, "
            + "label, fiber_type_id, length_m, connector_type_a_id, connector_type_b_id, grade, loss_db, loss_basis"
            + SpreadColumns.list(ELEMENT_SPREADS) + ") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING id";
    private static final String CABLE_OWNER = "SELECT p.tag, e.direction FROM path_element e "
            + "JOIN point p ON p.id = e.point_id WHERE e.kind = 'SEGMENT' AND e.label = ?";

    private final Session session;
    private final AuditLog audit;

    PathRepository(Session session, AuditLog audit) {
        this.session = session;
        this.audit = audit;
    }

    /**
     * Replaces all legs of a point by {@code legs} (at most one per direction; an empty list removes
     * them). Nothing changes when any check fails.
     *
     * @throws UnknownEntryException   for an unknown point tag, fiber type or connector type
     * @throws DuplicateEntryException when a cable ID is used twice or already used by another point
     */
    public void replaceLegs(String pointTag, List<PathLeg> legs) {
        session.write(() -> {
            long pointId = RowKeys.requirePoint(session, pointTag);
            checkLegs(pointTag, legs);
            deleteLegs(session, audit, pointId);
            for (PathLeg leg : legs) {
                insertLeg(pointId, leg);
            }
            return null;
        });
    }

    private static void checkLegs(String pointTag, List<PathLeg> legs) {
        Set<PathDirection> directions = new HashSet<>();
        Set<String> cableIds = new HashSet<>();
        for (PathLeg leg : legs) {
            if (!leg.pointTag().equalsIgnoreCase(pointTag.strip())) {
                throw new IllegalArgumentException("a leg of point " + leg.pointTag() + " cannot be stored under point "
                        + pointTag);
            }
            if (!directions.add(leg.direction())) {
                throw new IllegalArgumentException("point " + pointTag + ": two " + word(leg.direction()) + " legs given");
            }
            for (CableSegment s : leg.segments()) {
                if (!cableIds.add(s.label().toLowerCase(Locale.ROOT))) {
                    throw new DuplicateEntryException("point " + pointTag + ": cable ID '" + s.label()
                            + "' appears twice in its legs");
                }
            }
        }
    }

    private void insertLeg(long pointId, PathLeg leg) throws SQLException {
        String where = "point " + leg.pointTag() + " " + word(leg.direction()) + " leg";
        int position = 1;
        for (PathElement element : leg.elements()) {
            PreparedStatement ps = session.prepared(INSERT_ELEMENT);
            ps.setLong(1, pointId);
            ps.setString(2, leg.direction().name());
            ps.setInt(3, position++);
            ps.setString(5, element.label());
            if (element instanceof CableSegment s) {
                checkCableFree(s.label());
                long fiberId = RowKeys.fiberType(session, s.fiberTypeCode()).orElseThrow(() -> new UnknownEntryException(
                        where + ": cable " + s.label() + " uses unknown fiber type '" + s.fiberTypeCode() + "'"));
                ps.setString(4, "SEGMENT");
                ps.setLong(6, fiberId);
                ps.setDouble(7, s.lengthM());
                ps.setNull(8, Types.INTEGER);
                ps.setNull(9, Types.INTEGER);
                ps.setNull(10, Types.VARCHAR);
                ps.setNull(11, Types.REAL);
                ps.setNull(12, Types.VARCHAR);
                SpreadColumns.bind(ps, 13, s.spreads(), ELEMENT_SPREADS);
            } else if (element instanceof Joint j) {
                ps.setString(4, "JOINT");
                ps.setNull(6, Types.INTEGER);
                ps.setNull(7, Types.REAL);
                ps.setLong(8, connectorId(where, j, j.connectorTypeA()));
                ps.setLong(9, connectorId(where, j, j.connectorTypeB()));
                ps.setString(10, j.grade().name());
                Columns.setOptional(ps, 11, j.lossDb());
                ps.setString(12, j.lossBasis().name());
                SpreadColumns.bind(ps, 13, j.spreads(), ELEMENT_SPREADS);
            }
            long elementId = Columns.insertReturningId(ps);
            audit.inserted(AuditedTable.PATH_ELEMENT, elementId);
            if (element instanceof CableSegment s) {
                insertBends(elementId, s.bends());
            }
        }
    }

    private long connectorId(String where, Joint j, String code) throws SQLException {
        return RowKeys.connectorType(session, code).orElseThrow(() -> new UnknownEntryException(
                where + ": joint " + j.label() + " uses unknown connector type '" + code + "'"));
    }

    private void checkCableFree(String label) throws SQLException {
        PreparedStatement ps = session.prepared(CABLE_OWNER);
        ps.setString(1, label);
        try (ResultSet rs = ps.executeQuery()) {
            if (rs.next()) {
                throw new DuplicateEntryException("cable ID '" + label + "' is already used by point "
                        + rs.getString(1) + " (" + word(PathDirection.valueOf(rs.getString(2))) + " leg)");
            }
        }
    }

    private void insertBends(long elementId, List<Bend> bends) throws SQLException {
        int position = 1;
        for (Bend b : bends) {
            PreparedStatement ps = session.prepared("INSERT INTO segment_bend (element_id, position, radius_mm, count) "
                    + "VALUES (?, ?, ?, ?) RETURNING id");
            ps.setLong(1, elementId);
            ps.setInt(2, position++);
            ps.setDouble(3, b.radiusMm());
            ps.setInt(4, b.count());
            audit.inserted(AuditedTable.SEGMENT_BEND, Columns.insertReturningId(ps));
        }
    }

    /** Deletes every element (and bend) of a point's legs, each with its audit row. */
    static void deleteLegs(Session session, AuditLog audit, long pointId) throws SQLException {
        for (long elementId : RowKeys.children(session, "SELECT id FROM path_element WHERE point_id = ?", pointId)) {
            for (long bendId : RowKeys.children(session, "SELECT id FROM segment_bend WHERE element_id = ?", elementId)) {
                audit.deleteRow(AuditedTable.SEGMENT_BEND, bendId);
            }
            audit.deleteRow(AuditedTable.PATH_ELEMENT, elementId);
        }
    }

    /** The point's legs, send before return; a direction with no elements is left out. */
    public List<PathLeg> legs(String pointTag) {
        return session.read(() -> {
            long pointId = RowKeys.requirePoint(session, pointTag);
            String tag = storedTag(pointId);
            Map<PathDirection, List<PathElement>> byDirection = new EnumMap<>(PathDirection.class);
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_ELEMENTS)) {
                ps.setLong(1, pointId);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        byDirection.computeIfAbsent(PathDirection.valueOf(rs.getString("direction")),
                                d -> new ArrayList<>()).add(element(rs));
                    }
                }
            }
            List<PathLeg> out = new ArrayList<>();
            byDirection.forEach((direction, elements) -> out.add(new PathLeg(tag, direction, elements)));
            return out;
        });
    }

    /**
     * The point's legs as they were at {@code at}: before a maintenance action replaced an element,
     * the path it replaced; otherwise the path of today. Right also when actions were recorded on
     * laptops that did not know of each other ({@link PathReconstruction}). Joint grades are as
     * entered with the path; {@link org.strandbook.site.InspectionHistory} gives them as inspected at
     * that moment.
     */
    public List<PathLeg> legsAt(String pointTag, java.time.Instant at) {
        return session.read(() -> {
            long pointId = RowKeys.requirePoint(session, pointTag);
            return PathReconstruction.at(PathHistory.changes(session, pointId, storedTag(pointId)), legs(pointTag), at);
        });
    }

    /** The point's legs just before a path-changing action, or none when the action did not change the path. */
    List<PathLeg> legsBefore(long pointId, long actionId) throws SQLException {
        String tag = storedTag(pointId);
        List<PathReconstruction.PathChange> changes = PathHistory.changes(session, pointId, tag);
        for (int k = 0; k < changes.size(); k++) {
            if (changes.get(k).actionId() == actionId) {
                return PathReconstruction.before(changes, k, legs(tag));
            }
        }
        return List.of();
    }

    /**
     * Puts {@code replacement} in the place of the element labelled {@code label} (same kind), each
     * changed row audited. The caller has already copied the path into its history.
     *
     * <p>The row is updated where it stands: the replacement takes the same leg and position, and only
     * an element of its own kind is looked for, so one action changes exactly one place of the path.
     * {@link PathReconstruction} relies on that, and on the label naming one element only.
     *
     * @throws WorkbookException when two elements of that kind carry the label
     */
    void replaceElement(long pointId, String pointTag, String label, PathElement replacement) throws SQLException {
        String kind = replacement instanceof CableSegment ? "SEGMENT" : "JOINT";
        String noun = kind.equals("JOINT") ? "joint" : "cable";
        long elementId;
        try (PreparedStatement ps = session.connection().prepareStatement(
                "SELECT id FROM path_element WHERE point_id = ? AND label = ? AND kind = ?")) {
            ps.setLong(1, pointId);
            ps.setString(2, label);
            ps.setString(3, kind);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    throw new UnknownEntryException("point " + pointTag + " has no " + noun + " '" + label
                            + "' on its path today");
                }
                elementId = rs.getLong(1);
                if (rs.next()) {
                    throw new WorkbookException("point " + pointTag + " has two " + noun + "s labelled '" + label
                            + "' on its path; give each its own label in the path first, so the record names one");
                }
            }
        }
        String where = "point " + pointTag + ": replacement for " + label;
        RowImage before = audit.capture(AuditedTable.PATH_ELEMENT, elementId).orElseThrow();
        if (replacement instanceof CableSegment s) {
            if (!s.label().equalsIgnoreCase(label)) {
                checkCableFree(s.label());
            }
            long fiberId = RowKeys.fiberType(session, s.fiberTypeCode()).orElseThrow(() -> new UnknownEntryException(
                    where + " uses unknown fiber type '" + s.fiberTypeCode() + "'"));
            try (PreparedStatement ps = session.connection().prepareStatement(
                    "UPDATE path_element SET label = ?, fiber_type_id = ?, length_m = ?"
                            + SpreadColumns.assignments(ELEMENT_SPREADS) + " WHERE id = ?")) {
                ps.setString(1, s.label());
                ps.setLong(2, fiberId);
                ps.setDouble(3, s.lengthM());
                ps.setLong(SpreadColumns.bind(ps, 4, s.spreads(), ELEMENT_SPREADS), elementId);
                ps.executeUpdate();
            }
            for (long bendId : RowKeys.children(session, "SELECT id FROM segment_bend WHERE element_id = ?", elementId)) {
                audit.deleteRow(AuditedTable.SEGMENT_BEND, bendId);
            }
            insertBends(elementId, s.bends());
        } else if (replacement instanceof Joint j) {
            try (PreparedStatement ps = session.connection().prepareStatement("UPDATE path_element SET label = ?, "
                    + "connector_type_a_id = ?, connector_type_b_id = ?, grade = ?, loss_db = ?, loss_basis = ?"
                    + SpreadColumns.assignments(ELEMENT_SPREADS) + " WHERE id = ?")) {
                ps.setString(1, j.label());
                ps.setLong(2, connectorId(where, j, j.connectorTypeA()));
                ps.setLong(3, connectorId(where, j, j.connectorTypeB()));
                ps.setString(4, j.grade().name());
                Columns.setOptional(ps, 5, j.lossDb());
                ps.setString(6, j.lossBasis().name());
                ps.setLong(SpreadColumns.bind(ps, 7, j.spreads(), ELEMENT_SPREADS), elementId);
                ps.executeUpdate();
            }
        }
        audit.updated(AuditedTable.PATH_ELEMENT, elementId, before);
    }

    /** The point's leg in one direction, if it has any element. */
    public Optional<PathLeg> leg(String pointTag, PathDirection direction) {
        return legs(pointTag).stream().filter(l -> l.direction() == direction).findFirst();
    }

    private String storedTag(long pointId) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement("SELECT tag FROM point WHERE id = ?")) {
            ps.setLong(1, pointId);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getString(1);
            }
        }
    }

    private PathElement element(ResultSet rs) throws SQLException {
        if ("SEGMENT".equals(rs.getString("kind"))) {
            return new CableSegment(rs.getString("label"), rs.getString("fiber_code"), rs.getDouble("length_m"),
                    bends(rs.getLong("id")), SpreadColumns.read(rs, SpreadInput.LENGTH, SpreadInput.BEND_RADIUS));
        }
        return new Joint(rs.getString("label"), rs.getString("connector_a"), rs.getString("connector_b"),
                InspectionGrade.valueOf(rs.getString("grade")), Columns.optionalDouble(rs, "loss_db"),
                LossBasis.valueOf(rs.getString("loss_basis")), SpreadColumns.read(rs, SpreadInput.JOINT_LOSS));
    }

    private List<Bend> bends(long elementId) throws SQLException {
        List<Bend> out = new ArrayList<>();
        try (PreparedStatement ps = session.connection().prepareStatement(
                "SELECT radius_mm, count FROM segment_bend WHERE element_id = ? ORDER BY position")) {
            ps.setLong(1, elementId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(new Bend(rs.getDouble(1), rs.getInt(2)));
                }
            }
        }
        return out;
    }

    private static String word(PathDirection direction) {
        return direction.name().toLowerCase(Locale.ROOT);
    }
}
