package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The workbook's audit trail: every insert, update and delete of user data appends one row, in the
 * same transaction as the change, naming the time (UTC), the user, the table and key, and the row
 * before and after as JSON (a spectrum appears as its SHA-256 and size, not its bytes).
 *
 * <p>Rows are chained: {@code hash = SHA-256(field(prev_hash) field(id) field(at) field(user_name)
 * field(action) field(table_name) field(row_key) field(old_values) field(new_values)
 * field(row_sha256))}, where {@code field(s)} is the decimal UTF-8 byte length of {@code s}, a
 * colon and {@code s}, and a NULL field is a single {@code -}. The first row's {@code prev_hash} is
 * 64 zeros. Anyone can recompute the chain from the table with any SHA-256 tool (FIPS 180-4).
 *
 * <p>Why Java and not triggers: SQLite has no SHA-256 function to chain rows inside a trigger, and
 * a trigger-filled staging table would still need Java to chain it before commit. Writing the row
 * from the repository inside the change's transaction keeps one mechanism, and the repository
 * already knows the user. Tables have no cascading deletes, so no row leaves unseen.
 */
public final class AuditLog {

    static final String WORKBOOK_TABLE = "workbook";

    private static final String APPEND_SQL = "INSERT INTO audit_entry (id, at, user_name, action, table_name, "
            + "row_key, old_values, new_values, row_sha256, prev_hash, hash) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)";
    private static final String SCAN_ROW_SQL = "SELECT * FROM scan WHERE id = ?";
    private static final String HEAD_SQL = "SELECT id, hash FROM audit_entry ORDER BY id DESC LIMIT 1";
    private static final String ENTRIES_SQL = "SELECT id, at, user_name, action, table_name, row_key, old_values, "
            + "new_values, row_sha256, prev_hash, hash FROM audit_entry WHERE id > ? ORDER BY id LIMIT ?";

    private final Session session;
    /** The newest row as this connection wrote it, valid while the session's write generation is {@link #headGeneration}. */
    private long headId;
    private String headHash;
    private long headGeneration = -1;

    AuditLog(Session session) {
        this.session = session;
    }

    /** Checks the chain and compares every data row with the trail's last image of it. */
    public AuditReport verify() {
        return session.read(() -> new AuditVerifier(session).verify());
    }

    /** Up to {@code limit} rows after row {@code afterId}, in order. */
    public List<AuditEntry> entries(long afterId, int limit) {
        return session.read(() -> {
            PreparedStatement ps = session.prepared(ENTRIES_SQL);
            ps.setLong(1, afterId);
            ps.setInt(2, limit);
            List<AuditEntry> out = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(entry(rs));
                }
            }
            return out;
        });
    }

    /** The newest row of the trail, if any. */
    public Optional<AuditEntry> head() {
        return session.read(() -> {
            try (ResultSet rs = session.prepared("SELECT id, at, user_name, action, table_name, row_key, old_values,"
                    + " new_values, row_sha256, prev_hash, hash FROM audit_entry ORDER BY id DESC LIMIT 1").executeQuery()) {
                return rs.next() ? Optional.of(entry(rs)) : Optional.<AuditEntry>empty();
            }
        });
    }

    static AuditEntry entry(ResultSet rs) throws SQLException {
        return new AuditEntry(rs.getLong("id"), StoredTime.parse(rs.getString("at")), rs.getString("user_name"),
                rs.getString("action"), rs.getString("table_name"), rs.getString("row_key"),
                rs.getString("old_values"), rs.getString("new_values"), rs.getString("row_sha256"),
                rs.getString("prev_hash"), rs.getString("hash"));
    }

    Optional<RowImage> capture(AuditedTable table, long key) throws SQLException {
        PreparedStatement ps = session.prepared(table.selectRowSql());
        ps.setLong(1, key);
        try (ResultSet rs = ps.executeQuery()) {
            return rs.next() ? Optional.of(RowImage.of(rs)) : Optional.empty();
        }
    }

    /** Records a row just inserted. */
    void inserted(AuditedTable table, long key) throws SQLException {
        RowImage now = capture(table, key).orElseThrow(() -> new IllegalStateException(
                table.tableName() + " row " + key + " vanished inside its own transaction"));
        append("INSERT", table.tableName(), Long.toString(key), null, now.json(), now.sha256());
    }

    /**
     * Records a scan just inserted with its spectrum, from the scan row read back and the spectrum
     * bytes the caller has just written. This is the image {@link AuditedTable#SCAN} gives, whose
     * digest the verifier recomputes from the stored BLOB, so a spectrum changed later is still
     * found; it only spares reading the 16 bytes per point straight back and digesting them on the
     * writing thread.
     */
    void insertedScan(long scanId, int spectrumBytes, String spectrumSha256) throws SQLException {
        PreparedStatement ps = session.prepared(SCAN_ROW_SQL);
        ps.setLong(1, scanId);
        RowImage now;
        try (ResultSet rs = ps.executeQuery()) {
            if (!rs.next()) {
                throw new IllegalStateException("scan row " + scanId + " vanished inside its own transaction");
            }
            now = RowImage.of(rs).withBlob(AuditedTable.SCAN_SPECTRUM_COLUMN, spectrumSha256, spectrumBytes);
        }
        append("INSERT", AuditedTable.SCAN.tableName(), Long.toString(scanId), null, now.json(), now.sha256());
    }

    /** Records a row just updated; an update that changed nothing leaves no trace. */
    void updated(AuditedTable table, long key, RowImage before) throws SQLException {
        RowImage now = capture(table, key).orElseThrow(() -> new IllegalStateException(
                table.tableName() + " row " + key + " vanished inside its own transaction"));
        if (!now.equals(before)) {
            append("UPDATE", table.tableName(), Long.toString(key), before.json(), now.json(), now.sha256());
        }
    }

    /** Deletes one row that has no covered child rows, and records it. */
    void deleteRow(AuditedTable table, long key) throws SQLException {
        Optional<RowImage> before = capture(table, key);
        if (before.isEmpty()) {
            return;
        }
        PreparedStatement ps = session.prepared(table.deleteRowSql());
        ps.setLong(1, key);
        ps.executeUpdate();
        deleted(table, key, before.get());
    }

    /** Records a row the caller has just deleted, given its image from before. */
    void deleted(AuditedTable table, long key, RowImage before) throws SQLException {
        append("DELETE", table.tableName(), Long.toString(key), before.json(), null, null);
    }

    /** Records every row of the table as found: the trail's starting point for rows older than it. */
    void baseline(AuditedTable table) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement(table.selectAllSql());
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                RowImage row = RowImage.of(rs);
                append("BASELINE", table.tableName(), Long.toString(rs.getLong(1)), null, row.json(), row.sha256());
            }
        }
    }

    void schemaChanged(int fromVersion, int toVersion) throws SQLException {
        append("SCHEMA", WORKBOOK_TABLE, "schema", "{\"schema\":" + fromVersion + "}",
                "{\"schema\":" + toVersion + "}", null);
    }

    private void append(String action, String table, String key, String oldValues, String newValues,
                        String rowSha256) throws SQLException {
        // the head is read once per write transaction: while it is open no other program can append,
        // and the generation moves on at every rollback that might have taken our own rows away
        if (headGeneration != session.writeGeneration()) {
            readHead();
        }
        String prevHash = headHash;
        long id = headId + 1;
        String at = StoredTime.format(StoredTime.now());
        String user = session.user();
        String hash = chainHash(prevHash, id, at, user, action, table, key, oldValues, newValues, rowSha256);
        PreparedStatement ps = session.prepared(APPEND_SQL);
        ps.setLong(1, id);
        ps.setString(2, at);
        ps.setString(3, user);
        ps.setString(4, action);
        ps.setString(5, table);
        ps.setString(6, key);
        ps.setString(7, oldValues);
        ps.setString(8, newValues);
        ps.setString(9, rowSha256);
        ps.setString(10, prevHash);
        ps.setString(11, hash);
        ps.executeUpdate();
        headId = id;
        headHash = hash;
    }

    private void readHead() throws SQLException {
        long id = 0;
        String hash = Sha256.GENESIS;
        try (ResultSet rs = session.prepared(HEAD_SQL).executeQuery()) {
            if (rs.next()) {
                id = rs.getLong(1);
                hash = rs.getString(2);
            }
        }
        headId = id;
        headHash = hash;
        headGeneration = session.writeGeneration();
    }

    static String chainHash(String prevHash, long id, String at, String user, String action, String table,
                            String key, String oldValues, String newValues, String rowSha256) {
        return new Sha256.Fields().add(prevHash).add(Long.toString(id)).add(at).add(user).add(action).add(table)
                .add(key).add(oldValues).add(newValues).add(rowSha256).hex();
    }
}
