package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.Arrays;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A workbook whose file is damaged takes no more writes: SQLite's {@code PRAGMA quick_check}
 * (sqlite.org/pragma.html#pragma_quick_check) runs before a session's first write, and the user is
 * told to restore a backup. Page layout from "Database File Format" (sqlite.org/fileformat.html,
 * section 1.6, b-tree pages): a table's interior page holds, after its 12-byte header and its
 * cell pointer array, cells that begin with the 4-byte number of their left child page.
 */
class DamagedWorkbookTest {

    private static final Instant T0 = Instant.parse("2024-03-05T14:07:00Z");

    @TempDir
    Path dir;

    @Test
    void aWorkbookWithADamagedAuditPageRefusesAnImportAndIsLeftAsItWas() throws Exception {
        Path file = dir.resolve("site.strandbook");
        try (Workbook wb = Workbook.create(file, DemoSite.site(), DemoSite.USER)) {
            DemoSite.populate(wb);
            for (int i = 0; i < 60; i++) {
                DemoSite.insertScan(wb, DemoSite.POINT_A, i, T0.plusSeconds(i));
            }
        }
        smashOldestLeafOf(file, "audit_entry");
        byte[] damaged = Files.readAllBytes(file);
        DamagedWorkbookException e;
        try (Workbook wb = Workbook.open(file, DemoSite.USER)) {
            // the newest audit page, where the import appends, is whole: only the check can notice
            e = assertThrows(DamagedWorkbookException.class,
                    () -> DemoSite.insertScan(wb, DemoSite.POINT_B, 100, T0.plusSeconds(100)));
        }
        assertTrue(e.getMessage().startsWith("workbook " + file + " is damaged ("), e.getMessage());
        assertTrue(e.getMessage().endsWith("nothing was written to it: restore it from a backup"), e.getMessage());
        assertArrayEquals(damaged, Files.readAllBytes(file));
    }

    @Test
    void aSoundWorkbookPassesTheCheck() {
        Path file = dir.resolve("sound.strandbook");
        try (Workbook wb = Workbook.create(file, DemoSite.site(), DemoSite.USER)) {
            DemoSite.populate(wb);
            wb.checkIntegrity();
            assertEquals(1, DemoSite.insertScan(wb, DemoSite.POINT_A, 1, T0));
        }
    }

    /** Overwrites the table's leftmost leaf page (its oldest rows) with a pattern no page can hold. */
    private static void smashOldestLeafOf(Path file, String table) throws SQLException, IOException {
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
