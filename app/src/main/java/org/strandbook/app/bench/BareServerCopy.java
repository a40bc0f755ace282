package org.strandbook.app.bench;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.HexFormat;

import org.postgresql.PGConnection;
import org.postgresql.copy.CopyIn;

/**
 * The sync benchmark's second floor, printed beside the ratio: the same scan rows read from the
 * workbook file with a bare SELECT and loaded by PostgreSQL's COPY (the fastest bare way in, which
 * a technician's login cannot take into a table under row-level security), in one transaction, into a table of the server's scan shape (site,
 * key, fields as jsonb, spectrum as bytea, the same primary key) with no trigger, no row-level
 * security, no audit and no bookkeeping: what SQLite and PostgreSQL themselves cost for the copy.
 */
final class BareServerCopy {

    private BareServerCopy() {
    }

    /** Copies every scan; the seconds it took, connection set-up and table creation excluded. */
    static double secondsToCopy(Path workbook, String serverUrl, String user, String password, String table) {
        try (Connection from = DriverManager.getConnection("jdbc:sqlite:" + workbook);
             Connection to = DriverManager.getConnection(serverUrl, user, password == null ? "" : password)) {
            createBareTable(to, table);
            long start = System.nanoTime();
            CopyIn copy = to.unwrap(PGConnection.class).getCopyAPI()
                    .copyIn("COPY " + table + " (site_id, record_key, fields, spectrum) FROM STDIN");
            HexFormat hex = HexFormat.of();
            StringBuilder line = new StringBuilder();
            try (BareScanRows rows = new BareScanRows(from)) {
                while (rows.next()) {
                    line.setLength(0);
                    // COPY's text format: tab-separated, bytea as \x hex (its backslash doubled)
                    line.append("1\t").append(rows.key()).append('\t').append(rows.fieldsJson());
                    line.append("\t\\\\x").append(hex.formatHex(rows.spectrum())).append('\n');
                    byte[] bytes = line.toString().getBytes(StandardCharsets.UTF_8);
                    copy.writeToCopy(bytes, 0, bytes.length);
                }
                copy.endCopy();
            } finally {
                if (copy.isActive()) {
                    copy.cancelCopy();
                }
            }
            to.commit();
            return (System.nanoTime() - start) * 1e-9;
        } catch (SQLException e) {
            throw new IllegalStateException("the bare copy failed: " + e.getMessage(), e);
        }
    }

    /** A table of the server's scan shape with nothing on it: no trigger, no policy, no audit. */
    static void createBareTable(Connection to, String table) throws SQLException {
        to.setAutoCommit(false);
        try (Statement st = to.createStatement()) {
            st.execute("DROP TABLE IF EXISTS " + table);
            st.execute("CREATE TABLE " + table + " (site_id bigint NOT NULL, record_key text NOT NULL,"
                    + " fields jsonb NOT NULL, spectrum bytea NOT NULL, PRIMARY KEY (site_id, record_key))");
        }
        to.commit();
    }
}
