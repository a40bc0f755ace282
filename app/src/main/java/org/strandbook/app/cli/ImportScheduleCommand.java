package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.strandbook.intake.ScheduleImporter;
import org.strandbook.schedule.ScheduleProblem;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook import-schedule SITE FILE.xlsx}: validates every row first and lists every
 * problem as {@code Sheet!Cell: what is wrong}; writes only a clean schedule, in one transaction.
 */
@Command(name = "import-schedule", mixinStandardHelpOptions = true,
        description = "Import a filled cable-schedule XLSX (the template ships in the templates module). "
            + "Nothing is written unless every row is valid.")
final class ImportScheduleCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Parameters(index = "1", paramLabel = "FILE.xlsx", description = "The filled cable schedule.")
    Path schedule;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        ScheduleImporter.Outcome outcome;
        try (Workbook wb = workbook.open()) {
            outcome = new ScheduleImporter().importFile(wb, schedule);
        }
        PrintWriter out = spec.commandLine().getOut();
        if (!outcome.written()) {
            // a rejected schedule is an error: its problems go where errors go, standard error
            PrintWriter err = spec.commandLine().getErr();
            for (ScheduleProblem p : outcome.problems()) {
                err.println(schedule.getFileName() + ": " + p);
            }
            err.printf(java.util.Locale.ROOT, "%d problem%s; nothing was written%n", outcome.problems().size(),
                    outcome.problems().size() == 1 ? "" : "s");
            err.flush();
            return StrandbookCommand.EXIT_REJECTED;
        }
        out.printf(java.util.Locale.ROOT, "imported %s: %d analyzers, %d points, %d legs, %d catalog entries%n",
                schedule.getFileName(), outcome.analyzers(), outcome.points(), outcome.legs(), outcome.catalogEntries());
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }
}
