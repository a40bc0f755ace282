package org.strandbook.dossier;

import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.apache.poi.ss.SpreadsheetVersion;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.apache.poi.xssf.usermodel.XSSFRow;
import org.apache.poi.xssf.usermodel.XSSFSheet;

/**
 * One sheet of the dossier being filled: rows are streamed below the template's own rows, each
 * value into the column whose hidden key names its field, styled as the template styles that key.
 * Columns the plant removed from the template are skipped. Counts what it writes.
 */
final class TableSheet {

    /** What a number column shows for an infinite value, e.g. a confidence limit too few readings cannot bound. */
    static final String UNBOUNDED = "unbounded";

    /** Index of the last row a sheet can hold (the spreadsheet format's limit). */
    static final int LAST_ROW_INDEX = SpreadsheetVersion.EXCEL2007.getLastRowIndex();

    private final DossierSheet which;
    private final List<SXSSFSheet> parts;
    private final DossierStyles styles;
    private final Map<DossierColumn, Integer> columns = new EnumMap<>(DossierColumn.class);
    private final Map<DossierColumn, CellStyle> dataStyles = new EnumMap<>(DossierColumn.class);
    private final Map<DossierColumn, CellStyle> headerStyles = new EnumMap<>(DossierColumn.class);
    private final CellStyle defaultStyle;
    private final int firstRow;
    private int headerRow = -1;
    private final int[] lastRowOfPart;
    private SXSSFSheet sheet;
    private Map<Integer, Double> widthCache;
    private SXSSFSheet widthCacheSheet;
    private int part;
    private int nextRow;
    private long rowsWritten;
    private long textCells;
    private long textChars;
    private long numberCells;

    private TableSheet(DossierSheet which, List<SXSSFSheet> parts, DossierStyles styles, CellStyle defaultStyle,
                       int firstRow) {
        this.which = which;
        this.parts = parts;
        this.styles = styles;
        this.defaultStyle = defaultStyle;
        this.firstRow = firstRow;
        this.sheet = parts.get(0);
        this.nextRow = firstRow;
        this.lastRowOfPart = new int[parts.size()];
        java.util.Arrays.fill(lastRowOfPart, -1);
    }

    /**
     * The sheet of {@code workbook} for {@code which} with its continuation sheets (see
     * {@link #partTitle}), its columns read from the template's key row.
     *
     * @throws DossierTemplateException when the template lacks the sheet or, for a table, its key row
     */
    static TableSheet open(SXSSFWorkbook workbook, DossierSheet which, DossierStyles styles) {
        XSSFSheet template = workbook.getXSSFWorkbook().getSheet(which.title());
        if (template == null) {
            throw new DossierTemplateException("the dossier template has no sheet '" + which.title() + "'");
        }
        List<SXSSFSheet> parts = new ArrayList<>();
        for (int p = 0; workbook.getSheet(partTitle(which, p)) != null; p++) {
            parts.add(workbook.getSheet(partTitle(which, p)));
        }
        TableSheet t = new TableSheet(which, parts, styles, workbook.getXSSFWorkbook().getCellStyleAt(0),
                template.getLastRowNum() + 1);
        if (which.layout() == DossierSheet.Layout.TABLE) {
            t.readKeys(template);
        }
        return t;
    }

    /** The tab name of part {@code part} (from 0): "Spectra", "Spectra (2)", ... */
    static String partTitle(DossierSheet which, int part) {
        return part == 0 ? which.title() : which.title() + " (" + (part + 1) + ")";
    }

    /** Rows one part of a sheet holds below a template of {@code templateRows} rows. */
    static int capacity(int templateRows) {
        return LAST_ROW_INDEX + 1 - templateRows;
    }

    private void readKeys(XSSFSheet template) {
        for (int r = 0; r <= template.getLastRowNum(); r++) {
            XSSFRow row = template.getRow(r);
            if (row == null || !isKeyRow(row)) {
                continue;
            }
            XSSFRow header = template.getRow(r + 1);
            headerRow = header == null ? r : r + 1;
            for (Cell cell : row) {
                if (cell.getCellType() != CellType.STRING || cell.getStringCellValue().isBlank()) {
                    continue;
                }
                DossierColumn column = DossierColumn.of(which, cell.getStringCellValue().strip()).orElseThrow();
                columns.put(column, cell.getColumnIndex());
                dataStyles.put(column, cell.getCellStyle());
                Cell head = header == null ? null : header.getCell(cell.getColumnIndex());
                headerStyles.put(column, head == null ? cell.getCellStyle() : head.getCellStyle());
            }
            return;
        }
        throw new DossierTemplateException("the dossier template's sheet '" + which.title()
                + "' has no row of field keys (a hidden row naming the field of each column)");
    }

    private boolean isKeyRow(XSSFRow row) {
        int keys = 0;
        for (Cell cell : row) {
            if (cell.getCellType() == CellType.BLANK) {
                continue;
            }
            if (cell.getCellType() != CellType.STRING) {
                return false;
            }
            String text = cell.getStringCellValue().strip();
            if (text.isEmpty()) {
                continue;
            }
            if (DossierColumn.of(which, text).isEmpty()) {
                return false;
            }
            keys++;
        }
        return keys > 0;
    }

    /** The part being filled. */
    SXSSFSheet sheet() {
        return sheet;
    }

    /** Every part, the first one first. */
    List<SXSSFSheet> parts() {
        return List.copyOf(parts);
    }

    /** The last row written on part {@code index}, −1 when none. */
    int lastRowOf(int index) {
        return lastRowOfPart[index];
    }

    /** Makes sure the next {@code rows} rows fit one part, moving on to the next part if they do not. */
    void ensureRoom(int rows) {
        if (nextRow + rows - 1 > LAST_ROW_INDEX && part + 1 < parts.size()) {
            part++;
            sheet = parts.get(part);
            nextRow = firstRow;
        }
    }

    /** The 0-based row of the column headers, −1 for sheets without. */
    int headerRow() {
        return headerRow;
    }

    /** The 0-based column of a field, or −1 when the template dropped it. */
    int column(DossierColumn column) {
        return columns.getOrDefault(column, -1);
    }

    /** Index of the row {@link #newRow()} will make next. */
    int nextRowIndex() {
        return nextRow;
    }

    Row newRow() {
        ensureRoom(1);
        if (nextRow > LAST_ROW_INDEX) {
            throw new IllegalStateException("sheet '" + sheet.getSheetName() + "' is full: the dossier planned too few"
                    + " continuation sheets");
        }
        rowsWritten++;
        lastRowOfPart[part] = nextRow;
        return sheet.createRow(nextRow++);
    }

    /**
     * A row whose every column already holds an empty cell in the column's style, so that borders
     * run unbroken across short tables; long tables use {@link #newRow()}.
     */
    Row newRowStyled() {
        Row row = newRow();
        columns.forEach((column, index) -> row.createCell(index).setCellStyle(dataStyles.get(column)));
        return row;
    }

    /** Columns from A to the last keyed one. */
    int columnCount() {
        return columns.values().stream().mapToInt(Integer::intValue).max().orElse(ChartPlacement.COLUMNS - 1) + 1;
    }

    /** Leaves rows free, e.g. for a chart to sit on. */
    void skipRows(int count) {
        nextRow += count;
    }

    long rowsWritten() {
        return rowsWritten;
    }

    long textCells() {
        return textCells;
    }

    long textChars() {
        return textChars;
    }

    long numberCells() {
        return numberCells;
    }

    void text(Row row, DossierColumn column, String value) {
        text(row, column, value, DossierStyles.Look.PLAIN);
    }

    void text(Row row, DossierColumn column, String value, DossierStyles.Look look) {
        Integer c = columns.get(column);
        if (c != null) {
            textAt(row, c, value, dataStyles.get(column), look);
        }
    }

    /** A text in a header-styled cell of a column (block headers inside a sheet). */
    void headerText(Row row, DossierColumn column, int offset, String value) {
        Integer c = columns.get(column);
        if (c != null) {
            textAt(row, c + offset, value, headerStyles.get(column), DossierStyles.Look.PLAIN);
        }
    }

    /** Text at a fixed column, styled as the sheet's default or as {@code base}. */
    void textAt(Row row, int column, String value, CellStyle base, DossierStyles.Look look) {
        if (value == null || value.isEmpty()) {
            return;
        }
        Cell cell = row.createCell(column, CellType.STRING);
        cell.setCellValue(value);
        CellStyle style = styles.forText(base == null ? defaultStyle : base, look, value);
        cell.setCellStyle(style);
        textCells++;
        textChars += value.length();
        if (styles.wraps(style)) {
            fitHeight(row, value, style, widthChars(column));
        }
    }

    /** A column's width in digits of the default font, read once per part. */
    private double widthChars(int column) {
        if (widthCache == null || widthCacheSheet != sheet) {
            widthCache = new java.util.HashMap<>();
            widthCacheSheet = sheet;
        }
        return widthCache.computeIfAbsent(column, c -> sheet.getColumnWidth(c) / 256.0);
    }

    /** Text across columns {@code column..column+span-1}, merged and wrapped, the row made tall enough. */
    void textSpanning(Row row, int column, int span, String value, DossierStyles.Look look) {
        if (value == null || value.isEmpty()) {
            return;
        }
        Cell cell = row.createCell(column, CellType.STRING);
        cell.setCellValue(value);
        CellStyle style = styles.forText(styles.style(defaultStyle, DossierStyles.Look.WRAPPED, false), look, value);
        cell.setCellStyle(style);
        textCells++;
        textChars += value.length();
        sheet.addMergedRegion(new CellRangeAddress(row.getRowNum(), row.getRowNum(), column, column + span - 1));
        double width = 0;
        for (int c = column; c < column + span; c++) {
            width += sheet.getColumnWidth(c) / 256.0;
        }
        fitHeight(row, value, style, width);
    }

    /** Makes the row tall enough for {@code text} wrapped in a width of {@code widthChars}. */
    void fitHeight(Row row, String text, CellStyle style, double widthChars) {
        int lines = DossierText.wrappedLines(text, styles.charsPerLine(style, widthChars));
        float needed = lines * styles.lineHeightPoints(style) + 2f;
        float current = row.getHeight() < 0 ? sheet.getDefaultRowHeightInPoints() : row.getHeightInPoints();
        if (lines > 1 && needed > current) {
            row.setHeightInPoints(needed);
        }
    }

    /** A number; nothing for NaN, the words for an infinite limit. */
    void number(Row row, DossierColumn column, double value) {
        number(row, column, 0, value, DossierStyles.Look.PLAIN);
    }

    void number(Row row, DossierColumn column, int offset, double value, DossierStyles.Look look) {
        Integer c = columns.get(column);
        if (c == null || Double.isNaN(value)) {
            return;
        }
        if (Double.isInfinite(value)) {
            textAt(row, c + offset, UNBOUNDED, dataStyles.get(column), look);
            return;
        }
        Cell cell = row.createCell(c + offset, CellType.NUMERIC);
        cell.setCellValue(value);
        cell.setCellStyle(styles.style(dataStyles.get(column), look, false));
        numberCells++;
    }

    void time(Row row, DossierColumn column, Instant time) {
        if (time != null) {
            number(row, column, excelTime(time));
        }
    }

    void date(Row row, DossierColumn column, LocalDate date) {
        if (date != null) {
            number(row, column, DateUtil.getExcelDate(date));
        }
    }

    /** The spreadsheet's serial date-time of an instant in UTC (1900 date system). */
    static double excelTime(Instant time) {
        return DateUtil.getExcelDate(LocalDateTime.ofInstant(time, ZoneOffset.UTC));
    }

    /**
     * An absolute reference to rows {@code first..last} (0-based) of a column on the part being
     * filled, e.g. {@code 'Spectra'!$C$4:$C$754}.
     */
    String range(DossierColumn column, int first, int last) {
        int c = column(column);
        if (c < 0) {
            throw new DossierTemplateException("the dossier template's sheet '" + which.title()
                    + "' lacks the column '" + column.key() + "' a chart plots");
        }
        String letter = CellReference.convertNumToColString(c);
        return "'" + sheet.getSheetName().replace("'", "''") + "'!$" + letter + "$" + (first + 1) + ":$" + letter + "$"
                + (last + 1);
    }
}
