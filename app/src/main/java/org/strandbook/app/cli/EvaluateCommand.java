package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;

import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.SiteEvaluation;
import org.strandbook.evaluation.SiteEvaluator;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code strandbook evaluate SITE [--point TAG] [--json]}: measured against predicted, per point. */
@Command(name = "evaluate", mixinStandardHelpOptions = true,
        description = {"Compare each point's latest loop scan with its predicted loss: PASS, REVIEW or FAIL per band,",
            "with the diagnosis of what is wrong and the element to check first."})
final class EvaluateCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--point", paramLabel = "TAG", description = "Only this point, with its details.")
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
            out.print(EvaluationText.json(site));
        } else {
            EvaluationText.summary(site, out);
            if (point != null) {
                for (PointEvaluation e : site.points()) {
                    EvaluationText.details(e, out);
                }
            }
        }
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }
}
