package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.PathLeg;

/**
 * Withdraws the record last entered at a point (an inspection, a maintenance action or a note): the
 * undo of the history panel. The row is deleted as an audited change, so the trail keeps what it
 * held and who withdrew it. An action that changed the path or the probe puts back what it
 * replaced. A record that a signature entered after it covers (the point's own, whose digest holds
 * it, or the site record's, which signed the trail's head) is never withdrawn: the crew records a
 * correcting entry instead.
 */
public final class RecordWithdrawal {

    /** The trail's entry that brought each of the point's records in, newest first. */
    private static final String LATEST = "SELECT e.id, e.table_name, CAST(e.row_key AS INTEGER) FROM audit_entry e "
            + "WHERE e.action IN ('INSERT', 'BASELINE') AND ("
            + "(e.table_name = 'inspection' AND CAST(e.row_key AS INTEGER) IN (SELECT id FROM inspection WHERE point_id = ?)) "
            + "OR (e.table_name = 'maintenance_action' AND CAST(e.row_key AS INTEGER) IN "
            + "(SELECT id FROM maintenance_action WHERE point_id = ?)) "
            + "OR (e.table_name = 'note' AND CAST(e.row_key AS INTEGER) IN (SELECT id FROM note WHERE point_id = ?))) "
            + "ORDER BY e.id DESC LIMIT 1";
    /** Sign-offs of the point or of the site record entered into the trail after a given entry. */
    private static final String COVERING = "SELECT s.role, s.name, s.signed_at, s.point_id IS NULL FROM sign_off s "
            + "JOIN audit_entry e ON e.table_name = 'sign_off' AND CAST(e.row_key AS INTEGER) = s.id "
            + "AND e.action IN ('INSERT', 'BASELINE') WHERE (s.point_id = ? OR s.point_id IS NULL) AND e.id > ? "
            + "ORDER BY e.id LIMIT 1";

    private final Session session;
    private final AuditLog audit;
    private final PathRepository paths;

    RecordWithdrawal(Session session, AuditLog audit, PathRepository paths) {
        this.session = session;
        this.audit = audit;
        this.paths = paths;
    }

    /**
     * Withdraws the point's latest-entered inspection, action or note.
     *
     * @return what was withdrawn
     * @throws UnknownEntryException for an unknown point
     * @throws WorkbookException     when the point has no such record, or a signature covers it
     */
    public WithdrawnRecord withdrawLatest(String pointTag) {
        return session.write(() -> {
            long pointId = RowKeys.requirePoint(session, pointTag);
            long entryId;
            String table;
            long rowId;
            try (PreparedStatement ps = session.connection().prepareStatement(LATEST)) {
                for (int i = 1; i <= 3; i++) {
                    ps.setLong(i, pointId);
                }
                try (ResultSet rs = ps.executeQuery()) {
                    if (!rs.next()) {
                        throw new WorkbookException("point " + pointTag
                                + " has no inspection, maintenance action or note to withdraw");
                    }
                    entryId = rs.getLong(1);
                    table = rs.getString(2);
                    rowId = rs.getLong(3);
                }
            }
            String what = describe(table, rowId);
            refuseIfSigned(pointId, pointTag, entryId, what);
            refuseIfOnServer(table, rowId, what);
            boolean restored = switch (table) {
                case "inspection" -> {
                    audit.deleteRow(AuditedTable.INSPECTION, rowId);
                    yield false;
                }
                case "note" -> {
                    audit.deleteRow(AuditedTable.NOTE, rowId);
                    yield false;
                }
                default -> withdrawAction(pointId, pointTag, rowId);
            };
            return new WithdrawnRecord(what, restored);
        });
    }

    private void refuseIfSigned(long pointId, String pointTag, long entryId, String what) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement(COVERING)) {
            ps.setLong(1, pointId);
            ps.setLong(2, entryId);
            try (ResultSet rs = ps.executeQuery()) {
                if (rs.next()) {
                    throw new WorkbookException("the " + what + " is covered by the "
                            + rs.getString(1).toLowerCase(Locale.ROOT) + " signature of " + rs.getString(2) + " ("
                            + (rs.getBoolean(4) ? "site record" : "point " + pointTag) + ", "
                            + StoredTime.parse(rs.getString(3)) + "); a signed record is not withdrawn: "
                            + "record a correcting entry instead");
                }
            }
        }
    }

    /**
     * A record the plant server already holds stays: the server keeps records of what happened
     * unchanged, so a withdrawal here would not travel and the other workbooks would keep it.
     */
    private void refuseIfOnServer(String table, long rowId, String what) throws SQLException {
        PortableTable portable = PortableTable.valueOf(table.toUpperCase(Locale.ROOT));
        String key = WorkbookRecords.keyOfRow(session, portable, rowId).orElseThrow();
        try (PreparedStatement ps = session.connection().prepareStatement(
                "SELECT 1 FROM sync_base WHERE table_name = ? AND record_key = ?")) {
            ps.setString(1, portable.name());
            ps.setString(2, key);
            try (ResultSet rs = ps.executeQuery()) {
                if (rs.next()) {
                    throw new WorkbookException("the " + what + " is on the plant server already, which keeps such"
                            + " records as they were made and would bring it back to every workbook; a record that"
                            + " travelled is not withdrawn: record a correcting entry instead");
                }
            }
        }
    }

    /**
     * Puts back the path and probe the action replaced, then removes its copies and the action.
     *
     * @return true when something was put back
     */
    private boolean withdrawAction(long pointId, String pointTag, long actionId) throws SQLException {
        List<PathLeg> before = paths.legsBefore(pointId, actionId);
        if (!before.isEmpty()) {
            paths.replaceLegs(pointTag, before);
            for (long retired : RowKeys.children(session,
                    "SELECT id FROM retired_path_element WHERE action_id = ? ORDER BY id", actionId)) {
                audit.deleteRow(AuditedTable.RETIRED_PATH_ELEMENT, retired);
            }
        }
        String[] kindAndLabel = text("SELECT kind, element_label FROM maintenance_action WHERE id = ?", actionId, 2);
        boolean probe = MaintenanceKind.valueOf(kindAndLabel[0]) == MaintenanceKind.REPLACE_PROBE
                && !kindAndLabel[1].isEmpty();
        if (probe) {
            long probeTypeId = RowKeys.probeType(session, kindAndLabel[1]).orElseThrow(() -> new WorkbookException(
                    "the probe type " + kindAndLabel[1] + " this action removed is no longer in the catalog"));
            PointRepository.changeProbeType(session, audit, pointId, probeTypeId);
        }
        audit.deleteRow(AuditedTable.MAINTENANCE_ACTION, actionId);
        return probe || !before.isEmpty();
    }

    private String describe(String table, long rowId) throws SQLException {
        return switch (table) {
            case "inspection" -> {
                String[] r = text("SELECT joint_label, grade, inspected_at, inspector FROM inspection WHERE id = ?",
                        rowId, 4);
                yield "inspection of " + r[0] + " (" + r[1].toLowerCase(Locale.ROOT).replace('_', ' ') + ") of "
                        + StoredTime.parse(r[2]) + " by " + r[3];
            }
            case "note" -> {
                String[] r = text("SELECT written_at, author FROM note WHERE id = ?", rowId, 2);
                yield "note of " + StoredTime.parse(r[0]) + " by " + r[1];
            }
            default -> {
                String[] r = text("SELECT kind, element_label, performed_at, performed_by FROM maintenance_action "
                        + "WHERE id = ?", rowId, 4);
                MaintenanceKind kind = MaintenanceKind.valueOf(r[0]);
                boolean labelled = kind.role() != MaintenanceKind.ElementRole.NONE && !r[1].isEmpty();
                yield kind.words() + (labelled ? " " + r[1] : "") + " of " + StoredTime.parse(r[2]) + " by " + r[3];
            }
        };
    }

    private String[] text(String sql, long id, int columns) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement(sql)) {
            ps.setLong(1, id);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    throw new IllegalStateException("row " + id + " vanished inside its own transaction");
                }
                List<String> out = new ArrayList<>();
                for (int i = 1; i <= columns; i++) {
                    out.add(rs.getString(i));
                }
                return out.toArray(String[]::new);
            }
        }
    }
}
