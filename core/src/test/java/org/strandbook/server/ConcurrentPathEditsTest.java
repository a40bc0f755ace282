package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.store.DemoSite;
import org.strandbook.store.PortableTable;
import org.strandbook.store.Workbook;
import org.strandbook.store.WorkbookException;

/**
 * Two laptops that changed the same site in ways one cannot simply take from the other, through a
 * real PostgreSQL plant server. The contract: "nothing lost, no duplicate, the next sync
 * completes", both values kept for a person to choose. A sync that cannot be taken changes nothing on
 * either side and says which record stands in the way; it never leaves the server holding a push
 * that the pushing workbook could not finish, which would stop every later sync of both laptops.
 */
class ConcurrentPathEditsTest {

    private static final Instant T0 = Instant.parse("2026-03-01T09:00:00Z");
    private static final String TECH = "edits_tech";

    @TempDir
    Path dir;

    private String url;

    @BeforeEach
    void startServer() {
        url = LocalPostgres.shared().newPlantServer(TECH);
    }

    private PlantServer server() {
        return new PlantServer(new ServerLogin(url, TECH, null));
    }

    private Workbook laptopA() {
        Workbook wb = Workbook.create(dir.resolve("a.strandbook"), DemoSite.site(), "k.ashdown");
        DemoSite.populate(wb);
        DemoSite.insertScan(wb, DemoSite.POINT_A, 1, T0);
        wb.inspections().add(new Inspection(DemoSite.POINT_A, "J1", T0, "k.ashdown", InspectionGrade.CLEAN, ""));
        return wb;
    }

    private Workbook cloneOf(String file) {
        SiteClone.run(server(), DemoSite.site().name(), dir.resolve(file), "j.pell", SyncProgress.SILENT);
        return Workbook.open(dir.resolve(file), "j.pell");
    }

    private SiteSync.Outcome sync(Workbook wb) {
        return new SiteSync(server(), wb, wb.site().get().name(), SyncProgress.SILENT).run();
    }

    private static List<String> sendLabels(Workbook wb) {
        return wb.paths().legs(DemoSite.POINT_A).get(0).elements().stream().map(PathElement::label).toList();
    }

    @Test
    void aLegShortenedOnOneLaptopReachesTheOtherThoughItsElementsMovedPosition() {
        try (Workbook a = laptopA()) {
            sync(a);
            try (Workbook b = cloneOf("b.strandbook")) {
                List<PathLeg> legs = DemoSite.legs(DemoSite.POINT_A, "C101");
                PathLeg send = new PathLeg(DemoSite.POINT_A, PathDirection.SEND, List.of(legs.get(0).elements().get(2)));
                a.paths().replaceLegs(DemoSite.POINT_A, List.of(send, legs.get(1)));
                sync(a);
                sync(b);
                assertEquals(sendLabels(a), sendLabels(b));
                assertEquals(a.records().readAll(), b.records().readAll());
                assertTrue(b.audit().verify().intact());
            }
        }
    }

    @Test
    void aPointRemovedThereWhileAScanWasTakenHereStopsThisSyncAloneAndChangesNothing() throws SQLException {
        try (Workbook a = laptopA()) {
            sync(a);
            try (Workbook b = cloneOf("b.strandbook")) {
                a.points().delete(DemoSite.POINT_B);
                DemoSite.insertScan(b, DemoSite.POINT_B, 7, T0.plusSeconds(99));
                sync(a);
                long scansOnServer = count("SELECT count(*) FROM scan");
                SyncRefusedException refused = assertThrows(SyncRefusedException.class, () -> sync(b));
                assertTrue(refused.getMessage().contains("scan records name a point that another workbook removed ("
                        + DemoSite.POINT_B + ")") && refused.getMessage().contains("Nothing was changed on the server"
                        + " or here"), refused.getMessage());
                assertEquals(scansOnServer, count("SELECT count(*) FROM scan"), "the refused push left no scan behind");
                assertEquals(1, b.points().list().stream().filter(p -> p.tag().equals(DemoSite.POINT_B)).count(),
                        "the workbook kept its point");
                assertTrue(b.audit().verify().intact());
                sync(a);
                try (Workbook c = cloneOf("c.strandbook")) {
                    assertEquals(a.records().readAll(), c.records().readAll(), "the other laptop and a clone go on");
                }
            }
        }
    }

    @Test
    void aJointRegradedHereWhereTheOtherLaptopNowHasASegmentIsAConflictNotAHybrid() throws SQLException {
        try (Workbook a = laptopA()) {
            sync(a);
            try (Workbook b = cloneOf("b.strandbook")) {
                List<PathLeg> legs = DemoSite.legs(DemoSite.POINT_A, "C101");
                List<PathElement> s = legs.get(0).elements();
                a.paths().replaceLegs(DemoSite.POINT_A, List.of(new PathLeg(DemoSite.POINT_A, PathDirection.SEND,
                        List.of(new Joint("J0", DemoSite.CONNECTOR, null, InspectionGrade.CLEAN, OptionalDouble.empty(),
                                LossBasis.ASSUMED), s.get(0), s.get(1), s.get(2))), legs.get(1)));
                b.paths().replaceLegs(DemoSite.POINT_A, List.of(new PathLeg(DemoSite.POINT_A, PathDirection.SEND,
                        List.of(s.get(0), new Joint("J1", DemoSite.CONNECTOR, null, InspectionGrade.DIRTY,
                                OptionalDouble.of(0.9), LossBasis.MEASURED), s.get(2))), legs.get(1)));
                sync(a);
                SiteSync.Outcome there = sync(b);
                assertEquals(1, there.openConflicts().stream().filter(x -> x.table() == PortableTable.PATH_ELEMENT
                        && x.field().equals(SiteSync.RECORD)).count(), there.openConflicts()::toString);
                assertEquals(0, count("SELECT count(*) FROM path_element WHERE fields ->> 'kind' = 'SEGMENT'"
                        + " AND fields ->> 'loss_db' IS NOT NULL"), "no segment carries a joint's measured loss");
                sync(a);
                assertTrue(a.audit().verify().intact() && b.audit().verify().intact());
            }
        }
    }

    @Test
    void aTagAddedOnTwoLaptopsInDifferentCaseStopsTheSecondSyncAndChangesNothing() throws SQLException {
        // the workbook compares tags without regard to case (ISA-5.1 tags are written in capitals)
        try (Workbook a = laptopA()) {
            sync(a);
            try (Workbook b = cloneOf("b.strandbook")) {
                a.points().add(DemoSite.point("AT-300", 3));
                b.points().add(DemoSite.point("at-300", 4));
                sync(a);
                long pointsOnServer = count("SELECT count(*) FROM point");
                SyncRefusedException refused = assertThrows(SyncRefusedException.class, () -> sync(b));
                assertTrue(refused.getMessage().contains("point record AT-300 cannot be written into this workbook"),
                        refused.getMessage());
                assertEquals(pointsOnServer, count("SELECT count(*) FROM point"));
                sync(a);
            }
        }
    }

    @Test
    void anInspectionThatTravelledIsNotWithdrawnForItWouldComeBack() {
        try (Workbook a = laptopA()) {
            sync(a);
            WorkbookException refused = assertThrows(WorkbookException.class,
                    () -> a.withdrawal().withdrawLatest(DemoSite.POINT_A));
            assertTrue(refused.getMessage().contains("is on the plant server already"), refused.getMessage());
            a.inspections().add(new Inspection(DemoSite.POINT_A, "J2", T0.plusSeconds(60), "k.ashdown",
                    InspectionGrade.DIRTY, ""));
            assertTrue(a.withdrawal().withdrawLatest(DemoSite.POINT_A).description().contains("J2"),
                    "a record not yet synced is withdrawn as before");
        }
    }

    private long count(String sql) throws SQLException {
        try (Connection c = LocalPostgres.shared().superuser(url); Statement st = c.createStatement();
             ResultSet rs = st.executeQuery(sql)) {
            rs.next();
            return rs.getLong(1);
        }
    }
}
