package org.strandbook.app.cli;

import java.util.Locale;
import java.util.concurrent.Callable;

import org.strandbook.handover.PointSigning;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook sign SITE [--point TAG] --role ROLE --name NAME}: signs a point, or the site
 * record (the dossier revision), keeping a digest of what was signed.
 */
@Command(name = "sign", mixinStandardHelpOptions = true,
        description = "Sign a point (--point) or the site record, i.e. the dossier revision, as prepared, checked "
            + "or approved. The signature keeps a digest of what it signed (a point's evaluation inputs, or the "
            + "audit trail's head); a later change shows it as superseded, and signing a changed revision opens "
            + "the next revision letter. A point is signed only once it has been evaluated.")
final class SignCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--point", paramLabel = "TAG", description = "The point signed (default: the site record).")
    String point;

    @Option(names = "--role", required = true, paramLabel = "ROLE", description = "prepared, checked or approved.")
    String role;

    @Option(names = "--name", required = true, paramLabel = "NAME", description = "The signer's name.")
    String name;

    @Option(names = "--title", paramLabel = "TEXT", description = "The signer's job title, e.g. commissioning lead.")
    String title;

    @Option(names = "--comment", paramLabel = "TEXT", description = "An optional comment.")
    String comment;

    @Mixin
    RecordTimeOption at;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        SignOffRole r = parseRole(role);
        SignOff signOff = new SignOff(r, name, at.instant(), point, comment, title, "", "");
        String revision;
        try (Workbook wb = workbook.open()) {
            PointSigning.sign(wb, signOff);
            revision = wb.site().get().revision();
        }
        spec.commandLine().getOut().println("signed: " + r.name().toLowerCase(Locale.ROOT) + " by "
                + signOff.name() + (point == null ? ", site record" : ", point " + signOff.pointTag())
                + ", revision " + revision);
        spec.commandLine().getOut().flush();
        return StrandbookCommand.EXIT_OK;
    }

    private static SignOffRole parseRole(String text) {
        for (SignOffRole r : SignOffRole.values()) {
            if (r.name().equalsIgnoreCase(text == null ? "" : text.strip())) {
                return r;
            }
        }
        throw new UsageProblem("--role '" + text + "' is not one of prepared, checked, approved");
    }
}
