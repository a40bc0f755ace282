package org.strandbook.app.ui.workbook;

/** A workbook action that cannot be done, with a message a technician can act on. */
public final class WorkbookProblem extends RuntimeException {

    public WorkbookProblem(String message) {
        super(message);
    }

    public WorkbookProblem(String message, Throwable cause) {
        super(message, cause);
    }
}
