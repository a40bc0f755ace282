package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.Note;
import org.strandbook.store.DamagedWorkbookException;
import org.strandbook.store.DemoSite;
import org.strandbook.store.PortableTable;
import org.strandbook.store.SyncLedger;
import org.strandbook.store.Workbook;
import org.strandbook.store.WorkbookDamage;

/**
 * Two laptops and a real PostgreSQL plant server (the checks are the sync's contract as the issue
 * states it: immutable records never conflict, two edits of one field are a conflict with both
 * values kept, a resolution is an audited change, the same sync twice changes nothing).
 */
class SiteSyncTest {

    private static final Instant T0 = Instant.parse("2026-03-01T09:00:00Z");

    @TempDir
    Path dir;

    private String url;

    @BeforeEach
    void server() {
        url = LocalPostgres.shared().newPlantServer("sync_tech_a", "sync_tech_b", "sync_tech_c");
    }

    private PlantServer as(String tech) {
        return new PlantServer(new ServerLogin(url, tech, null));
    }

    private Workbook laptopA() {
        Workbook wb = Workbook.create(dir.resolve("a.strandbook"), DemoSite.site(), "k.ashdown");
        DemoSite.populate(wb);
        DemoSite.insertScan(wb, DemoSite.POINT_A, 1, T0);
        DemoSite.insertScan(wb, DemoSite.POINT_A, 2, T0.plusSeconds(3600));
        wb.inspections().add(new Inspection(DemoSite.POINT_A, "J1", T0, "k.ashdown", InspectionGrade.CLEAN, ""));
        return wb;
    }

    private Workbook cloneAs(String tech, String file) {
        SiteClone.run(as(tech), DemoSite.site().name(), dir.resolve(file), tech, SyncProgress.SILENT);
        return Workbook.open(dir.resolve(file), tech);
    }

    private static SiteSync.Outcome sync(PlantServer server, Workbook wb) {
        return new SiteSync(server, wb, wb.site().get().name(), SyncProgress.SILENT).run();
    }

    @Test
    void aCloneHoldsEveryRecordOfTheLaptopThatPushed() {
        try (Workbook a = laptopA()) {
            SiteSync.Outcome first = sync(as("sync_tech_a"), a);
            assertTrue(first.pushed() >= 3, "two scans and an inspection at least");
            try (Workbook b = cloneAs("sync_tech_a", "b.strandbook")) {
                assertEquals(a.records().readAll(), b.records().readAll());
                String sha = DemoSite.sha256Of(DemoSite.POINT_A + "/1");
                assertArrayEquals(a.records().spectrum(sha), b.records().spectrum(sha));
                assertTrue(b.audit().verify().intact(), "the clone's own trail verifies");
                assertEquals(a.paths().legs(DemoSite.POINT_A), b.paths().legs(DemoSite.POINT_A));
            }
        }
    }

    @Test
    void theSitesDecisionRuleTravelsToAClone() {
        // the "same meaning as the workbook": a clone must judge its points by the rule the
        // site chose (a coverage interval at 90 %, 0.3 dB guard band), not fall back to the default
        DecisionRule chosen = DecisionRule.interval().withCoverage(0.90).withGuardBandDb(0.3);
        try (Workbook a = laptopA()) {
            a.site().setDecisionRule(chosen);
            sync(as("sync_tech_a"), a);
            try (Workbook b = cloneAs("sync_tech_a", "b.strandbook")) {
                assertEquals(chosen, b.site().decisionRule());
                assertTrue(b.audit().verify().intact(), "the clone's own trail verifies");
            }
        }
    }

    @Test
    void recordsMadeOnTwoLaptopsMeetWithoutConflict() {
        try (Workbook a = laptopA()) {
            sync(as("sync_tech_a"), a);
            try (Workbook b = cloneAs("sync_tech_a", "b.strandbook")) {
                DemoSite.insertScan(a, DemoSite.POINT_B, 3, T0.plusSeconds(7200));
                DemoSite.insertScan(b, DemoSite.POINT_A, 4, T0.plusSeconds(7300));
                b.notes().add(new Note(DemoSite.POINT_A, null, T0.plusSeconds(60), "j.pell", "probe window clear"));
                sync(as("sync_tech_a"), a);
                sync(as("sync_tech_a"), b);
                SiteSync.Outcome last = sync(as("sync_tech_a"), a);
                assertTrue(last.openConflicts().isEmpty());
                assertEquals(a.records().readAll(), b.records().readAll());
                assertEquals(4, a.scans().list(DemoSite.POINT_A).size() + a.scans().list(DemoSite.POINT_B).size());
            }
        }
    }

    @Test
    void aScanRemovedFromOneWorkbookIsRemovedFromTheOthersAndFromClonesWhileTheServerKeepsIt() throws SQLException {
        // the issue: immutable records are never changed or deleted on the server, yet a wrong import
        // removed on one laptop must not come back; the removal travels as a record of its own
        String wrong = DemoSite.sha256Of(DemoSite.POINT_A + "/1");
        try (Workbook a = laptopA()) {
            sync(as("sync_tech_a"), a);
            try (Workbook b = cloneAs("sync_tech_a", "b.strandbook")) {
                long id = a.scans().list(DemoSite.POINT_A).stream().filter(r -> r.sha256().equals(wrong))
                        .findFirst().orElseThrow().id();
                a.scans().delete(id);
                SiteSync.Outcome removal = sync(as("sync_tech_a"), a);
                assertEquals(1, removal.changedThere(), "the removal was recorded on the server");
                assertEquals(1, count("SELECT count(*) FROM scan WHERE record_key = '" + wrong + "'"),
                        "the scan itself stays on the server, immutable");
                assertEquals(1, count("SELECT count(*) FROM audit_entry WHERE table_name = 'scan_removal'"
                        + " AND record_key = '" + wrong + "'"), "the removal is audited on the server");

                SiteSync.Outcome there = sync(as("sync_tech_a"), b);
                assertEquals(1, there.changedHere());
                assertTrue(b.scans().list(DemoSite.POINT_A).stream().noneMatch(r -> r.sha256().equals(wrong)));
                assertTrue(b.audit().verify().intact(), "the removal is an audited change of the other workbook");
                assertEquals(a.records().readAll(), b.records().readAll());
                try (Workbook c = cloneAs("sync_tech_a", "c.strandbook")) {
                    assertEquals(a.records().readAll(), c.records().readAll(), "a clone leaves the removed scan out");
                }
                SiteSync.Outcome again = sync(as("sync_tech_a"), a);
                assertEquals(0, again.pushed() + again.pulled() + again.changedHere() + again.changedThere(),
                        "the removed scan does not come back, and the removal is not recorded twice");
            }
        }
    }

    @Test
    void twoEditsOfOneFieldAreAConflictThatAPersonResolves() throws SQLException {
        try (Workbook a = laptopA()) {
            sync(as("sync_tech_a"), a);
            try (Workbook b = cloneAs("sync_tech_a", "b.strandbook")) {
                MeasurementPoint p = a.points().get(DemoSite.POINT_A).orElseThrow();
                a.points().save(withService(p, "reactor feed, after the filter"));
                b.points().save(withLocation(withService(p, "reactor feed, bypass"),
                        "pipe rack 4"));
                sync(as("sync_tech_a"), a);
                SiteSync.Outcome seen = sync(as("sync_tech_a"), b);
                assertEquals(1, seen.openConflicts().size(), "the service field was edited on both laptops");
                SyncLedger.Conflict c = seen.openConflicts().get(0);
                assertEquals(PortableTable.POINT, c.table());
                assertEquals("service", c.field());
                assertEquals("\"reactor feed, bypass\"", c.mine());
                assertEquals("\"reactor feed, after the filter\"", c.theirs());
                // nothing overwritten: each side still holds its own value; the other field merged
                assertEquals("reactor feed, bypass", b.points().get(DemoSite.POINT_A).orElseThrow().service());
                assertEquals("reactor feed, after the filter", serverField("point", DemoSite.POINT_A, "service"));
                assertEquals("pipe rack 4", serverField("point", DemoSite.POINT_A, "location"));

                SiteSync.resolve(b, c.id(), false, "j.pell");
                SiteSync.Outcome after = sync(as("sync_tech_a"), b);
                assertTrue(after.openConflicts().isEmpty());
                assertEquals("reactor feed, after the filter", b.points().get(DemoSite.POINT_A).orElseThrow().service());
                assertTrue(b.audit().entries(0, 100_000).stream().anyMatch(e -> e.table().equals("point")
                        && e.action().equals("UPDATE") && e.user().equals("sync_tech_a")
                        && e.newValues().contains("after the filter")), "the resolution is in the trail");
                assertTrue(b.syncLedger().conflicts().get(0).kept().equals("THEIRS"));
            }
        }
    }

    @Test
    void keepingMineIsPushedAsAnAuditedEditOnTheServer() throws SQLException {
        try (Workbook a = laptopA()) {
            sync(as("sync_tech_a"), a);
            try (Workbook b = cloneAs("sync_tech_b", "b.strandbook")) {
                // sync_tech_b was not a member of the site: the clone above must fail
            } catch (SyncRefusedException refused) {
                assertTrue(refused.getMessage().contains("no site"), refused.getMessage());
            }
            try (Workbook b = cloneAs("sync_tech_a", "b2.strandbook")) {
                MeasurementPoint p = a.points().get(DemoSite.POINT_A).orElseThrow();
                a.points().save(withService(p, "feed A"));
                b.points().save(withService(p, "feed B"));
                sync(as("sync_tech_a"), a);
                long conflict = sync(as("sync_tech_a"), b).openConflicts().get(0).id();
                SiteSync.resolve(b, conflict, true, "j.pell");
                sync(as("sync_tech_a"), b);
                assertEquals("feed B", serverField("point", DemoSite.POINT_A, "service"));
                sync(as("sync_tech_a"), a);
                assertEquals("feed B", a.points().get(DemoSite.POINT_A).orElseThrow().service());
                assertEquals(1, serverAuditRows("point", "feed B"), "one audited update on the server");
            }
        }
    }

    @Test
    void theSameSyncTwiceChangesNothing() throws SQLException {
        try (Workbook a = laptopA()) {
            sync(as("sync_tech_a"), a);
            long serverRows = count("SELECT count(*) FROM audit_entry");
            long workbookRows = a.audit().verify().rows();
            SiteSync.Outcome again = sync(as("sync_tech_a"), a);
            assertEquals(0, again.pushed() + again.pulled() + again.changedHere() + again.changedThere());
            assertEquals(serverRows, count("SELECT count(*) FROM audit_entry"));
            assertEquals(workbookRows, a.audit().verify().rows());
            assertEquals(1, count("SELECT count(*) FROM workbook_push"), "the server noted the entries it took once");
        }
    }

    @Test
    void aWorkbookThatFailsItsAuditCheckIsRefused() throws SQLException {
        Path file = dir.resolve("a.strandbook");
        laptopA().close();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            st.executeUpdate("UPDATE point SET service = 'edited behind the trail' WHERE tag = 'AT-101'");
        }
        try (Workbook a = Workbook.open(file, "k.ashdown")) {
            SyncRefusedException e = assertThrows(SyncRefusedException.class, () -> sync(as("sync_tech_a"), a));
            assertTrue(e.getMessage().contains("audit verify"), e.getMessage());
        }
        assertEquals(0, count("SELECT count(*) FROM site"), "nothing reached the server");
    }

    @Test
    void aPushOfThousandsOfScansFilesEachOnceInAuditedBatchesWhoseDigestsRecompute() throws SQLException {
        int scans = 2345;
        try (Workbook a = laptopA()) {
            a.inTransaction(() -> {
                for (int s = 0; s < scans; s++) {
                    DemoSite.insertScan(a, DemoSite.POINT_B, 1000 + s, T0.plusSeconds(60L * s));
                }
            });
            assertEquals(scans + 3, sync(as("sync_tech_a"), a).pushed(), "every scan and the inspection");
        }
        assertEquals(scans + 2, count("SELECT count(*) FROM scan"));
        // the server's own records_digest recomputes what each audit row says of the rows it covers
        assertEquals(scans + 2, count("SELECT sum((new_fields ->> 'records')::int) FROM audit_entry"
                + " WHERE table_name = 'scan'"), "each scan is named by exactly one audit row");
        assertEquals(0, count("SELECT count(*) FROM audit_entry WHERE table_name = 'scan' AND ("
                + " (new_fields ->> 'records')::int > 500 OR new_fields ->> 'sha256' IS DISTINCT FROM"
                + " records_digest('scan', site_id, ARRAY(SELECT jsonb_array_elements_text(new_fields -> 'keys'))))"),
                "batches of at most 500 whose digests recompute");
        assertEquals(0, count("SELECT count(*) FROM (SELECT k FROM audit_entry, jsonb_array_elements_text(new_fields"
                + " -> 'keys') k WHERE table_name = 'scan' GROUP BY k HAVING count(*) > 1) twice"));
    }

    @Test
    void aDamagedWorkbookIsRefusedAndNothingReachesTheServer() throws Exception {
        Path file = dir.resolve("a.strandbook");
        try (Workbook wb = laptopA()) {
            for (int s = 0; s < 60; s++) {
                DemoSite.insertScan(wb, DemoSite.POINT_B, 100 + s, T0.plusSeconds(60L * s));
            }
        }
        // SQLite's quick check (sqlite.org/pragma.html#pragma_quick_check) is made on the connection
        // that verifies the trail, alongside the exchange: its failure must still stop the sync
        WorkbookDamage.smashOldestLeafOf(file, "audit_entry");
        try (Workbook a = Workbook.open(file, "k.ashdown")) {
            assertThrows(DamagedWorkbookException.class, () -> sync(as("sync_tech_a"), a));
            assertTrue(a.syncLedger().peek().isEmpty(), "nothing was written to the damaged workbook");
        }
        assertEquals(0, count("SELECT count(*) FROM site"), "nothing reached the server");
    }

    @Test
    void aSecondSiteOnTheServerIsClosedToTheFirstSitesTechnician() {
        try (Workbook a = laptopA()) {
            sync(as("sync_tech_a"), a);
        }
        Workbook other = Workbook.create(dir.resolve("c.strandbook"),
                new org.strandbook.site.Site("Tidewater Mill", "Unit 9", "A", 1.0), "t.marl");
        try (other) {
            sync(as("sync_tech_c"), other);
        }
        assertThrows(SyncRefusedException.class, () -> cloneAs("sync_tech_c", "x.strandbook"));
        assertFalse(dir.resolve("x.strandbook").toFile().exists());
    }

    private String serverField(String table, String key, String field) throws SQLException {
        try (Connection c = LocalPostgres.shared().superuser(url); Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT fields ->> '" + field + "' FROM " + table
                     + " WHERE record_key = '" + key + "'")) {
            rs.next();
            return rs.getString(1);
        }
    }

    private long serverAuditRows(String table, String containing) throws SQLException {
        return count("SELECT count(*) FROM audit_entry WHERE action = 'UPDATE' AND table_name = '" + table
                + "' AND new_fields::text LIKE '%" + containing + "%'");
    }

    private long count(String sql) throws SQLException {
        try (Connection c = LocalPostgres.shared().superuser(url); Statement st = c.createStatement();
             ResultSet rs = st.executeQuery(sql)) {
            rs.next();
            return rs.getLong(1);
        }
    }

    private static MeasurementPoint withService(MeasurementPoint p, String service) {
        return new MeasurementPoint(p.tag(), service, p.location(), p.analyzerTag(), p.channel(), p.probeTypeCode(),
                p.bands(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService(), p.processTemperatureC());
    }

    private static MeasurementPoint withLocation(MeasurementPoint p, String location) {
        return new MeasurementPoint(p.tag(), p.service(), location, p.analyzerTag(), p.channel(), p.probeTypeCode(),
                p.bands(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService(), p.processTemperatureC());
    }
}
