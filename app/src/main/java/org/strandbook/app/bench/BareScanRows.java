package org.strandbook.app.bench;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Locale;

/**
 * The sync bench's scan rows as the floors read them: a bare SELECT of the workbook's scans and
 * spectra, each given as its key, its fields as the JSON text the server stores, and its spectrum's
 * bytes, with no Strandbook code between SQLite and the floor.
 */
final class BareScanRows implements AutoCloseable {

    private final Statement read;
    private final ResultSet rs;

    BareScanRows(Connection workbook) throws SQLException {
        read = workbook.createStatement();
        rs = read.executeQuery("SELECT s.sha256, s.point_id, s.kind, s.taken_at, s.operator,"
                + " s.integration_ms, s.co_added, s.n_points, s.min_nm, s.max_nm, s.source_file, d.data"
                + " FROM scan s JOIN scan_spectrum d ON d.scan_id = s.id");
    }

    boolean next() throws SQLException {
        return rs.next();
    }

    String key() throws SQLException {
        return rs.getString(1);
    }

    String fieldsJson() throws SQLException {
        return String.format(Locale.ROOT, "{\"point\":%d,\"kind\":\"%s\",\"taken_at\":\"%s\",\"operator\":\"%s\","
                        + "\"integration_ms\":%s,\"co_added\":%d,\"n_points\":%d,\"min_nm\":%s,"
                        + "\"max_nm\":%s,\"source_file\":\"%s\",\"sha256\":\"%s\"}",
                rs.getLong(2), rs.getString(3), rs.getString(4), rs.getString(5), rs.getDouble(6),
                rs.getLong(7), rs.getLong(8), rs.getDouble(9), rs.getDouble(10), rs.getString(11),
                rs.getString(1));
    }

    byte[] spectrum() throws SQLException {
        return rs.getBytes(12);
    }

    @Override
    public void close() throws SQLException {
        try (read) {
            rs.close();
        }
    }
}
