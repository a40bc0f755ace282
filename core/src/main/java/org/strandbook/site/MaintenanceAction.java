package org.strandbook.site;

import java.time.Instant;
import java.util.Optional;

/**
 * A maintenance action recorded at a point: who did what to which element, when and why.
 *
 * @param pointTag     the point
 * @param kind         what was done
 * @param elementLabel the joint label or cable ID worked on; empty for the probe or the reference
 * @param performedAt  when the work was done
 * @param performedBy  who did it
 * @param what         what was done, in the crew's words
 * @param why          why it was done (a finding, an inspection, a schedule)
 * @param replacement  the element as it is after the action, when the action changed the path
 *                     (a new segment's length and fiber type, a rerouted segment's bends, a new
 *                     connector); the element before it is kept in the path's history
 * @param newProbeTypeCode the catalog code of the probe type fitted by a probe replacement that
 *                     changed the type; empty otherwise. The probe type removed is then the
 *                     action's {@code elementLabel} once recorded (the element worked on), so that
 *                     scans before the action are judged with the probe they went through
 */
public record MaintenanceAction(String pointTag, MaintenanceKind kind, String elementLabel, Instant performedAt,
                                String performedBy, String what, String why, Optional<PathElement> replacement,
                                String newProbeTypeCode) {

    /** An action that fits no probe type of another kind. */
    public MaintenanceAction(String pointTag, MaintenanceKind kind, String elementLabel, Instant performedAt,
                             String performedBy, String what, String why, Optional<PathElement> replacement) {
        this(pointTag, kind, elementLabel, performedAt, performedBy, what, why, replacement, "");
    }

    public MaintenanceAction {
        pointTag = Require.text(pointTag, "point tag");
        if (kind == null) {
            throw new IllegalArgumentException("maintenance at " + pointTag + ": what was done is missing");
        }
        elementLabel = elementLabel == null ? "" : elementLabel.strip();
        if (kind.role() != MaintenanceKind.ElementRole.NONE && elementLabel.isEmpty()) {
            throw new IllegalArgumentException("maintenance at " + pointTag + ": " + kind.words() + " needs the "
                    + (kind.role() == MaintenanceKind.ElementRole.JOINT ? "joint label" : "cable ID") + " worked on");
        }
        if (performedAt == null) {
            throw new IllegalArgumentException("maintenance at " + pointTag + ": time missing");
        }
        performedBy = Require.text(performedBy, "maintenance at " + pointTag + ": who did it");
        what = what == null ? "" : what.strip();
        why = why == null ? "" : why.strip();
        replacement = replacement == null ? Optional.empty() : replacement;
        if (replacement.isPresent()) {
            PathElement e = replacement.get();
            boolean fits = kind.mayChangePath() && (kind.role() == MaintenanceKind.ElementRole.JOINT
                    ? e instanceof Joint : e instanceof CableSegment);
            if (!fits) {
                throw new IllegalArgumentException("maintenance at " + pointTag + ": " + kind.words()
                        + " cannot put a " + (e instanceof Joint ? "joint" : "cable segment") + " into the path");
            }
        }
        newProbeTypeCode = newProbeTypeCode == null ? "" : newProbeTypeCode.strip();
        if (!newProbeTypeCode.isEmpty() && kind != MaintenanceKind.REPLACE_PROBE) {
            throw new IllegalArgumentException("maintenance at " + pointTag + ": " + kind.words()
                    + " does not fit a probe; only replace probe takes a new probe type");
        }
    }

    /** True when a probe replacement fitted another probe type, which the prediction uses from its date on. */
    public boolean changesProbe() {
        return !newProbeTypeCode.isEmpty();
    }

    /** True when the action replaced an element of the path. */
    public boolean changesPath() {
        return replacement.isPresent();
    }
}
