package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

import org.strandbook.site.DecisionRule;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook acceptance SITE [--accept-on fixed|interval] [--coverage P] [--guard-band-db DB]}:
 * shows the site's decision rule, or changes it (audited).
 */
@Command(name = "acceptance", mixinStandardHelpOptions = true,
        description = "Show the site's decision rule (how a measured loss is accepted against its prediction), or "
            + "change it with the options below; every change lands in the audit trail.")
final class AcceptanceCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Mixin
    DecisionRuleOptions options;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        if (!options.anyGiven()) {
            try (Workbook wb = workbook.openForReading()) {
                out.println("decision rule: " + wb.site().decisionRule().describe(wb.site().get().defaultToleranceDb()));
            }
        } else {
            try (Workbook wb = workbook.open()) {
                DecisionRule rule = options.applyTo(wb.site().decisionRule());
                wb.site().setDecisionRule(rule);
                out.println("decision rule set: " + rule.describe(wb.site().get().defaultToleranceDb()));
            }
        }
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }
}
