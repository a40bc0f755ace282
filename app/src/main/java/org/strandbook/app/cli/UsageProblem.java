package org.strandbook.app.cli;

/** Thrown by a subcommand when its arguments are wrong in a way picocli cannot see (exit 2). */
public final class UsageProblem extends RuntimeException {

    public UsageProblem(String message) {
        super(message);
    }
}
