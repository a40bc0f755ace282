package org.strandbook.app.ui.path;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.strandbook.app.ui.budget.PointPrediction;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.RowFigures;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;

/** The computed columns of the segment and joint sheets, from the point's prediction. */
public final class PathFigures {

    private static final Figure NONE = Figure.text("\u2014");

    private PathFigures() {
    }

    /**
     * @param legs     the legs {@code rows} join into (with the other sheet's rows)
     * @param centreNm the wavelength the losses are stated at, nm
     */
    public static List<RowFigures> segments(List<LegSegment> rows, List<PathLeg> legs, PointPrediction prediction,
                                            double centreNm) {
        double total = prediction.lossDbAt(centreNm);
        List<RowFigures> out = new ArrayList<>(rows.size());
        for (LegSegment row : rows) {
            double loss = lossOf(row.direction(), row.segment(), legs, prediction, centreNm);
            if (Double.isNaN(loss)) {
                out.add(new RowFigures(Map.of(SegmentSheet.LOSS, NONE, SegmentSheet.SHARE, NONE)));
            } else {
                out.add(new RowFigures(Map.of(SegmentSheet.LOSS, Figure.number(loss, 3),
                        SegmentSheet.SHARE, Figure.number(100 * loss / total, 1))));
            }
        }
        return out;
    }

    public static List<RowFigures> joints(List<LegJoint> rows, List<PathLeg> legs, PointPrediction prediction,
                                          double centreNm) {
        List<RowFigures> out = new ArrayList<>(rows.size());
        for (LegJoint row : rows) {
            double loss = lossOf(row.direction(), row.joint(), legs, prediction, centreNm);
            out.add(new RowFigures(Map.of(JointSheet.BETWEEN, Figure.text(LegRows.between(row, legs)),
                    JointSheet.LOSS, Double.isNaN(loss) ? NONE : Figure.number(loss, 2))));
        }
        return out;
    }

    private static double lossOf(PathDirection direction, PathElement element, List<PathLeg> legs,
                                 PointPrediction prediction, double centreNm) {
        for (PathLeg leg : legs) {
            if (leg.direction() != direction) {
                continue;
            }
            List<PathElement> elements = leg.elements();
            for (int i = 0; i < elements.size(); i++) {
                if (elements.get(i) == element) {
                    return prediction.elementLossDbAt(direction, i, centreNm);
                }
            }
        }
        return Double.NaN;
    }
}
