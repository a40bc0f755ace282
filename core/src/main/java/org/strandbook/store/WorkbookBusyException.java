package org.strandbook.store;

/**
 * Another program held the workbook's write lock for longer than the busy timeout. Nothing was
 * written; trying again later is safe.
 */
public final class WorkbookBusyException extends WorkbookException {

    public WorkbookBusyException(String message, Throwable cause) {
        super(message, cause);
    }
}
