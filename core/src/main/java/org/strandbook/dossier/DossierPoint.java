package org.strandbook.dossier;

import java.util.List;
import java.util.Optional;

import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.Status;
import org.strandbook.site.Inspection;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.Note;
import org.strandbook.site.PathLeg;
import org.strandbook.site.SignOff;

/**
 * One measurement point as the dossier shows it: its records and, when it could be evaluated, its
 * evaluation.
 *
 * @param point       the point's record
 * @param legs        its recorded legs (send first), none when none was recorded
 * @param inspections its end-face inspections in time order
 * @param notes       notes on the point in time order
 * @param signOffs    sign-offs on the point in time order
 * @param evaluation  the evaluation, absent when the point could not be evaluated at all
 * @param problems    what could not be evaluated, in words
 * @param actions     maintenance actions at the point in time order
 */
public record DossierPoint(MeasurementPoint point, List<PathLeg> legs, List<Inspection> inspections, List<Note> notes,
                           List<SignOff> signOffs, Optional<PointEvaluation> evaluation, List<String> problems,
                           List<MaintenanceAction> actions) {

    public DossierPoint {
        actions = actions == null ? List.of() : List.copyOf(actions);
        legs = List.copyOf(legs);
        inspections = List.copyOf(inspections);
        notes = List.copyOf(notes);
        signOffs = List.copyOf(signOffs);
        problems = List.copyOf(problems);
    }

    /** A point with no maintenance recorded. */
    public DossierPoint(MeasurementPoint point, List<PathLeg> legs, List<Inspection> inspections, List<Note> notes,
                        List<SignOff> signOffs, Optional<PointEvaluation> evaluation, List<String> problems) {
        this(point, legs, inspections, notes, signOffs, evaluation, problems, List.of());
    }

    public String tag() {
        return point.tag();
    }

    /** The evaluation's status; REVIEW when the point could not be evaluated. */
    public Status status() {
        return evaluation.map(PointEvaluation::status).orElse(Status.REVIEW);
    }

    /** Every problem, the evaluation's own first. */
    public List<String> allProblems() {
        if (evaluation.isEmpty()) {
            return problems;
        }
        List<String> all = new java.util.ArrayList<>(evaluation.get().problems());
        problems.stream().filter(p -> !all.contains(p)).forEach(all::add);
        return all;
    }
}
