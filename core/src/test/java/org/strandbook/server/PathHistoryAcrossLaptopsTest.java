package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.evaluation.PathTimeline;
import org.strandbook.evaluation.PointBudgetBuilder;
import org.strandbook.evaluation.WorkbookInputs;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/**
 * One point's path changed on two laptops, each offline and unaware of the other, then both synced
 * through a real PostgreSQL plant server. Each action copied the path its laptop knew, so the copy
 * of the later action still shows the element the earlier one replaced; a scan taken between the two
 * must still be judged against the path it went through, in every workbook.
 *
 * <p>The checks are on the legs, not on a predicted spectrum: which element stood in the path at a
 * moment is a question of record keeping, and the optics that turn legs into loss are tested against
 * published values on their own. The one loss check below uses only the definition of the attenuation
 * coefficient.
 */
class PathHistoryAcrossLaptopsTest {

    private static final String TECH = "history_tech";
    /** Laptop A replaces cable C101-S2 on this day, laptop B the return leg's joint J2 a week later. */
    private static final Instant D1 = Instant.parse("2026-04-10T10:00:00Z");
    private static final Instant D2 = Instant.parse("2026-04-17T14:00:00Z");
    private static final double ORIGINAL_S2_M = 85.0;
    private static final double NEW_S2_M = 285.0;

    @TempDir
    Path dir;

    private TwoLaptops laptops;
    private Workbook a;
    private Workbook b;

    /**
     * Two laptops from one site, each with one offline replacement on point A, both synced (A first,
     * then B, then A again so that each holds both).
     */
    @BeforeEach
    void twoOfflineReplacements() {
        laptops = new TwoLaptops(dir, TECH);
        a = laptops.a;
        b = laptops.b;
        a.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_SEGMENT, "C101-S2", D1,
                "k.ashdown", "re-pulled by the long route", "crushed under a grating", Optional.of(longerS2())));
        b.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_CONNECTOR, "J2", D2,
                "j.pell", "", "ferrule chipped", Optional.of(newJ2())));
        laptops.sync(a);
        laptops.sync(b);
        laptops.sync(a);
    }

    @AfterEach
    void close() {
        if (laptops != null) {
            laptops.close();
        }
    }

    private static CableSegment longerS2() {
        return new CableSegment("C101-S2", DemoSite.FIBER, NEW_S2_M, List.of(new Bend(60, 3), new Bend(150, 2)));
    }

    private static Joint newJ2() {
        return new Joint("J2", DemoSite.CONNECTOR, DemoSite.CONNECTOR, InspectionGrade.CLEAN, OptionalDouble.of(0.4),
                LossBasis.MEASURED);
    }

    private static CableSegment s2(List<PathLeg> legs) {
        return legs.get(0).segments().get(1);
    }

    private static Joint j2(List<PathLeg> legs) {
        return legs.get(1).joints().get(0);
    }

    /** What the evaluation predicts for the point's loop at {@code when} at 1550 nm, dB. */
    private static double predictedLoopLossDbAt1550(Workbook wb, Instant when) {
        Catalog catalog = Catalog.of(wb.catalog().fiberTypes(), wb.catalog().connectorTypes(),
                wb.catalog().probeTypes());
        MeasurementPoint point = wb.points().get(DemoSite.POINT_A).orElseThrow();
        PathTimeline.Legs then = WorkbookInputs.of(wb, wb.site().get(), point,
                wb.site().analyzer(DemoSite.ANALYZER).orElseThrow(), catalog, List.of()).history().at(when);
        return new PointBudgetBuilder(catalog).build(point, then.send(), then.ret(),
                new OpticsCache(WavelengthGrid.ofNm(1550.0))).totalLossDb()[0];
    }

    @Test
    void theLoopLossPredictedBetweenTheTwoCountsTheLongerCableOnBothLaptops() {
        for (Workbook wb : List.of(a, b)) {
            double grownDb = predictedLoopLossDbAt1550(wb, D1.plusSeconds(3600))
                    - predictedLoopLossDbAt1550(wb, D1.minusSeconds(1));
            // TIA/EIA-455-46-A (FOTP-46), definition of spectral attenuation: for a uniform fiber
            // A(λ) = α(λ)·L, α independent of the length. The fiber type's datasheet row gives
            // α(1550 nm) = 4.5 dB/km (DemoSite's catalog), so 200 m more of it adds 0.9 dB, and
            // nothing else in the loop changed between the two moments
            double expectedDb = 4.5 * (NEW_S2_M - ORIGINAL_S2_M) / 1000.0;
            assertEquals(expectedDb, grownDb, 1e-9 * expectedDb, wb == a ? "laptop A" : "laptop B");
        }
    }

    @Test
    void aScanBetweenTwoOfflineReplacementsIsJudgedAgainstThePathItWentThroughOnBothLaptops() {
        List<PathLeg> original = DemoSite.legs(DemoSite.POINT_A, "C101");
        for (Workbook wb : List.of(a, b)) {
            String which = wb == a ? "laptop A" : "laptop B";
            List<PathLeg> between = wb.paths().legsAt(DemoSite.POINT_A, D1.plusSeconds(3600));
            assertEquals(longerS2(), s2(between), which + ": the cable replaced before the scan");
            assertEquals(j2(original), j2(between), which + ": the joint replaced after the scan");

            assertEquals(original, wb.paths().legsAt(DemoSite.POINT_A, D1.minusSeconds(1)),
                    which + ": before both, the path as built");

            List<PathLeg> after = wb.paths().legsAt(DemoSite.POINT_A, D2);
            assertEquals(List.of(longerS2(), newJ2()), List.of(s2(after), j2(after)), which + ": after both");
        }
    }
}
