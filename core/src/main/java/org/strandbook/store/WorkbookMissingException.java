package org.strandbook.store;

/** No file exists where a workbook was expected. */
public final class WorkbookMissingException extends WorkbookException {

    public WorkbookMissingException(String message) {
        super(message);
    }
}
