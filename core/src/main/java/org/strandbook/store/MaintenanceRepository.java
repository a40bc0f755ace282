package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.strandbook.site.CableSegment;
import org.strandbook.site.Joint;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;

/**
 * Maintenance actions at points. An action that replaces an element first copies the point's whole
 * path into its history, then changes today's path, in one transaction, so that scans taken before
 * it are still judged against the path they went through. Every row is audited.
 */
public final class MaintenanceRepository {

    private static final String SELECT = "SELECT p.tag, a.kind, a.element_label, a.performed_at, "
            + "a.performed_by, a.what, a.why FROM maintenance_action a JOIN point p ON p.id = a.point_id";

    private final Session session;
    private final AuditLog audit;
    private final PathRepository paths;

    MaintenanceRepository(Session session, AuditLog audit, PathRepository paths) {
        this.session = session;
        this.audit = audit;
        this.paths = paths;
    }

    /**
     * Records an action, and changes the path when it brings a replacement.
     *
     * @return its id
     * @throws UnknownEntryException    for an unknown point, joint, cable or catalog code
     * @throws IllegalArgumentException for a time in the future, or a path change dated before an
     *                                  earlier-recorded one (the history must be written in order)
     */
    public long add(MaintenanceAction action) {
        return session.write(() -> {
            long pointId = RowKeys.requirePoint(session, action.pointTag());
            String what = action.kind().words() + " at " + action.pointTag()
                    + (action.elementLabel().isEmpty() ? "" : " " + action.elementLabel());
            FieldRecordTime.require(action.performedAt(), what);
            switch (action.kind().role()) {
                case JOINT -> PathHistory.requireElement(session, pointId, action.pointTag(), action.elementLabel(), "JOINT");
                case SEGMENT -> PathHistory.requireElement(session, pointId, action.pointTag(), action.elementLabel(), "SEGMENT");
                case NONE -> {
                    // the probe and the reference are not path elements with labels
                }
            }
            if (action.changesPath()) {
                Optional<Instant> last = PathHistory.latestChange(session, pointId);
                if (last.isPresent() && !action.performedAt().isAfter(last.get())) {
                    throw new IllegalArgumentException(what + ": dated " + action.performedAt()
                            + ", not after the path's latest recorded change (" + last.get()
                            + "); changes to the path are recorded in the order they were made");
                }
            }
            List<PathLeg> before = action.changesPath() ? paths.legs(action.pointTag()) : List.of();
            long id;
            try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO maintenance_action "
                    + "(point_id, kind, element_label, performed_at, performed_by, what, why) "
                    + "VALUES (?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
                ps.setLong(1, pointId);
                ps.setString(2, action.kind().name());
                ps.setString(3, action.elementLabel());
                ps.setString(4, StoredTime.format(action.performedAt()));
                ps.setString(5, action.performedBy());
                ps.setString(6, described(action, before));
                ps.setString(7, action.why());
                id = Columns.insertReturningId(ps);
                audit.inserted(AuditedTable.MAINTENANCE_ACTION, id);
            }
            if (action.changesPath()) {
                PathHistory.retire(session, audit, id, before);
                paths.replaceElement(pointId, action.pointTag(), action.elementLabel(), action.replacement().get());
            }
            return id;
        });
    }

    /**
     * The point's actions in time order. A path change reads back with its element before and after
     * in {@code what}; the replacement itself lives on in the path and its history.
     */
    public List<MaintenanceAction> list(String pointTag) {
        return session.read(() -> {
            long pointId = RowKeys.requirePoint(session, pointTag);
            try (PreparedStatement ps = session.connection().prepareStatement(
                    SELECT + " WHERE a.point_id = ? ORDER BY a.performed_at, a.id")) {
                ps.setLong(1, pointId);
                return actions(ps);
            }
        });
    }

    /** Every action, by point tag then time. */
    public List<MaintenanceAction> listAll() {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(
                    SELECT + " ORDER BY p.tag, a.performed_at, a.id")) {
                return actions(ps);
            }
        });
    }

    private static List<MaintenanceAction> actions(PreparedStatement ps) throws SQLException {
        List<MaintenanceAction> out = new ArrayList<>();
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new MaintenanceAction(rs.getString(1), MaintenanceKind.valueOf(rs.getString(2)),
                        rs.getString(3), StoredTime.parse(rs.getString(4)), rs.getString(5), rs.getString(6),
                        rs.getString(7), Optional.empty()));
            }
        }
        return out;
    }

    /** The stored description: the crew's words, then the element before and after in the workbook's terms. */
    private static String described(MaintenanceAction action, List<PathLeg> before) {
        if (!action.changesPath()) {
            return action.what();
        }
        String was = before.stream().flatMap(l -> l.elements().stream())
                .filter(e -> e.label().equalsIgnoreCase(action.elementLabel())).findFirst()
                .map(MaintenanceRepository::element).orElse("?");
        String change = "before: " + was + "; after: " + element(action.replacement().get());
        return action.what().isEmpty() ? change : action.what() + " (" + change + ")";
    }

    private static String element(PathElement e) {
        if (e instanceof CableSegment s) {
            return String.format(Locale.ROOT, "cable %s, %s, %.1f m%s", s.label(), s.fiberTypeCode(), s.lengthM(),
                    s.bends().isEmpty() ? "" : ", bends " + s.bends().stream().map(b -> String.format(Locale.ROOT,
                            "%d × %.0f mm", b.count(), b.radiusMm())).reduce((a, b) -> a + ", " + b).orElse(""));
        }
        Joint j = (Joint) e;
        return "joint " + j.label() + ", " + j.connectorTypeA() + "/" + j.connectorTypeB()
                + (j.lossDb().isPresent() ? String.format(Locale.ROOT, ", %.2f dB", j.lossDb().getAsDouble()) : "");
    }
}
