package org.strandbook.dossier;

import java.util.Map;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.HeaderFooter;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Puts the {@link Placeholder} values into the template: into every cell of the template's own rows
 * that shows a token, and into every page header and footer.
 */
final class Placeholders {

    /** Spreadsheet programs refuse page headers longer than 255 characters; values there are cut to this. */
    static final int HEADER_VALUE_CHARS = 60;

    private Placeholders() {
    }

    static void fill(XSSFWorkbook workbook, Map<Placeholder, String> values, DossierStyles styles) {
        for (int s = 0; s < workbook.getNumberOfSheets(); s++) {
            XSSFSheet sheet = workbook.getSheetAt(s);
            for (Row row : sheet) {
                for (Cell cell : row) {
                    if (cell.getCellType() != CellType.STRING) {
                        continue;
                    }
                    String text = cell.getStringCellValue();
                    if (text.indexOf('{') < 0) {
                        continue;
                    }
                    String filled = replace(text, values, false);
                    if (!filled.equals(text)) {
                        cell.setCellValue(filled);
                        cell.setCellStyle(styles.forText(cell.getCellStyle(), DossierStyles.Look.PLAIN, filled));
                        growForLines(row, cell, filled, styles);
                    }
                }
            }
            fill(sheet.getHeader(), values);
            fill(sheet.getFooter(), values);
        }
    }

    /**
     * A value of several lines (one analyzer per line, say), or one longer than its cell is wide (the
     * decision rule in words), gets the height it needs.
     */
    private static void growForLines(Row row, Cell cell, String text, DossierStyles styles) {
        if (!styles.wraps(cell.getCellStyle())) {
            return;
        }
        double perLine = Math.max(1, styles.charsPerLine(cell.getCellStyle(), widthChars(row.getSheet(), cell)));
        int lines = 0;
        for (String line : text.split("\n", -1)) {
            lines += Math.max(1, (int) Math.ceil(line.length() / perLine));
        }
        if (lines > 1) {
            float needed = lines * styles.lineHeightPoints(cell.getCellStyle()) + 2f;
            if (needed > row.getHeightInPoints()) {
                row.setHeightInPoints(needed);
            }
        }
    }

    /** Width of the cell in characters of the default font, across its merged region if it has one. */
    private static double widthChars(org.apache.poi.ss.usermodel.Sheet sheet, Cell cell) {
        int first = cell.getColumnIndex();
        int last = first;
        for (org.apache.poi.ss.util.CellRangeAddress merged : sheet.getMergedRegions()) {
            if (merged.isInRange(cell.getRowIndex(), first)) {
                first = merged.getFirstColumn();
                last = merged.getLastColumn();
                break;
            }
        }
        double width = 0;
        for (int c = first; c <= last; c++) {
            width += sheet.getColumnWidth(c) / 256.0;
        }
        return width;
    }

    private static void fill(HeaderFooter part, Map<Placeholder, String> values) {
        part.setLeft(replace(part.getLeft(), values, true));
        part.setCenter(replace(part.getCenter(), values, true));
        part.setRight(replace(part.getRight(), values, true));
    }

    static String replace(String text, Map<Placeholder, String> values, boolean header) {
        if (text == null || text.indexOf('{') < 0) {
            return text;
        }
        String out = text;
        for (Map.Entry<Placeholder, String> e : values.entrySet()) {
            String token = e.getKey().token();
            if (out.contains(token)) {
                out = out.replace(token, header ? forHeader(e.getValue()) : e.getValue());
            }
        }
        return out;
    }

    /** One line, cut to length, with '&amp;' doubled (a single one starts a header code). */
    private static String forHeader(String value) {
        String line = value.replace('\n', ' ').replace('\r', ' ');
        if (line.length() > HEADER_VALUE_CHARS) {
            line = line.substring(0, HEADER_VALUE_CHARS - 1) + "…";
        }
        return line.replace("&", "&&");
    }
}
