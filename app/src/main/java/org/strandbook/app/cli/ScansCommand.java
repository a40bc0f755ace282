package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.strandbook.site.ScanRecord;
import org.strandbook.store.UnknownEntryException;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook scans SITE [--point TAG] [--json]}: the stored scans, without their spectra;
 * {@code --remove ID} takes out a wrong import.
 */
@Command(name = "scans", mixinStandardHelpOptions = true,
        description = {"List the scans stored in a workbook, by point and time.",
            "--remove takes one scan out (a wrong import), recorded in the audit trail; a synced workbook's next"
                + " sync removes it from the site's other workbooks too (the plant server keeps it, marked removed)."})
final class ScansCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--point", paramLabel = "TAG", description = "Only the scans of this measurement point.")
    String point;

    @Option(names = "--json", description = "One JSON object per scan instead of a table.")
    boolean json;

    @Option(names = "--remove", paramLabel = "ID",
            description = "Remove the scan with this id (the first column of the listing) from the workbook.")
    Long remove;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (remove != null) {
            ScanRecord gone;
            try (Workbook wb = workbook.open()) {
                gone = wb.scans().get(remove).orElseThrow(() -> new UnknownEntryException("no scan with id " + remove
                        + " in " + workbook.file() + "; `strandbook scans " + workbook.file() + "` lists them"));
                wb.scans().delete(gone.id());
            }
            PrintWriter out = spec.commandLine().getOut();
            out.println("removed the " + gone.kind().name().toLowerCase(Locale.ROOT) + " scan of " + gone.pointTag() + " taken " + gone.takenAt()
                    + " (" + gone.sourceFile() + ") from " + workbook.file());
            out.flush();
            return StrandbookCommand.EXIT_OK;
        }
        List<ScanRecord> scans;
        try (Workbook wb = workbook.openForReading()) {
            scans = point == null ? wb.scans().listAll() : wb.scans().list(point);
        }
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.print(ScanListing.json(scans));
        } else if (scans.isEmpty()) {
            out.println(point == null ? "no scans in " + workbook.file() : "no scans for point " + point);
        } else {
            out.print(ScanListing.table(scans));
        }
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }
}
