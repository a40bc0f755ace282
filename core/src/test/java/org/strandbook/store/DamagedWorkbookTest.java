package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A workbook whose file is damaged takes no more writes: SQLite's {@code PRAGMA quick_check}
 * (sqlite.org/pragma.html#pragma_quick_check) runs before a session's first write, and the user is
 * told to restore a backup. The damage is made as {@link WorkbookDamage} describes.
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
        WorkbookDamage.smashOldestLeafOf(file, "audit_entry");
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
    void aCheckPassedOnAnotherConnectionCountsOnlyForTheSameFile() {
        Path file = dir.resolve("sound.strandbook");
        Path other = dir.resolve("other.strandbook");
        Workbook.create(other, DemoSite.site(), DemoSite.USER).close();
        try (Workbook wb = Workbook.create(file, DemoSite.site(), DemoSite.USER);
             Workbook unchecked = Workbook.openForReading(file, DemoSite.USER);
             Workbook elsewhere = Workbook.openForReading(other, DemoSite.USER)) {
            assertThrows(IllegalArgumentException.class, () -> wb.acceptIntegrityCheck(unchecked),
                    "a connection that passed no check vouches for nothing");
            elsewhere.checkIntegrity();
            assertThrows(IllegalArgumentException.class, () -> wb.acceptIntegrityCheck(elsewhere),
                    "a check of another file says nothing of this one");
            unchecked.checkIntegrity();
            wb.acceptIntegrityCheck(unchecked);
        }
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
}
