package org.strandbook.store;

/** A tag, code or id names nothing in the workbook. */
public final class UnknownEntryException extends WorkbookException {

    public UnknownEntryException(String message) {
        super(message);
    }
}
