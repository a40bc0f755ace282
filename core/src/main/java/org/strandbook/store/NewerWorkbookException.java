package org.strandbook.store;

/** The workbook was written by a newer Strandbook whose schema this one does not know; it is left unchanged. */
public final class NewerWorkbookException extends WorkbookException {

    private final int schemaVersion;

    public NewerWorkbookException(String message, int schemaVersion) {
        super(message);
        this.schemaVersion = schemaVersion;
    }

    /** The schema version found in the file. */
    public int schemaVersion() {
        return schemaVersion;
    }
}
