package org.strandbook.app.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.strandbook.app.cli.CliRun;

class BenchCommandTest {

    @Test
    void opticsBenchEndsWithTheRatioLine() {
        // every bench prints `ratio: R` last (Strandbook benchmark rule); tiny run, no speed asserted
        CliRun run = CliRun.of("bench", "optics", "--paths", "5", "--trial-ms", "5");
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = run.out().lines().toList();
        assertTrue(lines.get(lines.size() - 1).matches("ratio: \\d+\\.\\d\\d"), run.out());
    }

    @Test
    void editBenchEndsWithTheRatioLine() {
        // the window's work per typed cell against the bare budget; tiny run, no speed asserted
        CliRun run = CliRun.of("bench", "edit", "--trial-ms", "5");
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = run.out().lines().toList();
        assertTrue(lines.get(lines.size() - 1).matches("ratio: \\d+\\.\\d\\d"), run.out());
    }

    @Test
    void exportBenchMeasuresItsFloorAndEndsWithTheRatioLine() {
        // tiny run: the bench's shape, not its speed
        CliRun run = CliRun.of("bench", "export", "--points", "2", "--scans", "3", "--wavelengths", "40",
                "--trials", "1");
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = run.out().lines().toList();
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("floor   N=2 ")), run.out());
        assertTrue(lines.get(lines.size() - 1).matches("ratio: \\d+\\.\\d{3}"), run.out());
    }

    @Test
    void importBenchTimesEveryTrialAndEndsWithTheRatioLine() {
        // tiny run: the bench's shape (a line per trial, the first marked cold), not its speed
        CliRun run = CliRun.of("bench", "import", "--files", "3", "--trials", "2");
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = run.out().lines().toList();
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("trial 1 (cold): import ")), run.out());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("trial 2: import ")), run.out());
        assertTrue(lines.get(lines.size() - 1).matches("ratio: \\d+\\.\\d\\d"), run.out());
    }

    @Test
    void evaluateBenchWithUncertaintyComparesTheTwoRulesAndEndsWithTheRatioLine() {
        // tiny run: plain and with-interval times printed, the ratio last; no speed asserted
        CliRun run = CliRun.of("bench", "evaluate", "--uncertainty", "--points", "2", "--scans", "2");
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = run.out().lines().toList();
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("plain: ")), run.out());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("with interval: ")), run.out());
        assertTrue(lines.get(lines.size() - 1).matches("ratio: \\d+\\.\\d{3}"), run.out());
    }

    @Test
    void benchWithoutABenchmarkIsWrongUsage() {
        // a parent command needs a subcommand
        CliRun run = CliRun.of("bench");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("optics"), run.err());
    }
}
