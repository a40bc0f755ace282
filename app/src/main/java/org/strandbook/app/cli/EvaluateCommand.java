package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.SiteEvaluation;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code strandbook evaluate SITE [--point TAG] [--json]}: measured against predicted, per point. */
@Command(name = "evaluate", mixinStandardHelpOptions = true,
        description = "Compare each point's latest loop scan with its predicted loss: PASS, REVIEW or FAIL per "
            + "band, with the diagnosis of what is wrong and the element to check first.")
final class EvaluateCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Mixin
    PointSelection selection;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        SiteEvaluation site = selection.evaluate(workbook);
        PrintWriter out = spec.commandLine().getOut();
        if (selection.json) {
            out.print(EvaluationText.json(site));
        } else {
            EvaluationText.summary(site, out);
            if (selection.point != null) {
                for (PointEvaluation e : site.points()) {
                    EvaluationText.details(e, out);
                }
            }
        }
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }
}
