package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;

import org.strandbook.evaluation.SiteEvaluation;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code strandbook trend SITE [--point TAG] [--json]}: loss over time and when margins run out. */
@Command(name = "trend", mixinStandardHelpOptions = true,
        description = "Loss history per point and band: Theil-Sen slope with its 95 %% interval, step changes, "
            + "and the date the margin to the analyzer's allowed loss runs out; points ranked by "
            + "urgency.")
final class TrendCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Mixin
    PointSelection selection;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        SiteEvaluation site = selection.evaluate(workbook);
        List<MaintenanceAction> actions;
        try (Workbook wb = workbook.open()) {
            actions = wb.maintenance().listAll();
        }
        PrintWriter out = spec.commandLine().getOut();
        if (selection.json) {
            out.print(EvaluationText.trendJson(site, actions));
        } else {
            EvaluationText.trendTable(site, actions, out);
        }
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }
}
