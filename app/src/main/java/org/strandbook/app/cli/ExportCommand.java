package org.strandbook.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.strandbook.dossier.DossierContent;
import org.strandbook.dossier.DossierProgress;
import org.strandbook.dossier.DossierScope;
import org.strandbook.dossier.DossierSummary;
import org.strandbook.dossier.DossierWriter;
import org.strandbook.dossier.WorkbookDossier;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.evaluation.Status;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook export SITE -o FILE.xlsx}: the commissioning dossier of a workbook. Refuses to
 * replace an existing file unless told to; writes nothing at all when anything fails.
 */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = "Write the commissioning dossier of a workbook: an XLSX file filled from the dossier "
            + "template, with the status of every point and band, findings, point register, cable "
            + "schedule, loss budgets, measured-against-predicted and trend charts, the cautions and "
            + "method, and the audit log.")
final class ExportCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "FILE.xlsx",
            description = "The dossier file to write.")
    Path output;

    @Option(names = "--points", split = ",", paramLabel = "TAGS",
            description = "Only these points, comma-separated (default: every point).")
    List<String> points = new ArrayList<>();

    @Option(names = "--from", paramLabel = "DATE",
            description = "Only scans taken on or after this day, UTC (yyyy-mm-dd).")
    LocalDate from;

    @Option(names = "--to", paramLabel = "DATE",
            description = "Only scans taken on or before this day, UTC (yyyy-mm-dd).")
    LocalDate to;

    @Option(names = "--template", paramLabel = "FILE.xlsx",
            description = "A plant's own copy of the dossier template (default: the shipped one).")
    Path template;

    @Option(names = "--replace", description = "Replace FILE.xlsx if it exists (default: refuse).")
    boolean replace;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        if (!output.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".xlsx")) {
            throw new UsageProblem("the dossier is an XLSX file: give -o a name ending in .xlsx, not " + output);
        }
        if (from != null && to != null && from.isAfter(to)) {
            throw new UsageProblem("--from " + from + " is after --to " + to);
        }
        if (!replace && Files.exists(output)) {
            throw new IllegalArgumentException("a file already exists at " + output + "; add --replace to replace it");
        }
        if (replace) {
            DossierWriter.requireReplaceable(output);
        }
        if (template != null && !Files.isRegularFile(template)) {
            throw new IllegalArgumentException("no dossier template at " + template);
        }
        DossierScope scope = new DossierScope(points, Optional.ofNullable(from), Optional.ofNullable(to));
        DossierWriter writer = template == null ? DossierWriter.withShippedTemplate()
                : DossierWriter.withTemplate(template);
        PrintWriter err = spec.commandLine().getErr();
        DossierProgress progress = System.console() == null ? DossierProgress.NONE : new ConsoleProgress(err);
        DossierContent content;
        DossierSummary summary;
        try (Workbook wb = workbook.openForReading()) {
            content = WorkbookDossier.read(wb, scope, PointEvaluator.withDefaults(), Instant.now(),
                    new StrandbookVersion().getVersion()[0], progress);
            summary = writer.write(content, output, replace, progress);
        } catch (FileAlreadyExistsException e) {
            throw new IllegalArgumentException("a file appeared at " + output + " while the dossier was written; it"
                    + " was left as it is", e);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        PrintWriter out = spec.commandLine().getOut();
        out.printf(Locale.ROOT, "wrote dossier %s: %d point(s): %d %s, %d %s, %d %s; %d sheets, %d charts;"
                        + " revision %s, audit head %s%n", output, content.points().size(),
                content.count(Status.PASS), Status.PASS.label(), content.count(Status.REVIEW), Status.REVIEW.label(),
                content.count(Status.FAIL), Status.FAIL.label(), summary.sheets(), summary.charts(),
                content.site().revision(), content.audit().headHash());
        out.flush();
        if (!content.audit().intact()) {
            err.println("strandbook: warning: the audit trail of " + workbook.file() + " is broken; the dossier says so"
                    + " on its cover (run 'strandbook audit verify')");
        }
        return StrandbookCommand.EXIT_OK;
    }

    /** One line per second at most on standard error, for a person watching a terminal. */
    private static final class ConsoleProgress implements DossierProgress {

        private final PrintWriter err;
        private long lastNanos;

        ConsoleProgress(PrintWriter err) {
            this.err = err;
        }

        @Override
        public boolean advance(String stage, int done, int total) {
            long now = System.nanoTime();
            if (now - lastNanos > 1_000_000_000L || done == total) {
                err.printf(Locale.ROOT, "export: %s (%d of %d)%n", stage, done, total);
                err.flush();
                lastNanos = now;
            }
            return true;
        }
    }
}
