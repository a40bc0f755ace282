package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text table: header lines left-aligned, numbers right-aligned, columns marked as text
 * left-aligned, columns two spaces apart.
 */
final class TextTable {

    private final List<String[]> headers = new ArrayList<>();
    private final List<String[]> rows = new ArrayList<>();
    private final int columns;
    private final boolean[] left;

    TextTable(String[] names, String[] units) {
        if (names.length != units.length) {
            throw new IllegalArgumentException("one unit per column");
        }
        this.columns = names.length;
        this.left = new boolean[columns];
        headers.add(names);
        headers.add(units);
    }

    /** Marks text columns to be left-aligned; the rest are numbers, right-aligned. */
    TextTable leftAligned(int... textColumns) {
        for (int c : textColumns) {
            left[c] = true;
        }
        return this;
    }

    void row(String... cells) {
        if (cells.length != columns) {
            throw new IllegalArgumentException("row has " + cells.length + " cells, table has " + columns + " columns");
        }
        rows.add(cells);
    }

    void print(PrintWriter out) {
        int[] width = new int[columns];
        for (List<String[]> block : List.of(headers, rows)) {
            for (String[] r : block) {
                for (int c = 0; c < columns; c++) {
                    width[c] = Math.max(width[c], r[c].length());
                }
            }
        }
        for (String[] h : headers) {
            out.println(line(h, width, false));
        }
        for (String[] r : rows) {
            out.println(line(r, width, true));
        }
    }

    private String line(String[] cells, int[] width, boolean alignNumbers) {
        StringBuilder b = new StringBuilder();
        for (int c = 0; c < cells.length; c++) {
            if (c > 0) {
                b.append("  ");
            }
            String pad = " ".repeat(width[c] - cells[c].length());
            b.append(alignNumbers && !left[c] ? pad + cells[c] : cells[c] + pad);
        }
        return b.toString().stripTrailing();
    }
}
