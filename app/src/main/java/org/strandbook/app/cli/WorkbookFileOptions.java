package org.strandbook.app.cli;

import java.nio.file.Path;

import org.strandbook.store.Workbook;

import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * The SITE argument and {@code --user} option of every command that works on a workbook; mix it in
 * with {@code @Mixin}. SITE is the first positional parameter.
 */
public final class WorkbookFileOptions {

    @Parameters(index = "0", paramLabel = "SITE", description = "The site's workbook file.")
    Path file;

    @Option(names = "--user", paramLabel = "NAME",
            description = "Name the audit trail records for changes (default: your login name).")
    String user;

    public Path file() {
        return file;
    }

    /** The {@code --user} name, else the login name of whoever runs the command. */
    public String user() {
        return userOrLogin(user);
    }

    /** {@code given} when it names someone, else the login name of whoever runs the command. */
    static String userOrLogin(String given) {
        if (given != null && !given.isBlank()) {
            return given.strip();
        }
        String login = System.getProperty("user.name");
        return login == null || login.isBlank() ? "unknown user" : login;
    }

    /** Opens the workbook for {@link #user()}; a missing file is "no workbook at SITE" (exit 1). */
    public Workbook open() {
        return Workbook.open(file, user());
    }

    /**
     * Opens the workbook for a command that only reads it: a workbook on a read-only share, or one
     * another user owns, can still be listed, evaluated and exported.
     */
    public Workbook openForReading() {
        return Workbook.openForReading(file, user());
    }
}
