package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.OptionalDouble;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.strandbook.evaluation.PointBudgetBuilder;
import org.strandbook.optics.SellmeierMaterial;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.WavelengthBand;

/** The one-fiber calculator and the workbook charge repeated bends by the same rule. */
class BendRuleAgreementTest {

    private static final double NM = 1300;

    @Test
    void threeTwentyMillimetreBendsOnTwoHundredMicronFiberCostTheSameInFiberAndInTheWorkbook() {
        // Gloge, Appl. Opt. 11, 2506 (1972), step index: M_eff/M∞ = 1 − (1/2Δ)[2a/R + (3/(2 n₂ k R))^(2/3)],
        // Δ = NA²/(2n₁²); the tightest bend of a run is charged once, because the modes it cannot
        // guide are gone before the next bend (Gloge, Bell Syst. Tech. J. 51, 1767 (1972): weak mode
        // coupling; FED-STD-1037C "mandrel wrapping": further turns add little)
        double n1 = SellmeierMaterial.FUSED_SILICA.refractiveIndex(NM);
        double na = 0.22;
        double n2 = Math.sqrt(n1 * n1 - na * na);
        double delta = na * na / (2 * n1 * n1);
        double radiusM = 0.020;
        double k = 2 * Math.PI / (NM * 1e-9);
        double guided = 1 - (2 * 100e-6 / radiusM + Math.pow(3 / (2 * n2 * k * radiusM), 2.0 / 3.0)) / (2 * delta);
        double oneBendDb = -10 * Math.log10(guided);

        CliRun run = CliRun.of("fiber", "--core-um", "200", "--clad-um", "220", "--na", "0.22", "--length-m", "10",
                "--bend-radius-mm", "20", "--bend-count", "3", "--wavelengths-nm", "1300", "--json");
        assertEquals(0, run.exitCode(), run.err());
        double fiberCommandDb = jsonNumber(run.out(), "bend_loss_db");

        double workbookDb = workbookSegmentLossDb(List.of(new Bend(20, 3))) - workbookSegmentLossDb(List.of());

        assertEquals(oneBendDb, fiberCommandDb, 1e-6);
        assertEquals(oneBendDb, workbookDb, 1e-9);
        assertEquals(2.62, oneBendDb, 0.01);
    }

    private static double workbookSegmentLossDb(List<Bend> bends) {
        Catalog catalog = Catalog.of(
                List.of(new FiberType("F200", "", 200, 220, 245, 0.22, "FUSED_SILICA", OhGrade.LOW_OH, 1, List.of())),
                List.of(new ConnectorType("C", "", "SMA 905", 1.0, true)),
                List.of(new ProbeType("P", "", ProbeKind.TRANSMISSION, "SAPPHIRE", 0, 0, 0)));
        MeasurementPoint point = new MeasurementPoint("B-1", "", "", "A", 1, "P",
                List.of(new WavelengthBand("b", 1250, 1350)), OptionalDouble.empty(), false, false,
                OptionalDouble.empty());
        PathLeg send = new PathLeg("B-1", PathDirection.SEND, List.of(new CableSegment("S", "F200", 10, bends)));
        PathLeg ret = new PathLeg("B-1", PathDirection.RETURN, List.of(new CableSegment("R", "F200", 10, List.of())));
        WavelengthGrid grid = WavelengthGrid.ofNm(NM);
        return new PointBudgetBuilder(catalog).build(point, send, ret, new OpticsCache(grid)).totalLossDb()[0];
    }

    private static double jsonNumber(String json, String field) {
        Matcher m = Pattern.compile("\"" + field + "\":(-?[0-9.]+(?:[eE][-+]?[0-9]+)?)").matcher(json);
        if (!m.find()) {
            throw new AssertionError(field + " missing in " + json);
        }
        return Double.parseDouble(m.group(1));
    }
}
