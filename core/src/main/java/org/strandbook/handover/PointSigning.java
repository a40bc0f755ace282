package org.strandbook.handover;

import java.util.List;

import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.SiteEvaluation;
import org.strandbook.evaluation.SiteEvaluator;
import org.strandbook.site.SignOff;
import org.strandbook.store.Workbook;

/**
 * Signing as the command line and the window do it: a point is signed only once it evaluates to a
 * measurement, because a signature on a point says its measured loss was judged.
 */
public final class PointSigning {

    private PointSigning() {
    }

    /**
     * Records the signature.
     *
     * @return its id
     * @throws IllegalArgumentException when the point has not been evaluated (no paired loop scan)
     */
    public static long sign(Workbook wb, SignOff signOff) {
        if (!signOff.onSite()) {
            requireEvaluated(wb, signOff.pointTag());
        }
        return wb.signOffs().add(signOff);
    }

    private static void requireEvaluated(Workbook wb, String tag) {
        SiteEvaluation e = SiteEvaluator.withDefaults().evaluate(wb, List.of(tag), SiteEvaluator.Progress.NONE);
        PointEvaluation p = e.points().stream().findFirst().orElseThrow(() ->
                new IllegalArgumentException("point " + tag + " cannot be evaluated (" + String.join("; ", e.problems())
                        + "), so there is nothing to sign"));
        if (p.measured().isEmpty()) {
            throw new IllegalArgumentException("point " + tag + " has not been evaluated (" + p.finding()
                    + "), so there is nothing to sign");
        }
    }
}
