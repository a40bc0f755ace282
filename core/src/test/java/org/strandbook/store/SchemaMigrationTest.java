package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;

/** A workbook written by schema 1 (committed fixture) opens in this Strandbook with nothing lost. */
class SchemaMigrationTest {

    /** Steps from schema 1 on that the trail records: 1 to 2 (which starts it), 2 to 3, 3 to 5, 5 to 6, 6 to 7, 7 to 8, 8 to 9. */
    private static final long SCHEMA_STEPS_AUDITED = 7;

    @TempDir
    Path dir;

    @Test
    void aSchemaOneWorkbookUpgradesWithItsDataIntact() throws IOException {
        Path file = SchemaOneFixture.copyTo(dir.resolve("old.sqlite"));
        try (Workbook wb = Workbook.open(file, "t.vane")) {
            assertEquals(Workbook.latestSchemaVersion(), wb.schemaVersion());
            assertEquals(new Site("Harrowgate Salt Flats Plant", "Brine unit 2", "A", 1.2), wb.site().get());
            assertEquals("QB-3", wb.site().analyzers().get(0).tag());
            assertEquals(2, wb.catalog().fiberType("LOH-200").orElseThrow().datasheet().size());
            assertEquals(2, wb.points().get("AB-201").orElseThrow().bands().size());
            List<PathLeg> legs = wb.paths().legs("AB-201");
            assertEquals(2, legs.size());
            assertEquals(List.of("HB-1", "J1"), legs.get(0).elements().stream().map(e -> e.label()).toList());
            List<ScanRecord> scans = wb.scans().list("AB-201");
            assertEquals(1, scans.size());
            assertEquals(ScanKind.LOOP, scans.get(0).kind());
            assertEquals(Instant.parse("2023-11-02T10:30:00Z"), scans.get(0).takenAt());
            assertEquals(SchemaOneFixture.SPECTRUM, wb.scans().spectrum(scans.get(0).id()));
            assertEquals(List.of(new Inspection("AB-201", "J1", Instant.parse("2023-11-02T10:15:00Z"), "t.vane",
                    InspectionGrade.CLEAN, "")), wb.inspections().list("AB-201"));
            assertEquals(1, wb.signOffs().list().size());
            assertEquals("probe window replaced", wb.notes().list("AB-201").get(0).text());
            // a workbook from before schema 6 chose no decision rule: it keeps the fixed tolerance it was judged by
            assertEquals(DecisionRule.FIXED, wb.site().decisionRule());
        }
    }

    @Test
    void theUpgradeStartsTheTrailWithABaselineOfEveryRow() throws IOException {
        Path file = SchemaOneFixture.copyTo(dir.resolve("old.sqlite"));
        try (Workbook wb = Workbook.open(file, "t.vane")) {
            List<AuditEntry> trail = wb.audit().entries(0, 1000);
            // site, analyzer, fiber type + 2 datasheet points, connector, probe, point + 2 bands,
            // 3 path elements + 1 bend, 1 scan (with its spectrum), inspection, sign-off, note; then
            // schema 3 adds the scan's unit column and records the scan once more with it
            assertEquals(18 + 1, trail.stream().filter(e -> e.action().equals("BASELINE")).count());
            List<AuditEntry> schemaRows = trail.stream().filter(e -> e.action().equals("SCHEMA")).toList();
            assertEquals(List.of("{\"schema\":2}", "{\"schema\":3}", "{\"schema\":5}", "{\"schema\":6}",
                    "{\"schema\":7}", "{\"schema\":8}", "{\"schema\":" + Workbook.latestSchemaVersion() + "}"),
                    schemaRows.stream().map(AuditEntry::newValues).toList());
            assertEquals("t.vane", schemaRows.get(0).user());
            assertTrue(trail.stream().anyMatch(e -> e.action().equals("BASELINE") && e.newValues().contains("\"y_unit\":\"\"")),
                    "the scan's image after schema 3 carries its unit");
            AuditEntry last = trail.get(trail.size() - 1);
            assertEquals("{\"schema\":" + Workbook.latestSchemaVersion() + "}", last.newValues());
            assertTrue(wb.audit().verify().intact(), () -> wb.audit().verify().toString());
            wb.notes().add(new org.strandbook.site.Note("", Instant.parse("2024-01-01T00:00:00Z"), "t.vane", "upgraded"));
            assertTrue(wb.audit().verify().intact());
        }
    }

    @Test
    void aCurrentWorkbookIsNotUpgradedTwice() throws IOException {
        Path file = SchemaOneFixture.copyTo(dir.resolve("old.sqlite"));
        Workbook.open(file, "t.vane").close();
        try (Workbook wb = Workbook.open(file, "t.vane")) {
            assertEquals(SCHEMA_STEPS_AUDITED, wb.audit().entries(0, 1000).stream().filter(e -> e.action().equals("SCHEMA")).count());
        }
    }

    @Test
    void twoProgramsOpeningAnOldWorkbookAtOnceUpgradeItOnce() throws Exception {
        Path file = SchemaOneFixture.copyTo(dir.resolve("old.sqlite"));
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            Callable<Integer> opener = () -> {
                try (Workbook wb = Workbook.open(file, Thread.currentThread().getName())) {
                    return wb.schemaVersion();
                }
            };
            List<Future<Integer>> results = pool.invokeAll(List.of(opener, opener));
            for (Future<Integer> r : results) {
                assertEquals(Workbook.latestSchemaVersion(), r.get());
            }
        } finally {
            pool.shutdown();
        }
        try (Workbook wb = Workbook.open(file, "t.vane")) {
            List<AuditEntry> trail = wb.audit().entries(0, 1000);
            assertEquals(SCHEMA_STEPS_AUDITED, trail.stream().filter(e -> e.action().equals("SCHEMA")).count());
            assertEquals(18 + 1, trail.stream().filter(e -> e.action().equals("BASELINE")).count());
            assertTrue(wb.audit().verify().intact());
        }
    }

    @Test
    void theSchemaOneScriptStillBuildsTheFixturesTables() throws Exception {
        Path fixture = SchemaOneFixture.copyTo(dir.resolve("old.sqlite"));
        Path fresh = dir.resolve("fresh.sqlite");
        Workbook.connect(fresh, "t.vane", Workbook.DEFAULT_BUSY_TIMEOUT, true, 1).close();
        assertEquals(schema(fixture), schema(fresh), "a released schema script was edited: add a new step instead");
    }

    @Test
    void everyTableOfUserDataIsAudited() throws Exception {
        Path file = dir.resolve("now.sqlite");
        Workbook.create(file, DemoSite.site(), DemoSite.USER).close();
        Set<String> tables = new HashSet<>();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT name FROM sqlite_master WHERE type = 'table' "
                     + "AND name NOT LIKE 'sqlite_%' AND name <> 'audit_entry'"
                     // the plant server's bookkeeping (schema 7): what the server has, not user data
                     + " AND name NOT LIKE 'sync_%'")) {
            while (rs.next()) {
                tables.add(rs.getString(1));
            }
        }
        Set<String> audited = new HashSet<>();
        for (AuditedTable t : AuditedTable.values()) {
            audited.add(t.tableName());
            audited.addAll(t.coveredTables());
        }
        assertEquals(tables, audited);
    }

    private static List<String> schema(Path file) throws SQLException {
        List<String> out = new ArrayList<>();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT type, name, tbl_name, sql FROM sqlite_master ORDER BY name")) {
            while (rs.next()) {
                out.add(rs.getString(1) + " " + rs.getString(2) + " " + rs.getString(3) + " " + rs.getString(4));
            }
        }
        return out.stream().collect(Collectors.toList());
    }
}
