package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.Note;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;

/**
 * Withdrawing a point's latest record, the history panel's undo: an audited delete that puts back
 * what an action replaced, refused for a record a later signature covers. That a signed record is
 * corrected by a new entry rather than changed follows 21 CFR Part 11, §11.10(e) (audit trails:
 * changes shall not obscure previously recorded information); the rest is design choice.
 */
class RecordWithdrawalTest {

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

    private void assertTrailIntact() {
        assertTrue(wb.audit().verify().intact(), () -> wb.audit().verify().toString());
    }

    @Test
    void theLatestEnteredRecordIsWithdrawnAndTheTrailKeepsIt() {
        wb.inspections().add(new Inspection(DemoSite.POINT_A, "J2", DAY_2, "k.ashdown", InspectionGrade.DIRTY, "film"));
        // entered later, dated earlier: the undo takes back what was entered last, not the oldest event
        wb.notes().add(new Note(DemoSite.POINT_A, DAY_1, "k.ashdown", "dust cap missing"));

        WithdrawnRecord withdrawn = wb.withdrawal().withdrawLatest(DemoSite.POINT_A);

        assertFalse(withdrawn.pathRestored());
        assertTrue(withdrawn.description().startsWith("note of 2025-03-04T09:00:00Z by k.ashdown"), withdrawn.description());
        assertEquals(List.of(), wb.notes().list(DemoSite.POINT_A));
        assertEquals(1, wb.inspections().list(DemoSite.POINT_A).size());
        assertTrailIntact();
        long deletes = wb.audit().entries(0, 10_000).stream()
                .filter(e -> e.action().equals("DELETE") && e.table().equals("note")).count();
        assertEquals(1, deletes);
    }

    @Test
    void withdrawingASegmentReplacementPutsTheOldSegmentBack() {
        wb.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_SEGMENT, "C101-R1", DAY_2,
                "k.ashdown", "", "crushed", Optional.of(new CableSegment("C101-R1", DemoSite.FIBER, 92.0, List.of()))));

        assertTrue(wb.withdrawal().withdrawLatest(DemoSite.POINT_A).pathRestored());

        CableSegment back = wb.paths().legs(DemoSite.POINT_A).stream().flatMap(l -> l.segments().stream())
                .filter(s -> s.label().equals("C101-R1")).findFirst().orElseThrow();
        assertEquals(85.5, back.lengthM());
        assertEquals(List.of(new Bend(60, 2)), back.bends());
        assertEquals(List.of(), wb.maintenance().list(DemoSite.POINT_A));
        assertTrailIntact();
    }

    @Test
    void withdrawingAProbeChangePutsTheOldProbeBack() {
        wb.catalog().addProbeType(new ProbeType("TF-2", "transflectance, 2 mm path", ProbeKind.TRANSFLECTANCE,
                "SAPPHIRE", 4, 4.0, 2.5));
        wb.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_PROBE, "", DAY_2,
                "k.ashdown", "", "", Optional.empty(), "TF-2"));

        wb.withdrawal().withdrawLatest(DemoSite.POINT_A);

        assertEquals(DemoSite.PROBE, wb.points().get(DemoSite.POINT_A).orElseThrow().probeTypeCode());
        assertTrailIntact();
    }

    @Test
    void aRecordCoveredByALaterSiteSignatureIsNotWithdrawn() {
        wb.inspections().add(new Inspection(DemoSite.POINT_A, "J2", DAY_1, "k.ashdown", InspectionGrade.CLEAN, ""));
        wb.signOffs().add(new SignOff(SignOffRole.PREPARED, "R. Inglenook", DAY_2, "", "", "site engineer", "", ""));

        WorkbookException e = assertThrows(WorkbookException.class,
                () -> wb.withdrawal().withdrawLatest(DemoSite.POINT_A));

        assertTrue(e.getMessage().contains("covered by the prepared signature of R. Inglenook (site record"),
                e.getMessage());
        assertEquals(1, wb.inspections().list(DemoSite.POINT_A).size());
        assertTrailIntact();
    }

    @Test
    void aPointWithNothingToWithdrawSaysSo() {
        WorkbookException e = assertThrows(WorkbookException.class,
                () -> wb.withdrawal().withdrawLatest(DemoSite.POINT_B));
        assertEquals("point " + DemoSite.POINT_B + " has no inspection, maintenance action or note to withdraw",
                e.getMessage());
    }

    @Test
    void aSegmentReplacementStaysWithdrawnFromThePathsHistoryToo() {
        wb.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_SEGMENT, "C101-R1", DAY_2,
                "k.ashdown", "", "crushed", Optional.of(new CableSegment("C101-R1", DemoSite.FIBER, 92.0, List.of()))));
        wb.withdrawal().withdrawLatest(DemoSite.POINT_A);

        List<PathLeg> then = wb.paths().legsAt(DemoSite.POINT_A, DAY_1);
        assertEquals(wb.paths().legs(DemoSite.POINT_A), then);
    }
}
