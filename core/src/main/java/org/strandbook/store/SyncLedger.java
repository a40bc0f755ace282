package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;

/**
 * What this workbook knows of its plant server (schema 7): which server and site, its own identity
 * there, how far the server has taken its audit trail, each record as both sides last agreed on it,
 * and the conflicts waiting for a person.
 */
public final class SyncLedger {

    /**
     * @param workbookId     this workbook's identity on the server (a random UUID, made once)
     * @param server         the server's address without parameters; null before the first sync
     * @param siteName       the site on that server
     * @param pushedEntryId  the last audit entry of this workbook the server has taken
     * @param syncedAt       when the last sync ended; null before the first
     */
    public record State(String workbookId, String server, String siteName, long pushedEntryId, Instant syncedAt) {
    }

    /** A record as both sides last agreed on it; {@code fieldsJson} empty for an immutable record. */
    public record Base(String fieldsJson, long revision) {
    }

    /**
     * Two edits of one field since the last sync.
     *
     * @param mine   this workbook's value, as JSON
     * @param theirs the server's value, as JSON
     * @param kept   MINE or THEIRS once resolved, else null
     */
    public record Conflict(long id, PortableTable table, String key, String field, String mine, String theirs,
                           String theirsBy, Instant foundAt, Instant resolvedAt, String resolvedBy, String kept) {
        public boolean open() {
            return resolvedAt == null;
        }

        /**
         * One side's value ({@link #mine} or {@link #theirs}) as a person reads it: "(removed)" for
         * a whole record gone, "(empty)" for a field without value, a whole record as its JSON, a
         * number with the unit its field's name carries.
         */
        public String shown(String side) {
            boolean whole = field.equals(WHOLE_RECORD);
            if (side == null || side.equals("null")) {
                return whole ? "(removed)" : "(empty)";
            }
            if (whole) {
                return side;
            }
            Object v = PortableFields.parseValue(side);
            return v == null ? "(empty)" : FieldUnit.shown(field, v);
        }
    }

    /** The field a conflict over a whole record (removed on one side, changed on the other) names. */
    public static final String WHOLE_RECORD = "(record)";

    private final Session session;

    SyncLedger(Session session) {
        this.session = session;
    }

    /** The state, made (with a new workbook id) on first use; call inside a write transaction. */
    public State state() {
        return session.write(() -> {
            Optional<State> found = read();
            if (found.isPresent()) {
                return found.get();
            }
            PreparedStatement ps = session.prepared("INSERT INTO sync_state (id, workbook_id) VALUES (1, ?)");
            ps.setString(1, UUID.randomUUID().toString());
            ps.executeUpdate();
            return read().orElseThrow();
        });
    }

    /** The state if this workbook ever synced or prepared to; reading only. */
    public Optional<State> peek() {
        return session.read(this::read);
    }

    private Optional<State> read() throws java.sql.SQLException {
        try (ResultSet rs = session.prepared("SELECT workbook_id, server, site_name, pushed_entry_id, synced_at"
                + " FROM sync_state WHERE id = 1").executeQuery()) {
            if (!rs.next()) {
                return Optional.empty();
            }
            String at = rs.getString(5);
            return Optional.of(new State(rs.getString(1), rs.getString(2), rs.getString(3), rs.getLong(4),
                    at == null ? null : StoredTime.parse(at)));
        }
    }

    public void synced(String server, String siteName, long pushedEntryId, Instant at) {
        session.write(() -> {
            state();
            PreparedStatement ps = session.prepared("UPDATE sync_state SET server = ?, site_name = ?,"
                    + " pushed_entry_id = ?, synced_at = ? WHERE id = 1");
            ps.setString(1, server);
            ps.setString(2, siteName);
            ps.setLong(3, pushedEntryId);
            ps.setString(4, StoredTime.format(at));
            ps.executeUpdate();
            return null;
        });
    }

    /** Every record's base, per table. */
    public Map<PortableTable, Map<String, Base>> bases() {
        return session.read(() -> {
            Map<PortableTable, Map<String, Base>> out = new HashMap<>();
            for (PortableTable t : PortableTable.values()) {
                out.put(t, new HashMap<>());
            }
            try (ResultSet rs = session.prepared("SELECT table_name, record_key, fields, revision FROM sync_base")
                    .executeQuery()) {
                while (rs.next()) {
                    out.get(PortableTable.valueOf(rs.getString(1))).put(rs.getString(2),
                            new Base(rs.getString(3), rs.getLong(4)));
                }
            }
            return out;
        });
    }

    public void putBase(PortableTable table, String key, Base base) {
        putBases(table, Map.of(key, base));
    }

    /**
     * Many bases at once: a first sync records one per scan, tens of thousands. They go in as one
     * statement over a JSON array in key order, which SQLite unpacks itself (json_each): a statement
     * per base cost a call into the driver each and b-tree inserts in random key order.
     */
    public void putBases(PortableTable table, Map<String, Base> bases) {
        if (bases.isEmpty()) {
            return;
        }
        StringBuilder rows = new StringBuilder(bases.size() * 80).append('[');
        bases.entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(e -> {
            if (rows.length() > 1) {
                rows.append(',');
            }
            JsonText.string(rows.append('['), e.getKey()).append(',');
            JsonText.string(rows, e.getValue().fieldsJson()).append(',').append(e.getValue().revision()).append(']');
        });
        rows.append(']');
        session.write(() -> {
            PreparedStatement ps = session.prepared("INSERT OR REPLACE INTO sync_base (table_name, record_key, fields,"
                    + " revision) SELECT ?, value ->> 0, value ->> 1, value ->> 2 FROM json_each(?)");
            ps.setString(1, table.name());
            ps.setString(2, rows.toString());
            ps.executeUpdate();
            return null;
        });
    }

    public void removeBase(PortableTable table, String key) {
        session.write(() -> {
            PreparedStatement ps = session.prepared("DELETE FROM sync_base WHERE table_name = ? AND record_key = ?");
            ps.setString(1, table.name());
            ps.setString(2, key);
            ps.executeUpdate();
            return null;
        });
    }

    /** Records a conflict unless the same one is already open; updates the values of an open one. */
    public void conflict(PortableTable table, String key, String field, String mine, String theirs, String theirsBy,
                         Instant at) {
        session.write(() -> {
            PreparedStatement ps = session.prepared("INSERT INTO sync_conflict (table_name, record_key, field, mine,"
                    + " theirs, theirs_by, found_at) VALUES (?, ?, ?, ?, ?, ?, ?) ON CONFLICT (table_name, record_key,"
                    + " field) WHERE resolved_at IS NULL DO UPDATE SET mine = excluded.mine, theirs = excluded.theirs,"
                    + " theirs_by = excluded.theirs_by");
            ps.setString(1, table.name());
            ps.setString(2, key);
            ps.setString(3, field);
            ps.setString(4, mine);
            ps.setString(5, theirs);
            ps.setString(6, theirsBy);
            ps.setString(7, StoredTime.format(at));
            ps.executeUpdate();
            return null;
        });
    }

    public List<Conflict> conflicts() {
        return session.read(() -> {
            List<Conflict> out = new ArrayList<>();
            try (ResultSet rs = session.prepared("SELECT id, table_name, record_key, field, mine, theirs, theirs_by,"
                    + " found_at, resolved_at, resolved_by, kept FROM sync_conflict ORDER BY id").executeQuery()) {
                while (rs.next()) {
                    String resolved = rs.getString(9);
                    out.add(new Conflict(rs.getLong(1), PortableTable.valueOf(rs.getString(2)), rs.getString(3),
                            rs.getString(4), rs.getString(5), rs.getString(6), rs.getString(7),
                            StoredTime.parse(rs.getString(8)), resolved == null ? null : StoredTime.parse(resolved),
                            rs.getString(10), rs.getString(11)));
                }
            }
            return out;
        });
    }

    public void resolved(long conflictId, String kept, String by, Instant at) {
        session.write(() -> {
            PreparedStatement ps = session.prepared("UPDATE sync_conflict SET resolved_at = ?, resolved_by = ?,"
                    + " kept = ? WHERE id = ? AND resolved_at IS NULL");
            ps.setString(1, StoredTime.format(at));
            ps.setString(2, by);
            ps.setString(3, kept);
            ps.setLong(4, conflictId);
            if (ps.executeUpdate() != 1) {
                throw new UnknownEntryException("no open conflict " + conflictId);
            }
            return null;
        });
    }
}
