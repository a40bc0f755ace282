package org.strandbook.dossier;

/** The export was cancelled through its {@link DossierProgress}; nothing was written. */
public final class DossierCancelledException extends RuntimeException {

    public DossierCancelledException(String message) {
        super(message);
    }
}
