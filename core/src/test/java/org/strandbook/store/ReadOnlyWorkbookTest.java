package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;

/**
 * A workbook that only needs reading (a handed-over dossier's workbook on a share, a file another
 * user owns) is read without writing anything: SQLite's read-only open and the {@code immutable}
 * URI parameter (sqlite.org/uri.html; sqlite.org/wal.html, "Read-Only Databases").
 */
class ReadOnlyWorkbookTest {

    @TempDir
    Path dir;

    @Test
    void aWorkbookInAFolderNobodyMayWriteIsReadAndRefusesWritesAsReadOnly() throws Exception {
        Path folder = Files.createDirectory(dir.resolve("handed over"));
        Path file = populated(folder.resolve("site.strandbook"));
        try (ImmutableFiles locked = ImmutableFiles.lock(file, folder)) {
            byte[] before = Files.readAllBytes(file);
            try (Workbook wb = Workbook.openForReading(file, DemoSite.USER)) {
                assertEquals(3, wb.scans().list(DemoSite.POINT_A).size());
                assertTrue(wb.audit().verify().intact());
                WorkbookException e = assertThrows(WorkbookException.class,
                        () -> DemoSite.insertScan(wb, DemoSite.POINT_A, 9, Instant.parse("2024-05-01T08:00:00Z")));
                assertEquals("workbook " + file + " is read-only; nothing was changed", e.getMessage());
            }
            WorkbookException e = assertThrows(WorkbookException.class, () -> Workbook.open(file, DemoSite.USER));
            assertEquals("workbook " + file + " is read-only; nothing was changed", e.getMessage());
            assertArrayEquals(before, Files.readAllBytes(file));
        }
        assertFalse(Files.exists(Path.of(file + "-wal")) || Files.exists(Path.of(file + "-shm")));
    }

    @Test
    void anImmutableOpenReadsAFileWhoseNameNeedsEscapingInAUri() throws IOException {
        // '#', '?', '%' and a space mean something in a URI; the file name must survive them
        Path folder = Files.createDirectory(dir.resolve("unit 3 #2 ?100%"));
        Path file = populated(folder.resolve("site a.strandbook"));
        try (Workbook wb = Workbook.connectReadOnly(file, DemoSite.USER, true)) {
            assertEquals(3, wb.scans().list(DemoSite.POINT_A).size());
        }
        assertFalse(Files.exists(Path.of(file + "-wal")) || Files.exists(Path.of(file + "-shm")));
    }

    private static Path populated(Path file) {
        try (Workbook wb = Workbook.create(file, DemoSite.site(), DemoSite.USER)) {
            DemoSite.populate(wb);
            for (int i = 0; i < 3; i++) {
                wb.scans().insert(DemoSite.POINT_A, ScanKind.LOOP, Instant.parse("2024-03-05T14:07:00Z").plusSeconds(i),
                        ScanConditions.unknown("k.ashdown"), DemoSite.spectrum(64, i), "loop-" + i + ".csv",
                        DemoSite.sha256Of("loop-" + i));
            }
        }
        return file;
    }
}
