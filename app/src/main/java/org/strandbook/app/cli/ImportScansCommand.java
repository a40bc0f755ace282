package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.strandbook.intake.ScanFileImporter;
import org.strandbook.intake.TakenAtRange;
import org.strandbook.scanfile.PrintableName;
import org.strandbook.scanfile.SpectrumFiles;
import org.strandbook.site.ScanKind;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook import-scans SITE --point TAG --kind loop|reference|dark FILES...}: each file
 * is stored whole or not at all; bad files are listed with {@code file:line: what is wrong}.
 * Exit 0 when every file was stored, 1 when any was rejected.
 */
@Command(name = "import-scans", mixinStandardHelpOptions = true,
        description = "Import spectrum files (JCAMP-DX, or comma/semicolon/tab-separated text) for one point. "
            + "The time taken comes from the file (JCAMP-DX ##LONGDATE, or a '# taken_at:' line), else "
            + "from --taken-at, else from the file's modification time (said in the summary).")
final class ImportScansCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--point", required = true, paramLabel = "TAG", description = "The measurement point.")
    String point;

    @Option(names = "--kind", required = true, paramLabel = "KIND",
            description = "What the scans are: loop, reference or dark.")
    String kind;

    @Option(names = "--taken-at", paramLabel = "TIME",
            description = "Time taken for every file, ISO-8601 (e.g. 2026-03-01T09:30:00Z); overrides the files.")
    String takenAt;

    @Option(names = "--block", paramLabel = "N",
            description = "For multi-block JCAMP-DX files holding several optical spectra: import block N "
                + "(1, 2, ... in file order, as the refusal lists them).")
    Integer block;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "FILES", description = "The spectrum files.")
    List<Path> files;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        ScanKind scanKind;
        try {
            scanKind = ScanKind.fromWord(kind);
        } catch (IllegalArgumentException e) {
            throw new UsageProblem(e.getMessage());
        }
        Optional<Instant> time = Optional.empty();
        if (takenAt != null) {
            try {
                time = Optional.of(Instant.parse(takenAt));
            } catch (DateTimeParseException e) {
                throw new UsageProblem("--taken-at '" + takenAt + "' is not an ISO-8601 instant such as 2026-03-01T09:30:00Z");
            }
            Optional<String> problem = TakenAtRange.problem(time.get(), Instant.now());
            if (problem.isPresent()) {
                throw new UsageProblem("--taken-at: " + problem.get().replace("; give the time with --taken-at", ""));
            }
        }
        if (block != null && block < 1) {
            throw new UsageProblem("--block " + block + ": blocks are numbered from 1");
        }
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        ScanFileImporter.Summary summary;
        try (Workbook wb = workbook.open()) {
            ScanFileImporter.Progress progress = files.size() < 20 ? ScanFileImporter.Progress.NONE
                    : (done, total, file) -> {
                        if (done % 10 == 0 || done == total) {
                            err.printf(java.util.Locale.ROOT, "\rimporting: %d of %d files", done, total);
                            if (done == total) {
                                err.println();
                            }
                            err.flush();
                        }
                        return true;
                    };
            if (wb.points().get(point).map(p -> p.hazardousArea()).orElse(false)) {
                // before the scans are read: the person at the point may still be taking them
                FieldCautions.hazardousPoint(err, point);
            }
            summary = new ScanFileImporter().importFiles(wb,
                    new ScanFileImporter.Request(point, scanKind, files, time, workbook.user(),
                            block == null ? SpectrumFiles.WHOLE_FILE : block), progress);
        }
        for (ScanFileImporter.Accepted a : summary.accepted()) {
            out.printf(java.util.Locale.ROOT, "stored   %s as scan %d, taken %s (%s)%n",
                    PrintableName.of(a.file().toString()), a.scanId(), a.takenAt(), a.timeSource());
            for (String note : a.tolerated()) {
                out.println("         tolerated: " + note);
            }
        }
        // refusals are errors: standard error, as every command's problems are, so that a script
        // reading the summary from standard output sees only what was stored
        for (ScanFileImporter.Rejected r : summary.rejected()) {
            err.println("rejected " + r.reason());
        }
        err.flush();
        out.printf(java.util.Locale.ROOT, "%d accepted, %d rejected (point %s, %s scans)%n", summary.accepted().size(),
                summary.rejected().size(), point, scanKind.word());
        out.flush();
        return summary.rejected().isEmpty() ? StrandbookCommand.EXIT_OK : StrandbookCommand.EXIT_REJECTED;
    }
}
