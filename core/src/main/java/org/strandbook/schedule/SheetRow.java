package org.strandbook.schedule;

import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Supplier;
import java.util.regex.Pattern;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.CellValue;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.usermodel.XSSFCell;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;

/**
 * One data row of a schedule sheet with typed access to its cells. Every problem a cell has is
 * logged with its address, and the row is marked faulty; accessors then return a placeholder
 * (null, NaN, -1) the caller never builds a model value from.
 *
 * <p>Cell rules: text is trimmed of spaces at both ends (no-break spaces too); a number in a text
 * column is read as written ({@code 101}, not {@code 101.0}) unless the spreadsheet turned it into a
 * date; a formula counts by its last calculated value; an error value (#N/A, #DIV/0!) is a problem.
 *
 * <p>A formula saved without its value (files written by scripts often are) is calculated with the
 * spreadsheet library's evaluator; one it cannot calculate is a problem, never read as 0. A formula
 * that takes its value from another file is a problem too, saved value or not: that file may have
 * changed since, and it is not at hand to check.
 */
final class SheetRow {

    /** Tags, IDs, labels and codes longer than this are a paste mistake, not an identifier. */
    static final int MAX_IDENTIFIER_CHARS = 64;
    /** The workbook keeps a spread basis of at most this many characters (schema 8). */
    static final int MAX_SPREAD_BASIS_CHARS = 500;

    private sealed interface Content permits Blank, Text, Number, Flag, Failure, Unreadable {
    }

    private record Blank() implements Content {
    }

    private record Text(String value) implements Content {
    }

    private record Number(double value, boolean date) implements Content {
    }

    private record Flag(boolean value) implements Content {
    }

    private record Failure(String code) implements Content {
    }

    /** A cell whose value cannot be trusted, with the reason. */
    private record Unreadable(String problem) implements Content {
    }

    /** An external reference as the spreadsheet library shows it: {@code [1]Sheet1!A1}. */
    private static final Pattern OTHER_FILE = Pattern.compile("\\[\\d+]");
    private static final int FORMULA_SHOWN_CHARS = 60;

    private final ScheduleSheet sheet;
    private final Row row;
    private final FormulaEvaluator formulas;
    private final ProblemLog log;
    private boolean faulty;

    SheetRow(ScheduleSheet sheet, Row row, FormulaEvaluator formulas, ProblemLog log) {
        this.sheet = sheet;
        this.row = row;
        this.formulas = formulas;
        this.log = log;
    }

    /** The row number as the spreadsheet shows it (header is 1). */
    int number() {
        return row.getRowNum() + 1;
    }

    boolean faulty() {
        return faulty;
    }

    ScheduleCell place(ScheduleColumn column) {
        if (column.sheet() != sheet) {
            throw new IllegalArgumentException(column + " is not a column of sheet " + sheet.title());
        }
        return new ScheduleCell(column, number());
    }

    void problem(ScheduleColumn column, String message) {
        faulty = true;
        log.add(place(column).problem(message));
    }

    /** True when no column of the sheet holds anything; such rows are skipped. */
    boolean isBlank() {
        for (ScheduleColumn c : sheet.columns()) {
            if (!(content(c) instanceof Blank)) {
                return false;
            }
        }
        return true;
    }

    /** A required key unique on its sheet (ignoring case); null (and a problem) when missing or a duplicate. */
    String uniqueKey(ScheduleColumn column, KeyIndex keys, String what) {
        String key = identifier(column, what);
        if (key == null) {
            return null;
        }
        Optional<ScheduleCell> earlier = keys.define(key, place(column));
        if (earlier.isPresent()) {
            problem(column, "duplicate " + what + " '" + key + "' (first on row " + earlier.get().row() + ")");
            return null;
        }
        return key;
    }

    /**
     * A required reference to a key defined elsewhere; returns the reference even when unknown
     * (after a problem) so that later checks on the row still run, null only when missing.
     */
    String reference(ScheduleColumn column, KeyIndex keys, String what, String whereDefined) {
        String key = identifier(column, what);
        if (key == null) {
            return null;
        }
        String unknown = keys.unknownReference(key, what, whereDefined);
        if (unknown != null) {
            problem(column, unknown);
        }
        return key;
    }

    /**
     * Builds a model value from cells that all passed, or null. The model's own checks are the last
     * guard: any rule they enforce beyond the cell checks still becomes a problem at {@code column}.
     */
    <T> T guard(ScheduleColumn column, Supplier<T> construction) {
        try {
            return construction.get();
        } catch (IllegalArgumentException e) {
            problem(column, e.getMessage());
            return null;
        }
    }

    /** True when the cell holds nothing (or only spaces); reports nothing. */
    boolean isBlank(ScheduleColumn column) {
        return content(column) instanceof Blank;
    }

    /** The cell as text, "" when blank or when its content was reported as a problem. */
    String text(ScheduleColumn column) {
        String value = textOrNull(column);
        return value == null ? "" : value;
    }

    /** The cell as text, "" when blank, null after reporting content that is no text (a date, an error value). */
    private String textOrNull(ScheduleColumn column) {
        Content content = content(column);
        if (content instanceof Text t) {
            return t.value();
        }
        if (content instanceof Number n) {
            if (n.date()) {
                problem(column, "the cell holds a date: the spreadsheet turned what was typed into a date;"
                        + " format the column as Text and type it again");
                return null;
            }
            return DecimalText.display(n.value());
        }
        if (content instanceof Flag f) {
            return f.value() ? "TRUE" : "FALSE";
        }
        if (content instanceof Failure e) {
            problem(column, "the cell holds the error value " + e.code());
            return null;
        }
        if (content instanceof Unreadable u) {
            problem(column, u.problem());
            return null;
        }
        return "";
    }

    /**
     * The spreads the row states in its sheet's spread columns, with the row's spread basis; an
     * unreadable spread is a problem of its cell (what was expected, with an example).
     */
    StatedSpreads spreads() {
        Map<SpreadInput, StatedSpread> stated = new EnumMap<>(SpreadInput.class);
        String basis = "";
        for (ScheduleColumn column : sheet.columns()) {
            if (column.spreadBasis()) {
                basis = text(column);
                if (basis.length() > MAX_SPREAD_BASIS_CHARS) {
                    problem(column, "spread basis must be at most " + MAX_SPREAD_BASIS_CHARS + " characters, was "
                            + basis.length());
                    basis = "";
                }
            } else if (column.spread() != null) {
                String text = text(column);
                if (!text.isEmpty()) {
                    try {
                        stated.put(column.spread(), StatedSpread.parse(text, column.spread()));
                    } catch (IllegalArgumentException e) {
                        problem(column, e.getMessage());
                    }
                }
            }
        }
        return new StatedSpreads(stated, basis);
    }

    /** A required tag, ID, label or code; null (and a problem) when blank or too long. */
    String identifier(ScheduleColumn column, String what) {
        String value = requiredText(column, what);
        if (value != null && value.length() > MAX_IDENTIFIER_CHARS) {
            problem(column, what + " must be at most " + MAX_IDENTIFIER_CHARS + " characters, was "
                    + value.length() + " characters");
            return null;
        }
        return value;
    }

    /** Required text (e.g. a mating family); null and a problem when blank. */
    String requiredText(ScheduleColumn column, String what) {
        String value = textOrNull(column);
        if (value != null && value.isEmpty()) {
            problem(column, what + " is missing");
            return null;
        }
        return value;
    }

    /**
     * One of the column's allowed words, case and spaces or hyphens forgiven ({@code low-OH} reads as
     * LOW_OH); {@code whenBlank} for a blank cell, or a problem when that is null.
     */
    <E extends Enum<E>> E choice(ScheduleColumn column, Class<E> type, E whenBlank, String what) {
        String value = textOrNull(column);
        if (value == null) {
            return null;
        }
        if (value.isEmpty()) {
            if (whenBlank == null) {
                problem(column, what + " is missing: choose one of " + String.join(", ", column.choices()));
            }
            return whenBlank;
        }
        String word = value.toUpperCase(Locale.ROOT).replaceAll("[\\s-]+", "_");
        for (E e : type.getEnumConstants()) {
            if (e.name().equals(word)) {
                return e;
            }
        }
        problem(column, what + " must be one of " + String.join(", ", column.choices()) + ", was '" + value + "'");
        return null;
    }

    /** YES or NO (also Y/N, TRUE/FALSE and logical cells); required. */
    Boolean yesNo(ScheduleColumn column, String what) {
        if (content(column) instanceof Flag f) {
            return f.value();
        }
        String value = textOrNull(column);
        if (value == null) {
            return null;
        }
        switch (value.toUpperCase(Locale.ROOT)) {
            case "YES", "Y", "TRUE":
                return Boolean.TRUE;
            case "NO", "N", "FALSE":
                return Boolean.FALSE;
            case "":
                problem(column, what + " is missing: enter YES or NO");
                return null;
            default:
                problem(column, what + " must be YES or NO, was '" + value + "'");
                return null;
        }
    }

    /** A required number within {@code quantity}'s range; NaN (and a problem) otherwise. */
    double number(ScheduleColumn column, Quantity quantity) {
        Double value = numberOrNull(column, quantity);
        if (value == null) {
            problem(column, quantity.missing());
            return Double.NaN;
        }
        return value;
    }

    /** A number within {@code quantity}'s range, or empty when the cell is blank (or wrong: then a problem). */
    OptionalDouble optionalNumber(ScheduleColumn column, Quantity quantity) {
        Double value = numberOrNull(column, quantity);
        return value == null || value.isNaN() ? OptionalDouble.empty() : OptionalDouble.of(value);
    }

    /** Null for a blank cell, NaN after reporting a problem, else the accepted value. */
    private Double numberOrNull(ScheduleColumn column, Quantity quantity) {
        Content content = content(column);
        double value;
        if (content instanceof Blank) {
            return null;
        } else if (content instanceof Number n) {
            value = n.value();
            if (!Double.isFinite(value)) {
                problem(column, quantity.notANumber(DecimalText.display(value)));
                return Double.NaN;
            }
        } else if (content instanceof Text t) {
            DecimalText.Reading reading = DecimalText.read(t.value());
            if (reading instanceof DecimalText.Parsed p) {
                value = p.value();
            } else {
                problem(column, reading instanceof DecimalText.Ambiguous
                        ? quantity.ambiguous(t.value()) : quantity.notANumber(t.value()));
                return Double.NaN;
            }
        } else {
            String raw = textOrNull(column);
            if (raw != null) {
                problem(column, quantity.notANumber(raw));
            }
            return Double.NaN;
        }
        String violation = quantity.violation(value);
        if (violation != null) {
            problem(column, violation);
            return Double.NaN;
        }
        return value;
    }

    /** A required whole number within {@code range}; -1 (and a problem) otherwise. */
    int whole(ScheduleColumn column, WholeRange range) {
        Content content = content(column);
        double value;
        if (content instanceof Blank) {
            problem(column, range.missing());
            return -1;
        } else if (content instanceof Number n) {
            value = n.value();
        } else if (content instanceof Text t && DecimalText.read(t.value()) instanceof DecimalText.Parsed p) {
            value = p.value();
        } else {
            String raw = textOrNull(column);
            if (raw != null) {
                problem(column, range.notANumber(raw));
            }
            return -1;
        }
        String violation = range.violation(value);
        if (violation != null) {
            problem(column, violation);
            return -1;
        }
        return (int) value;
    }

    private Content content(ScheduleColumn column) {
        Cell cell = row.getCell(column.index());
        if (cell == null) {
            return new Blank();
        }
        CellType type = cell.getCellType();
        if (type == CellType.FORMULA) {
            Content unsaved = formula(cell);
            if (unsaved != null) {
                return unsaved;
            }
            type = cell.getCachedFormulaResultType();
        }
        switch (type) {
            case STRING: {
                String s = trim(cell.getStringCellValue());
                return s.isEmpty() ? new Blank() : new Text(s);
            }
            case NUMERIC:
                return new Number(cell.getNumericCellValue(), isDate(cell));
            case BOOLEAN:
                return new Flag(cell.getBooleanCellValue());
            case ERROR:
                return new Failure(errorCode(cell.getErrorCellValue()));
            default:
                return new Blank();
        }
    }

    /** The content of a formula cell when its saved value cannot serve; null when it can. */
    private Content formula(Cell cell) {
        String formula = shown(cell.getCellFormula());
        if (OTHER_FILE.matcher(formula).find()) {
            return new Unreadable("a formula that takes its value from another file (=" + formula + "); type the"
                    + " value itself, since that file may have changed since this one was saved");
        }
        if (!(cell instanceof XSSFCell x) || x.getCTCell().isSetV()) {
            return null;
        }
        CellValue value;
        try {
            value = formulas.evaluate(cell);
        } catch (RuntimeException e) {
            // a function the library lacks, a reference it cannot follow
            value = null;
        }
        if (value == null) {
            return new Unreadable("a formula with no saved value (=" + formula + ") that Strandbook cannot calculate;"
                    + " open and save the file in a spreadsheet program, or type the value");
        }
        switch (value.getCellType()) {
            case NUMERIC:
                return new Number(value.getNumberValue(), isDate(cell));
            case STRING: {
                String s = trim(value.getStringValue());
                return s.isEmpty() ? new Blank() : new Text(s);
            }
            case BOOLEAN:
                return new Flag(value.getBooleanValue());
            case ERROR:
                return new Failure(errorCode(value.getErrorValue()));
            default:
                return new Blank();
        }
    }

    private static String shown(String formula) {
        String oneLine = formula.replaceAll("\\p{Cntrl}", " ");
        return oneLine.length() <= FORMULA_SHOWN_CHARS ? oneLine : oneLine.substring(0, FORMULA_SHOWN_CHARS) + "...";
    }

    private static boolean isDate(Cell cell) {
        try {
            return DateUtil.isCellDateFormatted(cell);
        } catch (RuntimeException e) {
            // an unreadable number format is not a date format
            return false;
        }
    }

    private static String errorCode(byte code) {
        try {
            return FormulaError.forInt(code).getString();
        } catch (IllegalArgumentException e) {
            return "#" + code;
        }
    }

    static String trim(String s) {
        if (s == null) {
            return "";
        }
        int start = 0;
        int end = s.length();
        while (start < end && isSpace(s.charAt(start))) {
            start++;
        }
        while (end > start && isSpace(s.charAt(end - 1))) {
            end--;
        }
        return s.substring(start, end);
    }

    private static boolean isSpace(char c) {
        return Character.isWhitespace(c) || Character.isSpaceChar(c);
    }
}
