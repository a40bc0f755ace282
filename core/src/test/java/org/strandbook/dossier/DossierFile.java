package org.strandbook.dossier;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * An exported dossier reopened with POI, read the way a plant's own macro would: each table row as
 * a map from the field key (the hidden row 2) to its cell.
 */
final class DossierFile implements AutoCloseable {

    static final int KEY_ROW = 1;
    static final int HEADER_ROW = 2;
    static final int FIRST_DATA_ROW = 3;

    private final XSSFWorkbook workbook;

    DossierFile(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            workbook = new XSSFWorkbook(in);
        }
    }

    XSSFWorkbook workbook() {
        return workbook;
    }

    XSSFSheet sheet(String title) {
        XSSFSheet s = workbook.getSheet(title);
        if (s == null) {
            throw new AssertionError("no sheet '" + title + "'");
        }
        return s;
    }

    /** Field key to column index, from the key row. */
    Map<String, Integer> keys(String title) {
        Map<String, Integer> keys = new LinkedHashMap<>();
        for (Cell c : sheet(title).getRow(KEY_ROW)) {
            keys.put(c.getStringCellValue(), c.getColumnIndex());
        }
        return keys;
    }

    /** Header texts left to right. */
    List<String> headers(String title) {
        List<String> out = new ArrayList<>();
        for (Cell c : sheet(title).getRow(HEADER_ROW)) {
            out.add(c.getStringCellValue());
        }
        return out;
    }

    /** Every data row, as key to cell; rows without any value are left out. */
    List<Map<String, Cell>> rows(String title) {
        Map<String, Integer> keys = keys(title);
        XSSFSheet s = sheet(title);
        List<Map<String, Cell>> out = new ArrayList<>();
        for (int r = FIRST_DATA_ROW; r <= s.getLastRowNum(); r++) {
            Row row = s.getRow(r);
            if (row == null) {
                continue;
            }
            Map<String, Cell> cells = new LinkedHashMap<>();
            keys.forEach((key, column) -> {
                Cell c = row.getCell(column);
                if (c != null && c.getCellType() != CellType.BLANK) {
                    cells.put(key, c);
                }
            });
            if (!cells.isEmpty()) {
                out.add(cells);
            }
        }
        return out;
    }

    /** The rows whose {@code tag} cell holds {@code tag}. */
    List<Map<String, Cell>> rowsOf(String title, String tag) {
        return rows(title).stream().filter(r -> r.containsKey("tag") && r.get("tag").getStringCellValue().equals(tag))
                .toList();
    }

    /** Every text of a sheet, row by row, cells separated by tabs. */
    String text(String title) {
        StringBuilder b = new StringBuilder();
        for (Row row : sheet(title)) {
            for (Cell c : row) {
                b.append(c.toString()).append('\t');
            }
            b.append('\n');
        }
        return b.toString();
    }

    static String string(Map<String, Cell> row, String key) {
        Cell c = row.get(key);
        return c == null ? "" : c.getStringCellValue();
    }

    static double number(Map<String, Cell> row, String key) {
        Cell c = row.get(key);
        return c == null ? Double.NaN : c.getNumericCellValue();
    }

    @Override
    public void close() throws IOException {
        workbook.close();
    }
}
