package org.strandbook.server;

/** A sync the server or the workbook's state does not allow; nothing was changed. */
public class SyncRefusedException extends ServerException {

    public SyncRefusedException(String message) {
        super(message);
    }
}
