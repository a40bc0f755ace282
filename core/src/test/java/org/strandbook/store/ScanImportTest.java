package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;

import org.junit.jupiter.api.Test;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;

class ScanImportTest extends PopulatedWorkbookTest {

    ScanImportTest() {
        super("import.sqlite");
    }

    private static NewScan scan(String tag, int seq) {
        return new NewScan(tag, ScanKind.LOOP, Instant.EPOCH.plusSeconds(seq), ScanConditions.unknown("k.ashdown"),
                DemoSite.spectrum(128, seq), "f" + seq + ".csv", DemoSite.sha256Of("import/" + seq));
    }

    @Test
    void storesEveryScanAcrossSeveralCommits() {
        try (ScanImport batch = wb.scans().startImport(25, Duration.ofMinutes(1))) {
            for (int i = 0; i < 60; i++) {
                assertEquals(ScanImport.Result.STORED, batch.add(scan(DemoSite.POINT_A, i)).result());
            }
            assertEquals(60, batch.stored());
        }
        assertEquals(60, wb.scans().count());
        assertEquals(60, wb.scans().list(DemoSite.POINT_A).size());
    }

    @Test
    void aClosedImportHasCopiedItsLogIntoTheWorkbookFile() throws Exception {
        // a commit leaves pages in the write-ahead log until a checkpoint copies them into the file
        // (SQLite, "Write-Ahead Logging", sqlite.org/wal.html); the import copies beside itself and
        // on close, so the file alone, without its -wal, already holds every scan
        try (ScanImport batch = wb.scans().startImport(25, Duration.ofMinutes(1))) {
            for (int i = 0; i < 60; i++) {
                batch.add(scan(DemoSite.POINT_A, i));
            }
        }
        Path copy = dir.resolve("file-alone.sqlite");
        Files.copy(dir.resolve("import.sqlite"), copy);
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + copy);
             Statement s = c.createStatement();
             ResultSet rs = s.executeQuery("SELECT count(*) FROM scan")) {
            rs.next();
            assertEquals(60, rs.getInt(1));
        }
    }

    @Test
    void aClosedImportGivesTheConnectionBackSqlitesOwnCheckpointSize() throws Exception {
        // 1000 pages is SQLite's default wal_autocheckpoint (sqlite.org/pragma.html); the import turns
        // it off while its own checkpointer runs and must not leave it off for later commits
        try (ScanImport batch = wb.scans().startImport()) {
            batch.add(scan(DemoSite.POINT_A, 1));
        }
        try (Statement s = wb.session().connection().createStatement();
             ResultSet rs = s.executeQuery("PRAGMA wal_autocheckpoint")) {
            rs.next();
            assertEquals(1000, rs.getInt(1));
        }
    }

    @Test
    void aFileAlreadyStoredIsReportedWithItsScanNotThrown() {
        long first = wb.scans().insert(scan(DemoSite.POINT_A, 1));
        try (ScanImport batch = wb.scans().startImport()) {
            assertEquals(new ScanImport.Outcome(ScanImport.Result.ALREADY_STORED, first),
                    batch.add(scan(DemoSite.POINT_A, 1)));
            assertEquals(ScanImport.Result.STORED, batch.add(scan(DemoSite.POINT_A, 2)).result());
            assertEquals(1, batch.alreadyStored());
        }
        assertEquals(2, wb.scans().count());
    }

    @Test
    void aRefusedScanUndoesOnlyItselfAndTheImportGoesOn() {
        try (ScanImport batch = wb.scans().startImport()) {
            batch.add(scan(DemoSite.POINT_A, 1));
            assertThrows(UnknownEntryException.class, () -> batch.add(scan("AT-404", 2)));
            batch.add(scan(DemoSite.POINT_B, 3));
        }
        assertEquals(2, wb.scans().count());
    }

    @Test
    void otherWorkbookCallsOfTheSameThreadJoinTheOpenImport() {
        try (ScanImport batch = wb.scans().startImport()) {
            batch.add(scan(DemoSite.POINT_A, 1));
            wb.notes().add(new org.strandbook.site.Note(DemoSite.POINT_A, Instant.EPOCH, "k.ashdown", "mid-import note"));
            assertEquals(1, wb.scans().count());
        }
        assertEquals(1, wb.notes().list().size());
    }
}
