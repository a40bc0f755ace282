package org.strandbook.dossier;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import org.strandbook.evaluation.Acceptance;
import org.strandbook.evaluation.EvaluationGrid;
import org.strandbook.evaluation.Status;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;

/** The value of every {@link Placeholder} for one dossier, in words and numbers with a decimal point. */
final class PlaceholderValues {

    /** The document status every export carries: a complete export is issued, never a draft. */
    static final String FINAL = "FINAL";

    private static final int TAGS_LISTED = 24;

    private PlaceholderValues() {
    }

    static Map<Placeholder, String> of(DossierContent c) {
        Map<Placeholder, String> v = new EnumMap<>(Placeholder.class);
        v.put(Placeholder.SITE, c.site().name());
        v.put(Placeholder.PLANT_AREA, c.site().plantArea().isEmpty() ? "—" : c.site().plantArea());
        v.put(Placeholder.ANALYZERS, c.analyzers().isEmpty() ? "—" : c.analyzers().stream()
                .map(a -> a.tag() + (a.description().isEmpty() ? "" : ", " + a.description()) + ": "
                        + DossierText.decimal(a.minNm(), 0) + "–" + DossierText.decimal(a.maxNm(), 0)
                        + " nm, allowed loop loss " + DossierText.decimal(a.allowedLossDb(), 2) + " dB")
                .collect(Collectors.joining("\n")));
        v.put(Placeholder.REVISION, c.site().revision());
        v.put(Placeholder.EARLIER_REVISIONS, c.earlierRevisions().isEmpty() ? "—"
                : String.join("\n", c.earlierRevisions()));
        v.put(Placeholder.ISSUED, DossierText.time(c.issuedAt()));
        v.put(Placeholder.DOCUMENT_STATUS, FINAL);
        v.put(Placeholder.RESULT, result(c));
        v.put(Placeholder.STATUS_COUNTS, DossierText.statusCount(c.count(Status.PASS), Status.PASS) + " · "
                + DossierText.statusCount(c.count(Status.REVIEW), Status.REVIEW) + " · "
                + DossierText.statusCount(c.count(Status.FAIL), Status.FAIL));
        v.put(Placeholder.SCOPE_POINTS, scopePoints(c));
        v.put(Placeholder.SCOPE_DATES, c.scope().describeDates());
        signer(v, c, SignOffRole.PREPARED, Placeholder.PREPARED_NAME, Placeholder.PREPARED_DATE);
        signer(v, c, SignOffRole.CHECKED, Placeholder.CHECKED_NAME, Placeholder.CHECKED_DATE);
        signer(v, c, SignOffRole.APPROVED, Placeholder.APPROVED_NAME, Placeholder.APPROVED_DATE);
        v.put(Placeholder.SOFTWARE, c.software());
        v.put(Placeholder.WORKBOOK, c.workbookName());
        v.put(Placeholder.AUDIT_ROWS, Long.toString(c.audit().rows()));
        v.put(Placeholder.AUDIT_HEAD, c.audit().headHash());
        v.put(Placeholder.AUDIT_CHECK, c.audit().describeCheck());
        v.put(Placeholder.PAIRING_RULE, c.pairingRule());
        v.put(Placeholder.DEFAULT_TOLERANCE, DossierText.decimal(c.site().defaultToleranceDb(), 2));
        v.put(Placeholder.MIN_MEASURED, DossierText.decimal(100 * Acceptance.MIN_MEASURED_FRACTION, 0));
        v.put(Placeholder.LOCAL_FAIL, DossierText.decimal(Acceptance.LOCAL_FAIL_FACTOR, 0));
        v.put(Placeholder.GRID_STEP, DossierText.decimal(EvaluationGrid.STEP_NM, 0));
        v.put(Placeholder.DECISION_RULE, DossierText.decisionRule(c.decisionRule(), c.site().defaultToleranceDb()));
        return v;
    }

    /** Whether every point passed, symbol first so that the cover's colour follows it. */
    static String result(DossierContent c) {
        int n = c.points().size();
        if (n == 0) {
            return Status.REVIEW.symbol() + " NO POINTS IN SCOPE";
        }
        if (c.allPass()) {
            return Status.PASS.symbol() + " ALL " + n + (n == 1 ? " POINT PASSES" : " POINTS PASS");
        }
        Status worst = c.count(Status.FAIL) > 0 ? Status.FAIL : Status.REVIEW;
        return worst.symbol() + " NOT ALL POINTS PASS: " + c.count(Status.FAIL) + " FAIL, " + c.count(Status.REVIEW)
                + " REVIEW, " + c.count(Status.PASS) + " PASS of " + n;
    }

    private static String scopePoints(DossierContent c) {
        int n = c.points().size();
        if (c.scope().allPoints()) {
            return "all " + n + " point" + (n == 1 ? "" : "s") + " of the workbook";
        }
        List<String> tags = c.points().stream().map(DossierPoint::tag).toList();
        String listed = String.join(", ", tags.subList(0, Math.min(TAGS_LISTED, tags.size())));
        return n + " selected: " + listed + (tags.size() > TAGS_LISTED ? " and " + (tags.size() - TAGS_LISTED)
                + " more" : "");
    }

    private static void signer(Map<Placeholder, String> v, DossierContent c, SignOffRole role, Placeholder name,
                               Placeholder date) {
        SignOff s = c.signOff(role).orElse(null);
        v.put(name, s == null ? "" : s.name());
        v.put(date, s == null ? "" : DossierText.date(s.signedAt()));
    }
}
