package org.strandbook.dossier;

/**
 * What one export wrote.
 *
 * @param sheets        sheets in the file
 * @param rows          rows added below the template's own
 * @param textCells     text cells added
 * @param textChars     characters in those text cells
 * @param numberCells   number and date cells added
 * @param charts        native charts
 * @param chartPoints   values written into the charts' caches
 * @param derivedStyles cell styles and fonts the writer derived from the template's (a fixed handful)
 */
public record DossierSummary(int sheets, long rows, long textCells, long textChars, long numberCells, int charts,
                             long chartPoints, int derivedStyles) {

    public long cells() {
        return textCells + numberCells;
    }
}
