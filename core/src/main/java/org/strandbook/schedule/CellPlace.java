package org.strandbook.schedule;

/** A cell of a schedule sheet: the column and the 1-based row as the spreadsheet shows it. */
record CellPlace(ScheduleColumn column, int row) {

    ScheduleProblem problem(String message) {
        return new ScheduleProblem(column.sheet().title(), row, column.letter(), message);
    }

    /** The address as a spreadsheet writes it, e.g. {@code Segments!C4}. */
    String address() {
        return ScheduleProblem.quotedSheet(column.sheet().title()) + "!" + column.letter() + row;
    }
}
