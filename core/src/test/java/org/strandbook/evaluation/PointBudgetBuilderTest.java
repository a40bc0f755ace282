package org.strandbook.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.attenuation.SilicaAttenuation;
import org.strandbook.optics.attenuation.SilicaFiberGrade;
import org.strandbook.optics.path.Contribution;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.Bend;
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
import org.strandbook.site.WavelengthBand;
import org.strandbook.uncertainty.BudgetInputUncertainties;
import org.strandbook.uncertainty.ElementAllowances;
import org.strandbook.uncertainty.PathUncertainty;

/** A point's predicted budget is the sum of its parts, each from its published law. */
class PointBudgetBuilderTest {

    private static final WavelengthGrid GRID = WavelengthGrid.ofNm(1300, 1550, 1700);

    private static final Catalog CATALOG = Catalog.of(
            List.of(new FiberType("F", "", 200, 220, 245, 0.22, "FUSED_SILICA", OhGrade.LOW_OH, 0.5, List.of())),
            List.of(new ConnectorType("C", "", "SMA 905", 1.0, true)),
            List.of(new ProbeType("P", "", ProbeKind.TRANSMISSION, "SAPPHIRE", 2, 5, 3.0)));

    private static final MeasurementPoint POINT = new MeasurementPoint("T-1", "", "", "A", 1, "P",
            List.of(new WavelengthBand("b", 1500, 1600)), OptionalDouble.empty(), false, false, OptionalDouble.empty());

    private static Joint joint(String label, OptionalDouble loss) {
        return new Joint(label, "C", "C", InspectionGrade.CLEAN, loss, LossBasis.MEASURED);
    }

    /**
     * Sapphire ordinary index, λ in µm: the 20 °C Sellmeier fit printed in M. J. Dodge, "Refractive
     * index", Handbook of Laser Science and Technology vol. IV (CRC, 1986).
     */
    private static double sapphireIndex(double um) {
        double l2 = um * um;
        double n2 = 1 + 1.4313493 * l2 / (l2 - 0.0726631 * 0.0726631)
                + 0.65054713 * l2 / (l2 - 0.1193242 * 0.1193242)
                + 5.3414021 * l2 / (l2 - 18.028251 * 18.028251);
        return Math.sqrt(n2);
    }

    /** 80 m of fiber: J1 measured at 0.5 dB on the send leg, J2 at its type's loss on the return. */
    private static PredictedBudget measuredAndTypicalJointLoop() {
        PathLeg send = new PathLeg("T-1", PathDirection.SEND, List.of(
                new CableSegment("S1", "F", 10, List.of()), joint("J1", OptionalDouble.of(0.5)),
                new CableSegment("S2", "F", 30, List.of())));
        PathLeg ret = new PathLeg("T-1", PathDirection.RETURN, List.of(
                joint("J2", OptionalDouble.empty()), new CableSegment("R1", "F", 40, List.of())));
        PredictedBudget b = new PointBudgetBuilder(CATALOG).build(POINT, send, ret, new OpticsCache(GRID));
        return b;
    }

    @Test
    void aJointIsMeasuredOnlyWhenALossWasMeasuredElseItsTypeDecides() {
        // Design choice: a measured reading carries its own uncertainty; a joint without a reading
        // carries its connector type's range (air gap here), whatever basis the row names.
        PredictedBudget b = measuredAndTypicalJointLoop();
        // path order: S1, J1, S2, probe, J2, R1
        assertEquals(new ElementAllowances.Lumped(BudgetInputUncertainties.SHIPPED.measuredJoint()),
                b.allowances().elements().get(1));
        assertEquals(new ElementAllowances.Lumped(BudgetInputUncertainties.SHIPPED.airGapConnectorPair()),
                b.allowances().elements().get(4));
        List<BandUncertainty> bands = BandUncertainty.of(b, POINT.bands(), PathUncertainty.standard());
        assertEquals(1, bands.size());
        assertEquals(1550, bands.get(0).atCentre().wavelengthNm(), 1e-9);
    }

    @Test
    void budgetIsJointsPlusFiberPlusProbeWindowsAndFixedLoss() {
        PredictedBudget b = measuredAndTypicalJointLoop();
        int i = GRID.nearestIndex(1550);
        double alphaDbPerKm = SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 0.5).attenuationDbPerKm(1550);
        // Fresnel at normal incidence, R = ((n−1)/(n+1))² (Born & Wolf, Principles of Optics, §1.5);
        // a window's two faces with incoherent multiple reflections transmit
        // (1−R)²·Σ R^2k = (1−R)²/(1−R²) = (1−R)/(1+R) (geometric series, derived here)
        double n = sapphireIndex(1.55);
        double r = Math.pow((n - 1) / (n + 1), 2);
        double windowDb = -10 * Math.log10((1 - r) / (1 + r));
        double expected = 0.5 + 1.0 + alphaDbPerKm * 0.080 + 3.0 + windowDb;
        assertEquals(expected, b.totalLossDb()[i], 1e-9);
    }

    @Test
    void everyElementHasItsOwnContributionAndTheyAddUp() {
        PathLeg send = new PathLeg("T-1", PathDirection.SEND, List.of(new CableSegment("S1", "F", 10, List.of()),
                joint("J1", OptionalDouble.empty()), new CableSegment("S2", "F", 10, List.of())));
        PathLeg ret = new PathLeg("T-1", PathDirection.RETURN, List.of(new CableSegment("R1", "F", 20, List.of())));
        PredictedBudget b = new PointBudgetBuilder(CATALOG).build(POINT, send, ret, new OpticsCache(GRID));
        assertEquals(List.of("S1", "J1", "S2", "probe P", "R1"),
                b.contributions().stream().map(Contribution::label).toList());
        for (int i = 0; i < GRID.size(); i++) {
            double sum = 0;
            for (Contribution c : b.contributions()) {
                sum += c.lossDbAt(i);
            }
            assertEquals(b.totalLossDb()[i], sum, 1e-12);
        }
    }

    @Test
    void onlyTheTightestBendOfASegmentIsCharged() {
        // mode stripping: after the tightest bend, gentler bends find the unguided modes gone
        // (Gloge, Appl. Opt. 11, 2506 (1972) gives the guided share for one radius)
        PathLeg ret = new PathLeg("T-1", PathDirection.RETURN, List.of(new CableSegment("R1", "F", 20, List.of())));
        PathLeg oneBend = new PathLeg("T-1", PathDirection.SEND, List.of(
                new CableSegment("S1", "F", 20, List.of(new Bend(30, 1)))));
        PathLeg manyBends = new PathLeg("T-1", PathDirection.SEND, List.of(
                new CableSegment("S1", "F", 20, List.of(new Bend(30, 4), new Bend(80, 6)))));
        PointBudgetBuilder builder = new PointBudgetBuilder(CATALOG);
        PredictedBudget one = builder.build(POINT, oneBend, ret, new OpticsCache(GRID));
        PredictedBudget many = builder.build(POINT, manyBends, ret, new OpticsCache(GRID));
        assertEquals(one.totalLossDb()[1], many.totalLossDb()[1], 1e-12);
        assertTrue(many.notes().stream().anyMatch(s -> s.contains("10 bends recorded, the tightest (30 mm) charged once")));
    }
}
