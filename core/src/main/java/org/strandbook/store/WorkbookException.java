package org.strandbook.store;

/**
 * A workbook operation failed for a reason the user can act on. The message is one line that names
 * the file or the entry concerned; the command line prints it as it is.
 */
public class WorkbookException extends RuntimeException {

    public WorkbookException(String message) {
        super(message);
    }

    public WorkbookException(String message, Throwable cause) {
        super(message, cause);
    }
}
