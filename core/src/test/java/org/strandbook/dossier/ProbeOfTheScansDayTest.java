package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.evaluation.EvaluationGrid;
import org.strandbook.evaluation.PointBudgetBuilder;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.evaluation.PointInputs;
import org.strandbook.evaluation.Status;
import org.strandbook.evaluation.WorkbookInputs;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.Catalog;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.store.Workbook;

/**
 * A scan is judged with the probe it went through: after the probe is replaced by a type with a
 * larger fixed loss, the older scans' prediction is still the old probe's. The fixture's loop scans
 * are made from the old probe's prediction, so against the new one they would read 3 dB too good.
 */
class ProbeOfTheScansDayTest {

    private static final Instant LAST_LOOP = DossierFixture.FIRST_VISIT.plus(Duration.ofDays(91L * 3)).plusSeconds(180);
    private static final Instant REPLACED = LAST_LOOP.plus(Duration.ofDays(20));
    /** Same windows as the fixture's TX-5 (0.8 dB fixed loss), 3.0 dB more fixed loss: design choice of the test. */
    private static final ProbeType LOSSIER = new ProbeType("TX-5L", "transmission cell, 5 mm gap, long-path mount",
            ProbeKind.TRANSMISSION, "SAPPHIRE", 4, 5.0, 3.8);

    @TempDir
    Path dir;

    private Workbook wb;

    @BeforeEach
    void create() {
        wb = DossierFixture.create(dir.resolve("site.sqlite"), Map.of());
        wb.catalog().addProbeType(LOSSIER);
        wb.maintenance().add(new MaintenanceAction(DossierFixture.GOOD, MaintenanceKind.REPLACE_PROBE, "", REPLACED,
                "T. Okonjo", "probe swapped", "window cracked", Optional.empty(), LOSSIER.code()));
    }

    @AfterEach
    void close() {
        wb.close();
    }

    private static Catalog catalog() {
        Catalog c = DossierFixture.catalog();
        List<ProbeType> probes = new ArrayList<>(c.probeTypes().values());
        probes.add(LOSSIER);
        return Catalog.of(List.copyOf(c.fiberTypes().values()), List.copyOf(c.connectorTypes().values()), probes);
    }

    private double[] prediction(MeasurementPoint point) {
        List<PathLeg> legs = DossierFixture.legs(DossierFixture.GOOD);
        return new PointBudgetBuilder(catalog()).build(point, legs.get(0), legs.get(1),
                new OpticsCache(EvaluationGrid.forAnalyzer(DossierFixture.analyzer()))).totalLossDb();
    }

    @Test
    void scansBeforeAProbeReplacementAreJudgedWithTheProbeOfTheirDay() {
        MeasurementPoint today = wb.points().get(DossierFixture.GOOD).orElseThrow();
        assertEquals(LOSSIER.code(), today.probeTypeCode());
        PointInputs in = WorkbookInputs.of(wb, wb.site().get(), today, DossierFixture.analyzer(), catalog(),
                wb.scans().list(DossierFixture.GOOD));

        PointEvaluation e = PointEvaluator.withDefaults().evaluate(in);

        assertArrayEquals(prediction(today.withProbeTypeCode("TX-5")), e.predicted().totalLossDb(), 1e-12);
        assertEquals(Status.PASS, e.status());
    }

    @Test
    void theNewProbesPredictionDiffersByItsExtraFixedLoss() {
        // the check above can fail: the two probes' predictions differ by the fixed losses alone
        // (3.8 − 0.8 dB), the windows being the same (Fresnel faces cancel in the difference)
        MeasurementPoint today = wb.points().get(DossierFixture.GOOD).orElseThrow();
        double[] newer = prediction(today);
        double[] older = prediction(today.withProbeTypeCode("TX-5"));
        for (int i = 0; i < newer.length; i += 50) {
            assertEquals(3.0, newer[i] - older[i], 1e-9);
        }
    }
}
