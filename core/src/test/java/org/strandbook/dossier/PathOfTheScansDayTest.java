package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.evaluation.EvaluationGrid;
import org.strandbook.evaluation.PathTimeline;
import org.strandbook.evaluation.PointBudgetBuilder;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.evaluation.PointInputs;
import org.strandbook.evaluation.Status;
import org.strandbook.evaluation.WorkbookInputs;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.PathLeg;
import org.strandbook.store.Workbook;

/**
 * A scan is judged against the path it went through: after a segment is replaced by a longer one,
 * the older scans' prediction is still the old path's, and a joint's grade is the one inspected by
 * the scan's day. The loop scans are made from the old path's prediction (see DossierFixture), so
 * against the new path they would fail by the new fiber's extra loss.
 */
class PathOfTheScansDayTest {

    /** The good point's last loop scan (fourth visit, 91 days apart, loop 3 minutes after the dark). */
    private static final Instant LAST_LOOP = DossierFixture.FIRST_VISIT.plus(Duration.ofDays(91L * 3)).plusSeconds(180);
    private static final Instant REPAIRED = LAST_LOOP.plus(Duration.ofDays(20));
    private static final double LONGER_M = 2060.0;

    @TempDir
    Path dir;

    private Workbook wb;

    @BeforeEach
    void create() {
        wb = DossierFixture.create(dir.resolve("site.sqlite"), Map.of());
        wb.maintenance().add(new MaintenanceAction(DossierFixture.GOOD, MaintenanceKind.REPLACE_SEGMENT, "C201-R1",
                REPAIRED, "T. Okonjo", "cable re-pulled by the long route", "crushed under a grating",
                Optional.of(new CableSegment("C201-R1", "LOH-400", LONGER_M, List.of()))));
    }

    @AfterEach
    void close() {
        wb.close();
    }

    private PointInputs inputs() {
        return WorkbookInputs.of(wb, wb.site().get(), DossierFixture.point(DossierFixture.GOOD, 1, "Reactor feed"),
                DossierFixture.analyzer(), DossierFixture.catalog(), wb.scans().list(DossierFixture.GOOD));
    }

    @Test
    void scansBeforeAReplacementAreJudgedAgainstThePathAsItWasThen() {
        PointEvaluation e = PointEvaluator.withDefaults().evaluate(inputs());
        WavelengthGrid grid = EvaluationGrid.forAnalyzer(DossierFixture.analyzer());
        List<PathLeg> old = DossierFixture.legs(DossierFixture.GOOD);
        double[] oldPrediction = new PointBudgetBuilder(DossierFixture.catalog()).build(
                DossierFixture.point(DossierFixture.GOOD, 1, ""), old.get(0), old.get(1), new OpticsCache(grid))
                .totalLossDb();
        assertArrayEquals(oldPrediction, e.predicted().totalLossDb(), 1e-12);
        assertEquals(Status.PASS, e.status());
        // design choice of the fixture: the scans carry only 4-count noise, well under 0.1 dB
        e.verdicts().forEach(v -> assertEquals(0.0, v.meanDeviationDb(), 0.1, v.band().name()));
    }

    @Test
    void judgedAgainstTodaysPathTheSameScansWouldFail() {
        // the check above can fail: the same scans against the replaced fiber, 2 km longer
        PointInputs in = inputs();
        PointInputs today = new PointInputs(in.site(), in.point(), in.analyzer(), in.send(), in.ret(), in.catalog(),
                in.scans(), in.spectra(), PathTimeline.fixed(in.send(), in.ret()));
        PointEvaluation e = PointEvaluator.withDefaults().evaluate(today);
        // Beer-Lambert: attenuation in dB grows linearly with length, so the measured loss falls short
        // of a prediction that counts 2 km of extra fiber by 2 km times its attenuation. Rayleigh
        // scattering alone in silica is about 0.8 dB/km at 1 µm, falling as λ^-4 (from memory), so
        // ≈0.4 dB/km at 1175 nm: the shortfall exceeds 0.6 dB
        double deviation = e.verdicts().get(1).meanDeviationDb();
        assertTrue(deviation < -0.6, "mean deviation " + deviation + " dB");
    }

    @Test
    void aJointIsGradedAsInspectedByTheScansDay() {
        wb.inspections().add(new Inspection(DossierFixture.GOOD, "J2", REPAIRED.plus(Duration.ofDays(1)), "T. Okonjo",
                InspectionGrade.DAMAGED, "chipped ferrule"));
        PointInputs in = inputs();
        assertEquals(InspectionGrade.CLEAN, in.history().at(LAST_LOOP).ret().joints().get(0).grade());
        assertEquals(InspectionGrade.DAMAGED, in.ret().joints().get(0).grade());
        assertTrue(in.history().at(LAST_LOOP).ret().segments().get(0).lengthM() < LONGER_M);
    }
}
