package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;

import org.strandbook.diagnosis.Cause;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.Status;
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
        fieldCaution(site, spec.commandLine().getErr());
        return StrandbookCommand.EXIT_OK;
    }

    /**
     * Once per run, when a finding sends someone to open joints, junction boxes or the probe: every
     * failing point, and every point under review whose first suspect is in the field rather than
     * the reference scan.
     */
    static void fieldCaution(SiteEvaluation site, PrintWriter err) {
        List<PointEvaluation> field = site.points().stream().filter(EvaluateCommand::sendsIntoTheField).toList();
        if (field.isEmpty()) {
            return;
        }
        List<String> hazardous = field.stream().filter(e -> e.point().hazardousArea()).map(e -> e.point().tag()).toList();
        FieldCautions.fieldWork(err, "the findings for " + String.join(", ", field.stream().map(e -> e.point().tag())
                .toList()) + " send someone to the fiber path in the field"
                + (hazardous.isEmpty() ? "." : "; " + String.join(", ", hazardous) + (hazardous.size() == 1 ? " lies" : " lie")
                        + " in a classified hazardous area."));
    }

    private static boolean sendsIntoTheField(PointEvaluation e) {
        if (e.status() == Status.PASS || e.diagnosis().isEmpty()) {
            return false;
        }
        return e.diagnosis().get().first().map(f -> f.cause() != Cause.REFERENCE_DRIFT).orElse(false);
    }
}
