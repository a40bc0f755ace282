package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The workbook's records in portable form ({@link PortableTable}): read all at once for a sync, and
 * written back one by one, each write audited like any other change of the workbook.
 */
public final class WorkbookRecords {

    private final Session session;
    private final AuditLog audit;
    private final Map<PortableTable, Map<String, Long>> ids = new EnumMap<>(PortableTable.class);
    private long idsGeneration = -1;
    /** Each table's columns, read once: the schema cannot change while the workbook is open. */
    private final Map<PortableTable, List<String>> columns = new EnumMap<>(PortableTable.class);

    WorkbookRecords(Session session, AuditLog audit) {
        this.session = session;
        this.audit = audit;
    }

    /** Every table's records, key → portable fields (a scan without its spectrum), read in one transaction. */
    public Map<PortableTable, Map<String, Map<String, Object>>> readAll() {
        return session.read(() -> {
            Keys keys = new Keys();
            Map<PortableTable, Map<String, Map<String, Object>>> all = new EnumMap<>(PortableTable.class);
            for (PortableTable t : PortableTable.values()) {
                all.put(t, read(t, keys));
            }
            return all;
        });
    }

    private Map<String, Map<String, Object>> read(PortableTable table, Keys keys) throws SQLException {
        Map<String, Map<String, Object>> out = new LinkedHashMap<>();
        Map<Long, String> idToKey = new HashMap<>();
        Map<String, PortableTable> refs = table.references();
        try (Statement st = session.connection().createStatement();
             ResultSet rs = st.executeQuery("SELECT * FROM " + table.workbookTable() + " ORDER BY id")) {
            ResultSetMetaData meta = rs.getMetaData();
            // named once: the driver asks the native library for a column's name on every call
            String[] names = new String[meta.getColumnCount() + 1];
            for (int c = 1; c < names.length; c++) {
                names[c] = meta.getColumnName(c);
            }
            while (rs.next()) {
                Map<String, Object> fields = new LinkedHashMap<>();
                long id = 0;
                for (int c = 1; c < names.length; c++) {
                    String name = names[c];
                    Object v = portableValue(rs.getObject(c));
                    if (name.equals("id")) {
                        id = (Long) v;
                    } else if (refs.containsKey(name)) {
                        fields.put(PortableTable.portableName(name),
                                v == null ? null : keys.key(refs.get(name), (Long) v));
                    } else {
                        fields.put(name, v);
                    }
                }
                String key = table.key(fields);
                idToKey.put(id, key);
                out.put(key, fields);
            }
        }
        keys.byTable.put(table, idToKey);
        return out;
    }

    /** A column's value as it travels: whole numbers as long, reals as double. */
    private static Object portableValue(Object v) {
        if (v instanceof Integer k) {
            return k.longValue();
        }
        return v instanceof Float f ? f.doubleValue() : v;
    }

    /**
     * The key one row travels under, read without the rest of the workbook (a row it refers to is
     * read for its own key); empty when the row is missing.
     */
    static Optional<String> keyOfRow(Session session, PortableTable table, long id) throws SQLException {
        Map<String, Object> fields = new LinkedHashMap<>();
        Map<String, PortableTable> refs = table.references();
        try (PreparedStatement ps = session.connection().prepareStatement(
                "SELECT * FROM " + table.workbookTable() + " WHERE id = ?")) {
            ps.setLong(1, id);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    return Optional.empty();
                }
                ResultSetMetaData meta = rs.getMetaData();
                for (int c = 1; c <= meta.getColumnCount(); c++) {
                    String name = meta.getColumnName(c);
                    if (!name.equals("id")) {
                        fields.put(name, portableValue(rs.getObject(c)));
                    }
                }
            }
        }
        Map<String, Object> portable = new LinkedHashMap<>();
        for (Map.Entry<String, Object> f : fields.entrySet()) {
            PortableTable referred = refs.get(f.getKey());
            if (referred == null) {
                portable.put(f.getKey(), f.getValue());
            } else {
                portable.put(PortableTable.portableName(f.getKey()), f.getValue() == null ? null
                        : keyOfRow(session, referred, (Long) f.getValue()).orElseThrow(() -> new WorkbookException(
                                table.workbookTable() + " row " + id + " refers to a missing " + referred.workbookTable())));
            }
        }
        return Optional.of(table.key(portable));
    }

    /** The spectrum BLOB of the scan with this SHA-256, as stored. */
    public byte[] spectrum(String scanSha256) {
        return session.read(() -> {
            PreparedStatement ps = session.prepared(
                    "SELECT d.data FROM scan s JOIN scan_spectrum d ON d.scan_id = s.id WHERE s.sha256 = ?");
            ps.setString(1, scanSha256);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    throw new UnknownEntryException("no scan with SHA-256 " + scanSha256 + " in the workbook");
                }
                return rs.getBytes(1);
            }
        });
    }

    /** What to do with each scan's spectrum as {@link #spectra} reads them. */
    @FunctionalInterface
    public interface SpectrumSink {
        void accept(String scanSha256, byte[] spectrum) throws Exception;
    }

    /** A failure of a {@link SpectrumSink}, carried out of the workbook's read untouched. */
    public static final class SinkFailure extends RuntimeException {
        SinkFailure(Exception cause) {
            super(cause);
        }
    }

    /**
     * Hands {@code sink} the spectrum BLOB of every scan whose SHA-256 is in {@code wanted}, in one
     * read of the workbook: a first sync of tens of thousands of scans must not open a read for each.
     */
    public void spectra(java.util.Set<String> wanted, SpectrumSink sink) {
        session.read(() -> {
            try (Statement st = session.connection().createStatement();
                 ResultSet rs = st.executeQuery("SELECT s.sha256, d.data FROM scan s JOIN scan_spectrum d"
                         + " ON d.scan_id = s.id ORDER BY s.id")) {
                while (rs.next()) {
                    String sha = rs.getString(1);
                    if (wanted.contains(sha)) {
                        byte[] data = rs.getBytes(2);
                        try {
                            sink.accept(sha, data);
                        } catch (Exception e) {
                            // the sink's failure is its own (the server's), not the workbook's
                            throw new SinkFailure(e);
                        }
                    }
                }
            }
            return null;
        });
    }

    /**
     * Adds or changes one record, audited; call inside {@code Workbook.inTransaction}, parents
     * first. {@code spectrum} only for a new scan.
     */
    public void put(PortableTable table, String key, Map<String, Object> fields, byte[] spectrum) {
        session.write(() -> {
            Map<String, Object> columns = localColumns(table, fields);
            Long id = localId(table, key);
            AuditedTable audited = AuditedTable.valueOf(table.name());
            if (id == null && table == PortableTable.SITE) {
                id = 1L;
            }
            if (id == null) {
                long newId = insert(table.workbookTable(), columns);
                ids.get(table).put(key, newId);
                if (table == PortableTable.SCAN) {
                    PreparedStatement ps = session.prepared("INSERT INTO scan_spectrum (scan_id, data) VALUES (?, ?)");
                    ps.setLong(1, newId);
                    ps.setBytes(2, spectrum);
                    ps.executeUpdate();
                    audit.insertedScan(newId, spectrum.length, Sha256.hex(spectrum));
                } else {
                    audit.inserted(audited, newId);
                }
            } else {
                RowImage before = audit.capture(audited, id).orElseThrow();
                update(table.workbookTable(), id, columns);
                audit.updated(audited, id, before);
            }
            return null;
        });
    }

    /**
     * Removes one editable record, or a scan another workbook removed, audited; call children first.
     */
    public void remove(PortableTable table, String key) {
        if (!table.editable() && table != PortableTable.SCAN || table == PortableTable.SITE
                || table == PortableTable.DECISION_RULE) {
            throw new IllegalArgumentException(table + " records are never removed by a sync");
        }
        session.write(() -> {
            Long id = localId(table, key);
            if (id != null) {
                if (table == PortableTable.SCAN) {
                    // the spectrum goes with its scan, as when a scan is removed here
                    PreparedStatement ps = session.prepared("DELETE FROM scan_spectrum WHERE scan_id = ?");
                    ps.setLong(1, id);
                    ps.executeUpdate();
                }
                audit.deleteRow(AuditedTable.valueOf(table.name()), id);
                ids.get(table).remove(key);
            }
            return null;
        });
    }

    private long insert(String tableName, Map<String, Object> columns) throws SQLException {
        List<String> names = new ArrayList<>(columns.keySet());
        String sql = "INSERT INTO " + tableName + " (" + String.join(", ", names) + ") VALUES ("
                + "?, ".repeat(names.size() - 1) + "?)";
        try (PreparedStatement ps = session.connection().prepareStatement(sql)) {
            bind(ps, names, columns);
            ps.executeUpdate();
        }
        try (Statement st = session.connection().createStatement();
             ResultSet rs = st.executeQuery("SELECT last_insert_rowid()")) {
            rs.next();
            return rs.getLong(1);
        }
    }

    private void update(String tableName, long id, Map<String, Object> columns) throws SQLException {
        List<String> names = new ArrayList<>(columns.keySet());
        String sql = "UPDATE " + tableName + " SET " + String.join(" = ?, ", names) + " = ? WHERE id = ?";
        try (PreparedStatement ps = session.connection().prepareStatement(sql)) {
            bind(ps, names, columns);
            ps.setLong(names.size() + 1, id);
            ps.executeUpdate();
        }
    }

    private static void bind(PreparedStatement ps, List<String> names, Map<String, Object> columns) throws SQLException {
        for (int i = 0; i < names.size(); i++) {
            ps.setObject(i + 1, columns.get(names.get(i)));
        }
    }

    /** Portable fields → this workbook's columns, references resolved to local ids. */
    private Map<String, Object> localColumns(PortableTable table, Map<String, Object> fields) throws SQLException {
        Map<String, PortableTable> refs = table.references();
        Map<String, String> idColumnOf = new HashMap<>();
        refs.keySet().forEach(c -> idColumnOf.put(PortableTable.portableName(c), c));
        List<String> known = columns.get(table);
        if (known == null) {
            known = columnNames(table.workbookTable());
            columns.put(table, known);
        }
        Map<String, Object> out = new LinkedHashMap<>();
        for (Map.Entry<String, Object> e : fields.entrySet()) {
            String column = idColumnOf.getOrDefault(e.getKey(), e.getKey());
            if (!known.contains(column) || column.equals("id")) {
                if (e.getValue() == null) {
                    continue;
                }
                throw new WorkbookException("the server's " + table.workbookTable() + " record carries the field "
                        + e.getKey() + ", which this workbook's schema lacks: a newer Strandbook wrote it; upgrade");
            }
            Object v = e.getValue();
            if (refs.containsKey(column) && v != null) {
                Long id = localId(refs.get(column), v.toString());
                if (id == null) {
                    throw new WorkbookException("the server's " + table.workbookTable() + " record names "
                            + refs.get(column).workbookTable() + " " + v + ", which is not in the workbook");
                }
                v = id;
            }
            out.put(column, v);
        }
        return out;
    }

    private List<String> columnNames(String tableName) throws SQLException {
        List<String> names = new ArrayList<>();
        try (Statement st = session.connection().createStatement();
             ResultSet rs = st.executeQuery("PRAGMA table_info(" + tableName + ")")) {
            while (rs.next()) {
                names.add(rs.getString("name"));
            }
        }
        return names;
    }

    /** The local id of the record with this natural key, or null. */
    private Long localId(PortableTable table, String key) throws SQLException {
        // read once per write transaction and kept up to date by put and remove: a pull of
        // thousands of scans must not re-read the workbook for each
        if (idsGeneration != session.writeGeneration()) {
            Keys fresh = new Keys();
            for (PortableTable t : PortableTable.values()) {
                read(t, fresh);
            }
            ids.clear();
            fresh.byTable.forEach((t, idToKey) -> {
                Map<String, Long> keyToId = new HashMap<>();
                idToKey.forEach((id, k) -> keyToId.put(k, id));
                ids.put(t, keyToId);
            });
            idsGeneration = session.writeGeneration();
        }
        return ids.get(table).get(key);
    }

    /** Local id → natural key, per table, filled parent first. */
    private static final class Keys {
        final Map<PortableTable, Map<Long, String>> byTable = new EnumMap<>(PortableTable.class);

        String key(PortableTable table, long id) {
            Map<Long, String> ids = byTable.get(table);
            String key = ids == null ? null : ids.get(id);
            if (key == null) {
                throw new WorkbookException(table.workbookTable() + " row " + id + " is referred to but missing");
            }
            return key;
        }
    }
}
