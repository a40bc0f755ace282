package org.strandbook.schedule;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.Workbook;

/**
 * Opens one data sheet of a schedule: checks it exists and that row 1 holds the expected headers,
 * then hands out its non-blank data rows. A sheet with a wrong header is not read further (its
 * columns cannot be trusted), so checks that rely on it are skipped rather than flooding the user.
 */
final class SheetTable {

    /** A cable schedule is hundreds of rows; this bounds the work a pasted-in data dump can cause. */
    static final int MAX_ROWS = 10_000;

    private SheetTable() {
    }

    /** The sheet's non-blank data rows, or empty when it cannot be read (problems logged). */
    static Optional<List<SheetRow>> rows(Workbook workbook, ScheduleSheet layout, ProblemLog log) {
        Sheet sheet = workbook.getSheet(layout.title());
        if (sheet == null) {
            log.add(ScheduleProblem.ofSheet(layout.title(), "sheet '" + layout.title() + "' is missing"));
            return Optional.empty();
        }
        if (sheet.getPhysicalNumberOfRows() > MAX_ROWS + 1) {
            log.add(ScheduleProblem.ofSheet(layout.title(), String.format(Locale.ROOT,
                    "sheet '%s' has %d rows; a schedule holds at most %d rows per sheet",
                    layout.title(), sheet.getPhysicalNumberOfRows(), MAX_ROWS)));
            return Optional.empty();
        }
        if (!headersMatch(sheet, layout, log)) {
            return Optional.empty();
        }
        List<SheetRow> rows = new ArrayList<>();
        FormulaEvaluator formulas = workbook.getCreationHelper().createFormulaEvaluator();
        for (Row row : sheet) {
            if (row.getRowNum() == 0) {
                continue;
            }
            SheetRow r = new SheetRow(layout, row, formulas, log);
            if (!r.isBlank()) {
                rows.add(r);
            }
        }
        return Optional.of(rows);
    }

    private static boolean headersMatch(Sheet sheet, ScheduleSheet layout, ProblemLog log) {
        Row header = sheet.getRow(0);
        boolean ok = true;
        for (ScheduleColumn column : layout.columns()) {
            String found = "";
            if (header != null && header.getCell(column.index()) != null) {
                found = SheetRow.trim(header.getCell(column.index()).toString());
            }
            if (found.isEmpty() && column.optional()) {
                continue;
            }
            if (!normalized(found).equals(normalized(column.header()))) {
                String was = found.isEmpty() ? ", the cell is empty" : ", was '" + found + "'";
                log.add(new ScheduleCell(column, 1).problem("expected header '" + column.header() + "'" + was));
                ok = false;
            }
        }
        return ok;
    }

    private static String normalized(String header) {
        return header.replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }
}
