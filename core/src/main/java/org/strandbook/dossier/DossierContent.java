package org.strandbook.dossier;

import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

import org.strandbook.evaluation.Status;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.Note;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.Site;

/**
 * Everything a commissioning dossier shows, gathered before a line is written: from a workbook by
 * {@link WorkbookDossier}, or built directly (the export benchmark does so).
 *
 * @param site          the site
 * @param analyzers     the analyzers serving the points in scope
 * @param catalog       the component catalogs (for fiber cladding in bend checks)
 * @param scope         which points and scans the dossier covers
 * @param points        the points in scope, by tag
 * @param pairingRule   how loop, reference and dark scans were paired, in words
 * @param siteNotes     notes on the site as a whole, in time order
 * @param siteSignOffs  sign-offs on the site record, in time order
 * @param audit         the audit trail
 * @param issuedAt      when the dossier is issued
 * @param software      the software and its version, e.g. "strandbook 0.1.0"
 * @param workbookName  the workbook file's name (without its folder)
 * @param decisionRule  how the bands were judged
 * @param uncertainties each evaluated point's prediction uncertainty by tag, worked out with the
 *                      evaluation (Monte Carlo is evaluation work, not writing); a point without one
 *                      shows no coverage interval
 */
public record DossierContent(Site site, List<Analyzer> analyzers, Catalog catalog, DossierScope scope,
                             List<DossierPoint> points, String pairingRule, List<Note> siteNotes,
                             List<SignOff> siteSignOffs, AuditAppendix audit, Instant issuedAt, String software,
                             String workbookName, DecisionRule decisionRule,
                             Map<String, PointUncertainty> uncertainties, List<String> earlierRevisions) {

    /** The content of a dossier with no signed revision before it. */
    public DossierContent(Site site, List<Analyzer> analyzers, Catalog catalog, DossierScope scope,
                          List<DossierPoint> points, String pairingRule, List<Note> siteNotes,
                          List<SignOff> siteSignOffs, AuditAppendix audit, Instant issuedAt, String software,
                          String workbookName, DecisionRule decisionRule, Map<String, PointUncertainty> uncertainties) {
        this(site, analyzers, catalog, scope, points, pairingRule, siteNotes, siteSignOffs, audit, issuedAt, software,
                workbookName, decisionRule, uncertainties, List.of());
    }

    /** The content of a dossier whose predictions carry no worked-out uncertainty. */
    public DossierContent(Site site, List<Analyzer> analyzers, Catalog catalog, DossierScope scope,
                          List<DossierPoint> points, String pairingRule, List<Note> siteNotes,
                          List<SignOff> siteSignOffs, AuditAppendix audit, Instant issuedAt, String software,
                          String workbookName, DecisionRule decisionRule) {
        this(site, analyzers, catalog, scope, points, pairingRule, siteNotes, siteSignOffs, audit, issuedAt, software,
                workbookName, decisionRule, Map.of());
    }

    /** The content of a dossier judged by the fixed tolerance. */
    public DossierContent(Site site, List<Analyzer> analyzers, Catalog catalog, DossierScope scope,
                          List<DossierPoint> points, String pairingRule, List<Note> siteNotes,
                          List<SignOff> siteSignOffs, AuditAppendix audit, Instant issuedAt, String software,
                          String workbookName) {
        this(site, analyzers, catalog, scope, points, pairingRule, siteNotes, siteSignOffs, audit, issuedAt, software,
                workbookName, DecisionRule.FIXED);
    }

    public DossierContent {
        Objects.requireNonNull(site, "site");
        Objects.requireNonNull(catalog, "catalog");
        Objects.requireNonNull(scope, "scope");
        Objects.requireNonNull(audit, "audit");
        Objects.requireNonNull(issuedAt, "issuedAt");
        analyzers = List.copyOf(analyzers);
        points = List.copyOf(points);
        siteNotes = List.copyOf(siteNotes);
        siteSignOffs = List.copyOf(siteSignOffs);
        earlierRevisions = List.copyOf(earlierRevisions);
        pairingRule = pairingRule == null ? "" : pairingRule;
        software = software == null || software.isBlank() ? "Strandbook" : software.strip();
        workbookName = workbookName == null ? "" : workbookName;
        decisionRule = decisionRule == null ? DecisionRule.FIXED : decisionRule;
        uncertainties = uncertainties == null ? Map.of() : Map.copyOf(uncertainties);
    }

    public long count(Status status) {
        return points.stream().filter(p -> p.status() == status).count();
    }

    /** True when there is at least one point and every point passed. */
    public boolean allPass() {
        return !points.isEmpty() && count(Status.PASS) == points.size();
    }

    /** The latest site-wide sign-off in a role, if any. */
    public Optional<SignOff> signOff(SignOffRole role) {
        return siteSignOffs.stream().filter(s -> s.role() == role)
                .reduce((a, b) -> b.signedAt().isBefore(a.signedAt()) ? a : b);
    }

    public Optional<Analyzer> analyzer(String tag) {
        return analyzers.stream().filter(a -> a.tag().equals(tag)).findFirst();
    }
}
