package org.strandbook.diagnosis;

import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * Ranks the two causes of a wavelength-flat excess with what the workbook records. In order:
 * a joint graded dirty or damaged at inspection puts the connector first; a recorded bend below
 * the long-term minimum radius puts the bend first; every joint inspected and graded clean puts
 * the bend first (the connectors were seen to be good); otherwise the connector comes first,
 * because inspecting and cleaning is the quickest check (common practice).
 */
final class FlatExcessRanking {

    private FlatExcessRanking() {
    }

    static Finding finding(double amountDb, double atNm, double share, PathEvidence evidence) {
        List<PathEvidence.JointEvidence> dirty = evidence.jointsNeedingAction();
        List<PathEvidence.SegmentEvidence> bent = evidence.segmentsWithTightBends();
        List<PathEvidence.JointEvidence> unseen = evidence.jointsNotInspected();
        String head = String.format(Locale.ROOT, "≈%.1f dB wavelength-flat excess", amountDb);
        String sameShape = " (a tight bend gives the same flat shape for large cores)";
        if (!dirty.isEmpty()) {
            String first = dirty.get(0).label();
            String rest = labels(dirty.subList(1, dirty.size()));
            String text = head + "; joint " + first + " was graded " + grade(dirty.get(0)) + " at inspection: clean "
                    + first + (rest.isEmpty() ? "" : ", then " + rest) + ", and re-measure" + sameShape;
            return new Finding(Signature.FLAT_EXCESS, List.of(Cause.DIRTY_CONNECTOR, Cause.TIGHT_BEND), amountDb,
                    atNm, share, first, text);
        }
        if (!bent.isEmpty()) {
            PathEvidence.SegmentEvidence s = bent.get(0);
            String text = String.format(Locale.ROOT, "%s; cable %s has a recorded bend of %.0f mm, below the"
                            + " long-term minimum of %.0f mm: ease or re-route it, then re-measure",
                    head, s.label(), s.tightestBendMm().getAsDouble(), s.longTermMinMm());
            return new Finding(Signature.FLAT_EXCESS, List.of(Cause.TIGHT_BEND, Cause.DIRTY_CONNECTOR), amountDb,
                    atNm, share, s.label(), text);
        }
        if (unseen.isEmpty() && !evidence.joints().isEmpty()) {
            PathEvidence.SegmentEvidence longest = evidence.longestSegment();
            String runs = evidence.segments().stream()
                    .filter(s -> s.lengthM() >= 0.5 * longest.lengthM())
                    .map(s -> String.format(Locale.ROOT, "%s (%.0f m)", s.label(), s.lengthM()))
                    .collect(Collectors.joining(" and "));
            String text = String.format(Locale.ROOT, "%s; every joint was graded clean at inspection, so suspect a"
                            + " tight bend or crush: walk %s and their junction boxes, then re-inspect %s",
                    head, runs, labels(evidence.joints()));
            return new Finding(Signature.FLAT_EXCESS, List.of(Cause.TIGHT_BEND, Cause.DIRTY_CONNECTOR), amountDb,
                    atNm, share, longest.label(), text);
        }
        String first = unseen.isEmpty() ? "" : unseen.get(0).label();
        String text = head + "; joints " + labels(unseen) + " have not been inspected: inspect and clean them,"
                + " starting with " + first + sameShape;
        return new Finding(Signature.FLAT_EXCESS, List.of(Cause.DIRTY_CONNECTOR, Cause.TIGHT_BEND), amountDb, atNm,
                share, first, text);
    }

    private static String grade(PathEvidence.JointEvidence j) {
        return j.grade().name().toLowerCase(Locale.ROOT);
    }

    private static String labels(List<PathEvidence.JointEvidence> joints) {
        return joints.stream().map(PathEvidence.JointEvidence::label).collect(Collectors.joining(", "));
    }
}
