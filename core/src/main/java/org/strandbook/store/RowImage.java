package org.strandbook.store;

import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

/**
 * One row as SQLite holds it, in two forms: JSON text for people reading the audit trail, and a
 * SHA-256 digest for the machine check that the row still is what the trail last recorded.
 *
 * <p>The JSON shows a BLOB as its SHA-256 and size, never its bytes. The digest runs over an exact,
 * runtime-independent encoding rather than the JSON: a REAL enters as the hex of its IEEE 754 bits,
 * because decimal text of a double has changed between Java releases and would raise false alarms.
 * Digest input, per non-NULL column in table order: {@code field(name) field(type) field(value)},
 * with {@code field(s) = <UTF-8 byte length of s> ":" s}, type {@code I} (value: decimal),
 * {@code R} (value: 16 hex digits of the bits), {@code T} (value: the text) or {@code B} (value:
 * SHA-256 hex of the bytes, then a field with the byte count). NULL columns are left out, so a
 * column added later as NULL leaves older rows' digests valid.
 */
final class RowImage {

    private record Column(String name, Object value) {
    }

    private record BlobSummary(String sha256, int bytes) {
    }

    private final List<Column> columns;

    private RowImage(List<Column> columns) {
        this.columns = columns;
    }

    /** The image of the result set's current row. */
    static RowImage of(ResultSet rs) throws SQLException {
        return of(rs, columnNames(rs));
    }

    /**
     * The result set's column names, to read once for many rows with {@link #of(ResultSet, String[])}:
     * the driver asks the native library for a name on every call, which a check of every row of a
     * workbook of tens of thousands of scans felt.
     */
    static String[] columnNames(ResultSet rs) throws SQLException {
        ResultSetMetaData meta = rs.getMetaData();
        String[] names = new String[meta.getColumnCount()];
        for (int i = 0; i < names.length; i++) {
            names[i] = meta.getColumnName(i + 1);
        }
        return names;
    }

    /** The image of the result set's current row, its columns named by {@link #columnNames}. */
    static RowImage of(ResultSet rs, String[] names) throws SQLException {
        int n = names.length;
        List<Column> columns = new ArrayList<>(n);
        for (int i = 1; i <= n; i++) {
            Object v = rs.getObject(i);
            if (v instanceof Integer k) {
                v = k.longValue();
            } else if (v instanceof byte[] bytes) {
                v = new BlobSummary(Sha256.hex(bytes), bytes.length);
            } else if (v instanceof Float f) {
                v = f.doubleValue();
            }
            columns.add(new Column(names[i - 1], v));
        }
        return new RowImage(List.copyOf(columns));
    }

    /**
     * This image with one more column holding bytes of the given digest and length, as {@link #of}
     * shows a BLOB column.
     */
    RowImage withBlob(String name, String sha256, int bytes) {
        List<Column> more = new ArrayList<>(columns.size() + 1);
        more.addAll(columns);
        more.add(new Column(name, new BlobSummary(sha256, bytes)));
        return new RowImage(List.copyOf(more));
    }

    String json() {
        StringBuilder sb = new StringBuilder(64 + 24 * columns.size()).append('{');
        for (int i = 0; i < columns.size(); i++) {
            Column c = columns.get(i);
            if (i > 0) {
                sb.append(',');
            }
            JsonText.string(sb, c.name()).append(':');
            Object v = c.value();
            if (v == null) {
                sb.append("null");
            } else if (v instanceof String s) {
                JsonText.string(sb, s);
            } else if (v instanceof BlobSummary b) {
                sb.append("{\"sha256\":\"").append(b.sha256()).append("\",\"bytes\":").append(b.bytes()).append('}');
            } else {
                sb.append(v);
            }
        }
        return sb.append('}').toString();
    }

    String sha256() {
        Sha256.Fields fields = new Sha256.Fields();
        for (Column c : columns) {
            Object v = c.value();
            if (v == null) {
                continue;
            }
            fields.add(c.name());
            if (v instanceof Long k) {
                fields.add("I").add(Long.toString(k));
            } else if (v instanceof Double d) {
                fields.add("R").add(bitsHex(d));
            } else if (v instanceof BlobSummary b) {
                fields.add("B").add(b.sha256()).add(Integer.toString(b.bytes()));
            } else {
                fields.add("T").add(v.toString());
            }
        }
        return fields.hex();
    }

    private static String bitsHex(double d) {
        String hex = Long.toHexString(Double.doubleToLongBits(d));
        return "0".repeat(16 - hex.length()) + hex;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RowImage r && columns.equals(r.columns);
    }

    @Override
    public int hashCode() {
        return columns.hashCode();
    }
}
