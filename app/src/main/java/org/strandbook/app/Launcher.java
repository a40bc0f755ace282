package org.strandbook.app;

import org.strandbook.app.cli.StrandbookCommand;

/**
 * Entry point of the runnable jar. It must not extend {@code javafx.application.Application}:
 * a shaded jar whose main class does fails with "JavaFX runtime components are missing".
 */
public final class Launcher {

    private Launcher() {
    }

    public static void main(String[] args) {
        System.exit(StrandbookCommand.run(args));
    }
}
