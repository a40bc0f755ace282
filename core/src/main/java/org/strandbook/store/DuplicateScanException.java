package org.strandbook.store;

/**
 * The scan's file (by SHA-256 of its bytes) is already in the workbook. Importers catch this to
 * skip a file imported before; {@link #existingScanId()} names the scan that holds it.
 */
public final class DuplicateScanException extends DuplicateEntryException {

    private final long existingScanId;

    public DuplicateScanException(String message, long existingScanId) {
        super(message);
        this.existingScanId = existingScanId;
    }

    public long existingScanId() {
        return existingScanId;
    }
}
