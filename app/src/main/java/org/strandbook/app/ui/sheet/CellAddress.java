package org.strandbook.app.ui.sheet;

/**
 * A cell by zero-based row and column; {@link #name()} gives the sheet-style address ("B3") that
 * messages show, with column letters counting the sheet's data columns from A.
 */
public record CellAddress(int row, int column) {

    public CellAddress {
        if (row < 0 || column < 0) {
            throw new IllegalArgumentException("cell row and column start at 0, was " + row + ", " + column);
        }
    }

    public String name() {
        return columnName(column) + (row + 1);
    }

    /** A, B, ... Z, AA, AB, ... for zero-based column 0, 1, ... 25, 26, 27, ... */
    public static String columnName(int column) {
        StringBuilder name = new StringBuilder();
        int c = column;
        do {
            name.insert(0, (char) ('A' + c % 26));
            c = c / 26 - 1;
        } while (c >= 0);
        return name.toString();
    }
}
