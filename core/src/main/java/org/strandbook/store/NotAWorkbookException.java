package org.strandbook.store;

/** The file offered is no Strandbook workbook: empty, not SQLite, or an SQLite file of another program. */
public final class NotAWorkbookException extends WorkbookException {

    public NotAWorkbookException(String message) {
        super(message);
    }
}
