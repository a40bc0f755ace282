package org.strandbook.app.cli;

import java.util.concurrent.Callable;

import org.strandbook.schedule.ComponentCatalog;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.Site;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code strandbook init SITE --site-name NAME}: a new, empty workbook for one site. Never overwrites a file. */
@Command(name = "init", mixinStandardHelpOptions = true,
        description = "Create a new workbook for one site. An existing file is never overwritten.")
final class InitCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--site-name", required = true, paramLabel = "NAME",
            description = "The site's name as the plant writes it.")
    String siteName;

    @Option(names = "--plant-area", paramLabel = "AREA", defaultValue = "", description = "Plant area or unit.")
    String plantArea;

    @Mixin
    DecisionRuleOptions rule;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Site site = new Site(siteName, plantArea, "A", Site.COMMON_PRACTICE_TOLERANCE_DB);
        // checked before the file exists, so a bad option leaves nothing behind
        DecisionRule decisionRule = rule.applyTo(DecisionRule.FIXED);
        try (Workbook wb = Workbook.create(workbook.file(), site, workbook.user())) {
            ComponentCatalog shipped = ComponentCatalog.shipped();
            wb.inTransaction(() -> {
                shipped.fiberTypes().forEach(wb.catalog()::addFiberType);
                shipped.connectorTypes().forEach(wb.catalog()::addConnectorType);
                shipped.probeTypes().forEach(wb.catalog()::addProbeType);
                if (rule.anyGiven()) {
                    wb.site().setDecisionRule(decisionRule);
                }
            });
            spec.commandLine().getOut().println("created workbook " + workbook.file() + " for site " + site.name()
                    + " (schema " + wb.schemaVersion() + ", default tolerance " + site.defaultToleranceDb() + " dB, "
                    + (shipped.fiberTypes().size() + shipped.connectorTypes().size() + shipped.probeTypes().size())
                    + " catalog entries from the shipped catalogs)");
            spec.commandLine().getOut().println("decision rule: " + decisionRule.describe(site.defaultToleranceDb()));
        }
        return StrandbookCommand.EXIT_OK;
    }
}
