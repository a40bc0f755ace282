package org.strandbook.diagnosis;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * Ranks the two causes of a wavelength-flat excess with what the workbook records. In order:
 * a joint graded dirty or damaged at inspection puts the connector first; a recorded bend below
 * the long-term minimum radius puts the bend first; every joint inspected and graded clean puts
 * the bend first (the connectors were seen to be good); otherwise the connector comes first,
 * because inspecting and cleaning is the quickest check (common practice).
 *
 * <p>When the excess matches the loss of a core-size step between a core of the path and a smaller
 * one of the path or the catalog ({@link CoreSizeStep}), that step is named as the second candidate
 * with its arithmetic: the records cannot show a wrong cord, so it never comes first.
 *
 * <p>A negative flat excess (the loop loses less than predicted) is no fault of the fiber: it points
 * at the reference or the records and is reported as such, never folded into the other shapes.
 */
final class FlatExcessRanking {

    /**
     * dB: a loop that loses at least this much less than predicted is reported as a reference or
     * records problem. Larger than the reporting threshold because connector allowances are
     * conservative and a healthy path often comes in a few tenths under budget (a design choice).
     */
    static final double BETTER_THAN_PREDICTED_DB = 1.0;

    private FlatExcessRanking() {
    }

    static Finding finding(double amountDb, double atNm, double share, PathEvidence evidence) {
        Finding f = recordsFirst(amountDb, atNm, share, evidence);
        return CoreSizeStep.matching(amountDb, evidence.pathCoresUm(), evidence.catalogCoresUm())
                .map(step -> withCoreStep(f, step, evidence))
                .orElse(f);
    }

    /**
     * The loop loses less than predicted ({@code amountDb} is the fitted flat amount, negative).
     * Fibers do not gain light, so the reference or the records are wrong (one-cord method: IEC
     * 61280-4-1, from memory). When the shortfall is one amount everywhere it is stated as such; when
     * it differs across the range it is stated at both ends, and when it follows the predicted loss
     * itself the records come first: they list more fiber (or a lossier one) than the light went through.
     */
    static Optional<Finding> betterThanPredicted(double amountDb, double atNm, double share, double minReportDb,
                                                 boolean negativeLoss, Shortfall shortfall) {
        if (-amountDb < Math.max(minReportDb, BETTER_THAN_PREDICTED_DB)) {
            return Optional.empty();
        }
        String check = " Check that the reference was taken through the launch cord alone (not a different cord, not"
                + " through more than the cord), at the loop scan's integration time, and that every joint, cord and"
                + " probe the records list is really in the path; re-take the reference before trusting this point's"
                + " verdicts";
        String text;
        Cause cause = Cause.REFERENCE_OR_RECORDS;
        double amount = amountDb;
        double at = atNm;
        if (shortfall.flat(amountDb)) {
            text = String.format(Locale.ROOT, "the loop loses ≈%.1f dB less than predicted at every wavelength:"
                    + " a fiber cannot gain light, so suspect the reference or the records.", -amountDb) + check;
        } else {
            String range = String.format(Locale.ROOT, "the loop loses less than predicted by ≈%.1f dB at %.0f nm"
                    + " and ≈%.1f dB at %.0f nm, not by one amount", -shortfall.shortDb(), shortfall.shortNm(),
                    -shortfall.longDb(), shortfall.longNm());
            amount = shortfall.worstDb();
            at = shortfall.worstNm();
            if (shortfall.followsPredicted()) {
                cause = Cause.RECORDS_LIST_MORE_LOSS;
                text = range + ": it falls short where the predicted loss is high, which is the shape of fiber the"
                        + " light did not go through. Check the recorded cable lengths (a 10\u00D7 slip such as"
                        + " 1020 m for 102 m) and fiber types first, then the reference." + check;
            } else {
                text = range + ": a fiber cannot gain light, so suspect the reference or the records." + check;
            }
        }
        if (negativeLoss) {
            text += "; the loss is even below zero in places, which only a bad reference explains";
        }
        return Optional.of(new Finding(Signature.FLAT_EXCESS, List.of(cause), amount, at, share, "", text));
    }

    private static Finding withCoreStep(Finding f, CoreSizeStep step, PathEvidence evidence) {
        List<Cause> causes = new ArrayList<>(f.candidates());
        causes.add(1, Cause.CORE_SIZE_STEP);
        String cordsOfLargerCore = evidence.segments().stream()
                .filter(s -> s.coreUm() == step.largerUm())
                .map(PathEvidence.SegmentEvidence::label)
                .collect(Collectors.joining(", "));
        String text = f.text() + String.format(Locale.ROOT, ". Or a smaller core somewhere in the path? A %.0f µm"
                        + " core after %.0f µm loses %s for uniformly filled fibers of equal NA: check that %s"
                        + " and every patch cord used are the recorded %.0f µm type",
                step.smallerUm(), step.largerUm(), step.arithmetic(),
                cordsOfLargerCore.isEmpty() ? "the cords" : cordsOfLargerCore, step.largerUm());
        return new Finding(f.signature(), causes, f.amountDb(), f.atNm(), f.sharePercent(), f.checkFirst(), text,
                f.atLeast());
    }

    private static Finding recordsFirst(double amountDb, double atNm, double share, PathEvidence evidence) {
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
