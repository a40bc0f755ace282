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

    /** A value of several lines (one analyzer per line, say) gets the height it needs. */
    private static void growForLines(Row row, Cell cell, String text, DossierStyles styles) {
        int lines = (int) text.chars().filter(c -> c == '\n').count() + 1;
        if (lines > 1 && styles.wraps(cell.getCellStyle())) {
            float needed = lines * styles.lineHeightPoints(cell.getCellStyle()) + 2f;
            if (needed > row.getHeightInPoints()) {
                row.setHeightInPoints(needed);
            }
        }
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
