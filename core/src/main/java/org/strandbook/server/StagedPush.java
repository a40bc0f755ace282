package org.strandbook.server;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Statement;

import org.postgresql.PGConnection;
import org.strandbook.store.PortableTable;

/**
 * The immutable records of one push as the server takes them: streamed by binary COPY, a chunk at a
 * time, into a staging table private to this session and dropped at commit, then filed into the
 * site's table by one {@code INSERT ... SELECT} per batch.
 *
 * <p>Why: COPY carries rows with no statement to plan and no parameters to bind per row, where a
 * multi-row INSERT made the server parse and plan thousands of parameters per batch; and while the
 * server files one chunk, the workbook's reader prepares the next, so the two costs overlap. The
 * filing is an ordinary INSERT by the technician into the site's table, so nothing is bypassed:
 * row-level security checks every row, the append-only and foreign-key triggers run, and the audit
 * trigger writes one chained row per statement naming the batch's records. The staging table holds
 * nothing another session can see, and a push cut off anywhere leaves nothing of it.
 */
final class StagedPush {

    /**
     * Batches per chunk sent at once (design choice): a chunk fits in the workbook reader's
     * read-ahead, so the reader fills the next one while the server files this one.
     */
    private static final int BATCHES_PER_CHUNK = 4;

    private final Connection connection;
    private final long siteId;
    private final PortableTable table;
    private final boolean scan;
    /** The staging table's name, and the same schema-qualified so that no other table can stand in for it. */
    private final String stagingName;
    private final String staging;
    private final String columns;

    StagedPush(Connection connection, long siteId, PortableTable table) {
        this.connection = connection;
        this.siteId = siteId;
        this.table = table;
        this.scan = table == PortableTable.SCAN;
        this.stagingName = "incoming_" + table.serverTable();
        this.staging = "pg_temp." + stagingName;
        this.columns = "record_key, fields" + (scan ? ", spectrum" : "");
    }

    /**
     * Sends every record {@code outgoing} reads and files them in statements of {@code batch}
     * records; progress counts the records filed.
     *
     * @return the records filed
     */
    int push(OutgoingRecords outgoing, int count, int batch, SyncProgress progress) throws SQLException {
        try (Statement st = connection.createStatement()) {
            st.execute("CREATE TEMP TABLE " + stagingName + " (n int NOT NULL, record_key text NOT NULL,"
                    + " fields jsonb NOT NULL" + (scan ? ", spectrum bytea NOT NULL" : "") + ") ON COMMIT DROP");
        }
        int filed = 0;
        try (PreparedStatement file = connection.prepareStatement("INSERT INTO " + table.serverTable()
                + " (site_id, " + columns + ") SELECT ?, " + columns + " FROM " + staging + " WHERE n >= ? AND n < ?");
             Statement clear = connection.createStatement()) {
            OutgoingRecords.Row next = outgoing.next();
            while (next != null) {
                BinaryCopyStream copy = new BinaryCopyStream(connection.unwrap(PGConnection.class).getCopyAPI()
                        .copyIn("COPY " + staging + " (n, " + columns + ") FROM STDIN (FORMAT binary)"));
                int sent = 0;
                try {
                    while (next != null && sent < batch * BATCHES_PER_CHUNK) {
                        copy.row(scan ? 4 : 3).int4(sent++).text(next.key()).jsonb(next.fieldsJson());
                        if (scan) {
                            copy.bytes(next.spectrum());
                        }
                        next = outgoing.next();
                    }
                    copy.finish();
                } catch (SQLException | RuntimeException e) {
                    copy.cancel();
                    throw e;
                }
                for (int from = 0; from < sent; from += batch) {
                    file.setLong(1, siteId);
                    file.setInt(2, from);
                    file.setInt(3, from + batch);
                    file.executeUpdate();
                    progress.done(filed + Math.min(sent, from + batch), count);
                }
                filed += sent;
                clear.execute("TRUNCATE " + staging);
            }
        }
        return filed;
    }
}
