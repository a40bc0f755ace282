package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.SpreadInput;

/**
 * A point's light path through time. {@code path_element} holds the path as it is now; before a
 * maintenance action replaces an element, the whole path as it was is copied under the action
 * ({@code retired_path_element}). {@link PathReconstruction} rebuilds the path at a moment from these
 * copies and today's path.
 */
final class PathHistory {

    private static final String CHANGES = "SELECT a.id, a.performed_at, a.kind, a.element_label "
            + "FROM maintenance_action a WHERE a.point_id = ? "
            + "AND EXISTS (SELECT 1 FROM retired_path_element r WHERE r.action_id = a.id) "
            + "ORDER BY a.performed_at, a.id";
    private static final String LATEST_CHANGE = "SELECT max(a.performed_at) FROM maintenance_action a "
            + "WHERE a.point_id = ? AND EXISTS (SELECT 1 FROM retired_path_element r WHERE r.action_id = a.id)";
    private static final String RETIRED = "SELECT direction, kind, label, fiber_code, length_m, bends, connector_a, "
            + "connector_b, grade, loss_db, loss_basis, loss_spread, length_spread, bend_spread, spread_basis "
            + "FROM retired_path_element WHERE action_id = ? "
            + "ORDER BY direction = 'RETURN', position";
    private static final String RETIRE = "INSERT INTO retired_path_element (action_id, direction, position, kind, "
            + "label, fiber_code, length_m, bends, connector_a, connector_b, grade, loss_db, loss_basis"
            + SpreadColumns.list(PathRepository.ELEMENT_SPREADS)
            + ") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING id";
    private static final String ELEMENT_NOW = "SELECT 1 FROM path_element WHERE point_id = ? AND label = ? AND kind = ?";
    private static final String ELEMENT_BEFORE = "SELECT 1 FROM retired_path_element r JOIN maintenance_action a "
            + "ON a.id = r.action_id WHERE a.point_id = ? AND r.label = ? COLLATE NOCASE AND r.kind = ?";

    private PathHistory() {
    }

    /** The point's path-changing actions with the path each one copied, by time (ties in the order recorded). */
    static List<PathReconstruction.PathChange> changes(Session session, long pointId, String pointTag)
            throws SQLException {
        record Row(long id, Instant at, String label, boolean segment) {
        }
        List<Row> rows = new ArrayList<>();
        PreparedStatement ps = session.prepared(CHANGES);
        ps.setLong(1, pointId);
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                rows.add(new Row(rs.getLong(1), StoredTime.parse(rs.getString(2)), rs.getString(4),
                        MaintenanceKind.valueOf(rs.getString(3)).role() == MaintenanceKind.ElementRole.SEGMENT));
            }
        }
        List<PathReconstruction.PathChange> out = new ArrayList<>();
        for (Row r : rows) {
            out.add(new PathReconstruction.PathChange(r.id(), r.at(), r.label(), r.segment(),
                    retiredLegs(session, r.id(), pointTag)));
        }
        return out;
    }

    /** When the point's path last changed by an action, if it ever did. */
    static Optional<Instant> latestChange(Session session, long pointId) throws SQLException {
        PreparedStatement ps = session.prepared(LATEST_CHANGE);
        ps.setLong(1, pointId);
        try (ResultSet rs = ps.executeQuery()) {
            String at = rs.next() ? rs.getString(1) : null;
            return at == null ? Optional.empty() : Optional.of(StoredTime.parse(at));
        }
    }

    /** The legs copied under an action: the path as it was just before it. */
    static List<PathLeg> retiredLegs(Session session, long actionId, String pointTag) throws SQLException {
        Map<PathDirection, List<PathElement>> byDirection = new EnumMap<>(PathDirection.class);
        PreparedStatement ps = session.prepared(RETIRED);
        ps.setLong(1, actionId);
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                byDirection.computeIfAbsent(PathDirection.valueOf(rs.getString(1)), d -> new ArrayList<>())
                        .add(retiredElement(rs));
            }
        }
        List<PathLeg> out = new ArrayList<>();
        byDirection.forEach((direction, elements) -> out.add(new PathLeg(pointTag, direction, elements)));
        return out;
    }

    private static PathElement retiredElement(ResultSet rs) throws SQLException {
        if ("SEGMENT".equals(rs.getString(2))) {
            return new CableSegment(rs.getString(3), rs.getString(4), rs.getDouble(5), parseBends(rs.getString(6)),
                    SpreadColumns.read(rs, SpreadInput.LENGTH, SpreadInput.BEND_RADIUS));
        }
        return new Joint(rs.getString(3), rs.getString(7), rs.getString(8), InspectionGrade.valueOf(rs.getString(9)),
                Columns.optionalDouble(rs, "loss_db"), LossBasis.valueOf(rs.getString(11)),
                SpreadColumns.read(rs, SpreadInput.JOINT_LOSS));
    }

    /** Copies the legs under an action, each row audited. */
    static void retire(Session session, AuditLog audit, long actionId, List<PathLeg> legs) throws SQLException {
        for (PathLeg leg : legs) {
            int position = 1;
            for (PathElement e : leg.elements()) {
                PreparedStatement ps = session.prepared(RETIRE);
                ps.setLong(1, actionId);
                ps.setString(2, leg.direction().name());
                ps.setInt(3, position++);
                ps.setString(5, e.label());
                if (e instanceof CableSegment s) {
                    ps.setString(4, "SEGMENT");
                    ps.setString(6, s.fiberTypeCode());
                    ps.setDouble(7, s.lengthM());
                    ps.setString(8, formatBends(s.bends()));
                    for (int i = 9; i <= 11; i++) {
                        ps.setNull(i, Types.VARCHAR);
                    }
                    ps.setNull(12, Types.REAL);
                    ps.setNull(13, Types.VARCHAR);
                    SpreadColumns.bind(ps, 14, s.spreads(), PathRepository.ELEMENT_SPREADS);
                } else if (e instanceof Joint j) {
                    ps.setString(4, "JOINT");
                    ps.setNull(6, Types.VARCHAR);
                    ps.setNull(7, Types.REAL);
                    ps.setNull(8, Types.VARCHAR);
                    ps.setString(9, j.connectorTypeA());
                    ps.setString(10, j.connectorTypeB());
                    ps.setString(11, j.grade().name());
                    Columns.setOptional(ps, 12, j.lossDb());
                    ps.setString(13, j.lossBasis().name());
                    SpreadColumns.bind(ps, 14, j.spreads(), PathRepository.ELEMENT_SPREADS);
                }
                audit.inserted(AuditedTable.RETIRED_PATH_ELEMENT, Columns.insertReturningId(ps));
            }
        }
    }

    /**
     * Refuses a label that names no element of that kind on the point's path, now or in its history.
     *
     * @param kind "JOINT" or "SEGMENT"
     */
    static void requireElement(Session session, long pointId, String pointTag, String label, String kind)
            throws SQLException {
        for (String sql : new String[] {ELEMENT_NOW, ELEMENT_BEFORE}) {
            PreparedStatement ps = session.prepared(sql);
            ps.setLong(1, pointId);
            ps.setString(2, label.strip());
            ps.setString(3, kind);
            try (ResultSet rs = ps.executeQuery()) {
                if (rs.next()) {
                    return;
                }
            }
        }
        throw new UnknownEntryException("point " + pointTag + " has no " + (kind.equals("JOINT") ? "joint" : "cable")
                + " '" + label.strip() + "' on its path");
    }

    static String formatBends(List<Bend> bends) {
        StringBuilder sb = new StringBuilder();
        for (Bend b : bends) {
            if (sb.length() > 0) {
                sb.append(';');
            }
            sb.append(Double.toString(b.radiusMm())).append(':').append(b.count());
        }
        return sb.toString();
    }

    static List<Bend> parseBends(String text) {
        List<Bend> out = new ArrayList<>();
        if (text == null || text.isBlank()) {
            return out;
        }
        for (String pair : text.split(";")) {
            String[] parts = pair.split(":");
            out.add(new Bend(Double.parseDouble(parts[0].strip()), Integer.parseInt(parts[1].strip())));
        }
        return out;
    }
}
