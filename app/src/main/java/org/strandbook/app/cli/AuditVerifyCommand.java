package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;

import org.strandbook.store.AuditFinding;
import org.strandbook.store.AuditReport;
import org.strandbook.store.SignatureState;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook audit verify SITE}: checks the hash chain and that every data row is as the trail
 * last recorded it. Exit 0 with the row count and head hash when whole, else exit 1 with the first
 * broken link and the rows changed behind Strandbook's back.
 */
@Command(name = "verify", mixinStandardHelpOptions = true,
        description = "Check the audit trail: its hash chain, and that every data row is as the trail last "
            + "recorded it; then every signature: one whose record disagrees with the trail it names is reported "
            + "as tampered (exit 1), one whose point or revision changed since as superseded. Note the head hash "
            + "it prints in a signed record: it pins the trail's end.")
final class AuditVerifyCommand implements Callable<Integer> {

    private static final int FINDINGS_SHOWN = 20;

    @Mixin
    WorkbookFileOptions workbook;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        AuditReport report;
        List<SignatureState> signatures;
        try (Workbook wb = workbook.openForReading()) {
            report = wb.audit().verify();
            signatures = wb.signOffs().states();
        }
        PrintWriter out = spec.commandLine().getOut();
        List<SignatureState> tampered = signatures.stream()
                .filter(s -> s.standing() == SignatureState.Standing.TAMPERED).toList();
        for (SignatureState s : signatures) {
            if (s.standing() == SignatureState.Standing.SUPERSEDED || s.standing() == SignatureState.Standing.TAMPERED
                    || s.standing() == SignatureState.Standing.SIGNED_ELSEWHERE) {
                out.println("signature " + s.describe() + ": "
                        + s.standing().name().replace('_', ' ').toLowerCase(java.util.Locale.ROOT) + ", " + s.why());
            }
        }
        if (report.intact() && tampered.isEmpty()) {
            out.println("audit trail OK: " + report.rows() + " rows, head " + report.headHash());
            out.flush();
            return StrandbookCommand.EXIT_OK;
        }
        printFindings(report, out);
        int problems = (report.chainBreak().isPresent() ? 1 : 0) + report.unrecordedChanges().size() + tampered.size();
        spec.commandLine().getErr().println("strandbook: audit trail of " + workbook.file() + " is broken ("
                + problems + " finding(s), " + report.rows() + " rows read)");
        return StrandbookCommand.EXIT_REJECTED;
    }

    /** The first broken link and the first rows changed behind the trail's back, a line each. */
    static void printFindings(AuditReport report, PrintWriter out) {
        report.chainBreak().ifPresent(f -> out.println(f.message()));
        List<AuditFinding> changes = report.unrecordedChanges();
        changes.stream().limit(FINDINGS_SHOWN).forEach(f -> out.println(f.message()));
        if (changes.size() > FINDINGS_SHOWN) {
            out.println("... and " + (changes.size() - FINDINGS_SHOWN) + " more records changed behind the trail");
        }
        out.flush();
    }
}
