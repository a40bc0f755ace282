package org.strandbook.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;
import org.strandbook.site.WavelengthBand;

/** The records a core-size step is looked for in: the cores of the path and those the catalog offers. */
class PathEvidenceTest {

    private static FiberType fiber(String code, double coreUm) {
        return new FiberType(code, "", coreUm, coreUm * 1.1, coreUm * 1.2, 0.22, "FUSED_SILICA", OhGrade.LOW_OH, 0.5,
                List.of());
    }

    @Test
    void aPathOf400MicronFiberWithA200MicronTypeInTheCatalogNamesThe602DecibelStep() {
        // a 200 µm core after 400 µm keeps (200/400)² = 1/4 of the light, 6.02 dB (Keiser, Optical Fiber
        // Communications, ch. 5, from memory); nothing is lost from 200 into 600 µm, so 600 µm names no step
        Catalog catalog = Catalog.of(List.of(fiber("F200", 200), fiber("F400", 400), fiber("F600", 600)),
                List.of(new ConnectorType("C", "", "SMA 905", 1.0, true)), List.of());
        Joint j = new Joint("J1", "C", "C", InspectionGrade.CLEAN, OptionalDouble.empty(), LossBasis.ASSUMED);
        PathLeg send = new PathLeg("T-1", PathDirection.SEND,
                List.of(new CableSegment("S1", "F400", 2, List.of()), j, new CableSegment("S2", "F400", 80, List.of())));
        PathLeg ret = new PathLeg("T-1", PathDirection.RETURN, List.of(new CableSegment("R1", "F400", 80, List.of())));
        MeasurementPoint point = new MeasurementPoint("T-1", "", "", "A", 1, "P",
                List.of(new WavelengthBand("b", 1500, 1600)), OptionalDouble.empty(), false, false,
                OptionalDouble.empty());

        PathEvidence evidence = PathEvidence.of(point, send, ret, catalog);

        assertEquals(List.of(400.0), evidence.pathCoresUm());
        CoreSizeStep step = CoreSizeStep.matching(6.2, evidence.pathCoresUm(), evidence.catalogCoresUm())
                .orElseThrow();
        assertEquals(new CoreSizeStep(400, 200), step);
        assertEquals(6.02, step.lossDb(), 0.005);
    }
}
