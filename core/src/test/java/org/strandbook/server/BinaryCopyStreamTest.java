package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;

import org.junit.jupiter.api.Test;
import org.postgresql.PGConnection;

/**
 * Rows written in PostgreSQL's binary copy format (PostgreSQL 15 documentation, "COPY", section
 * "Binary Format") read back from a real server exactly as written: the server's own parser is the
 * reference, not our writer.
 */
class BinaryCopyStreamTest {

    private static final String COPY = "COPY copied (n, t, j, b) FROM STDIN (FORMAT binary)";

    private static Connection table() throws SQLException {
        LocalPostgres pg = LocalPostgres.shared();
        Connection c = pg.superuser(pg.newDatabase());
        try (Statement st = c.createStatement()) {
            st.execute("CREATE TABLE copied (n int PRIMARY KEY, t text NOT NULL, j jsonb NOT NULL, b bytea)");
        }
        return c;
    }

    @Test
    void textJsonAndBytesArriveUnchangedWhereTheTextFormatWouldNeedEscapes() throws SQLException {
        // a tab, a newline and a backslash are COPY text format's delimiters and escape; non-ASCII
        // text is multi-byte UTF-8; a byte string holds every byte value once
        String awkward = "AT-4101\tprobe\\tip\nµ-cell Å";
        String json = "{\"operator\":\"k.ashdown\",\"note\":\"tab\\there, ±0.2 dB\"}";
        byte[] every = new byte[256];
        for (int i = 0; i < every.length; i++) {
            every[i] = (byte) i;
        }
        try (Connection c = table()) {
            BinaryCopyStream copy = new BinaryCopyStream(c.unwrap(PGConnection.class).getCopyAPI().copyIn(COPY));
            copy.row(4).int4(7).text(awkward).jsonb(json).bytes(every);
            copy.row(4).int4(8).text("second").jsonb("[]").bytes(null);
            assertEquals(2, copy.finish());
            try (PreparedStatement ps = c.prepareStatement("SELECT n, t, j = ?::jsonb, b FROM copied ORDER BY n")) {
                ps.setString(1, json);
                try (ResultSet rs = ps.executeQuery()) {
                    rs.next();
                    assertEquals(7, rs.getInt(1));
                    assertEquals(awkward, rs.getString(2));
                    assertTrue(rs.getBoolean(3), "the JSON arrives as the same jsonb value");
                    assertArrayEquals(every, rs.getBytes(4));
                    rs.next();
                    assertEquals(8, rs.getInt(1));
                    assertNull(rs.getBytes(4));
                    assertFalse(rs.next());
                }
            }
        }
    }

    @Test
    void rowsLargerThanOneMessageArriveWhole() throws SQLException {
        byte[] large = new byte[300_000];
        for (int i = 0; i < large.length; i++) {
            large[i] = (byte) (i * 31);
        }
        try (Connection c = table()) {
            BinaryCopyStream copy = new BinaryCopyStream(c.unwrap(PGConnection.class).getCopyAPI().copyIn(COPY));
            for (int n = 0; n < 5; n++) {
                copy.row(4).int4(n).text("row " + n).jsonb("{}").bytes(large);
            }
            assertEquals(5, copy.finish());
            try (Statement st = c.createStatement();
                 ResultSet rs = st.executeQuery("SELECT count(*), sum(length(b)) FROM copied")) {
                rs.next();
                assertEquals(5, rs.getInt(1));
                assertEquals(5L * large.length, rs.getLong(2));
            }
        }
    }

    @Test
    void invalidJsonIsRefusedByTheServerAndNothingIsCopied() throws SQLException {
        try (Connection c = table()) {
            BinaryCopyStream copy = new BinaryCopyStream(c.unwrap(PGConnection.class).getCopyAPI().copyIn(COPY));
            copy.row(4).int4(1).text("fine").jsonb("{}").bytes(new byte[] {1});
            copy.row(4).int4(2).text("broken").jsonb("{not json").bytes(new byte[] {2});
            assertThrows(SQLException.class, copy::finish);
            try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT count(*) FROM copied")) {
                rs.next();
                assertEquals(0, rs.getInt(1));
            }
        }
    }
}
