package org.strandbook.app.ui.sheet;

import java.util.Locale;
import java.util.regex.Pattern;

/**
 * Parses a decimal number in a column's unit. Immutable: {@code withXxx} returns a new parser.
 *
 * <p>Accepts an optional trailing unit ("12.5 m"), the Unicode minus sign and, where the column
 * allows it, a decimal comma ("12,5") as continental spreadsheets copy it. A comma followed by
 * exactly three digits after a short whole part ("1,250") reads as 1.25 in one locale and 1250 in
 * another; a cable length off by a factor of 1000 is worse than a question, so it is rejected.
 */
public final class DecimalParser implements CellParser<Double> {

    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");
    private static final Pattern AMBIGUOUS_COMMA = Pattern.compile("[+-]?[1-9]\\d{0,2},\\d{3}");

    private final String unit;
    private final double min;
    private final boolean minInclusive;
    private final double max;
    private final boolean decimalComma;

    private DecimalParser(String unit, double min, boolean minInclusive, double max, boolean decimalComma) {
        this.unit = unit;
        this.min = min;
        this.minInclusive = minInclusive;
        this.max = max;
        this.decimalComma = decimalComma;
    }

    /** Any finite number in {@code unit} (may be empty for a pure number), decimal point only. */
    public static DecimalParser in(String unit) {
        return new DecimalParser(unit == null ? "" : unit, Double.NEGATIVE_INFINITY, true, Double.POSITIVE_INFINITY, false);
    }

    /** Values must exceed {@code bound}. */
    public DecimalParser above(double bound) {
        return new DecimalParser(unit, bound, false, max, decimalComma);
    }

    /** Values must be {@code bound} or more. */
    public DecimalParser atLeast(double bound) {
        return new DecimalParser(unit, bound, true, max, decimalComma);
    }

    /** Values must be {@code bound} or less. */
    public DecimalParser atMost(double bound) {
        return new DecimalParser(unit, min, minInclusive, bound, decimalComma);
    }

    /** Also accept a decimal comma. */
    public DecimalParser withDecimalComma() {
        return new DecimalParser(unit, min, minInclusive, max, true);
    }

    @Override
    public ParseResult<Double> parse(String text) {
        String s = text == null ? "" : text.strip().replace('\u2212', '-');
        if (s.isEmpty()) {
            return ParseResult.rejected("enter a number" + (unit.isEmpty() ? "" : " in " + unit));
        }
        if (!unit.isEmpty() && s.toLowerCase(Locale.ROOT).endsWith(unit.toLowerCase(Locale.ROOT))) {
            s = s.substring(0, s.length() - unit.length()).strip();
        }
        if (s.indexOf(',') >= 0) {
            if (!decimalComma) {
                return ParseResult.rejected("'" + text.strip() + "': use a decimal point");
            }
            if (s.indexOf('.') >= 0 || s.indexOf(',') != s.lastIndexOf(',')) {
                return ParseResult.rejected("'" + text.strip() + "': write one decimal separator and no thousands separator");
            }
            if (AMBIGUOUS_COMMA.matcher(s).matches()) {
                String whole = s.replace(",", "");
                String fraction = s.replace(',', '.');
                return ParseResult.rejected("'" + text.strip() + "' is ambiguous: write " + whole + " or " + fraction);
            }
            s = s.replace(',', '.');
        }
        if (!NUMBER.matcher(s).matches()) {
            return ParseResult.rejected("'" + text.strip() + "' is not a number" + (unit.isEmpty() ? "" : " in " + unit));
        }
        double v = Double.parseDouble(s);
        if (!Double.isFinite(v)) {
            return ParseResult.rejected("'" + text.strip() + "' is too large");
        }
        boolean lowOk = minInclusive ? v >= min : v > min;
        if (!lowOk) {
            return ParseResult.rejected("must be " + (minInclusive ? CellFormats.plain(min) + withUnit() + " or more"
                    : "more than " + CellFormats.plain(min) + withUnit()) + ", was " + CellFormats.plain(v));
        }
        if (v > max) {
            return ParseResult.rejected("must be at most " + CellFormats.plain(max) + withUnit() + ", was " + CellFormats.plain(v));
        }
        return ParseResult.accepted(v);
    }

    private String withUnit() {
        return unit.isEmpty() ? "" : " " + unit;
    }
}
