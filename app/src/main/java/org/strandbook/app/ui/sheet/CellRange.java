package org.strandbook.app.ui.sheet;

/** A rectangular block of cells, bounds inclusive and zero-based. */
public record CellRange(int top, int left, int bottom, int right) {

    public CellRange {
        if (top < 0 || left < 0 || bottom < top || right < left) {
            throw new IllegalArgumentException("not a cell block: rows " + top + "-" + bottom
                    + ", columns " + left + "-" + right);
        }
    }

    public static CellRange of(CellAddress a, CellAddress b) {
        return new CellRange(Math.min(a.row(), b.row()), Math.min(a.column(), b.column()),
                Math.max(a.row(), b.row()), Math.max(a.column(), b.column()));
    }

    public static CellRange single(CellAddress a) {
        return of(a, a);
    }

    public int rowCount() {
        return bottom - top + 1;
    }

    public int columnCount() {
        return right - left + 1;
    }

    public CellAddress topLeft() {
        return new CellAddress(top, left);
    }

    public CellAddress bottomRight() {
        return new CellAddress(bottom, right);
    }

    public boolean contains(CellAddress a) {
        return a.row() >= top && a.row() <= bottom && a.column() >= left && a.column() <= right;
    }

    /** "B3" for one cell, "B3:C5" for a block. */
    public String name() {
        return rowCount() == 1 && columnCount() == 1 ? topLeft().name() : topLeft().name() + ":" + bottomRight().name();
    }
}
