package org.strandbook.dossier;

import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.evaluation.WorkbookInputs;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.Inspection;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.Note;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanRecord;
import org.strandbook.handover.SignatureText;
import org.strandbook.site.SignOff;
import org.strandbook.site.Site;
import org.strandbook.store.AuditFinding;
import org.strandbook.store.AuditReport;
import org.strandbook.store.SignatureState;
import org.strandbook.store.Workbook;
import org.strandbook.uncertainty.PathUncertainty;

/**
 * Gathers a dossier's content from an open workbook: records, evaluations of the points in scope
 * (on the scans of the date range only) and the audit trail's check. The audit rows themselves are
 * read page by page while the dossier is written, so the workbook must stay open until then.
 *
 * <p>Why not {@code SiteEvaluator}: it evaluates every scan of a point; a dossier for a date range
 * must judge the latest scan within that range and trend only the scans inside it.
 */
public final class WorkbookDossier {

    private WorkbookDossier() {
    }

    /**
     * @param software the software and its version, for the cover
     * @throws IllegalArgumentException naming a point tag the workbook does not hold
     * @throws DossierCancelledException when {@code progress} cancels
     */
    public static DossierContent read(Workbook workbook, DossierScope scope, PointEvaluator evaluator,
                                      Instant issuedAt, String software, DossierProgress progress) {
        Site site = workbook.site().get();
        Map<String, Analyzer> analyzers = workbook.site().analyzers().stream()
                .collect(Collectors.toMap(Analyzer::tag, Function.identity()));
        Catalog catalog = Catalog.of(workbook.catalog().fiberTypes(), workbook.catalog().connectorTypes(),
                workbook.catalog().probeTypes());
        List<MeasurementPoint> chosen = choose(workbook.points().list(), scope);
        Map<String, List<Inspection>> inspections = workbook.inspections().listAll().stream()
                .collect(Collectors.groupingBy(Inspection::pointTag));
        List<Note> notes = workbook.notes().list();
        Map<String, List<MaintenanceAction>> actions = workbook.maintenance().listAll().stream()
                .collect(Collectors.groupingBy(MaintenanceAction::pointTag));
        List<SignOff> signOffs = shownSignOffs(workbook);
        String revision = workbook.signOffs().dossierRevision();
        if (!revision.equals(site.revision())) {
            // the signed revision changed since: this dossier is the next one, not yet signed
            site = new Site(site.name(), site.plantArea(), revision, site.defaultToleranceDb());
        }

        DecisionRule rule = workbook.site().decisionRule();
        PathUncertainty engine = PointUncertainty.engine(rule.coverage());
        Map<String, PointUncertainty> uncertainties = new HashMap<>();
        List<DossierPoint> points = new ArrayList<>();
        Set<String> analyzerTags = new LinkedHashSet<>();
        for (int i = 0; i < chosen.size(); i++) {
            MeasurementPoint point = chosen.get(i);
            analyzerTags.add(point.analyzerTag());
            List<PathLeg> legs = workbook.paths().legs(point.tag());
            List<String> problems = new ArrayList<>();
            Optional<PointEvaluation> evaluation = evaluate(workbook, site, point, analyzers.get(point.analyzerTag()),
                    legs, catalog, scope, evaluator, rule, problems);
            evaluation.ifPresent(e -> uncertainties.put(point.tag(), PointUncertainty.of(e, engine)));
            points.add(new DossierPoint(point, legs, inspections.getOrDefault(point.tag(), List.of()),
                    notes.stream().filter(n -> n.pointTag().equals(point.tag())).toList(),
                    signOffs.stream().filter(s -> s.pointTag().equals(point.tag())).toList(), evaluation, problems,
                    actions.getOrDefault(point.tag(), List.of())));
            if (!progress.advance("evaluating " + point.tag(), i + 1, chosen.size())) {
                throw new DossierCancelledException("export cancelled while evaluating point " + point.tag());
            }
        }
        AuditReport report = workbook.audit().verify();
        List<String> findings = new ArrayList<>();
        report.chainBreak().ifPresent(f -> findings.add(f.message()));
        report.unrecordedChanges().stream().map(AuditFinding::message).forEach(findings::add);
        AuditAppendix audit = new AuditAppendix(report.rows(), report.headHash(), report.intact(), findings,
                (after, limit) -> workbook.audit().entries(after, limit));
        return new DossierContent(site, analyzerTags.stream().map(analyzers::get).filter(a -> a != null).toList(),
                catalog, scope, points, evaluator.pairing().describe(),
                notes.stream().filter(n -> n.pointTag().isEmpty()).toList(),
                signOffs.stream().filter(s -> s.pointTag().isEmpty()).toList(), audit, issuedAt, software,
                workbook.file().getFileName().toString(), rule, uncertainties, earlierRevisions(workbook, revision));
    }

    /**
     * The site signatures the cover no longer carries, so that a handover reader sees that an earlier
     * revision was signed and why this one follows: "APPROVED by … on …, site record, revision A —
     * SUPERSEDED: point AT-4104 changed after it was signed".
     */
    private static List<String> earlierRevisions(Workbook workbook, String revision) {
        return workbook.signOffs().states().stream()
                .filter(state -> state.signOff().onSite() && !onCover(state, revision))
                .map(state -> state.describe() + (state.standing() == SignatureState.Standing.CURRENT ? ""
                        : " \u2014 " + state.standing().name().replace('_', ' ') + ": " + state.why()))
                .toList();
    }

    /** A site signature the cover of {@code revision} carries: still standing, and of that revision. */
    private static boolean onCover(SignatureState state, String revision) {
        SignOff s = state.signOff();
        boolean current = state.standing() == SignatureState.Standing.CURRENT
                || state.standing() == SignatureState.Standing.NO_DIGEST
                || state.standing() == SignatureState.Standing.SIGNED_ELSEWHERE;
        return current && (s.revision().isEmpty() || s.revision().equalsIgnoreCase(revision));
    }

    /**
     * The signatures as the dossier shows them: a point's superseded signature says so in its remark;
     * the cover carries only the current signatures of the revision it shows.
     */
    private static List<SignOff> shownSignOffs(Workbook workbook) {
        String revision = workbook.signOffs().dossierRevision();
        List<SignOff> out = new ArrayList<>();
        for (SignatureState state : workbook.signOffs().states()) {
            SignOff s = state.signOff();
            boolean current = state.standing() == SignatureState.Standing.CURRENT
                    || state.standing() == SignatureState.Standing.NO_DIGEST;
            if (s.onSite()) {
                if (onCover(state, revision)) {
                    // a signature given in another copy says so on the cover: that copy's trail holds what it covered
                    out.add(state.standing() == SignatureState.Standing.SIGNED_ELSEWHERE ? new SignOff(s.role(),
                            s.name(), s.signedAt(), s.pointTag(), SignatureText.line(state), s.jobTitle(),
                            s.revision(), s.contentSha256()) : s);
                }
            } else {
                out.add(current ? s : new SignOff(s.role(), s.name(), s.signedAt(), s.pointTag(),
                        SignatureText.line(state), s.jobTitle(), s.revision(), s.contentSha256()));
            }
        }
        return out;
    }

    private static List<MeasurementPoint> choose(List<MeasurementPoint> all, DossierScope scope) {
        if (scope.allPoints()) {
            return all;
        }
        Set<String> known = all.stream().map(MeasurementPoint::tag).collect(Collectors.toSet());
        for (String tag : scope.pointTags()) {
            if (!known.contains(tag)) {
                throw new IllegalArgumentException("no point tagged '" + tag + "' in this workbook");
            }
        }
        return all.stream().filter(p -> scope.pointTags().contains(p.tag())).toList();
    }

    private static Optional<PointEvaluation> evaluate(Workbook workbook, Site site, MeasurementPoint point,
                                                      Analyzer analyzer, List<PathLeg> legs, Catalog catalog,
                                                      DossierScope scope, PointEvaluator evaluator,
                                                      DecisionRule rule, List<String> problems) {
        if (analyzer == null) {
            problems.add("point " + point.tag() + ": unknown analyzer '" + point.analyzerTag() + "'");
            return Optional.empty();
        }
        Optional<PathLeg> send = legs.stream().filter(l -> l.direction() == PathDirection.SEND).findFirst();
        Optional<PathLeg> ret = legs.stream().filter(l -> l.direction() == PathDirection.RETURN).findFirst();
        if (send.isEmpty() || ret.isEmpty()) {
            problems.add("point " + point.tag() + ": no " + (send.isEmpty() ? "send" : "return") + " leg recorded");
            return Optional.empty();
        }
        List<ScanRecord> all = workbook.scans().list(point.tag());
        List<ScanRecord> inRange = all.stream().filter(s -> scope.includes(s.takenAt())).toList();
        if (inRange.isEmpty() && !all.isEmpty()) {
            problems.add("no scan of " + point.tag() + " among " + scope.describeDates());
        }
        try {
            return Optional.of(evaluator.evaluate(WorkbookInputs.of(workbook, site, point, analyzer, catalog, inRange),
                    rule));
        } catch (IllegalArgumentException e) {
            problems.add(e.getMessage());
            return Optional.empty();
        }
    }
}
