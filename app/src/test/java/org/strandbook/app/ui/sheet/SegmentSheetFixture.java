package org.strandbook.app.ui.sheet;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.strandbook.app.ui.budget.SitePrediction;
import org.strandbook.app.ui.path.LegRows;
import org.strandbook.app.ui.path.LegSegment;
import org.strandbook.app.ui.path.PathFigures;
import org.strandbook.app.ui.path.SegmentSheet;
import org.strandbook.site.Analyzer;
import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.DetectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.Site;
import org.strandbook.site.WavelengthBand;

/**
 * A segment sheet whose computed loss comes from the real prediction, over test fibers whose
 * datasheet gives one attenuation on both sides of the 1700 nm band centre, so that a segment's
 * loss there is simply α·L. Columns: A leg, B cable ID, C fiber type, D length (m), E bends,
 * F loss at the 1st band centre (dB), G share of loop loss (%).
 */
final class SegmentSheetFixture {

    static final double ALPHA_A_DB_PER_KM = 5.0;
    static final double ALPHA_B_DB_PER_KM = 8.0;
    static final double CENTRE_NM = 1700;
    static final int LABEL = 1;
    static final int FIBER = 2;
    static final int LENGTH = 3;
    static final int LOSS = 5;

    static final Catalog CATALOG = Catalog.of(
            List.of(flatFiber("F-A", ALPHA_A_DB_PER_KM), flatFiber("F-B", ALPHA_B_DB_PER_KM)),
            List.of(),
            List.of(new ProbeType("P-1", "test probe", ProbeKind.TRANSMISSION, "SAPPHIRE", 0, 0, 1.0)));
    static final MeasurementPoint POINT = new MeasurementPoint("T-1", "test", "", "A-1", 1, "P-1",
            List.of(new WavelengthBand("test band", CENTRE_NM - 50, CENTRE_NM + 50)), OptionalDouble.empty(), false,
            false, OptionalDouble.empty());

    private SegmentSheetFixture() {
    }

    static SheetModel<LegSegment> sheet() {
        SitePrediction prediction = new SitePrediction(new Site("test site"),
                List.of(new Analyzer("A-1", "", 1000, 2500, 1, 20, DetectorType.EXTENDED_INGAAS)), CATALOG);
        SheetModel<LegSegment> sheet = SegmentSheet.create(() -> List.of("F-A", "F-B"), label -> Optional.empty(),
                rows -> {
                    List<PathLeg> legs = LegRows.join(POINT.tag(), rows, List.of());
                    return PathFigures.segments(rows, legs, prediction.predict(POINT, legs), CENTRE_NM);
                });
        sheet.load(List.of(
                segment(PathDirection.SEND, 1, "C-01", "F-A", 10),
                segment(PathDirection.SEND, 2, "C-02", "F-A", 100),
                segment(PathDirection.RETURN, 1, "C-03", "F-A", 50)));
        return sheet;
    }

    static LegSegment segment(PathDirection d, double position, String label, String fiber, double lengthM) {
        return new LegSegment(d, position, new CableSegment(label, fiber, lengthM, List.of()));
    }

    static double lengthM(SheetModel<LegSegment> sheet, int row) {
        return sheet.records().get(row).segment().lengthM();
    }

    static String fiber(SheetModel<LegSegment> sheet, int row) {
        return sheet.records().get(row).segment().fiberTypeCode();
    }

    private static FiberType flatFiber(String code, double alphaDbPerKm) {
        return new FiberType(code, "test fiber", 600, 660, 710, 0.22, "FUSED_SILICA", OhGrade.LOW_OH, 0.5,
                List.of(new AttenuationPoint(CENTRE_NM - 100, alphaDbPerKm), new AttenuationPoint(CENTRE_NM + 100, alphaDbPerKm)));
    }
}
