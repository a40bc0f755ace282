package org.strandbook.app.ui.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.strandbook.app.ui.sheet.Verdict;
import org.strandbook.optics.path.Contribution;
import org.strandbook.site.Analyzer;
import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.DetectorType;
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
import org.strandbook.site.Site;
import org.strandbook.site.WavelengthBand;

/**
 * The window's prediction of a point, on a test fiber whose datasheet gives one attenuation either
 * side of the band centre. Losses in dB of elements in series add (IEC 60027-3, logarithmic
 * quantities); a fiber's loss is its attenuation coefficient times its length (IEC 60793-1-40).
 */
class SitePredictionTest {

    private static final double ALPHA_DB_PER_KM = 4.0;
    private static final double CENTRE_NM = 1700;
    private static final double ALLOWED_DB = 12;

    private static final Catalog CATALOG = Catalog.of(
            List.of(new FiberType("F-1", "test", 400, 440, 480, 0.22, "FUSED_SILICA", OhGrade.LOW_OH, 0.5,
                    List.of(new AttenuationPoint(1600, ALPHA_DB_PER_KM), new AttenuationPoint(1800, ALPHA_DB_PER_KM)))),
            List.of(new ConnectorType("K-1", "test", "SMA 905", 0.75, true)),
            List.of(new ProbeType("P-1", "test", ProbeKind.TRANSMISSION, "SAPPHIRE", 0, 0, 3.0)));
    private static final MeasurementPoint POINT = new MeasurementPoint("T-1", "", "", "A-1", 1, "P-1",
            List.of(new WavelengthBand("b", CENTRE_NM - 40, CENTRE_NM + 40)), OptionalDouble.of(0.5), false, false,
            OptionalDouble.empty());

    private final SitePrediction prediction = new SitePrediction(new Site("test"),
            List.of(new Analyzer("A-1", "", 1000, 2500, 1, ALLOWED_DB, DetectorType.EXTENDED_INGAAS)), CATALOG);

    private static List<PathLeg> legs(double trunkM) {
        Joint j = new Joint("J1", "K-1", "K-1", InspectionGrade.CLEAN, OptionalDouble.empty(), LossBasis.ASSUMED);
        return List.of(
                new PathLeg("T-1", PathDirection.SEND, List.of(new CableSegment("S1", "F-1", trunkM, List.of()), j)),
                new PathLeg("T-1", PathDirection.RETURN, List.of(new CableSegment("R1", "F-1", 250, List.of()))));
    }

    @Test
    void loopLossAtTheBandCentreIsTheSumOfItsElements() {
        PointPrediction p = prediction.predict(POINT, legs(500));

        double sum = 0;
        for (Contribution c : p.budget().orElseThrow().contributions()) {
            sum += c.lossDbAt(p.budget().get().grid().nearestIndex(CENTRE_NM));
        }
        // 4 dB/km × (0.5 + 0.25) km of fiber + 0.75 dB joint + 3 dB probe
        assertEquals(3.0 + 0.75 + 3.0, p.bands().get(0).predictedLossDb(), 1e-9);
        assertEquals(sum, p.bands().get(0).predictedLossDb(), 1e-9);
    }

    @Test
    void marginIsWhatTheAnalyzerAllowsLessThePrediction() {
        BandPrediction band = prediction.predict(POINT, legs(500)).bands().get(0);

        assertEquals(ALLOWED_DB - 6.75, band.marginDb(), 1e-9);
        assertEquals(Verdict.PASS, band.verdict());
    }

    @Test
    void aLongerTrunkShowsAtOnceAndCanFailThePoint() {
        prediction.predict(POINT, legs(500));

        PointPrediction longer = prediction.predict(POINT, legs(1_000));

        // +0.5 km at 4 dB/km = +2 dB; 1.5 km more fails the point at the margin below zero
        assertEquals(8.75, longer.bands().get(0).predictedLossDb(), 1e-9);
        assertEquals(Verdict.FAIL, prediction.predict(POINT, legs(2_100)).verdict().orElseThrow());
    }

    @Test
    void aPointWithoutItsReturnLegHasNoPredictionAndSaysWhy() {
        PointPrediction p = prediction.predict(POINT, legs(500).subList(0, 1));

        assertTrue(p.budget().isEmpty());
        assertEquals("no return leg recorded", p.problem());
    }

    @Test
    void aBandBeyondTheAnalyzersRangeIsNamed() {
        MeasurementPoint wide = new MeasurementPoint("T-1", "", "", "A-1", 1, "P-1",
                List.of(new WavelengthBand("far", 2600, 2700)), OptionalDouble.empty(), false, false, OptionalDouble.empty());

        PointPrediction p = prediction.predict(wide, legs(500));

        assertTrue(p.problem().contains("outside analyzer A-1's range"), p.problem());
        assertTrue(Double.isNaN(p.bands().get(0).predictedLossDb()));
    }
}
