package org.strandbook.dossier;

/**
 * Told as a dossier is gathered and written; returns false to cancel. A cancelled export leaves no
 * file behind and throws {@link DossierCancelledException}.
 */
@FunctionalInterface
public interface DossierProgress {

    /**
     * @param stage what is being done, e.g. "evaluating AT-4101" or "writing Spectra"
     * @param done  steps done in this stage
     * @param total steps in this stage
     * @return false to cancel
     */
    boolean advance(String stage, int done, int total);

    DossierProgress NONE = (stage, done, total) -> true;
}
