package org.strandbook.app.cli;

import java.util.concurrent.Callable;

import org.strandbook.store.WithdrawnRecord;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook withdraw SITE --point TAG}: takes back the inspection, maintenance action or note
 * entered last at a point, as the History tab's undo does.
 */
@Command(name = "withdraw", mixinStandardHelpOptions = true,
        description = "Withdraw the inspection, maintenance action or note entered last at a point (a replacement "
            + "it recorded is undone too). The audit trail keeps the record and who withdrew it (--user). A record "
            + "that a later point or site signature covers is refused: record a correcting entry instead.")
final class WithdrawCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--point", required = true, paramLabel = "TAG", description = "The measurement point.")
    String point;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        WithdrawnRecord withdrawn;
        try (Workbook wb = workbook.open()) {
            withdrawn = wb.withdrawal().withdrawLatest(point);
        }
        spec.commandLine().getOut().println("withdrawn: " + withdrawn.description()
                + (withdrawn.pathRestored() ? "; the path and probe are as they were before it" : ""));
        spec.commandLine().getOut().flush();
        return StrandbookCommand.EXIT_OK;
    }
}
