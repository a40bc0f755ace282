package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.InspectionHistory;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.Note;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;

/**
 * Inspections as dated events, maintenance actions and the path's history, notes on elements.
 * What a record must hold (who, when, what, why) is common practice for maintenance logs; the
 * inspection grades follow the pass/fail zones of IEC 61300-3-35:2015.
 */
class MaintenanceRecordsTest {

    private static final Instant DAY_1 = Instant.parse("2025-03-04T09:00:00Z");
    private static final Instant DAY_2 = Instant.parse("2025-06-10T14:30:00Z");

    @TempDir
    Path dir;

    private Workbook wb;

    @BeforeEach
    void buildWorkbook() {
        wb = Workbook.create(dir.resolve("site.sqlite"), DemoSite.site(), DemoSite.USER);
        DemoSite.populate(wb);
    }

    @AfterEach
    void close() {
        wb.close();
    }

    @Test
    void aJointsGradeAtAMomentIsItsLatestInspectionUpToThen() {
        wb.inspections().add(new Inspection(DemoSite.POINT_A, "J2", DAY_1, "k.ashdown", InspectionGrade.DIRTY, "film"));
        wb.inspections().add(new Inspection(DemoSite.POINT_A, "J2", DAY_2, "k.ashdown", InspectionGrade.CLEAN, ""));
        InspectionHistory history = new InspectionHistory(wb.inspections().list(DemoSite.POINT_A));
        PathLeg ret = wb.paths().legs(DemoSite.POINT_A).get(1);
        // design choice: before any inspection the grade entered with the path stands
        assertEquals(InspectionGrade.ACCEPTABLE, grade(history.gradedAt(ret, DAY_1.minusSeconds(1))));
        assertEquals(InspectionGrade.DIRTY, grade(history.gradedAt(ret, DAY_2.minusSeconds(1))));
        assertEquals(InspectionGrade.CLEAN, grade(history.gradedAt(ret, DAY_2)));
    }

    private static InspectionGrade grade(PathLeg ret) {
        return ret.joints().get(0).grade();
    }

    @Test
    void anInspectionOfAJointNotOnThePathIsRefusedNamingIt() {
        UnknownEntryException e = assertThrows(UnknownEntryException.class, () -> wb.inspections().add(
                new Inspection(DemoSite.POINT_A, "J9", DAY_1, "k.ashdown", InspectionGrade.CLEAN, "")));
        assertEquals("point AT-101 has no joint 'J9' on its path", e.getMessage());
    }

    @Test
    void anInspectionDatedInTheFutureIsRefused() {
        Instant nextYear = Instant.now().plus(Duration.ofDays(365));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> wb.inspections().add(
                new Inspection(DemoSite.POINT_A, "J2", nextYear, "k.ashdown", InspectionGrade.CLEAN, "")));
        assertTrue(e.getMessage().contains("in the future"), e.getMessage());
        assertEquals(List.of(), wb.inspections().list(DemoSite.POINT_A));
    }

    @Test
    void aReplacedSegmentStaysInThePathsHistoryAndTheTrailVerifies() {
        CableSegment longer = new CableSegment("C101-R1", DemoSite.FIBER, 92.0, List.of(new Bend(150, 1)));
        wb.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_SEGMENT, "C101-R1", DAY_2,
                "k.ashdown", "new cable pulled through tray 4", "crushed at the rack crossing", Optional.of(longer)));

        assertEquals(92.0, segment(wb.paths().legs(DemoSite.POINT_A), "C101-R1").lengthM());
        assertEquals(92.0, segment(wb.paths().legsAt(DemoSite.POINT_A, DAY_2), "C101-R1").lengthM());
        CableSegment before = segment(wb.paths().legsAt(DemoSite.POINT_A, DAY_1), "C101-R1");
        assertEquals(85.5, before.lengthM());
        assertEquals(List.of(new Bend(60, 2)), before.bends());

        MaintenanceAction stored = wb.maintenance().list(DemoSite.POINT_A).get(0);
        assertEquals("new cable pulled through tray 4 (before: cable C101-R1, LOH-400, 85.5 m, bends 2 × 60 mm; "
                + "after: cable C101-R1, LOH-400, 92.0 m, bends 1 × 150 mm)", stored.what());
        assertEquals("crushed at the rack crossing", stored.why());
        assertTrue(wb.audit().verify().intact(), () -> wb.audit().verify().toString());
    }

    @Test
    void aReplacementWhoseLabelNamesTwoJointsIsRefusedAndChangesNothing() {
        // the path's history takes an action to change one place of the path: a label on both legs names two
        List<PathLeg> legs = DemoSite.legs(DemoSite.POINT_B, "C102");
        PathLeg back = new PathLeg(DemoSite.POINT_B, legs.get(1).direction(), List.of(legs.get(1).elements().get(0),
                new Joint("J1", DemoSite.CONNECTOR, null, InspectionGrade.CLEAN, OptionalDouble.empty(),
                        LossBasis.ASSUMED), legs.get(1).elements().get(2)));
        wb.paths().replaceLegs(DemoSite.POINT_B, List.of(legs.get(0), back));
        Joint fresh = new Joint("J1", DemoSite.CONNECTOR, null, InspectionGrade.CLEAN, OptionalDouble.of(0.4),
                LossBasis.MEASURED);
        WorkbookException e = assertThrows(WorkbookException.class, () -> wb.maintenance().add(new MaintenanceAction(
                DemoSite.POINT_B, MaintenanceKind.REPLACE_CONNECTOR, "J1", DAY_2, "k.ashdown", "", "", Optional.of(fresh))));
        assertEquals("point AT-102 has two joints labelled 'J1' on its path; give each its own label in the path"
                + " first, so the record names one", e.getMessage());
        assertEquals(List.of(), wb.maintenance().list(DemoSite.POINT_B));
        assertEquals(List.of(legs.get(0), back), wb.paths().legs(DemoSite.POINT_B));
    }

    @Test
    void aConnectorReplacementChangesTheJointFromItsDateOn() {
        Joint fresh = new Joint("J2", DemoSite.CONNECTOR, null, InspectionGrade.CLEAN, OptionalDouble.of(0.4),
                LossBasis.MEASURED);
        wb.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_CONNECTOR, "J2", DAY_2,
                "k.ashdown", "", "ferrule chipped", Optional.of(fresh)));
        assertEquals(OptionalDouble.of(0.4), wb.paths().legs(DemoSite.POINT_A).get(1).joints().get(0).lossDb());
        assertEquals(OptionalDouble.of(0.7), wb.paths().legsAt(DemoSite.POINT_A, DAY_1).get(1).joints().get(0).lossDb());
    }

    @Test
    void aProbeReplacementMakesTheNewTypeThePointsOwnAndKeepsTheOldOneInTheAction() {
        wb.catalog().addProbeType(transflectance());
        wb.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_PROBE, "", DAY_2,
                "k.ashdown", "probe swapped at the shutdown", "window etched", Optional.empty(), "TF-2"));

        assertEquals("TF-2", wb.points().get(DemoSite.POINT_A).orElseThrow().probeTypeCode());
        MaintenanceAction stored = wb.maintenance().list(DemoSite.POINT_A).get(0);
        assertEquals(DemoSite.PROBE, stored.elementLabel());
        assertEquals("TF-2", stored.newProbeTypeCode());
        assertEquals("probe swapped at the shutdown (before: probe TX-5; after: probe TF-2)", stored.what());
        assertTrue(wb.audit().verify().intact(), () -> wb.audit().verify().toString());
    }

    @Test
    void aProbeReplacementWithAnUnknownTypeIsRefusedAndWritesNothing() {
        UnknownEntryException e = assertThrows(UnknownEntryException.class, () -> wb.maintenance().add(
                new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_PROBE, "", DAY_2, "k.ashdown", "", "",
                        Optional.empty(), "TF-9")));
        assertTrue(e.getMessage().contains("unknown probe type 'TF-9'"), e.getMessage());
        assertEquals(List.of(), wb.maintenance().list(DemoSite.POINT_A));
        assertEquals(DemoSite.PROBE, wb.points().get(DemoSite.POINT_A).orElseThrow().probeTypeCode());
    }

    @Test
    void aProbeReplacementDatedInTheFutureIsRefused() {
        wb.catalog().addProbeType(transflectance());
        Instant nextYear = Instant.now().plus(Duration.ofDays(365));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> wb.maintenance().add(
                new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_PROBE, "", nextYear, "k.ashdown", "",
                        "", Optional.empty(), "TF-2")));
        assertTrue(e.getMessage().contains("in the future"), e.getMessage());
        assertEquals(DemoSite.PROBE, wb.points().get(DemoSite.POINT_A).orElseThrow().probeTypeCode());
    }

    @Test
    void aProbeChangeDatedBeforeTheLatestOneIsRefused() {
        wb.catalog().addProbeType(transflectance());
        wb.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_PROBE, "", DAY_2,
                "k.ashdown", "", "", Optional.empty(), "TF-2"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> wb.maintenance().add(
                new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_PROBE, "", DAY_1, "k.ashdown", "", "",
                        Optional.empty(), DemoSite.PROBE)));
        assertTrue(e.getMessage().contains("latest recorded probe change"), e.getMessage());
    }

    private static ProbeType transflectance() {
        return new ProbeType("TF-2", "transflectance, 2 mm path", ProbeKind.TRANSFLECTANCE, "SAPPHIRE", 4, 4.0, 2.5);
    }

    @Test
    void aPathChangeDatedBeforeTheLatestOneIsRefused() {
        wb.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REROUTE, "C101-S2", DAY_2,
                "k.ashdown", "", "", Optional.of(new CableSegment("C101-S2", DemoSite.FIBER, 85.0, List.of()))));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> wb.maintenance().add(
                new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REROUTE, "C101-R1", DAY_1, "k.ashdown", "", "",
                        Optional.of(new CableSegment("C101-R1", DemoSite.FIBER, 85.5, List.of())))));
        assertTrue(e.getMessage().contains("in the order they were made"), e.getMessage());
    }

    @Test
    void aCleaningOfAnUnknownJointIsRefused() {
        assertThrows(UnknownEntryException.class, () -> wb.maintenance().add(new MaintenanceAction(DemoSite.POINT_A,
                MaintenanceKind.CLEAN_JOINT, "J7", DAY_1, "k.ashdown", "", "", Optional.empty())));
        assertEquals(List.of(), wb.maintenance().listAll());
    }

    @Test
    void aNoteOnAJointComesBackWithItsSubject() {
        Note n = new Note(DemoSite.POINT_A, "J2", DAY_1, "k.ashdown", "dust cap missing, fitted a new one");
        wb.notes().add(n);
        assertEquals(List.of(n), wb.notes().list(DemoSite.POINT_A));
        assertEquals("AT-101 J2", wb.notes().list().get(0).subject());
        assertThrows(UnknownEntryException.class, () -> wb.notes().add(
                new Note(DemoSite.POINT_A, "C999", DAY_1, "k.ashdown", "no such cable")));
    }

    private static CableSegment segment(List<PathLeg> legs, String label) {
        return legs.stream().flatMap(l -> l.segments().stream()).filter(s -> s.label().equals(label)).findFirst()
                .orElseThrow();
    }
}
