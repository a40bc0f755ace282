package org.strandbook.dossier;

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
import org.strandbook.evaluation.BandTrend;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.evaluation.PointInputs;
import org.strandbook.evaluation.WorkbookInputs;
import org.strandbook.handover.StepAttribution;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.store.Workbook;
import org.strandbook.trend.StepEvent;

/**
 * A joint cleaned between two visits: the loss drops by the dirt's 3 dB, the step is put down to the
 * cleaning, and the trend and forecast start again after it instead of reading the drop as a slope.
 * Theil–Sen is the median of pairwise slopes (Sen, J. Am. Stat. Assoc. 63 (1968) 1379), so the two
 * regimes mixed give a steep negative slope; the regime after the repair alone gives none.
 */
class RepairInTheTrendTest {

    private static final String POINT = DossierFixture.UNMEASURED;
    private static final Instant CLEANED = DossierFixture.FIRST_VISIT.plus(Duration.ofDays(91 * 2 + 45));

    @TempDir
    Path dir;

    private Workbook wb;

    @BeforeEach
    void create() {
        wb = DossierFixture.create(dir.resolve("site.sqlite"), Map.of());
        // invented for the test: 3 dB of dirt at the first three visits, gone at the last three (the
        // step detector estimates its noise from at least four scan-to-scan changes)
        DossierFixture.scans(wb, POINT, new double[] {3.0, 3.0, 3.0, 0.0, 0.0, 0.0});
        wb.maintenance().add(new MaintenanceAction(POINT, MaintenanceKind.CLEAN_JOINT, "J2", CLEANED, "T. Okonjo",
                "dry click cleaner, two passes", "graded dirty", Optional.empty()));
    }

    @AfterEach
    void close() {
        wb.close();
    }

    private PointInputs inputs() {
        return WorkbookInputs.of(wb, wb.site().get(), DossierFixture.point(POINT, 3, "Reactor feed"),
                DossierFixture.analyzer(), DossierFixture.catalog(), wb.scans().list(POINT));
    }

    private static BandTrend band(PointInputs in) {
        return PointEvaluator.withDefaults().evaluate(in).trends().get(1);
    }

    @Test
    void theStepIsPutDownToTheCleaningBetweenTheTwoScans() {
        PointInputs in = inputs();
        List<StepEvent> steps = band(in).steps();
        assertEquals(1, steps.size(), steps::toString);
        assertEquals(-3.0, steps.get(0).stepDb(), 0.1);
        assertEquals("\u22123.0 dB after J2 was cleaned on " + CLEANED.toString().substring(0, 10),
                StepAttribution.describe(steps.get(0), in.actions()));
    }

    @Test
    void theTrendRestartsAfterTheRepair() {
        PointInputs in = inputs();
        double after = band(in).trend().orElseThrow().slopeDbPerYear();
        // design choice of the fixture: 4-count noise, far under 0.5 dB/yr over 182 days
        assertEquals(0.0, after, 0.5);
        PointInputs unrecorded = new PointInputs(in.site(), in.point(), in.analyzer(), in.send(), in.ret(),
                in.catalog(), in.scans(), in.spectra(), in.history(), List.of());
        double mixed = band(unrecorded).trend().orElseThrow().slopeDbPerYear();
        assertTrue(mixed < -3.0, "slope across both regimes " + mixed + " dB/yr");
    }

    @Test
    void aStepWithNoActionBetweenSaysSo() {
        StepEvent step = band(inputs()).steps().get(0);
        assertTrue(StepAttribution.describe(step, List.of()).endsWith("no maintenance recorded between"));
    }
}
