package org.strandbook.server;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Statement;

import org.postgresql.PGConnection;
import org.strandbook.store.PortableTable;

/**
 * The immutable records of one push as the server takes them: streamed by binary COPY into a
 * staging table private to this session and dropped at commit, then filed into the site's table by
 * one {@code INSERT ... SELECT} per batch.
 *
 * <p>Why two steps: COPY streams the rows while the workbook is still being read, with no
 * statement to plan and no parameters to bind per row, where a multi-row INSERT made the server
 * parse and plan thousands of parameters per batch. The filing is an ordinary INSERT by the
 * technician into the site's table, so nothing is bypassed: row-level security checks every row,
 * the append-only and foreign-key triggers run, and the audit trigger writes one chained row per
 * statement naming the batch's records. The staging table itself holds nothing another session
 * can see, and a push cut off anywhere leaves nothing of it.
 */
final class StagedPush {

    /** Records between two progress reports while sending (design choice). */
    private static final int PROGRESS_EVERY = 500;

    private final Connection connection;
    private final long siteId;
    private final PortableTable table;
    private final boolean scan;
    /** The staging table's name, and the same schema-qualified so that no other table can stand in for it. */
    private final String stagingName;
    private final String staging;

    StagedPush(Connection connection, long siteId, PortableTable table) {
        this.connection = connection;
        this.siteId = siteId;
        this.table = table;
        this.scan = table == PortableTable.SCAN;
        this.stagingName = "incoming_" + table.serverTable();
        this.staging = "pg_temp." + stagingName;
    }

    /**
     * Sends every record {@code outgoing} reads and files them in statements of {@code batch}
     * records; progress counts records sent, then records filed.
     *
     * @return the records filed
     */
    int push(OutgoingRecords outgoing, int count, int batch, SyncProgress progress) throws SQLException {
        try (Statement st = connection.createStatement()) {
            st.execute("CREATE TEMP TABLE " + stagingName + " (n int PRIMARY KEY,"
                    + " record_key text NOT NULL, fields jsonb NOT NULL" + (scan ? ", spectrum bytea NOT NULL" : "")
                    + ") ON COMMIT DROP");
        }
        int sent = send(outgoing, count, progress);
        progress.step("filing " + sent + " " + table.workbookTable() + " record(s) on the server");
        String columns = "record_key, fields" + (scan ? ", spectrum" : "");
        try (PreparedStatement file = connection.prepareStatement("INSERT INTO " + table.serverTable()
                + " (site_id, " + columns + ") SELECT ?, " + columns + " FROM " + staging + " WHERE n >= ? AND n < ?")) {
            for (int from = 0; from < sent; from += batch) {
                file.setLong(1, siteId);
                file.setInt(2, from);
                file.setInt(3, from + batch);
                file.executeUpdate();
                progress.done(Math.min(sent, from + batch), sent);
            }
        }
        return sent;
    }

    private int send(OutgoingRecords outgoing, int count, SyncProgress progress) throws SQLException {
        BinaryCopyStream copy = new BinaryCopyStream(connection.unwrap(PGConnection.class).getCopyAPI()
                .copyIn("COPY " + staging + " (n, record_key, fields" + (scan ? ", spectrum" : "")
                        + ") FROM STDIN (FORMAT binary)"));
        boolean finished = false;
        try {
            int n = 0;
            for (OutgoingRecords.Row r = outgoing.next(); r != null; r = outgoing.next()) {
                copy.row(scan ? 4 : 3).int4(n).text(r.key()).jsonb(r.fieldsJson());
                if (scan) {
                    copy.bytes(r.spectrum());
                }
                if (++n % PROGRESS_EVERY == 0) {
                    progress.done(n, count);
                }
            }
            copy.finish();
            finished = true;
            progress.done(n, count);
            return n;
        } finally {
            if (!finished) {
                copy.cancel();
            }
        }
    }
}
