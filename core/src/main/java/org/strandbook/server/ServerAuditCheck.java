package org.strandbook.server;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.sql.Array;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.strandbook.store.AuditFinding;
import org.strandbook.store.AuditReport;
import org.strandbook.store.PortableTable;

/**
 * Checks one site's audit trail on the plant server from outside the server: every row's hash is
 * recomputed here (SHA-256, FIPS 180-4) from the row as stored, not by the server's own
 * {@code audit_hash}, which the database's owner could replace; the chain must run unbroken from 64
 * zeros; every record must be as the trail last recorded it (an editable record's latest fields, a
 * batch of immutable records' SHA-256 recomputed from the records as stored). What it finds is what
 * the owner could still do past the triggers (disable them, or edit as superuser): the technician's
 * role cannot reach either table.
 */
public final class ServerAuditCheck {

    private static final String GENESIS = "0".repeat(64);
    /** The server's text of a moment in the hash: {@code to_char(at AT TIME ZONE 'UTC', ...US"Z")}. */
    private static final DateTimeFormatter AT = DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss.SSSSSS'Z'",
            Locale.ROOT);
    /** Tables of records that never change; scan_removal lives only on the server. */
    private static final List<String> IMMUTABLE = immutableTables();
    /** Records whose SHA-256 is recomputed per query: one push statement's worth. */
    private static final int KEYS_PER_QUERY = 500;

    /** What the trail last said of one record: its fields (editable, or a record audited alone) or a batch digest. */
    private record LastImage(long auditRowId, String fieldsText) {
    }

    private ServerAuditCheck() {
    }

    private static List<String> immutableTables() {
        List<String> out = new ArrayList<>();
        for (PortableTable t : PortableTable.values()) {
            if (!t.editable()) {
                out.add(t.serverTable());
            }
        }
        out.add("scan_removal");
        return List.copyOf(out);
    }

    /** The site's trail as the login may read it (the owner: all of it; a member: its own sites). */
    public static AuditReport verify(PlantServer server, String siteName) {
        try (Connection c = server.connect()) {
            long siteId = siteIdFor(c, siteName);
            Map<String, LastImage> last = new HashMap<>();
            Map<String, List<Batch>> batches = new LinkedHashMap<>();
            long rows = 0;
            String prev = GENESIS;
            Optional<AuditFinding> chainBreak = Optional.empty();
            // a batch row's keys and digest are read by the server's own JSON functions (built in, not the schema's)
            try (PreparedStatement ps = c.prepareStatement("SELECT id, at, db_user::text, action, table_name, record_key,"
                    + " old_fields::text, new_fields::text, prev_hash, hash, CASE WHEN jsonb_typeof(new_fields -> 'keys') = 'array'"
                    + " AND new_fields -> 'records' IS NOT NULL AND new_fields -> 'sha256' IS NOT NULL THEN ARRAY(SELECT jsonb_array_elements_text(new_fields"
                    + " -> 'keys')) END, new_fields ->> 'sha256' FROM audit_entry WHERE site_id = ? ORDER BY id")) {
                ps.setLong(1, siteId);
                ps.setFetchSize(5_000);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        rows++;
                        long id = rs.getLong(1);
                        String at = AT.format(rs.getObject(2, OffsetDateTime.class).withOffsetSameInstant(ZoneOffset.UTC));
                        String table = rs.getString(5);
                        String key = rs.getString(6);
                        String newFields = rs.getString(8);
                        String recomputed = sha256Hex(String.join("\n", rs.getString(9), Long.toString(id), at,
                                rs.getString(3), rs.getString(4), table, key, orDash(rs.getString(7)), orDash(newFields)));
                        if (chainBreak.isEmpty()) {
                            if (!prev.equals(rs.getString(9))) {
                                chainBreak = Optional.of(new AuditFinding(id, "server audit row " + id + " breaks the"
                                        + " chain: its previous hash is not the hash of the site's row before it, so a"
                                        + " row was removed or changed"));
                            } else if (!recomputed.equals(rs.getString(10))) {
                                chainBreak = Optional.of(new AuditFinding(id, "server audit row " + id + " breaks the"
                                        + " chain: its content no longer matches its hash, so it was changed after it was"
                                        + " written"));
                            }
                        }
                        prev = rs.getString(10);
                        Array keys = rs.getArray(11);
                        Batch batch = IMMUTABLE.contains(table) && keys != null
                                ? new Batch(id, List.of((String[]) keys.getArray()), rs.getString(12)) : null;
                        if (batch != null) {
                            batches.computeIfAbsent(table, x -> new ArrayList<>()).add(batch);
                            for (String k : batch.keys()) {
                                last.put(table + '\u0000' + k, new LastImage(id, null));
                            }
                        } else {
                            last.put(table + '\u0000' + key, new LastImage(id, newFields));
                        }
                    }
                }
            }
            List<AuditFinding> findings = new ArrayList<>();
            for (Map.Entry<String, List<Batch>> e : batches.entrySet()) {
                for (Batch b : e.getValue()) {
                    checkBatch(c, siteId, e.getKey(), b, findings);
                }
            }
            reconcile(c, siteId, last, findings);
            return new AuditReport(rows, prev, chainBreak, findings);
        } catch (SQLException e) {
            throw new ServerException("cannot read the audit trail of site \"" + siteName + "\" on "
                    + server.login().displayUrl() + ": " + ServerException.firstLine(e), e);
        }
    }

    /**
     * A batch audit row of immutable records (schema 4): the keys it names and the SHA-256 it
     * recorded. A row of schema 1 to 3 records one record's fields instead, and is compared as an
     * editable record's row is.
     */
    private record Batch(long auditRowId, List<String> keys, String sha256) {
    }

    /**
     * Recomputes a batch's digest from the records as stored: per record, in the server's key order,
     * its key, its fields as text and, for a scan, its spectrum's SHA-256, tab-separated, a record a
     * line (schema 4, {@code records_digest}).
     */
    private static void checkBatch(Connection c, long siteId, String table, Batch b, List<AuditFinding> findings)
            throws SQLException {
        boolean scan = table.equals("scan");
        StringBuilder text = new StringBuilder();
        int found = 0;
        for (int from = 0; from < b.keys().size(); from += KEYS_PER_QUERY) {
            List<String> part = b.keys().subList(from, Math.min(b.keys().size(), from + KEYS_PER_QUERY));
            try (PreparedStatement ps = c.prepareStatement("SELECT record_key, fields::text" + (scan ? ", spectrum" : "")
                    + " FROM " + table + " WHERE site_id = ? AND record_key = ANY (?) ORDER BY record_key")) {
                Array keys = c.createArrayOf("text", part.toArray());
                ps.setLong(1, siteId);
                ps.setArray(2, keys);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        if (found++ > 0) {
                            text.append('\n');
                        }
                        text.append(rs.getString(1)).append('\t').append(rs.getString(2));
                        if (scan) {
                            text.append('\t').append(HexFormat.of().formatHex(sha256(rs.getBytes(3))));
                        }
                    }
                }
            }
        }
        if (found != b.keys().size()) {
            findings.add(new AuditFinding(b.auditRowId(), table + ": " + (b.keys().size() - found) + " of the "
                    + b.keys().size() + " record(s) audit row " + b.auditRowId() + " names are missing: removed past"
                    + " the server's triggers"));
        } else if (!sha256Hex(text.toString()).equals(b.sha256())) {
            findings.add(new AuditFinding(b.auditRowId(), table + ": the " + found + " record(s) audit row "
                    + b.auditRowId() + " names differ from what it recorded (SHA-256): changed past the server's"
                    + " triggers"));
        }
    }

    /**
     * Every record against the trail's last image of it; a record the trail never named, and one it
     * named that is gone (nothing leaves the server: a removal is a flag), are reported too.
     */
    private static void reconcile(Connection c, long siteId, Map<String, LastImage> last, List<AuditFinding> findings)
            throws SQLException {
        List<String> tables = new ArrayList<>(IMMUTABLE);
        for (PortableTable t : PortableTable.values()) {
            if (t.editable()) {
                tables.add(t.serverTable());
            }
        }
        for (String table : tables) {
            boolean editable = !IMMUTABLE.contains(table);
            String image = editable ? "CASE WHEN deleted THEN '{\"deleted\": true}' ELSE fields::text END" : "fields::text";
            try (PreparedStatement ps = c.prepareStatement("SELECT record_key, " + image + " FROM " + table
                    + " WHERE site_id = ?")) {
                ps.setLong(1, siteId);
                ps.setFetchSize(5_000);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        LastImage recorded = last.remove(table + '\u0000' + rs.getString(1));
                        String name = table + " " + rs.getString(1);
                        if (recorded == null) {
                            findings.add(new AuditFinding(0, name + " has no audit row: it was added past the"
                                    + " server's triggers"));
                        } else if (recorded.fieldsText() != null && !recorded.fieldsText().equals(rs.getString(2))) {
                            findings.add(new AuditFinding(recorded.auditRowId(), name + " differs from server audit row "
                                    + recorded.auditRowId() + ": it was changed past the server's triggers"));
                        }
                    }
                }
            }
        }
        // a batch's missing records are counted by its digest check; any other record the trail names must be there
        last.forEach((name, recorded) -> {
            if (recorded.fieldsText() != null) {
                findings.add(new AuditFinding(recorded.auditRowId(), name.replace('\u0000', ' ') + " recorded by server"
                        + " audit row " + recorded.auditRowId() + " is missing: it was deleted past the server's triggers"));
            }
        });
    }

    private static long siteIdFor(Connection c, String siteName) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT id FROM site WHERE name = ?")) {
            ps.setString(1, siteName);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    throw new SyncRefusedException("no site \"" + siteName + "\" on the server that this login may"
                            + " read; `strandbook fleet` lists those it may");
                }
                return rs.getLong(1);
            }
        }
    }

    private static String orDash(String s) {
        return s == null ? "-" : s;
    }

    private static byte[] sha256(byte[] data) {
        try {
            return MessageDigest.getInstance("SHA-256").digest(data);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime provides SHA-256", e);
        }
    }

    private static String sha256Hex(String text) {
        return HexFormat.of().formatHex(sha256(text.getBytes(StandardCharsets.UTF_8)));
    }
}
