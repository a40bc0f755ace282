package org.strandbook.schedule;

import java.math.BigDecimal;
import java.util.regex.Pattern;

/**
 * Numbers that arrive as text in a numeric column, and numbers shown back in messages.
 *
 * <p>Accepted: an optional sign (ASCII or the Unicode minus), digits, one decimal sign that may be a
 * point or a comma, an optional exponent ({@code 1.5e3}). ISO 80000-1:2009 (numbers: decimal sign, digit grouping) allows either
 * decimal sign and groups digits in threes with a space, never with a point or comma; so spaces
 * (also no-break and thin spaces) between digits are dropped, while a point or comma followed by
 * exactly three digits after one to three leading digits ({@code 1,234}, {@code 12.500}) is
 * rejected as ambiguous: a contractor may have meant a thousands separator. "NaN", "Infinity", units
 * and anything else are not numbers.
 */
final class DecimalText {

    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+([.,]\\d*)?|[.,]\\d+)([eE][+-]?\\d+)?");
    private static final Pattern GROUPED = Pattern.compile("[+-]?[1-9]\\d{0,2}[.,]\\d{3}");
    private static final Pattern SPACE_BETWEEN_DIGITS = Pattern.compile("(?<=\\d)[ \u00A0\u2009\u202F](?=\\d)");

    private DecimalText() {
    }

    /** Outcome of reading one text: a finite number, or why not. */
    sealed interface Reading permits Parsed, Ambiguous, NotANumber {
    }

    record Parsed(double value) implements Reading {
    }

    record Ambiguous() implements Reading {
    }

    record NotANumber() implements Reading {
    }

    static Reading read(String text) {
        String s = SPACE_BETWEEN_DIGITS.matcher(text.strip()).replaceAll("").replace('\u2212', '-');
        if (!NUMBER.matcher(s).matches()) {
            return new NotANumber();
        }
        if (GROUPED.matcher(s).matches()) {
            return new Ambiguous();
        }
        double value = Double.parseDouble(s.replace(',', '.'));
        return Double.isFinite(value) ? new Parsed(value) : new NotANumber();
    }

    /**
     * A number as a contractor would write it: whole numbers without a decimal point, others in
     * their shortest exact decimal form, very large or small ones with an exponent (1E+308).
     */
    static String display(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        BigDecimal d = BigDecimal.valueOf(value).stripTrailingZeros();
        return Math.abs(value) >= 1e15 || Math.abs(value) < 1e-6 ? d.toString() : d.toPlainString();
    }
}
