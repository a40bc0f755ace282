package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.DecisionRule;
import org.strandbook.store.Workbook;

/**
 * A site's decision rule from the command line. The 95 % coverage and 0.2 dB guard band defaults
 * are design choices; the rule's zones are those of JCGM 106:2012, clause 8.
 */
class DecisionRuleCommandTest {

    @TempDir
    Path dir;

    @Test
    void initTakesTheRuleAndAcceptanceShowsIt() {
        Path file = dir.resolve("site.strandbook");
        CliRun init = CliRun.of("init", file.toString(), "--site-name", "Fennwick Basin Works", "--accept-on", "interval",
                "--coverage", "0.99", "--guard-band-db", "0.3");
        assertEquals(0, init.exitCode(), init.err());
        try (Workbook wb = Workbook.open(file, "x")) {
            assertEquals(new DecisionRule(DecisionRule.Kind.COVERAGE_INTERVAL, 0.99, 0.3), wb.site().decisionRule());
        }
        CliRun shown = CliRun.of("acceptance", file.toString());
        assertEquals(0, shown.exitCode(), shown.err());
        assertTrue(shown.out().startsWith("decision rule: coverage interval: PASS inside the prediction's 99 % coverage"
                + " interval"), shown.out());
        assertTrue(shown.out().contains("guard band of 0.30 dB"), shown.out());
    }

    @Test
    void aBadCoverageLeavesNoWorkbookBehind() {
        Path file = dir.resolve("site.strandbook");
        CliRun r = CliRun.of("init", file.toString(), "--site-name", "Fennwick Basin Works", "--coverage", "1.5");
        assertEquals(1, r.exitCode());
        assertTrue(r.err().contains("coverage probability 1.5 must lie between 0.5 and 1"), r.err());
        assertTrue(Files.notExists(file));
    }

    @Test
    void anUnknownRuleIsRefusedByNameAndChangesNothing() {
        Path file = dir.resolve("site.strandbook");
        assertEquals(0, CliRun.of("init", file.toString(), "--site-name", "Fennwick Basin Works").exitCode());
        CliRun r = CliRun.of("acceptance", file.toString(), "--accept-on", "strict");
        assertEquals(1, r.exitCode());
        assertTrue(r.err().contains("decision rule 'strict' is not known: give fixed or interval"), r.err());
        try (Workbook wb = Workbook.open(file, "x")) {
            assertEquals(DecisionRule.FIXED, wb.site().decisionRule());
        }
    }

    @Test
    void evaluateStatesTheRuleInForceAndEachBandsLimits() {
        Path file = DemoWorkbook.create(dir.resolve("saltmarsh.sqlite"), List.of("AT-4101"), 2);
        CliRun fixed = CliRun.of("evaluate", file.toString(), "--json");
        assertTrue(fixed.out().contains("\"decision_rule\":{\"kind\":\"fixed\""), fixed.out());
        assertTrue(fixed.out().contains("\"measurement_uncertainty_db\":null"), fixed.out());

        CliRun set = CliRun.of("acceptance", file.toString(), "--accept-on", "interval", "--user", "r.inglenook");
        assertEquals(0, set.exitCode(), set.err());
        CliRun json = CliRun.of("evaluate", file.toString(), "--json");
        assertTrue(json.out().contains("\"decision_rule\":{\"kind\":\"interval\",\"name\":\"coverage interval\","
                + "\"coverage\":0.95,\"guard_band_db\":0.2"), json.out());
        for (String field : List.of("\"predicted_low_db\":", "\"predicted_high_db\":", "\"coverage\":0.95",
                "\"measurement_uncertainty_db\":0.", "\"accept_high_db\":", "\"uncertainty_budget\":[{",
                "\"measurement_budget\":[{\"input\":\"detector noise (band mean)\"")) {
            assertTrue(json.out().contains(field), field + " in " + json.out());
        }
        CliRun text = CliRun.of("evaluate", file.toString(), "--point", "AT-4101");
        assertTrue(text.out().contains("Decision rule: coverage interval"), text.out());
        assertTrue(text.out().contains("accepted up to +"), text.out());
    }
}
