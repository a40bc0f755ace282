package org.strandbook.app.cli;

import picocli.CommandLine.Command;

/** {@code strandbook audit ...}: work on a workbook's audit trail. */
@Command(name = "audit", mixinStandardHelpOptions = true,
        description = "Work on a workbook's audit trail, or on a site's on the plant server.",
        subcommands = {AuditVerifyCommand.class, AuditVerifyServerCommand.class})
final class AuditCommand implements Runnable {

    @Override
    public void run() {
        throw new UsageProblem("audit needs a subcommand: verify or verify-server");
    }
}
