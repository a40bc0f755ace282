package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;

class PathRepositoryTest extends PopulatedWorkbookTest {

    PathRepositoryTest() {
        super("paths.sqlite");
    }

    @Test
    void legsComeBackInLightOrderWithTheirBends() {
        assertEquals(DemoSite.legs(DemoSite.POINT_A, "C101"), wb.paths().legs(DemoSite.POINT_A));
        assertEquals(PathDirection.RETURN, wb.paths().leg(DemoSite.POINT_A, PathDirection.RETURN).orElseThrow().direction());
    }

    @Test
    void replacingLegsReplacesThemWhole() {
        PathLeg shorter = new PathLeg(DemoSite.POINT_A, PathDirection.SEND, List.of(
                new CableSegment("C101-N1", DemoSite.FIBER, 40.0, List.of(new Bend(80, 1)))));
        wb.paths().replaceLegs(DemoSite.POINT_A, List.of(shorter));
        assertEquals(List.of(shorter), wb.paths().legs(DemoSite.POINT_A));
    }

    @Test
    void aCableIdOfAnotherPointIsRefusedWithItsOwner() {
        PathLeg clash = new PathLeg(DemoSite.POINT_A, PathDirection.SEND, List.of(
                new CableSegment("c102-r1", DemoSite.FIBER, 10.0, List.of())));
        DuplicateEntryException e = assertThrows(DuplicateEntryException.class,
                () -> wb.paths().replaceLegs(DemoSite.POINT_A, List.of(clash)));
        assertEquals("cable ID 'c102-r1' is already used by point AT-102 (return leg)", e.getMessage());
    }

    @Test
    void aCableIdTwiceInOnePointIsRefused() {
        PathLeg send = new PathLeg(DemoSite.POINT_A, PathDirection.SEND, List.of(
                new CableSegment("C-X", DemoSite.FIBER, 10.0, List.of())));
        PathLeg back = new PathLeg(DemoSite.POINT_A, PathDirection.RETURN, List.of(
                new CableSegment("C-X", DemoSite.FIBER, 10.0, List.of())));
        assertThrows(DuplicateEntryException.class, () -> wb.paths().replaceLegs(DemoSite.POINT_A, List.of(send, back)));
    }

    @Test
    void aRefusedReplacementLeavesTheOldLegsInPlace() {
        PathLeg bad = new PathLeg(DemoSite.POINT_A, PathDirection.SEND, List.of(
                new CableSegment("C101-N1", DemoSite.FIBER, 40.0, List.of()),
                new Joint("J9", "SMA-UNKNOWN", null, InspectionGrade.NOT_INSPECTED, OptionalDouble.empty(),
                        LossBasis.ASSUMED)));
        UnknownEntryException e = assertThrows(UnknownEntryException.class,
                () -> wb.paths().replaceLegs(DemoSite.POINT_A, List.of(bad)));
        assertEquals("point AT-101 send leg: joint J9 uses unknown connector type 'SMA-UNKNOWN'", e.getMessage());
        assertEquals(DemoSite.legs(DemoSite.POINT_A, "C101"), wb.paths().legs(DemoSite.POINT_A));
    }

    @Test
    void legsOfAnUnknownPointNameTheTag() {
        UnknownEntryException e = assertThrows(UnknownEntryException.class, () -> wb.paths().legs("AT-404"));
        assertEquals("unknown point tag 'AT-404'", e.getMessage());
    }
}
