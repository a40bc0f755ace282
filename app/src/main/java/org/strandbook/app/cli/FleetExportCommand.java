package org.strandbook.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.concurrent.Callable;

import org.strandbook.dossier.FleetSpreadsheet;
import org.strandbook.server.FleetView;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code strandbook fleet export --server URL -o FILE.xlsx}: the fleet view as a spreadsheet. */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = "Write the fleet view (sites, urgency ranking, status changes) as an XLSX file.")
final class FleetExportCommand implements Callable<Integer> {

    @Mixin
    ServerOptions serverOptions;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "FILE.xlsx", description = "The file to write.")
    Path output;

    @Option(names = "--since", paramLabel = "DATE", description = "Also list the points whose status changed since DATE.")
    String since;

    @Option(names = "--replace", description = "Replace an existing file (never a workbook).")
    boolean replace;

    @Spec
    CommandSpec spec;

    @ParentCommand
    FleetCommand fleetCommand;

    @Override
    public Integer call() throws IOException {
        Instant from = since == null ? null : FieldTime.since("--since", since);
        FleetView.Fleet fleet = FleetView.read(serverOptions.connect(fleetCommand.serverOptions), from);
        FleetSpreadsheet.write(fleet, output, replace);
        spec.commandLine().getOut().println("fleet written to " + output + ": " + fleet.sites().size() + " site(s), "
                + fleet.ranking().size() + " point(s)");
        spec.commandLine().getOut().flush();
        return StrandbookCommand.EXIT_OK;
    }
}
