package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.strandbook.site.DecisionRule;

/**
 * The dossier states the decision rule in force in the terms of the documents that define them:
 * ILAC-G8:09/2019 (simple acceptance, w = 0; decision rules with a guard band) and JCGM 106:2012,
 * clause 8 (acceptance zone, guard band, rejection zone).
 */
class DecisionRuleStatementTest {

    @Test
    void theFixedToleranceIsNamedASimpleAcceptanceRule() {
        String text = DossierText.decisionRule(DecisionRule.FIXED, 1.0);
        for (String must : List.of("simple acceptance", "ILAC-G8:09/2019", "w = 0", "not taken into account",
                "1.00 dB")) {
            assertTrue(text.contains(must), must + " in: " + text);
        }
    }

    @Test
    void theCoverageIntervalNamesItsZonesGuardBandAndCoverage() {
        String text = DossierText.decisionRule(new DecisionRule(DecisionRule.Kind.COVERAGE_INTERVAL, 0.99, 0.3), 1.0);
        for (String must : List.of("ILAC-G8:09/2019", "JCGM 106:2012", "acceptance zone", "guard band w = 0.30 dB",
                "rejection zone", "99 % coverage interval", "JCGM 101:2008", "expanded uncertainty", "20 nm")) {
            assertTrue(text.contains(must), must + " in: " + text);
        }
    }
}
