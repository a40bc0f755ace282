package org.strandbook.app.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.strandbook.app.ui.workbook.StrandbookWindow;

import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code strandbook open SITE}: the workbook window on one workbook. */
@Command(name = "open", mixinStandardHelpOptions = true,
        description = "Open the workbook window on SITE (a display is needed). Without a command, 'strandbook' "
            + "opens the window on the last workbook or offers the sample site.")
final class OpenCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SITE", description = "The site's workbook file.")
    Path file;

    @Override
    public Integer call() {
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException("no workbook at " + file);
        }
        try {
            StrandbookWindow.open(Optional.of(file));
        } catch (RuntimeException | UnsatisfiedLinkError e) {
            // no display (or no GTK): one line, and where to turn instead
            throw new IllegalStateException("cannot open the window (" + e.getMessage()
                    + "); run 'strandbook --help' for the command line", e);
        }
        return StrandbookCommand.EXIT_OK;
    }
}
