package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.Arrays;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** A file that is not a workbook this Strandbook can write is refused with a clear message and left as it was. */
class ForeignFileTest {

    @TempDir
    Path dir;

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"empty", "text", "random", "other-sqlite", "blank-sqlite", "cut-in-its-header"})
    void aForeignFileIsRefusedAndLeftUnchanged(String kind) throws Exception {
        Path file = dir.resolve(kind + ".sqlite");
        String expected = switch (kind) {
            case "empty" -> {
                Files.createFile(file);
                yield "not a Strandbook workbook: " + file + " is empty";
            }
            case "text" -> {
                Files.writeString(file, "point,loss_db\nAT-101,3.2\n");
                yield "not a Strandbook workbook: " + file + " is not an SQLite database";
            }
            case "random" -> {
                byte[] noise = new byte[8192];
                new Random(20240305L).nextBytes(noise);
                Files.write(file, noise);
                yield "not a Strandbook workbook: " + file + " is not an SQLite database";
            }
            case "other-sqlite" -> {
                sql(file, "CREATE TABLE stock (item TEXT, qty INTEGER); INSERT INTO stock VALUES ('ferrule', 40);");
                yield "not a Strandbook workbook: " + file + " is an SQLite database of another program";
            }
            case "blank-sqlite" -> {
                sql(file, "CREATE TABLE t (x); DROP TABLE t;");
                yield "not a Strandbook workbook: " + file + " is an SQLite database of another program";
            }
            default -> {
                Path whole = dir.resolve("whole.sqlite");
                try (Workbook wb = Workbook.create(whole, DemoSite.site(), DemoSite.USER)) {
                    DemoSite.populate(wb);
                }
                byte[] bytes = Files.readAllBytes(whole);
                Files.write(file, Arrays.copyOf(bytes, 60));
                yield "not a Strandbook workbook: " + file + " is not an SQLite database";
            }
        };
        byte[] before = Files.readAllBytes(file);
        NotAWorkbookException e = assertThrows(NotAWorkbookException.class, () -> Workbook.open(file, DemoSite.USER));
        assertEquals(expected, e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
        assertFalse(Files.exists(Path.of(file + "-wal")) || Files.exists(Path.of(file + "-shm")),
                "SQLite must not have opened the file");
    }

    @Test
    void aFolderIsRefused() {
        NotAWorkbookException e = assertThrows(NotAWorkbookException.class, () -> Workbook.open(dir, DemoSite.USER));
        assertTrue(e.getMessage().endsWith("is a folder"), e.getMessage());
    }

    @Test
    void aWorkbookOfANewerSchemaIsRefusedAndLeftUnchanged() throws Exception {
        Path file = dir.resolve("future.sqlite");
        Workbook.create(file, DemoSite.site(), DemoSite.USER).close();
        sql(file, "PRAGMA user_version = 99;");
        byte[] before = Files.readAllBytes(file);
        NewerWorkbookException e = assertThrows(NewerWorkbookException.class, () -> Workbook.open(file, DemoSite.USER));
        assertEquals(99, e.schemaVersion());
        assertTrue(e.getMessage().contains("written by a newer Strandbook (schema 99)"), e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void aWorkbookOfAnUnknownSchemaVersionIsRefusedInOurWords() throws Exception {
        // design choice: versions are counted from 0 up (PRAGMA user_version, sqlite.org/pragma.html), so
        // a negative one was never written by Strandbook; the wording is ours, not SQLite's
        Path file = dir.resolve("unknown.sqlite");
        Workbook.create(file, DemoSite.site(), DemoSite.USER).close();
        sql(file, "PRAGMA user_version = -3;");
        byte[] before = Files.readAllBytes(file);
        NotAWorkbookException e = assertThrows(NotAWorkbookException.class, () -> Workbook.open(file, DemoSite.USER));
        assertEquals("workbook " + file + " records an unknown schema version (-3); no Strandbook wrote that, so the"
                + " file is left unchanged: restore it from a backup", e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void aWorkbookWhoseTablesDoNotMatchItsSchemaVersionIsRefusedInOurWords() throws Exception {
        // schema 2's tables under a version reset to 1: the upgrade to 2 cannot run (design choice: our
        // words, with SQLite's reason inside, and never its raw error code)
        Path file = dir.resolve("mismatched.sqlite");
        Workbook.create(file, DemoSite.site(), DemoSite.USER).close();
        sql(file, "PRAGMA user_version = 1;");
        byte[] before = Files.readAllBytes(file);
        WorkbookException e = assertThrows(WorkbookException.class, () -> Workbook.open(file, DemoSite.USER));
        assertTrue(e.getMessage().startsWith("workbook " + file + " records schema 1 but its tables do not match it"
                + " (upgrading to schema 2 failed: "), e.getMessage());
        assertTrue(e.getMessage().endsWith("); nothing was changed: restore the workbook from a backup"), e.getMessage());
        assertFalse(e.getMessage().contains("SQLITE_"), e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void aWorkbookMissingTablesOfItsRecordedSchemaIsRefusedBeforeAnyCommandRuns() throws Exception {
        // a file that says "Strandbook workbook, schema n" but lacks a table its schema creates (dropped by
        // another program) is refused when it is opened, in our words, not later with SQLite's bare "no such
        // table" in the middle of a command (design choice)
        Path file = dir.resolve("hollow.sqlite");
        Workbook.create(file, DemoSite.site(), DemoSite.USER).close();
        sql(file, "DROP TABLE scan_spectrum;");
        byte[] before = Files.readAllBytes(file);
        DamagedWorkbookException e = assertThrows(DamagedWorkbookException.class,
                () -> Workbook.open(file, DemoSite.USER));
        assertTrue(e.getMessage().contains("lacks the tables scan_spectrum of that schema"), e.getMessage());
        assertFalse(e.getMessage().contains("SQLITE_"), e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void aWorkbookCutShortIsReportedDamaged() throws Exception {
        Path whole = dir.resolve("whole.sqlite");
        try (Workbook wb = Workbook.create(whole, DemoSite.site(), DemoSite.USER)) {
            DemoSite.populate(wb);
            for (int i = 0; i < 20; i++) {
                DemoSite.insertScan(wb, DemoSite.POINT_A, i, Instant.EPOCH.plusSeconds(i));
            }
        }
        byte[] bytes = Files.readAllBytes(whole);
        Path cut = dir.resolve("cut.sqlite");
        Files.write(cut, Arrays.copyOf(bytes, bytes.length / 3));
        WorkbookException e = assertThrows(WorkbookException.class, () -> {
            try (Workbook wb = Workbook.open(cut, DemoSite.USER)) {
                wb.audit().verify();
            }
        });
        assertTrue(e.getMessage().contains("is damaged"), e.getMessage());
    }

    private static void sql(Path file, String script) throws SQLException, IOException {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            st.executeUpdate(script);
        }
        assertTrue(Files.size(file) > 0);
    }
}
