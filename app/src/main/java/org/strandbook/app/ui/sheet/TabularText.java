package org.strandbook.app.ui.sheet;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Tab-separated text as spreadsheet programs put blocks of cells on the clipboard: cells split by
 * tab, rows by LF, CRLF or CR, a cell holding a tab, line break or quote wrapped in double quotes
 * with inner quotes doubled. One trailing line break is tolerated (most programs add it).
 */
public final class TabularText {

    private TabularText() {
    }

    /** The rows of cells in {@code text}; empty text gives no rows. */
    public static List<List<String>> parse(String text) {
        List<List<String>> rows = new ArrayList<>();
        if (text == null || text.isEmpty()) {
            return rows;
        }
        List<String> row = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        boolean cellMayOpenQuote = true;
        int n = text.length();
        for (int i = 0; i < n; i++) {
            char ch = text.charAt(i);
            if (quoted) {
                if (ch == '"') {
                    if (i + 1 < n && text.charAt(i + 1) == '"') {
                        cell.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    cell.append(ch);
                }
                continue;
            }
            switch (ch) {
                case '"' -> {
                    if (cellMayOpenQuote && cell.length() == 0) {
                        quoted = true;
                    } else {
                        cell.append(ch);
                    }
                    cellMayOpenQuote = false;
                }
                case '\t' -> {
                    row.add(cell.toString());
                    cell.setLength(0);
                    cellMayOpenQuote = true;
                }
                case '\r', '\n' -> {
                    if (ch == '\r' && i + 1 < n && text.charAt(i + 1) == '\n') {
                        i++;
                    }
                    row.add(cell.toString());
                    rows.add(row);
                    row = new ArrayList<>();
                    cell.setLength(0);
                    cellMayOpenQuote = true;
                    if (i == n - 1) {
                        return rows;
                    }
                }
                default -> {
                    cell.append(ch);
                    cellMayOpenQuote = false;
                }
            }
        }
        row.add(cell.toString());
        rows.add(row);
        return rows;
    }

    /** Why {@code rows} is not a rectangular block, or empty when it is. */
    public static Optional<String> notRectangular(List<List<String>> rows) {
        for (int r = 1; r < rows.size(); r++) {
            if (rows.get(r).size() != rows.get(0).size()) {
                return Optional.of("row " + (r + 1) + " of the copied block has " + rows.get(r).size()
                        + " cells but row 1 has " + rows.get(0).size());
            }
        }
        return Optional.empty();
    }

    /** Cells joined by tabs, rows by LF, cells quoted where they must be. */
    public static String format(List<List<String>> rows) {
        StringBuilder out = new StringBuilder();
        for (int r = 0; r < rows.size(); r++) {
            if (r > 0) {
                out.append('\n');
            }
            List<String> row = rows.get(r);
            for (int c = 0; c < row.size(); c++) {
                if (c > 0) {
                    out.append('\t');
                }
                out.append(quoteIfNeeded(row.get(c)));
            }
        }
        return out.toString();
    }

    private static String quoteIfNeeded(String cell) {
        if (cell.indexOf('\t') < 0 && cell.indexOf('\n') < 0 && cell.indexOf('\r') < 0 && !cell.startsWith("\"")) {
            return cell;
        }
        return '"' + cell.replace("\"", "\"\"") + '"';
    }
}
