package org.strandbook.schedule;

/**
 * A cell of a schedule sheet: its column and its 1-based row as the spreadsheet shows it. Code that
 * finds a problem after reading (say, the store refusing a cable ID another import already used)
 * reports it here with {@link #problem(String)}, so the user still gets {@code Segments!D7: ...}.
 */
public record ScheduleCell(ScheduleColumn column, int row) {

    public ScheduleCell {
        if (column == null || row < 1) {
            throw new IllegalArgumentException("a schedule cell needs a column and a row from 1, was " + column + " " + row);
        }
    }

    /** A problem located at this cell. */
    public ScheduleProblem problem(String message) {
        return new ScheduleProblem(column.sheet().title(), row, column.letter(), message);
    }

    /** The address as a spreadsheet writes it, e.g. {@code Segments!C4}. */
    public String address() {
        return ScheduleProblem.quotedSheet(column.sheet().title()) + "!" + column.letter() + row;
    }
}
