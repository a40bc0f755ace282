package org.strandbook.handover;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Predicate;

import org.strandbook.diagnosis.Finding;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.Status;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;

/**
 * The follow-ups of a failing or review point: one per finding that names what to check (a joint,
 * a cable), or the reason a scan could not be judged, each marked done when an action on it was
 * recorded after the latest loop scan.
 */
public final class FollowUps {

    private FollowUps() {
    }

    /**
     * @param actions the point's maintenance actions (any order)
     * @return nothing for a passing point or one never measured
     */
    public static List<FollowUp> of(PointEvaluation evaluation, List<MaintenanceAction> actions) {
        if (evaluation.status() == Status.PASS || evaluation.latest().isEmpty()) {
            return List.of();
        }
        Instant scanned = evaluation.latest().get().loop().takenAt();
        List<FollowUp> out = new ArrayList<>();
        if (evaluation.diagnosis().isEmpty()) {
            // not judged (clipped reference, unknown integration time): the reference is what to redo
            String why = evaluation.problems().isEmpty() ? "re-take the reference and re-measure"
                    : evaluation.problems().get(0);
            out.add(new FollowUp("", why, doneAfter(actions, scanned, a -> a.kind() == MaintenanceKind.RETAKE_REFERENCE)));
            return out;
        }
        for (Finding f : evaluation.diagnosis().get().findings()) {
            String element = f.checkFirst();
            if (element.isEmpty()) {
                continue;
            }
            out.add(new FollowUp(element, "check " + element + ": " + f.cause().words(),
                    doneAfter(actions, scanned, a -> a.elementLabel().equalsIgnoreCase(element))));
        }
        return out;
    }

    private static Optional<MaintenanceAction> doneAfter(List<MaintenanceAction> actions, Instant scanned,
                                                         Predicate<MaintenanceAction> on) {
        return actions.stream().filter(a -> a.performedAt().isAfter(scanned)).filter(on)
                .max((a, b) -> a.performedAt().compareTo(b.performedAt()));
    }
}
