package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.Site;

class WorkbookLifecycleTest {

    @TempDir
    Path dir;

    @Test
    void createdWorkbookReopensWithItsSite() {
        Path file = dir.resolve("fennwick.sqlite");
        Workbook.create(file, DemoSite.site(), DemoSite.USER).close();
        try (Workbook wb = Workbook.open(file, "m.okonedo")) {
            assertEquals(DemoSite.site(), wb.site().get());
            assertEquals(Workbook.latestSchemaVersion(), wb.schemaVersion());
            assertEquals("m.okonedo", wb.user());
        }
    }

    @Test
    void everyConnectionEnforcesForeignKeysInWalModeWithABusyTimeout() throws SQLException {
        // PRAGMA semantics as documented at sqlite.org/pragma.html (foreign_keys, journal_mode, busy_timeout).
        try (Workbook wb = Workbook.create(dir.resolve("p.sqlite"), DemoSite.site(), DemoSite.USER);
             Statement st = wb.session().connection().createStatement()) {
            assertEquals("1", pragma(st, "foreign_keys"));
            assertEquals("wal", pragma(st, "journal_mode"));
            assertEquals("5000", pragma(st, "busy_timeout"));
            assertEquals(Integer.toString(WorkbookFile.APPLICATION_ID), pragma(st, "application_id"));
        }
    }

    @Test
    void aCopyWrittenWhileAnotherProgramHasTheWorkbookOpenIsWholeAndVerifies() throws IOException {
        // VACUUM INTO writes one consistent snapshot without an exclusive lock (sqlite.org/lang_vacuum.html)
        Path file = dir.resolve("source.sqlite");
        Path copy = dir.resolve("elsewhere").resolve("copy.sqlite");
        Files.createDirectories(copy.getParent());
        try (Workbook wb = Workbook.create(file, DemoSite.site(), DemoSite.USER);
             Workbook otherProgram = Workbook.open(file, "s.varga")) {
            DemoSite.populate(wb);
            otherProgram.points().list();
            Files.writeString(copy, "an older copy, replaced");

            wb.copyTo(copy);

            assertEquals(DemoSite.site(), wb.site().get());
            try (Workbook c = Workbook.open(copy, "m.okonedo")) {
                assertEquals(wb.points().list(), c.points().list());
                assertEquals(wb.site().get(), c.site().get());
                assertTrue(c.audit().verify().intact(), c.audit().verify()::toString);
            }
        }
        try (var left = Files.list(copy.getParent())) {
            assertEquals(1, left.count(), "no draft left beside the copy");
        }
    }

    @Test
    void aCopyIntoAMissingFolderNamesThatFolder() {
        // the technician must see what to fix: the target's folder, not the open workbook
        try (Workbook wb = Workbook.create(dir.resolve("source.sqlite"), DemoSite.site(), DemoSite.USER)) {
            WorkbookException e = assertThrows(WorkbookException.class,
                    () -> wb.copyTo(dir.resolve("no-such-folder").resolve("copy.sqlite")));
            assertTrue(e.getMessage().contains("no-such-folder") && e.getMessage().contains("does not exist"),
                    e.getMessage());
        }
    }

    @Test
    void aWorkbookIsNotCopiedOntoItself() {
        Path file = dir.resolve("self.sqlite");
        try (Workbook wb = Workbook.create(file, DemoSite.site(), DemoSite.USER)) {
            assertThrows(WorkbookException.class, () -> wb.copyTo(dir.resolve(".").resolve("self.sqlite")));
        }
    }

    @Test
    void createRefusesAnExistingFileAndLeavesItAlone() throws IOException {
        Path file = dir.resolve("taken.sqlite");
        Files.writeString(file, "someone's notes");
        byte[] before = Files.readAllBytes(file);
        WorkbookException e = assertThrows(WorkbookException.class,
                () -> Workbook.create(file, DemoSite.site(), DemoSite.USER));
        assertTrue(e.getMessage().contains("already exists"), e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void createLeavesNoDraftBehind() throws IOException {
        Workbook.create(dir.resolve("clean.sqlite"), DemoSite.site(), DemoSite.USER).close();
        try (var files = Files.list(dir)) {
            assertEquals(java.util.List.of("clean.sqlite"), files.map(p -> p.getFileName().toString()).toList());
        }
    }

    @Test
    void createInAMissingFolderSaysWhichFolder() {
        Path file = dir.resolve("no-such-folder").resolve("x.sqlite");
        WorkbookException e = assertThrows(WorkbookException.class,
                () -> Workbook.create(file, DemoSite.site(), DemoSite.USER));
        assertTrue(e.getMessage().contains("no-such-folder") && e.getMessage().contains("does not exist"), e.getMessage());
    }

    @Test
    void openingAMissingFileSaysNoWorkbookAndCreatesNothing() {
        Path file = dir.resolve("absent.sqlite");
        WorkbookMissingException e = assertThrows(WorkbookMissingException.class,
                () -> Workbook.open(file, DemoSite.USER));
        assertEquals("no workbook at " + file, e.getMessage());
        assertFalse(Files.exists(file));
    }

    @Test
    void aUserNameIsRequiredBecauseTheAuditTrailRecordsIt() {
        assertThrows(IllegalArgumentException.class, () -> Workbook.create(dir.resolve("u.sqlite"), DemoSite.site(), " "));
    }

    @Test
    void siteUpdateIsStoredAndAudited() {
        try (Workbook wb = Workbook.create(dir.resolve("rev.sqlite"), DemoSite.site(), DemoSite.USER)) {
            Site revised = new Site("Fennwick Basin Works", "Unit 3 aromatics", "B", 0.8);
            wb.site().update(revised);
            assertEquals(revised, wb.site().get());
            AuditEntry last = wb.audit().entries(0, 100).get(wb.audit().entries(0, 100).size() - 1);
            assertEquals("UPDATE", last.action());
            assertTrue(last.oldValues().contains("\"revision\":\"A\"") && last.newValues().contains("\"revision\":\"B\""),
                    last.oldValues() + " -> " + last.newValues());
            assertTrue(wb.audit().verify().intact());
        }
    }

    private static String pragma(Statement st, String name) throws SQLException {
        try (ResultSet rs = st.executeQuery("PRAGMA " + name)) {
            rs.next();
            return rs.getString(1);
        }
    }
}
