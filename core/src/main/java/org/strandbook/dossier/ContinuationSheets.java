package org.strandbook.dossier;

import java.util.List;

import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Plans the continuation sheets of the long appendices before anything is written: a sheet holds
 * at most 1,048,576 rows (the XLSX limit), and a point's rows must stay on one sheet for its chart,
 * so a large site continues on "Spectra (2)", "Trend history (2)", "Audit log (2)"... Each
 * continuation is a copy of the template's sheet, placed after the one it continues.
 */
final class ContinuationSheets {

    private ContinuationSheets() {
    }

    static void add(XSSFWorkbook workbook, DossierContent content) {
        add(workbook, DossierSheet.SPECTRA, content.points().stream()
                .mapToInt(p -> p.evaluation().map(e -> e.predicted().grid().size()).orElse(0)).boxed().toList());
        add(workbook, DossierSheet.HISTORY, content.points().stream().map(HistoryRows::rowsOf).toList());
        XSSFSheet audit = workbook.getSheet(DossierSheet.AUDIT.title());
        long capacity = TableSheet.capacity(audit.getLastRowNum() + 1);
        copies(workbook, DossierSheet.AUDIT, (int) ((content.audit().rows() + capacity - 1) / capacity) - 1);
    }

    /** Packs blocks of rows greedily, as the writer will, and adds the sheets they need. */
    private static void add(XSSFWorkbook workbook, DossierSheet which, List<Integer> blocks) {
        int capacity = TableSheet.capacity(workbook.getSheet(which.title()).getLastRowNum() + 1);
        copies(workbook, which, partsFor(blocks, capacity, which.title()) - 1);
    }

    /**
     * Sheets needed for blocks of rows kept whole, filled in order: a block that does not fit the
     * rest of a sheet starts the next one.
     *
     * @throws IllegalArgumentException when a block alone is longer than a sheet
     */
    static int partsFor(List<Integer> blocks, int capacity, String sheet) {
        int parts = 1;
        long used = 0;
        for (int rows : blocks) {
            if (rows > capacity) {
                throw new IllegalArgumentException("one point needs " + rows + " rows on sheet '" + sheet
                        + "', more than a sheet holds (" + capacity + ")");
            }
            if (used + rows > capacity) {
                parts++;
                used = 0;
            }
            used += rows;
        }
        return parts;
    }

    private static void copies(XSSFWorkbook workbook, DossierSheet which, int count) {
        int index = workbook.getSheetIndex(which.title());
        XSSFSheet original = workbook.getSheetAt(index);
        for (int c = 1; c <= count; c++) {
            XSSFSheet copy = workbook.cloneSheet(index, TableSheet.partTitle(which, c));
            copy.setRepeatingRows(original.getRepeatingRows());
            workbook.setSheetOrder(copy.getSheetName(), index + c);
        }
    }
}
