package org.strandbook.app.cli;

import java.io.PrintWriter;

import org.strandbook.app.ui.safety.SafetyCaution;

/**
 * The safety cautions the command line prints, the same text the window shows, on the error stream
 * so that piped output (JSON, tables) stays clean. Each command prints it at most once per run.
 */
final class FieldCautions {

    private FieldCautions() {
    }

    /** Before or after work recorded at a point in a classified hazardous area. */
    static void hazardousPoint(PrintWriter err, String pointTag) {
        print(err, SafetyCaution.reasonForHazardousPoint(pointTag));
    }

    /** When findings send someone to open joints or junction boxes in the field. */
    static void fieldWork(PrintWriter err, String why) {
        print(err, why);
    }

    private static void print(PrintWriter err, String reason) {
        err.println("CAUTION: " + reason);
        for (String line : SafetyCaution.TEXT.split("\n")) {
            err.println(line.isEmpty() ? "" : "  " + line);
        }
        err.println("  (README, section Safety)");
        err.flush();
    }
}
