package org.strandbook.app.bench;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.Arrays;

import org.sqlite.SQLiteConfig;

/**
 * The floor of the listing benchmark: one point's scan rows selected by a bare prepared statement
 * on a connection already open, through the workbook's index on point and time, every listed
 * column read and nothing built from it. No point-tag lookup, no transaction, no objects: what
 * SQLite itself costs to hand over the rows.
 */
final class BareScanListing {

    static final String SQL = "SELECT id, kind, taken_at, operator, integration_ms, co_added, ambient_temperature_c, "
            + "process_temperature_c, n_points, min_nm, max_nm, source_file, sha256 FROM scan "
            + "WHERE point_id = ? ORDER BY taken_at, id";

    /**
     * The best of the timed trials.
     *
     * @param bestSeconds the fastest listing, seconds
     * @param scanIds     the scan ids listed, in listing order, for comparison with the workbook's listing
     */
    public record Timing(double bestSeconds, long[] scanIds) {
    }

    private BareScanListing() {
    }

    /**
     * Opens {@code file} read-only, finds the point (untimed), then lists its scans {@code trials}
     * times and gives the fastest.
     *
     * @throws IllegalArgumentException when no point has the tag or trials is below 1
     */
    public static Timing bestOf(Path file, String pointTag, int trials) {
        if (trials < 1) {
            throw new IllegalArgumentException("trials must be 1 or more, was " + trials);
        }
        SQLiteConfig config = new SQLiteConfig();
        config.setReadOnly(true);
        try (Connection c = config.createConnection("jdbc:sqlite:" + file.toAbsolutePath())) {
            long pointId = pointId(c, pointTag);
            double best = Double.MAX_VALUE;
            long[] ids = new long[0];
            try (PreparedStatement ps = c.prepareStatement(SQL)) {
                for (int t = 0; t < trials; t++) {
                    long start = System.nanoTime();
                    ids = list(ps, pointId);
                    best = Math.min(best, (System.nanoTime() - start) * 1e-9);
                }
            }
            return new Timing(best, ids);
        } catch (SQLException e) {
            throw new IllegalStateException("bare listing floor failed: " + e.getMessage(), e);
        }
    }

    private static long pointId(Connection c, String tag) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT id FROM point WHERE tag = ?")) {
            ps.setString(1, tag);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    throw new IllegalArgumentException("no point tagged '" + tag + "'");
                }
                return rs.getLong(1);
            }
        }
    }

    private static long[] list(PreparedStatement ps, long pointId) throws SQLException {
        ps.setLong(1, pointId);
        long[] ids = new long[64];
        int n = 0;
        double sink = 0;
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                if (n == ids.length) {
                    ids = Arrays.copyOf(ids, 2 * n);
                }
                ids[n++] = rs.getLong(1);
                // every column is fetched, as the workbook's listing fetches them
                sink += rs.getString(2).length() + rs.getString(3).length() + rs.getString(4).length()
                        + rs.getDouble(5) + rs.getInt(6) + rs.getDouble(7) + rs.getDouble(8) + rs.getInt(9)
                        + rs.getDouble(10) + rs.getDouble(11) + rs.getString(12).length() + rs.getString(13).length();
            }
        }
        if (Double.isNaN(sink)) {
            throw new IllegalStateException("a listed number is not a number");
        }
        return Arrays.copyOf(ids, n);
    }
}
