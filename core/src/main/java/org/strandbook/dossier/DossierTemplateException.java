package org.strandbook.dossier;

/** The dossier template lacks what the writer needs (a sheet, a key row, a column a chart plots). */
public final class DossierTemplateException extends RuntimeException {

    public DossierTemplateException(String message) {
        super(message);
    }
}
