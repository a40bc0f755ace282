package org.strandbook.spreadsheet;

/**
 * Text that a spreadsheet program could take for the start of a formula. The list of lead
 * characters ({@code = + - @}, tab, carriage return) is that of the OWASP "CSV Injection" guidance.
 * Strandbook's XLSX writers (dossier, cable schedule) write every text with
 * {@code Cell.setCellValue(String)}, which always makes a string cell, and give such text a
 * quote-prefixed style too, so that it stays text even when someone edits the cell later.
 */
public final class FormulaText {

    private FormulaText() {
    }

    /** True for text a spreadsheet could read as a formula. */
    public static boolean startsLikeFormula(String text) {
        if (text == null || text.isEmpty()) {
            return false;
        }
        char c = text.charAt(0);
        return c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r';
    }
}
