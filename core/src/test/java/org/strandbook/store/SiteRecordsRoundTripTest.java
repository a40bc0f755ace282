package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.FiberType;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.Note;
import org.strandbook.site.OhGrade;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;
import org.strandbook.site.WavelengthBand;

/** Every site record comes back from the workbook as it went in, and every change leaves the trail whole. */
class SiteRecordsRoundTripTest extends PopulatedWorkbookTest {

    SiteRecordsRoundTripTest() {
        super("site.sqlite");
    }

    @Test
    void catalogEntriesComeBackWhole() {
        assertEquals(List.of(DemoSite.analyzer()), wb.site().analyzers());
        assertEquals(List.of(DemoSite.fiber()), wb.catalog().fiberTypes());
        assertEquals(List.of(DemoSite.connector()), wb.catalog().connectorTypes());
        assertEquals(List.of(DemoSite.probe()), wb.catalog().probeTypes());
    }

    @Test
    void theDecisionRuleComesBackAsSetAndEachChangeIsAudited() {
        assertEquals(DecisionRule.FIXED, wb.site().decisionRule(), "a new workbook keeps the fixed tolerance");
        DecisionRule interval = new DecisionRule(DecisionRule.Kind.COVERAGE_INTERVAL, 0.99, 0.3);
        wb.site().setDecisionRule(interval);
        assertEquals(interval, wb.site().decisionRule());
        wb.site().setDecisionRule(interval.withKind(DecisionRule.Kind.FIXED_TOLERANCE));
        assertEquals(interval.withKind(DecisionRule.Kind.FIXED_TOLERANCE), wb.site().decisionRule());
        List<String> changes = wb.audit().entries(0, 1000).stream()
                .filter(e -> e.table().equals("decision_rule")).map(e -> e.action()).toList();
        assertEquals(List.of("INSERT", "UPDATE"), changes);
    }

    @Test
    void codesAndTagsCompareWithoutCase() {
        assertEquals(DemoSite.fiber(), wb.catalog().fiberType("loh-400").orElseThrow());
        assertEquals(DemoSite.POINT_A, wb.points().get("at-101").orElseThrow().tag());
        assertThrows(DuplicateEntryException.class, () -> wb.catalog().addFiberType(DemoSite.fiber()));
    }

    @Test
    void savingAFiberTypeReplacesItsDatasheet() {
        FiberType revised = new FiberType(DemoSite.FIBER, "400 um low-OH, new datasheet", 400, 440, 480, 0.22,
                "FUSED_SILICA", OhGrade.LOW_OH, 0.5,
                List.of(new AttenuationPoint(850, 12.0), new AttenuationPoint(1300, 6.0), new AttenuationPoint(1550, 4.0)));
        wb.catalog().saveFiberType(revised);
        assertEquals(revised, wb.catalog().fiberType(DemoSite.FIBER).orElseThrow());
    }

    @Test
    void pointsComeBackWithBandsAndOptionalValues() {
        assertEquals(List.of(DemoSite.point(DemoSite.POINT_A, 1), DemoSite.point(DemoSite.POINT_B, 2)), wb.points().list());
        MeasurementPoint bare = new MeasurementPoint("AT-103", "", "", DemoSite.ANALYZER, 3, DemoSite.PROBE,
                List.of(new WavelengthBand("water", 1400, 1500)), OptionalDouble.empty(), false, true,
                OptionalDouble.empty());
        wb.points().add(bare);
        assertEquals(bare, wb.points().get("AT-103").orElseThrow());
    }

    @Test
    void aDuplicatePointTagIsRefusedByName() {
        DuplicateEntryException e = assertThrows(DuplicateEntryException.class,
                () -> wb.points().add(DemoSite.point("at-101", 4)));
        assertEquals("point tag 'at-101' is already used in this workbook", e.getMessage());
    }

    @Test
    void aPointNeedsItsAnalyzerInTheWorkbook() {
        MeasurementPoint orphan = new MeasurementPoint("AT-900", "", "", "QA-99", 1, DemoSite.PROBE,
                List.of(new WavelengthBand("", 1100, 1200)), OptionalDouble.empty(), false, false, OptionalDouble.empty());
        UnknownEntryException e = assertThrows(UnknownEntryException.class, () -> wb.points().add(orphan));
        assertTrue(e.getMessage().contains("unknown analyzer 'QA-99'"), e.getMessage());
    }

    @Test
    void savingAPointReplacesItsBandsAndKeepsItsLegs() {
        MeasurementPoint moved = new MeasurementPoint(DemoSite.POINT_A, "reactor feed", "pipe rack 4", DemoSite.ANALYZER,
                1, DemoSite.PROBE, List.of(new WavelengthBand("O-H combination", 1900, 2000)), OptionalDouble.empty(),
                true, false, OptionalDouble.of(175.0));
        wb.points().save(moved);
        assertEquals(moved, wb.points().get(DemoSite.POINT_A).orElseThrow());
        assertEquals(DemoSite.legs(DemoSite.POINT_A, "C101"), wb.paths().legs(DemoSite.POINT_A));
    }

    @Test
    void aPointWithScansCannotBeDeleted() {
        DemoSite.insertScan(wb, DemoSite.POINT_B, 1, Instant.parse("2024-03-05T10:00:00Z"));
        WorkbookException e = assertThrows(WorkbookException.class, () -> wb.points().delete(DemoSite.POINT_B));
        assertTrue(e.getMessage().contains("1 scan record(s)"), e.getMessage());
    }

    @Test
    void aPointWithoutRecordsIsDeletedWithItsLegsAndBands() {
        wb.points().delete(DemoSite.POINT_B);
        assertEquals(List.of(DemoSite.POINT_A), wb.points().list().stream().map(MeasurementPoint::tag).toList());
        assertThrows(UnknownEntryException.class, () -> wb.paths().legs(DemoSite.POINT_B));
    }

    @Test
    void inspectionsSignOffsAndNotesComeBackInTimeOrder() {
        Inspection later = new Inspection(DemoSite.POINT_A, "J2", Instant.parse("2024-03-06T09:00:00Z"), "k.ashdown",
                InspectionGrade.CLEAN, "after cleaning");
        Inspection earlier = new Inspection(DemoSite.POINT_A, "J2", Instant.parse("2024-03-05T09:00:00Z"), "k.ashdown",
                InspectionGrade.DIRTY, "film on the core");
        wb.inspections().add(later);
        wb.inspections().add(earlier);
        assertEquals(List.of(earlier, later), wb.inspections().list(DemoSite.POINT_A));

        DemoSite.insertScan(wb, DemoSite.POINT_A, 1, Instant.parse("2024-03-06T10:00:00Z"));
        SignOff site = new SignOff(SignOffRole.PREPARED, "R. Inglenook", Instant.parse("2024-03-07T16:00:00Z"), "", "");
        SignOff point = new SignOff(SignOffRole.CHECKED, "M. Okonedo", Instant.parse("2024-03-08T08:30:00Z"),
                DemoSite.POINT_A, "loop within tolerance");
        wb.signOffs().add(site);
        wb.signOffs().add(point);
        assertEquals(List.of(site.name(), point.name()), wb.signOffs().list().stream().map(SignOff::name).toList());
        assertEquals(List.of("", DemoSite.POINT_A), wb.signOffs().list().stream().map(SignOff::pointTag).toList());

        Note n = new Note(DemoSite.POINT_B, Instant.parse("2024-03-05T11:00:00Z"), "k.ashdown",
                "return leg re-routed\nsee sketch");
        wb.notes().add(n);
        assertEquals(List.of(n), wb.notes().list(DemoSite.POINT_B));
        assertEquals(List.of(n), wb.notes().list());
    }

    @Test
    void anInspectionOfAnUnknownPointNamesTheTag() {
        UnknownEntryException e = assertThrows(UnknownEntryException.class, () -> wb.inspections().add(
                new Inspection("AT-404", "J1", Instant.parse("2024-03-05T09:00:00Z"), "", InspectionGrade.CLEAN, "")));
        assertEquals("unknown point tag 'AT-404'", e.getMessage());
    }
}
