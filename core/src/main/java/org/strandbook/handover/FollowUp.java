package org.strandbook.handover;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import java.util.Optional;

import org.strandbook.site.MaintenanceAction;

/**
 * What a finding sends a crew to do at a point, and whether it has been done since the scan that
 * raised it: open until an action on that element is recorded after the scan, then waiting for a
 * re-measurement.
 *
 * @param element   the joint or cable to check first; empty when the work is not on one element
 * @param todo      what to do, in the crew's words
 * @param doneSince the action recorded on it after the scan, if any
 */
public record FollowUp(String element, String todo, Optional<MaintenanceAction> doneSince) {

    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("uuuu-MM-dd", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    public FollowUp {
        element = element == null ? "" : element;
        doneSince = doneSince == null ? Optional.empty() : doneSince;
    }

    /** True while nothing has been recorded about it since the scan. */
    public boolean open() {
        return doneSince.isEmpty();
    }

    /** "check J2: dirty or misaligned connector", or "J2 was cleaned on 2026-05-03: re-measure". */
    public String text() {
        return doneSince.map(a -> StepAttribution.done(a) + " on " + DAY.format(a.performedAt()) + ": re-measure")
                .orElse(todo);
    }
}
