package org.strandbook.schedule;

/**
 * One thing wrong with a cable schedule, where the contractor can find it.
 *
 * <p>{@code row} is 1-based as a spreadsheet shows it (row 1 is the header row); 0 means the
 * problem concerns a whole sheet ({@code column} empty) or, with {@code sheet} empty too, the whole
 * file. {@link #toString()} gives the line shown to the user, e.g.
 * {@code Segments!F7: length must be a positive number of metres, was -3}; a sheet name with
 * anything but letters and digits is quoted the way spreadsheet formulas quote it,
 * {@code 'Fiber types'!D4}.
 *
 * @param sheet   sheet title, or empty for a file-level problem
 * @param row     1-based row, or 0 for a sheet- or file-level problem
 * @param column  column letter (A, B, ...), or empty
 * @param message what is wrong and, where it helps, what to do
 */
public record ScheduleProblem(String sheet, int row, String column, String message) {

    public ScheduleProblem {
        sheet = sheet == null ? "" : sheet;
        column = column == null ? "" : column;
        if (row < 0) {
            throw new IllegalArgumentException("row must be 0 or more, was " + row);
        }
        if (message == null || message.isBlank()) {
            throw new IllegalArgumentException("a schedule problem needs a message");
        }
    }

    /** A problem with the file as a whole (not a workbook, encrypted, too large...). */
    public static ScheduleProblem ofFile(String message) {
        return new ScheduleProblem("", 0, "", message);
    }

    /** A problem with a whole sheet (missing, too many rows...). */
    public static ScheduleProblem ofSheet(String sheet, String message) {
        return new ScheduleProblem(sheet, 0, "", message);
    }

    /** The cell address as a spreadsheet writes it, e.g. {@code Segments!F7}; empty without a row. */
    public String location() {
        if (row == 0 || sheet.isEmpty()) {
            return "";
        }
        return quotedSheet(sheet) + "!" + column + row;
    }

    @Override
    public String toString() {
        String at = location();
        return at.isEmpty() ? message : at + ": " + message;
    }

    static String quotedSheet(String sheet) {
        return sheet.chars().allMatch(Character::isLetterOrDigit) ? sheet : "'" + sheet.replace("'", "''") + "'";
    }
}
