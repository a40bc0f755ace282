package org.strandbook.app.ui.workbook;

import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import org.strandbook.evaluation.Status;
import org.strandbook.handover.FollowUp;

/**
 * One point in the site's attention view, in the order of the {@code trend} ranking.
 *
 * @param rank       1 for the most urgent
 * @param pointTag   the point
 * @param status     PASS, REVIEW or FAIL; empty when the point could not be evaluated
 * @param worstBand  the band with least margin, or empty
 * @param marginDb   the least band margin of the latest scan, dB (NaN when none was judged, −∞ when
 *                   a band returned no light)
 * @param runOutDate the earliest date a band's margin is forecast to run out, if within the horizon
 * @param finding    the finding in a few words, or why there is none
 * @param followUps  what the findings send a crew to do, and what was done since
 */
public record AttentionRow(int rank, String pointTag, Optional<Status> status, String worstBand, double marginDb,
                           Optional<LocalDate> runOutDate, String finding, List<FollowUp> followUps) {

    public AttentionRow {
        followUps = List.copyOf(followUps);
    }

    /** Failing, review, and points that could not be evaluated. */
    public boolean needsAttention() {
        return status.map(s -> s != Status.PASS).orElse(true);
    }

    /** "✖ FAIL", or "not evaluated". */
    public String statusText() {
        return status.map(Status::label).orElse("not evaluated");
    }

    public String marginText() {
        if (Double.isNaN(marginDb) || Double.isInfinite(marginDb) && marginDb > 0) {
            return "\u2014";
        }
        return Double.isInfinite(marginDb) ? "no light" : String.format(Locale.ROOT, "%.2f", marginDb);
    }

    public String runOutText() {
        return runOutDate.map(LocalDate::toString).orElse("\u2014");
    }

    /** Open follow-ups first, each on its line; "none" when nothing is asked. */
    public String followUpText() {
        if (followUps.isEmpty()) {
            return needsAttention() ? "none recorded" : "";
        }
        return followUps.stream().sorted((a, b) -> Boolean.compare(b.open(), a.open()))
                .map(f -> (f.open() ? "open: " : "done: ") + f.text()).collect(Collectors.joining("\n"));
    }
}
