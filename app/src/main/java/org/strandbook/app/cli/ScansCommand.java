package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;

import org.strandbook.site.ScanRecord;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code strandbook scans SITE [--point TAG] [--json]}: the stored scans, without their spectra. */
@Command(name = "scans", mixinStandardHelpOptions = true,
        description = "List the scans stored in a workbook, by point and time.")
final class ScansCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--point", paramLabel = "TAG", description = "Only the scans of this measurement point.")
    String point;

    @Option(names = "--json", description = "One JSON object per scan instead of a table.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
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
