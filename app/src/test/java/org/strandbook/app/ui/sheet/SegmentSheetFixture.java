package org.strandbook.app.ui.sheet;

import java.util.List;

import org.strandbook.app.ui.workbook.Catalog;
import org.strandbook.app.ui.workbook.LegSegment;
import org.strandbook.app.ui.workbook.SegmentSheet;
import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.CableSegment;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathDirection;

/**
 * A segment sheet over test fibers with a flat attenuation (a single datasheet point), so that a
 * computed fiber loss is simply α·L. Columns: A leg, B cable ID, C fiber type, D length (m),
 * E bends, F fiber loss at band centre (dB).
 */
final class SegmentSheetFixture {

    static final double ALPHA_A_DB_PER_KM = 5.0;
    static final double ALPHA_B_DB_PER_KM = 8.0;
    static final int LABEL = 1;
    static final int FIBER = 2;
    static final int LENGTH = 3;
    static final int LOSS = 5;

    static final Catalog CATALOG = new Catalog(
            List.of(flatFiber("F-A", ALPHA_A_DB_PER_KM), flatFiber("F-B", ALPHA_B_DB_PER_KM)),
            List.of(new ConnectorType("K-1", "", "SMA 905", 1.0, true)), List.of());

    private SegmentSheetFixture() {
    }

    static SheetModel<LegSegment> sheet() {
        SheetModel<LegSegment> sheet = SegmentSheet.create(() -> CATALOG, () -> 1700.0);
        sheet.load(List.of(
                segment(PathDirection.SEND, "C-01", "F-A", 10),
                segment(PathDirection.SEND, "C-02", "F-A", 100),
                segment(PathDirection.RETURN, "C-03", "F-A", 50)));
        return sheet;
    }

    static LegSegment segment(PathDirection d, String label, String fiber, double lengthM) {
        return new LegSegment(d, new CableSegment(label, fiber, lengthM, List.of()));
    }

    static double lengthM(SheetModel<LegSegment> sheet, int row) {
        return sheet.records().get(row).segment().lengthM();
    }

    static String fiber(SheetModel<LegSegment> sheet, int row) {
        return sheet.records().get(row).segment().fiberTypeCode();
    }

    private static FiberType flatFiber(String code, double alphaDbPerKm) {
        return new FiberType(code, "test fiber", 600, 660, 710, 0.22, "FUSED_SILICA", OhGrade.LOW_OH, 0.5,
                List.of(new AttenuationPoint(1700, alphaDbPerKm)));
    }
}
