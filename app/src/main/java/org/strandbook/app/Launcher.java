package org.strandbook.app;

import java.util.Optional;

import org.strandbook.app.cli.StrandbookCommand;
import org.strandbook.app.ui.workbook.StrandbookWindow;

/**
 * Entry point of the runnable jar: with no arguments it opens the workbook window (the last
 * workbook, or the offer of the sample site), with arguments it runs the command line
 * ({@code strandbook open SITE} opens the window on a given workbook). It must not extend
 * {@code javafx.application.Application}: a shaded jar whose main class does fails with "JavaFX
 * runtime components are missing".
 */
public final class Launcher {

    private Launcher() {
    }

    public static void main(String[] args) {
        if (args.length == 0) {
            System.exit(openWindow());
        }
        System.exit(StrandbookCommand.run(args));
    }

    private static int openWindow() {
        try {
            StrandbookWindow.open(Optional.empty());
            return StrandbookCommand.EXIT_OK;
        } catch (RuntimeException | UnsatisfiedLinkError e) {
            // no display (or no GTK): say so in one line and point to the command line
            System.err.println("strandbook: cannot open the window (" + e.getMessage() + "); run 'strandbook --help' for the command line");
            return StrandbookCommand.EXIT_REJECTED;
        }
    }
}
