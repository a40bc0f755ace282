package org.strandbook.app.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.strandbook.server.SiteClone;
import org.strandbook.server.SiteSync;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code strandbook clone --server URL --site NAME FILE}: a new workbook holding a site from the plant server. */
@Command(name = "clone", mixinStandardHelpOptions = true,
        description = "Start a laptop from the plant server: a new workbook FILE holding everything the server has "
            + "of one site, ready to `sync`. Never overwrites a file.")
final class CloneCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FILE", description = "The new workbook file.")
    Path file;

    @Option(names = "--site", required = true, paramLabel = "NAME", description = "The site's name on the server.")
    String site;

    @Option(names = "--user", paramLabel = "NAME",
            description = "Name the audit trail records for changes (default: your login name).")
    String user;

    @Mixin
    ServerOptions serverOptions;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        SiteSync.Outcome o = SiteClone.run(serverOptions.connect(), site, file, WorkbookFileOptions.userOrLogin(user),
                new ServerProgress(spec.commandLine().getErr()));
        spec.commandLine().getOut().println(String.format(Locale.ROOT, "cloned site \"%s\" into %s: %d record(s)",
                site, file, o.pulled() + o.changedHere()));
        spec.commandLine().getOut().flush();
        return StrandbookCommand.EXIT_OK;
    }
}
