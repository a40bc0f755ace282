package org.strandbook.app.bench;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.SQLException;

/**
 * The sync benchmark's second floor: the same scan rows as {@link BareServerCopy}, read by the same
 * bare SELECT, sent as a plain JDBC batch of INSERTs (the driver's own multi-row rewrite on, 500 rows
 * a batch as the push sends them) in one transaction into a bare table of the server's scan shape.
 * This is the way in that a technician's login has: the server refuses COPY into a table under
 * row-level security, so a push can only INSERT.
 */
final class BareServerInsert {

    /** Rows per executeBatch, as the push's statements carry them. */
    private static final int BATCH = 500;

    private BareServerInsert() {
    }

    /** Inserts every scan; the seconds it took, connection set-up and table creation excluded. */
    static double secondsToInsert(Path workbook, String serverUrl, String user, String password, String table) {
        String url = serverUrl + (serverUrl.contains("?") ? "&" : "?") + "reWriteBatchedInserts=true";
        try (Connection from = DriverManager.getConnection("jdbc:sqlite:" + workbook);
             Connection to = DriverManager.getConnection(url, user, password == null ? "" : password)) {
            BareServerCopy.createBareTable(to, table);
            long start = System.nanoTime();
            try (BareScanRows rows = new BareScanRows(from);
                 PreparedStatement ps = to.prepareStatement("INSERT INTO " + table
                         + " (site_id, record_key, fields, spectrum) VALUES (1, ?, ?::jsonb, ?)")) {
                int n = 0;
                while (rows.next()) {
                    ps.setString(1, rows.key());
                    ps.setString(2, rows.fieldsJson());
                    ps.setBytes(3, rows.spectrum());
                    ps.addBatch();
                    if (++n % BATCH == 0) {
                        ps.executeBatch();
                    }
                }
                ps.executeBatch();
            }
            to.commit();
            return (System.nanoTime() - start) * 1e-9;
        } catch (SQLException e) {
            throw new IllegalStateException("the bare batch insert failed: " + e.getMessage(), e);
        }
    }
}
