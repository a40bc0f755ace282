package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Checks the audit trail in two passes: the hash chain row by row (the first broken link is
 * reported), then every data row against the digest the trail last recorded for it, which finds
 * rows changed, added or removed by another program. Removing the newest audit rows keeps the
 * chain whole; the second pass still sees the data those rows recorded, and the head hash printed
 * by {@code audit verify} lets a signed record pin the trail's end.
 */
final class AuditVerifier {

    /** An audit row exactly as stored: the chain covers the stored text, whatever it says. */
    private record StoredRow(long id, String at, String user, String action, String table, String rowKey,
                             String oldValues, String newValues, String rowSha256, String prevHash, String hash) {

        static StoredRow of(ResultSet rs) throws SQLException {
            return new StoredRow(rs.getLong(1), rs.getString(2), rs.getString(3), rs.getString(4), rs.getString(5),
                    rs.getString(6), rs.getString(7), rs.getString(8), rs.getString(9), rs.getString(10),
                    rs.getString(11));
        }
    }

    private record LastImage(long auditRowId, String table, String rowKey, String rowSha256) {
    }

    private static final String ALL_SQL = "SELECT id, at, user_name, action, table_name, row_key, old_values, "
            + "new_values, row_sha256, prev_hash, hash FROM audit_entry ORDER BY id";

    private final Session session;

    AuditVerifier(Session session) {
        this.session = session;
    }

    AuditReport verify() throws SQLException {
        long rows = 0;
        long prevId = 0;
        String prevHash = Sha256.GENESIS;
        Optional<AuditFinding> chainBreak = Optional.empty();
        Map<String, LastImage> last = new LinkedHashMap<>();
        try (PreparedStatement ps = session.connection().prepareStatement(ALL_SQL);
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                StoredRow e = StoredRow.of(rs);
                rows++;
                if (chainBreak.isEmpty()) {
                    chainBreak = checkLink(e, prevId, prevHash);
                }
                prevId = e.id();
                prevHash = e.hash();
                switch (String.valueOf(e.action())) {
                    case "INSERT", "UPDATE", "BASELINE" -> last.put(rowName(e.table(), e.rowKey()),
                            new LastImage(e.id(), e.table(), e.rowKey(), e.rowSha256()));
                    case "DELETE" -> last.put(rowName(e.table(), e.rowKey()),
                            new LastImage(e.id(), e.table(), e.rowKey(), null));
                    default -> {
                        // SCHEMA rows record no data row
                    }
                }
            }
        }
        return new AuditReport(rows, prevHash, chainBreak, reconcile(last));
    }

    private static Optional<AuditFinding> checkLink(StoredRow e, long prevId, String prevHash) {
        if (!prevHash.equals(e.prevHash())) {
            String why;
            if (prevId == 0) {
                why = e.id() == 1 ? "it does not start the chain (its previous hash is not 64 zeros)"
                        : "the trail starts at row " + e.id() + ": the rows before it were removed";
            } else if (e.id() != prevId + 1) {
                why = "row ids jump from " + prevId + " to " + e.id() + ": the row(s) between were removed";
            } else {
                why = "its previous hash is not the hash of row " + prevId
                        + ": row " + prevId + " was changed or replaced";
            }
            return Optional.of(new AuditFinding(e.id(), "audit row " + e.id() + " breaks the chain: " + why));
        }
        String recomputed = AuditLog.chainHash(e.prevHash(), e.id(), e.at(), e.user(),
                e.action(), e.table(), e.rowKey(), e.oldValues(), e.newValues(), e.rowSha256());
        if (!recomputed.equals(e.hash())) {
            return Optional.of(new AuditFinding(e.id(), "audit row " + e.id()
                    + " breaks the chain: its content (time, user, table, key or values) no longer matches its hash,"
                    + " so it was changed after it was written"));
        }
        return Optional.empty();
    }

    private List<AuditFinding> reconcile(Map<String, LastImage> last) throws SQLException {
        List<AuditFinding> findings = new ArrayList<>();
        for (AuditedTable table : AuditedTable.values()) {
            try (PreparedStatement ps = session.connection().prepareStatement(table.selectAllSql());
                 ResultSet rs = ps.executeQuery()) {
                String[] columns = RowImage.columnNames(rs);
                while (rs.next()) {
                    String key = Long.toString(rs.getLong(1));
                    String name = table.tableName() + " row " + key;
                    LastImage recorded = last.remove(rowName(table.tableName(), key));
                    if (recorded == null) {
                        findings.add(new AuditFinding(0, name + " has no audit entry: it was added without Strandbook"));
                    } else if (recorded.rowSha256() == null) {
                        findings.add(new AuditFinding(recorded.auditRowId(), name + " was deleted by audit row "
                                + recorded.auditRowId() + " but is present: it was restored without Strandbook"));
                    } else if (!recorded.rowSha256().equals(RowImage.of(rs, columns).sha256())) {
                        findings.add(new AuditFinding(recorded.auditRowId(), name + " differs from audit row "
                                + recorded.auditRowId() + ": it was changed without Strandbook"));
                    }
                }
            }
        }
        // rows another program wrote with foreign keys off, such as a spectrum whose scan is gone
        try (PreparedStatement ps = session.connection().prepareStatement("PRAGMA foreign_key_check");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                findings.add(new AuditFinding(0, rs.getString(1) + " row " + rs.getLong(2) + " refers to a missing "
                        + rs.getString(3) + " row: it was changed without Strandbook"));
            }
        }
        for (LastImage gone : last.values()) {
            if (gone.rowSha256() != null) {
                findings.add(new AuditFinding(gone.auditRowId(), gone.table() + " row " + gone.rowKey()
                        + " recorded by audit row " + gone.auditRowId() + " is missing: it was deleted without Strandbook"));
            }
        }
        return findings;
    }

    private static String rowName(String table, String key) {
        return table + '\u0000' + key;
    }
}
