package org.strandbook.store;

/** An entry would take a tag, code or cable ID that another entry of the workbook already has. */
public class DuplicateEntryException extends WorkbookException {

    public DuplicateEntryException(String message) {
        super(message);
    }
}
