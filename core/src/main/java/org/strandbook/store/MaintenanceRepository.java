package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
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
            Optional<String> probeRemoved = action.changesProbe()
                    ? Optional.of(probeChange(pointId, action, what)) : Optional.empty();
            List<PathLeg> before = action.changesPath() ? paths.legs(action.pointTag()) : List.of();
            long id;
            try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO maintenance_action "
                    + "(point_id, kind, element_label, performed_at, performed_by, what, why) "
                    + "VALUES (?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
                ps.setLong(1, pointId);
                ps.setString(2, action.kind().name());
                // the probe and the reference carry no label, except the probe type a replacement removed
                ps.setString(3, action.kind().role() == MaintenanceKind.ElementRole.NONE ? probeRemoved.orElse("")
                        : action.elementLabel());
                ps.setString(4, StoredTime.format(action.performedAt()));
                ps.setString(5, action.performedBy());
                ps.setString(6, probeRemoved.map(old -> probeDescribed(action, old)).orElse(described(action, before)));
                ps.setString(7, action.why());
                id = Columns.insertReturningId(ps);
                audit.inserted(AuditedTable.MAINTENANCE_ACTION, id);
            }
            if (action.changesPath()) {
                PathHistory.retire(session, audit, id, before);
                paths.replaceElement(pointId, action.pointTag(), action.elementLabel(), action.replacement().get());
            }
            if (action.changesProbe()) {
                PointRepository.changeProbeType(session, audit, pointId,
                        RowKeys.probeType(session, action.newProbeTypeCode()).orElseThrow());
            }
            return id;
        });
    }

    /**
     * Checks a probe replacement that fits another type and returns the type it removes.
     *
     * @throws UnknownEntryException    for a probe type not in the catalog
     * @throws IllegalArgumentException when dated before the point's latest probe change
     */
    private String probeChange(long pointId, MaintenanceAction action, String what) throws SQLException {
        if (RowKeys.probeType(session, action.newProbeTypeCode()).isEmpty()) {
            throw new UnknownEntryException(what + ": unknown probe type '" + action.newProbeTypeCode()
                    + "'; add it to the probe catalog first");
        }
        try (PreparedStatement ps = session.connection().prepareStatement("SELECT max(performed_at) FROM "
                + "maintenance_action WHERE point_id = ? AND kind = 'REPLACE_PROBE' AND element_label <> ''")) {
            ps.setLong(1, pointId);
            try (ResultSet rs = ps.executeQuery()) {
                String last = rs.next() ? rs.getString(1) : null;
                if (last != null && !action.performedAt().isAfter(StoredTime.parse(last))) {
                    throw new IllegalArgumentException(what + ": dated " + action.performedAt()
                            + ", not after the point's latest recorded probe change (" + StoredTime.parse(last)
                            + "); probe changes are recorded in the order they were made");
                }
            }
        }
        return probeTypeNow(pointId);
    }

    private String probeTypeNow(long pointId) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement(
                "SELECT pt.code FROM point p JOIN probe_type pt ON pt.id = p.probe_type_id WHERE p.id = ?")) {
            ps.setLong(1, pointId);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getString(1);
            }
        }
    }

    private static String probeDescribed(MaintenanceAction action, String removed) {
        String change = "before: probe " + removed + "; after: probe " + action.newProbeTypeCode();
        return action.what().isEmpty() ? change : action.what() + " (" + change + ")";
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
                return withProbesFitted(actions(ps));
            }
        });
    }

    /** Every action, by point tag then time. */
    public List<MaintenanceAction> listAll() {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(
                    SELECT + " ORDER BY p.tag, a.performed_at, a.id")) {
                return withProbesFitted(actions(ps));
            }
        });
    }

    /**
     * Probe changes read back with the type they fitted: the type the point's next probe change
     * removed, or its probe type today. Expects the actions of each point in time order.
     */
    private List<MaintenanceAction> withProbesFitted(List<MaintenanceAction> actions) throws SQLException {
        List<MaintenanceAction> out = new ArrayList<>(actions);
        Map<String, String> fittedLater = new HashMap<>();
        for (int i = out.size() - 1; i >= 0; i--) {
            MaintenanceAction a = out.get(i);
            if (a.kind() != MaintenanceKind.REPLACE_PROBE || a.elementLabel().isEmpty()) {
                continue;
            }
            String fitted = fittedLater.get(a.pointTag());
            if (fitted == null) {
                fitted = probeTypeNow(RowKeys.requirePoint(session, a.pointTag()));
            }
            out.set(i, new MaintenanceAction(a.pointTag(), a.kind(), a.elementLabel(), a.performedAt(),
                    a.performedBy(), a.what(), a.why(), Optional.empty(), fitted));
            fittedLater.put(a.pointTag(), a.elementLabel());
        }
        return out;
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
