package org.strandbook.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
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
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;
import org.strandbook.site.WavelengthBand;
import org.strandbook.uncertainty.BasisKind;
import org.strandbook.uncertainty.BudgetRow;
import org.strandbook.uncertainty.PathUncertainty;

/** A spread stated on a catalog row or a single element reaches the point's uncertainty budget. */
class StatedSpreadBudgetTest {

    private static final WavelengthGrid GRID = WavelengthGrid.ofNm(1550);

    private static final MeasurementPoint POINT = new MeasurementPoint("AT-4101", "", "", "A", 1, "P",
            List.of(new WavelengthBand("b", 1500, 1600)), OptionalDouble.empty(), false, false, OptionalDouble.empty());

    private static final FiberType FIBER = new FiberType("F", "", 200, 220, 245, 0.22, "FUSED_SILICA",
            OhGrade.LOW_OH, 0.5, List.of());
    private static final ProbeType PROBE = new ProbeType("P", "", ProbeKind.TRANSMISSION, "SAPPHIRE", 0, 5, 1.0);

    private static StatedSpreads spread(SpreadInput input, String text, String basis) {
        return new StatedSpreads(Map.of(input, StatedSpread.parse(text, input)), basis);
    }

    /** One joint J1 between two 1 m runs, of connector type C; the probe closes the loop. */
    private static BudgetRow jointRow(ConnectorType type, Joint joint) {
        Catalog catalog = Catalog.of(List.of(FIBER), List.of(type), List.of(PROBE));
        PathLeg send = new PathLeg("AT-4101", PathDirection.SEND, List.of(new CableSegment("S1", "F", 1, List.of()),
                joint, new CableSegment("S2", "F", 1, List.of())));
        PathLeg ret = new PathLeg("AT-4101", PathDirection.RETURN, List.of(new CableSegment("R1", "F", 2, List.of())));
        PredictedBudget b = new PointBudgetBuilder(catalog).build(POINT, send, ret, new OpticsCache(GRID));
        return PathUncertainty.standard().withTrials(10_000).at(b.budget(), 0, b.allowances()).budget().rows()
                .stream().filter(r -> r.input().startsWith("J1 ")).findFirst().orElseThrow();
    }

    private static Joint assumedJoint() {
        return new Joint("J1", "C", "C", InspectionGrade.CLEAN, OptionalDouble.empty(), LossBasis.ASSUMED);
    }

    @Test
    void aConnectorTypesRectangularSpreadGivesHalfWidthOverRootThree() {
        // JCGM 100:2008, 4.3.7: a rectangular distribution of half-width a has u = a/√3.
        ConnectorType type = new ConnectorType("C", "", "SMA 905", 1.0, true,
                spread(SpreadInput.CONNECTOR_LOSS, "±0.3 dB", "datasheet rev C"));
        BudgetRow row = jointRow(type, assumedJoint());
        assertEquals(0.3 / Math.sqrt(3), row.standardUncertainty(), 1e-12);
    }

    @Test
    void aJointLossEntersTheTotalWithSensitivityOne() {
        // JCGM 100:2008, 5.1.3: cᵢ = ∂f/∂xᵢ; the loop's loss in dB is the sum of its parts, so 1.
        ConnectorType type = new ConnectorType("C", "", "SMA 905", 1.0, true,
                spread(SpreadInput.CONNECTOR_LOSS, "±0.3 dB", "datasheet rev C"));
        assertEquals(1.0, jointRow(type, assumedJoint()).sensitivity(), 0);
    }

    @Test
    void aStatedStandardUncertaintyPassesThroughUnchanged() {
        // JCGM 100:2008, 4.3.3: an uncertainty quoted as one standard deviation is u(xᵢ) itself.
        ConnectorType type = new ConnectorType("C", "", "SMA 905", 1.0, true,
                spread(SpreadInput.CONNECTOR_LOSS, "u 0.12 dB", "maker's test report"));
        assertEquals(0.12, jointRow(type, assumedJoint()).standardUncertainty(), 1e-12);
    }

    @Test
    void theRowSaysWhichCatalogRowTheSpreadCameFrom() {
        ConnectorType type = new ConnectorType("C", "", "SMA 905", 1.0, true,
                spread(SpreadInput.CONNECTOR_LOSS, "±0.3 dB", "datasheet rev C"));
        BudgetRow row = jointRow(type, assumedJoint());
        assertEquals("connector type C: ±0.3 dB, datasheet rev C", row.basisText());
        assertEquals(BasisKind.STATED, row.basis());
    }

    @Test
    void anElementsOwnSpreadBeatsItsConnectorTypes() {
        // Design choice: the joint's own reading knows more than its type's datasheet.
        ConnectorType type = new ConnectorType("C", "", "SMA 905", 1.0, true,
                spread(SpreadInput.CONNECTOR_LOSS, "±0.3 dB", "datasheet rev C"));
        Joint measured = new Joint("J1", "C", "C", InspectionGrade.CLEAN, OptionalDouble.of(0.8), LossBasis.MEASURED,
                spread(SpreadInput.JOINT_LOSS, "u 0.05 dB", "light source and meter, 2 readings"));
        BudgetRow row = jointRow(type, measured);
        assertEquals(0.05, row.standardUncertainty(), 1e-12);
        assertEquals("element J1: measured, u 0.05 dB, light source and meter, 2 readings", row.basisText());
        assertEquals(BasisKind.MEASURED, row.basis());
    }

    @Test
    void withNothingStatedTheShippedDefaultApplies() {
        // JCGM 100:2008, 4.3.7 on the shipped ±0.5 dB air-gap range (from memory): u = 0.5/√3.
        BudgetRow row = jointRow(new ConnectorType("C", "", "SMA 905", 1.0, true), assumedJoint());
        assertEquals(0.5 / Math.sqrt(3), row.standardUncertainty(), 1e-12);
        assertEquals(BasisKind.FROM_MEMORY, row.basis());
    }

    @Test
    void aSegmentsLengthToleranceInMetresGivesItsOwnRectangle() {
        // JCGM 100:2008, 4.3.7: ±0.5 m rectangular, u = 0.5/√3 m, in place of the shipped ±2 % or ±0.1 m.
        Catalog catalog = Catalog.of(List.of(FIBER), List.of(new ConnectorType("C", "", "SMA 905", 1.0, true)),
                List.of(PROBE));
        CableSegment run = new CableSegment("S1", "F", 40, List.of(),
                spread(SpreadInput.LENGTH, "±0.5 m", "walked with a wheel"));
        PathLeg send = new PathLeg("AT-4101", PathDirection.SEND, List.of(run));
        PathLeg ret = new PathLeg("AT-4101", PathDirection.RETURN, List.of(new CableSegment("R1", "F", 40, List.of())));
        PredictedBudget b = new PointBudgetBuilder(catalog).build(POINT, send, ret, new OpticsCache(GRID));
        List<BudgetRow> rows = PathUncertainty.standard().withTrials(10_000).at(b.budget(), 0, b.allowances())
                .budget().rows();
        BudgetRow own = rows.stream().filter(r -> r.input().equals("S1 length")).findFirst().orElseThrow();
        BudgetRow shipped = rows.stream().filter(r -> r.input().equals("R1 length")).findFirst().orElseThrow();
        assertEquals(0.5 / Math.sqrt(3), own.standardUncertainty(), 1e-12);
        assertEquals(0.8 / Math.sqrt(3), shipped.standardUncertainty(), 1e-12);
        assertTrue(own.basisText().startsWith("element S1: ±0.5 m"), own.basisText());
    }

    @Test
    void anOhRangeInPpmBecomesAnAsymmetricRectangleAboutTheGradesValue() {
        // JCGM 100:2008, 4.3.8: bounds a₋ and a₊ about the estimate, rectangular: u = (a₊ + a₋)/√12.
        FiberType wet = new FiberType("W", "", 200, 220, 245, 0.22, "FUSED_SILICA", OhGrade.HIGH_OH, 600, List.of(),
                spread(SpreadInput.OH_CONTENT, "400..1000 ppm", "grade sheet"));
        Catalog catalog = Catalog.of(List.of(wet), List.of(), List.of(PROBE));
        PathLeg send = new PathLeg("AT-4101", PathDirection.SEND, List.of(new CableSegment("S1", "W", 50, List.of())));
        PathLeg ret = new PathLeg("AT-4101", PathDirection.RETURN, List.of(new CableSegment("R1", "W", 50, List.of())));
        PredictedBudget b = new PointBudgetBuilder(catalog).build(POINT, send, ret,
                new OpticsCache(WavelengthGrid.ofNm(1383)));
        BudgetRow oh = PathUncertainty.standard().withTrials(10_000).at(b.budget(), 0, b.allowances()).budget().rows()
                .stream().filter(r -> r.input().equals("S1 OH content")).findFirst().orElseThrow();
        // relative to 600 ppm: −1/3 … +2/3
        assertEquals((1.0 / 3 + 2.0 / 3) / Math.sqrt(12), oh.standardUncertainty(), 1e-12);
    }
}
