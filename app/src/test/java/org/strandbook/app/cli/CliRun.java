package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** Runs the command line in-process and keeps what it printed. */
public record CliRun(int exitCode, String out, String err) {

    public static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = StrandbookCommand.newCommandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }
}
