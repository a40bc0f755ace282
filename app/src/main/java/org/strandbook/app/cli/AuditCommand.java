package org.strandbook.app.cli;

import picocli.CommandLine.Command;

/** {@code strandbook audit ...}: work on a workbook's audit trail. */
@Command(name = "audit", mixinStandardHelpOptions = true,
        description = "Work on a workbook's audit trail.",
        subcommands = AuditVerifyCommand.class)
final class AuditCommand implements Runnable {

    @Override
    public void run() {
        throw new UsageProblem("audit needs a subcommand: verify");
    }
}
