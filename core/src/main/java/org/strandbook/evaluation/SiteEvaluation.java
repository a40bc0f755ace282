package org.strandbook.evaluation;

import java.time.Instant;
import java.util.List;

import org.strandbook.site.DecisionRule;
import org.strandbook.site.Site;

/**
 * Every evaluated point of a site, ranked by urgency, with what could not be evaluated.
 *
 * @param site         the site
 * @param evaluatedAt  when the evaluation ran
 * @param pairingRule  the scan pairing rule used, in words
 * @param points       point evaluations, most urgent first
 * @param problems     points that could not be evaluated at all, with the reason
 * @param decisionRule the rule the bands were judged by
 */
public record SiteEvaluation(Site site, Instant evaluatedAt, String pairingRule, List<PointEvaluation> points,
                             List<String> problems, DecisionRule decisionRule) {

    public SiteEvaluation {
        points = List.copyOf(points);
        problems = List.copyOf(problems);
        java.util.Objects.requireNonNull(decisionRule, "decisionRule");
    }

    /** An evaluation under the fixed tolerance. */
    public SiteEvaluation(Site site, Instant evaluatedAt, String pairingRule, List<PointEvaluation> points,
                          List<String> problems) {
        this(site, evaluatedAt, pairingRule, points, problems, DecisionRule.FIXED);
    }

    public long count(Status status) {
        return points.stream().filter(p -> p.status() == status).count();
    }
}
