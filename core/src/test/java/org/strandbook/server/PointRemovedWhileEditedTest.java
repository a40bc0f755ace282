package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.SQLException;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.stream.Collectors;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.store.DemoSite;
import org.strandbook.store.PortableTable;
import org.strandbook.store.SyncLedger;
import org.strandbook.store.Workbook;

/**
 * A point removed on one laptop while another edited it, through a real PostgreSQL plant server.
 * The point becomes a conflict over the whole record; its bands, path elements and bends wait with
 * it (neither removed here nor on the server) and follow the person's choice, so that whichever
 * side is kept keeps its complete path. The rules checked are our own: the "nothing
 * silently overwritten" (a conflict keeps both sides until a person chooses), and the design
 * choice that a record belonging to one in question travels only with it.
 */
class PointRemovedWhileEditedTest {

    private static final String P = DemoSite.POINT_B;
    /** What hangs under the demo's point B: 2 bands, 6 path elements, 3 bends. */
    private static final int DEPENDENTS = 2 + 6 + 3;

    @TempDir
    Path dir;

    private TwoLaptops laptops;
    private Workbook a;
    private Workbook b;

    @BeforeEach
    void twoLaptopsInStep() {
        laptops = new TwoLaptops(dir, "removal_tech");
        a = laptops.a;
        b = laptops.b;
    }

    @AfterEach
    void closeThem() {
        laptops.close();
    }

    private SiteSync.Outcome sync(Workbook wb) {
        return laptops.sync(wb);
    }

    private static void editService(Workbook wb) {
        MeasurementPoint p = wb.points().get(P).orElseThrow();
        wb.points().save(new MeasurementPoint(p.tag(), "reactor feed, second train", p.location(), p.analyzerTag(),
                p.channel(), p.probeTypeCode(), p.bands(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService(),
                p.processTemperatureC()));
    }

    private static boolean holds(Workbook wb) {
        return wb.points().get(P).isPresent();
    }

    private static List<PathLeg> path(Workbook wb) {
        return wb.paths().legs(P);
    }

    private static SyncLedger.Conflict pointConflict(SiteSync.Outcome o) {
        return o.openConflicts().stream().filter(c -> c.table() == PortableTable.POINT && c.key().equals(P)
                && c.field().equals(SiteSync.RECORD)).findFirst().orElseThrow(() -> new AssertionError("no conflict over point " + P + ": "
                        + o.openConflicts()));
    }

    /** Laptop A removes the point and syncs; laptop B, offline, edited it and syncs after. */
    private SiteSync.Outcome removedThereEditedHere() {
        a.points().delete(P);
        editService(b);
        sync(a);
        return sync(b);
    }

    /** Laptop A edits the point and syncs; laptop B, offline, removed it and syncs after. */
    private SiteSync.Outcome removedHereEditedThere() {
        editService(a);
        b.points().delete(P);
        sync(a);
        return sync(b);
    }

    @Test
    void pointRemovedThereAndEditedHereKeepsItsPathWhileInConflictAndKeepingMineBringsItBackEverywhere()
            throws SQLException {
        SiteSync.Outcome seen = removedThereEditedHere();
        SyncLedger.Conflict point = pointConflict(seen);
        // nothing silently overwritten: the open conflict leaves this laptop's point whole
        assertEquals(DemoSite.legs(P, "C102"), path(b), "the path waits with its point");
        // design choice: each held-back record is a whole-record conflict of its own, shown by sync
        assertEquals(1 + DEPENDENTS, seen.openConflicts().size(), seen.openConflicts()::toString);
        assertTrue(seen.openConflicts().stream().allMatch(c -> c.field().equals(SiteSync.RECORD)
                && c.theirs().equals("null")));
        SyncLedger.Conflict bend = seen.openConflicts().stream().filter(c -> c.table() == PortableTable.SEGMENT_BEND)
                .findFirst().orElseThrow();
        assertEquals("path_element " + P + "/SEND/3", SiteSync.waitsWith(bend, seen.openConflicts()).orElseThrow(),
                "design choice: a held-back record says what it waits with");

        SiteSync.resolve(b, point.id(), true, "j.pell");
        // design choice: the point's choice resolves what waited with it
        assertTrue(b.syncLedger().conflicts().stream().noneMatch(SyncLedger.Conflict::open));
        sync(b);
        assertEquals(6, liveOnServer("path_element"), "the kept path is pushed back with its point");
        sync(a);
        assertEquals(DemoSite.legs(P, "C102"), path(a), "the other laptop gets the whole path back");
        assertEquals(a.records().readAll(), b.records().readAll(), "two laptops that agree");
        assertTrue(a.audit().verify().intact() && b.audit().verify().intact());
    }

    @Test
    void pointRemovedThereAndEditedHereIsGoneOnBothSidesWhenTheirsIsKept() throws SQLException {
        SyncLedger.Conflict point = pointConflict(removedThereEditedHere());
        // nothing silently overwritten: until a person chooses, the removal made there is not taken here
        assertEquals(DemoSite.legs(P, "C102"), path(b), "the path waits with its point");
        SiteSync.resolve(b, point.id(), false, "j.pell");
        // nothing silently overwritten: the removal is taken only now, by a person, and audited
        assertFalse(holds(b));
        assertTrue(b.audit().entries(0, 100_000).stream().anyMatch(e -> e.table().equals("segment_bend")
                && e.action().equals("DELETE") && e.user().equals("j.pell")));
        sync(b);
        sync(a);
        assertFalse(holds(a));
        assertEquals(0, liveOnServer("path_element") + liveOnServer("segment_bend")
                + liveOnServer("point_band"), "design choice: gone on both sides, nothing left over");
        assertEquals(a.records().readAll(), b.records().readAll(), "two laptops that agree");
        assertTrue(b.syncLedger().conflicts().stream().noneMatch(SyncLedger.Conflict::open));
    }

    @Test
    void pointRemovedHereAndEditedThereLeavesItsPathOnTheServerAndKeepingTheirsBringsItBackWhole()
            throws SQLException {
        SiteSync.Outcome seen = removedHereEditedThere();
        SyncLedger.Conflict point = pointConflict(seen);
        // nothing silently overwritten: the removals made here wait with the point's conflict
        assertEquals(6, liveOnServer("path_element"), "no removal pushed while the point is in question");
        assertEquals(3, liveOnServer("segment_bend"));
        assertEquals(1 + DEPENDENTS, seen.openConflicts().size(), seen.openConflicts()::toString);
        assertTrue(seen.openConflicts().stream().allMatch(c -> c.mine().equals("null")));

        SiteSync.resolve(b, point.id(), false, "j.pell");
        // design choice: the restored point brings its whole path with it
        assertEquals(DemoSite.legs(P, "C102"), path(b));
        sync(b);
        sync(a);
        assertEquals(DemoSite.legs(P, "C102"), path(a));
        assertEquals("reactor feed, second train", b.points().get(P).orElseThrow().service());
        assertEquals(a.records().readAll(), b.records().readAll(), "two laptops that agree");
        assertTrue(a.audit().verify().intact() && b.audit().verify().intact());
    }

    @Test
    void pointRemovedHereAndEditedThereIsGoneOnBothSidesWhenMineIsKept() throws SQLException {
        SyncLedger.Conflict point = pointConflict(removedHereEditedThere());
        // nothing silently overwritten: until a person chooses, the removals made here stay here
        assertEquals(6, liveOnServer("path_element"), "no removal pushed while the point is in question");
        SiteSync.resolve(b, point.id(), true, "j.pell");
        sync(b);
        // design choice: the removal kept here is pushed for the point and all it held
        assertEquals(0, liveOnServer("point") + liveOnServer("point_band") + liveOnServer("path_element")
                + liveOnServer("segment_bend"), "the point and all it held are removed on the server");
        sync(a);
        assertFalse(holds(a));
        assertEquals(a.records().readAll(), b.records().readAll(), "two laptops that agree");
        assertTrue(a.audit().verify().intact() && b.audit().verify().intact());
    }

    @Test
    void syncingTwiceWhileThePointIsInQuestionChangesNothing() throws SQLException {
        SiteSync.Outcome first = removedThereEditedHere();
        var records = b.records().readAll();
        long serverRows = serverRevisions();
        SiteSync.Outcome again = sync(b);
        // the "the same sync run twice changes nothing", while the conflict stays open
        assertEquals(List.of(0, 0, 0, 0), List.of(again.pushed(), again.pulled(), again.changedThere(),
                again.changedHere()));
        assertEquals(ids(first), ids(again), "the same conflicts, still open, not doubled");
        // design choice: what belongs to the point still waits with it
        assertEquals(1 + DEPENDENTS, again.openConflicts().size());
        assertEquals(DemoSite.legs(P, "C102"), path(b));
        assertEquals(records, b.records().readAll());
        assertEquals(serverRows, serverRevisions());
        assertEquals(first.serverAuditHead(), again.serverAuditHead());
    }

    @Test
    void aBendResolvedOnItsOwnDoesNotStopThePointsResolutionFromRemovingTheRest() {
        SiteSync.Outcome seen = removedThereEditedHere();
        SyncLedger.Conflict bend = seen.openConflicts().stream()
                .filter(c -> c.table() == PortableTable.SEGMENT_BEND).findFirst().orElseThrow();
        SyncLedger.Conflict element = seen.openConflicts().stream()
                .filter(c -> c.table() == PortableTable.PATH_ELEMENT).findFirst().orElseThrow();
        SiteSync.resolve(b, bend.id(), true, "j.pell");
        SiteSync.resolve(b, element.id(), false, "j.pell");
        SiteSync.resolve(b, pointConflict(seen).id(), false, "j.pell");
        // design choice: the records still under a removed point go with it, whatever was chosen for them
        assertFalse(holds(b));
        sync(b);
        sync(a);
        assertEquals(a.records().readAll(), b.records().readAll(), "two laptops that agree");
        assertTrue(b.audit().verify().intact());
    }

    @Test
    void aBandCannotBeBroughtBackBeforeThePointItBelongsTo() {
        SiteSync.Outcome seen = removedHereEditedThere();
        SyncLedger.Conflict band = seen.openConflicts().stream()
                .filter(c -> c.table() == PortableTable.POINT_BAND).findFirst().orElseThrow();
        SyncRefusedException refused = assertThrows(SyncRefusedException.class,
                () -> SiteSync.resolve(b, band.id(), false, "j.pell"));
        // design choice: the refusal names the conflict to resolve first, and changes nothing
        assertTrue(refused.getMessage().contains("Resolve the conflict over point " + P + " first"),
                refused.getMessage());
        assertTrue(b.syncLedger().conflicts().stream().filter(SyncLedger.Conflict::open).count()
                == 1 + DEPENDENTS);
        SiteSync.resolve(b, pointConflict(seen).id(), false, "j.pell");
        assertEquals(DemoSite.legs(P, "C102"), path(b));
    }

    @Test
    void aScanTakenHereOfAPointRemovedThereWaitsWithThePointAndTravelsOnceMineIsKept() throws SQLException {
        DemoSite.insertScan(b, P, 5, TwoLaptops.T0.plusSeconds(600));
        SyncLedger.Conflict point = pointConflict(removedThereEditedHere());
        // design choice: no workbook could take a scan of a point it no longer has, so it waits here
        assertEquals(1, count("SELECT count(*) FROM scan"), "only point A's scan is on the server");
        sync(a);
        SyncRefusedException refused = assertThrows(SyncRefusedException.class,
                () -> SiteSync.resolve(b, point.id(), false, "j.pell"));
        // nothing silently overwritten: keeping theirs would take the scan with the point
        assertTrue(refused.getMessage().contains("which this workbook's scan record"), refused.getMessage());
        assertTrue(holds(b));
        SiteSync.resolve(b, point.id(), true, "j.pell");
        sync(b);
        sync(a);
        assertEquals(2, count("SELECT count(*) FROM scan"), "the scan travels with its point");
        assertEquals(a.records().readAll(), b.records().readAll(), "two laptops that agree");
    }

    @Test
    void aScanTakenThereOfAPointRemovedHereWaitsOnTheServerUntilTheirsIsKept() {
        DemoSite.insertScan(a, P, 5, TwoLaptops.T0.plusSeconds(600));
        // design choice: the scan of a point in question is not pulled, so this sync completes
        SyncLedger.Conflict point = pointConflict(removedHereEditedThere());
        assertFalse(holds(b));
        SiteSync.resolve(b, point.id(), false, "j.pell");
        sync(b);
        assertEquals(2, b.records().readAll().get(PortableTable.SCAN).size(), "the scan comes with its point");
        sync(a);
        assertEquals(a.records().readAll(), b.records().readAll(), "two laptops that agree");
        assertTrue(a.audit().verify().intact() && b.audit().verify().intact());
    }

    @Test
    void aFieldConflictStillOpenOverThePointIsSettledByTheWholeRecordChoice() {
        editService(b);
        MeasurementPoint p = a.points().get(P).orElseThrow();
        a.points().save(new MeasurementPoint(p.tag(), "reactor feed, first train", p.location(),
                p.analyzerTag(), p.channel(), p.probeTypeCode(), p.bands(), p.toleranceDb(), p.hazardousArea(),
                p.hydrogenService(), p.processTemperatureC()));
        sync(a);
        assertEquals("service", sync(b).openConflicts().get(0).field());
        a.points().delete(P);
        sync(a);
        SiteSync.resolve(b, pointConflict(sync(b)).id(), false, "j.pell");
        // design choice: the point removed leaves none of its fields in question
        assertTrue(b.syncLedger().conflicts().stream().noneMatch(SyncLedger.Conflict::open),
                b.syncLedger().conflicts()::toString);
        sync(b);
        assertEquals(a.records().readAll(), b.records().readAll(), "two laptops that agree");
    }

    @Test
    void theBendsOfASegmentThereWhereAJointIsHereWaitWithItAndComeWithTheirs() {
        // one position of the send leg holds a different thing on each side: a conflict over the whole element
        List<PathLeg> legs = DemoSite.legs(P, "C102");
        List<PathElement> send = legs.get(0).elements();
        PathLeg there = new PathLeg(P, PathDirection.SEND, List.of(send.get(0),
                new CableSegment("C102-S9", DemoSite.FIBER, 4.0, List.of(new Bend(40, 1))), send.get(2)));
        PathLeg here = new PathLeg(P, PathDirection.SEND, List.of(send.get(0), new Joint("J1", DemoSite.CONNECTOR, null,
                InspectionGrade.DIRTY, OptionalDouble.of(0.9), LossBasis.MEASURED), send.get(2)));
        a.paths().replaceLegs(P, List.of(there, legs.get(1)));
        b.paths().replaceLegs(P, List.of(here, legs.get(1)));
        sync(a);
        SiteSync.Outcome seen = sync(b);
        SyncLedger.Conflict element = seen.openConflicts().stream().filter(c -> c.table() == PortableTable.PATH_ELEMENT)
                .findFirst().orElseThrow();
        // design choice: the segment's bend is not pulled under this laptop's joint
        assertEquals(List.of(PortableTable.PATH_ELEMENT, PortableTable.SEGMENT_BEND),
                seen.openConflicts().stream().map(SyncLedger.Conflict::table).toList());
        SiteSync.resolve(b, element.id(), false, "j.pell");
        assertEquals(List.of(there, legs.get(1)), path(b), "the segment comes with its bend");
        sync(b);
        sync(a);
        assertEquals(a.records().readAll(), b.records().readAll(), "two laptops that agree");
        assertTrue(a.audit().verify().intact() && b.audit().verify().intact());
    }

    private static Set<Long> ids(SiteSync.Outcome o) {
        return o.openConflicts().stream().map(SyncLedger.Conflict::id).collect(Collectors.toSet());
    }

    /** Records of point B or under it (their keys start with its tag) that the server holds as not removed. */
    private long liveOnServer(String table) throws SQLException {
        return count("SELECT count(*) FROM " + table + " WHERE NOT deleted AND (record_key = '" + P
                + "' OR record_key LIKE '" + P + "/%')");
    }

    /** The sum of every editable record's revision on the server: any write moves it. */
    private long serverRevisions() throws SQLException {
        long sum = 0;
        for (PortableTable t : PortableTable.values()) {
            if (t.editable()) {
                sum += count("SELECT coalesce(sum(revision), 0) FROM " + t.serverTable());
            }
        }
        return sum;
    }

    private long count(String sql) throws SQLException {
        return laptops.count(sql);
    }
}
