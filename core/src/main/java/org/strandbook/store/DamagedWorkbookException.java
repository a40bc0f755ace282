package org.strandbook.store;

import java.nio.file.Path;

/**
 * SQLite found the workbook's file damaged. Nothing more is written into it: the user restores a
 * backup (a copy made with "Save As", or the plant's file backup).
 */
public final class DamagedWorkbookException extends WorkbookException {

    DamagedWorkbookException(Path file, String problem, Throwable cause) {
        super("workbook " + file + " is damaged (" + oneLine(problem) + "); nothing was written to it: restore it"
                + " from a backup", cause);
    }

    private static String oneLine(String problem) {
        return problem == null ? "SQLite reports damage" : problem.replaceAll("\\s+", " ").strip();
    }
}
