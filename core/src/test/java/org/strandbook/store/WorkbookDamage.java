package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Arrays;

/**
 * Damage of the kind a failing disk or a copy cut short leaves in a workbook file. Page layout from
 * "Database File Format" (sqlite.org/fileformat.html, section 1.6, b-tree pages): a table's interior
 * page holds, after its 12-byte header and its cell pointer array, cells that begin with the 4-byte
 * number of their left child page.
 */
public final class WorkbookDamage {

    private WorkbookDamage() {
    }

    /** Overwrites the table's leftmost leaf page (its oldest rows) with a pattern no page can hold. */
    public static void smashOldestLeafOf(Path file, String table) throws SQLException, IOException {
        int pageSize;
        int root;
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            try (ResultSet rs = st.executeQuery("PRAGMA page_size")) {
                pageSize = rs.getInt(1);
            }
            try (ResultSet rs = st.executeQuery("SELECT rootpage FROM sqlite_master WHERE name = '" + table + "'")) {
                root = rs.getInt(1);
            }
        }
        try (RandomAccessFile raf = new RandomAccessFile(file.toFile(), "rw")) {
            long rootOffset = (long) (root - 1) * pageSize;
            raf.seek(rootOffset);
            // 0x05: interior table b-tree page; the test needs enough rows for the table to have one
            assertEquals(0x05, raf.readUnsignedByte(), "the audit table spans more than one page");
            raf.seek(rootOffset + 12);
            int firstCell = raf.readUnsignedShort();
            raf.seek(rootOffset + firstCell);
            int leaf = raf.readInt();
            byte[] junk = new byte[pageSize];
            Arrays.fill(junk, (byte) 0x7f);
            raf.seek((long) (leaf - 1) * pageSize);
            raf.write(junk);
        }
    }
}
