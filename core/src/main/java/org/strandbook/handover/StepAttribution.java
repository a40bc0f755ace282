package org.strandbook.handover;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.strandbook.site.MaintenanceAction;
import org.strandbook.trend.StepEvent;

/**
 * Ties a step in a band's loss to the maintenance recorded between the two scans around it, so the
 * trend reads "−2.9 dB after J2 was cleaned on 2026-05-03" instead of an unexplained jump.
 */
public final class StepAttribution {

    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("uuuu-MM-dd", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private StepAttribution() {
    }

    /** The latest action after the scan before the step and no later than the scan after it. */
    public static Optional<MaintenanceAction> cause(StepEvent step, List<MaintenanceAction> actions) {
        MaintenanceAction found = null;
        for (MaintenanceAction a : actions) {
            boolean between = a.performedAt().isAfter(step.before()) && !a.performedAt().isAfter(step.after());
            if (between && (found == null || a.performedAt().isAfter(found.performedAt()))) {
                found = a;
            }
        }
        return Optional.ofNullable(found);
    }

    /** The step in words, with its cause when one was recorded. */
    public static String describe(StepEvent step, List<MaintenanceAction> actions) {
        String size = String.format(Locale.ROOT, "%s%.1f dB", step.stepDb() < 0 ? "\u2212" : "+", Math.abs(step.stepDb()));
        return cause(step, actions).map(a -> size + " after " + done(a) + " on " + DAY.format(a.performedAt()))
                .orElse(size + " between " + DAY.format(step.before()) + " and " + DAY.format(step.after())
                        + ", no maintenance recorded between");
    }

    /** "J2 was cleaned", "cable C4102-R2 was replaced", "the reference was re-taken". */
    static String done(MaintenanceAction a) {
        String e = a.elementLabel();
        return switch (a.kind()) {
            case CLEAN_JOINT -> e + " was cleaned";
            case RETERMINATE -> e + " was re-terminated";
            case REPLACE_CONNECTOR -> "the connector at " + e + " was replaced";
            case REPLACE_SEGMENT -> "cable " + e + " was replaced";
            case REROUTE -> "cable " + e + " was re-routed";
            case REPLACE_PROBE -> a.changesProbe() ? "probe " + e + " was replaced by " + a.newProbeTypeCode()
                    : "the probe was replaced";
            case RETAKE_REFERENCE -> "the reference was re-taken";
        };
    }
}
