package org.strandbook.app.cli;

import org.strandbook.site.DecisionRule;

import picocli.CommandLine.Option;

/**
 * The options that set a site's decision rule, on {@code init} and {@code acceptance}; mix in with
 * {@code @Mixin}. An option not given keeps what the rule already says.
 */
final class DecisionRuleOptions {

    @Option(names = "--accept-on", paramLabel = "fixed|interval",
            description = "The decision rule: fixed (a band may lose its tolerance more than predicted; the default)"
                + " or interval (the prediction's coverage interval widened by the measurement's own uncertainty,"
                + " with a guard band).")
    String kind;

    @Option(names = "--coverage", paramLabel = "P",
            description = "Coverage probability of the intervals, between 0.5 and 1 (default 0.95).")
    Double coverage;

    @Option(names = "--guard-band-db", paramLabel = "DB",
            description = "Guard band beyond the widened interval, in which a band is REVIEW (dB, default 0.2).")
    Double guardBandDb;

    boolean anyGiven() {
        return kind != null || coverage != null || guardBandDb != null;
    }

    /** {@code current} with the options given applied; a bad value is a rejected input (exit 1). */
    DecisionRule applyTo(DecisionRule current) {
        DecisionRule rule = current;
        if (kind != null) {
            rule = rule.withKind(DecisionRule.Kind.ofCode(kind));
        }
        if (coverage != null) {
            rule = rule.withCoverage(coverage);
        }
        if (guardBandDb != null) {
            rule = rule.withGuardBandDb(guardBandDb);
        }
        return rule;
    }
}
