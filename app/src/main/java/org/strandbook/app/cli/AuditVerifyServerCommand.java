package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

import org.strandbook.server.ServerAuditCheck;
import org.strandbook.store.AuditReport;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook audit verify-server --server URL --site NAME}: the workbook's {@code audit verify}
 * for a site's trail on the plant server, every hash recomputed on this machine.
 */
@Command(name = "verify-server", mixinStandardHelpOptions = true,
        description = "Check a site's audit trail on the plant server, every hash recomputed here rather than by the "
            + "server: the chain from its first row, each batch of scans and other records against the SHA-256 it "
            + "recorded, and every record against the trail's last word on it. Exit 1 with what differs.")
final class AuditVerifyServerCommand implements Callable<Integer> {

    @Mixin
    ServerOptions serverOptions;

    @Option(names = "--site", required = true, paramLabel = "NAME", description = "The site, as the server names it.")
    String site;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        AuditReport report = ServerAuditCheck.verify(serverOptions.connect(), site);
        PrintWriter out = spec.commandLine().getOut();
        if (report.intact()) {
            out.println("server audit trail of site \"" + site + "\" OK: " + report.rows() + " rows, head "
                    + report.headHash());
            out.flush();
            return StrandbookCommand.EXIT_OK;
        }
        AuditVerifyCommand.printFindings(report, out);
        spec.commandLine().getErr().println("strandbook: the server's audit trail of site \"" + site + "\" is broken ("
                + ((report.chainBreak().isPresent() ? 1 : 0) + report.unrecordedChanges().size()) + " finding(s), "
                + report.rows() + " rows read)");
        return StrandbookCommand.EXIT_REJECTED;
    }
}
