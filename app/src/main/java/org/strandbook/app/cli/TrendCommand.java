package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;

import org.strandbook.evaluation.SiteEvaluation;
import org.strandbook.evaluation.SiteEvaluator;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code strandbook trend SITE [--point TAG] [--json]}: loss over time and when margins run out. */
@Command(name = "trend", mixinStandardHelpOptions = true,
        description = {"Loss history per point and band: Theil-Sen slope with its 95 % interval, step changes,",
            "and the date the margin to the analyzer's allowed loss runs out; points ranked by urgency."})
final class TrendCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--point", paramLabel = "TAG", description = "Only this point.")
    String point;

    @Option(names = "--json", description = "JSON (fields listed in the README) instead of a table.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        SiteEvaluation site;
        try (Workbook wb = workbook.open()) {
            site = SiteEvaluator.withDefaults().evaluate(wb, point == null ? List.of() : List.of(point),
                    SiteEvaluator.Progress.NONE);
        }
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.print(EvaluationText.trendJson(site));
        } else {
            EvaluationText.trendTable(site, out);
        }
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }
}
