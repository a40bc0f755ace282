package org.strandbook.scanfile;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.Set;

/**
 * Strict reading and plain writing of decimal numbers in spectrum files.
 *
 * <p>{@link Double#parseDouble} alone is too forgiving for file input: it takes "NaN", "Infinity",
 * hexadecimal floats and a trailing "d" or "f". A field is first checked against the plain decimal
 * syntax {@code [+-]digits[.digits][(E|e)[+-]digits]} (digits on at least one side of the point),
 * and only then converted.
 */
final class NumberField {

    private static final Set<String> NON_FINITE_WORDS = Set.of("nan", "+nan", "-nan", "inf", "+inf", "-inf",
            "infinity", "+infinity", "-infinity", "1.#inf", "-1.#inf", "1.#ind", "-1.#ind", "1.#qnan", "-1.#qnan",
            "∞", "+∞", "-∞");

    private NumberField() {
    }

    /** True if {@code field} is a plain decimal number (see class comment). */
    static boolean isPlainDecimal(String field) {
        int n = field.length();
        int i = 0;
        if (i < n && (field.charAt(i) == '+' || field.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < n && isDigit(field.charAt(i))) {
            i++;
            digits++;
        }
        if (i < n && field.charAt(i) == '.') {
            i++;
            while (i < n && isDigit(field.charAt(i))) {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return false;
        }
        if (i < n && (field.charAt(i) == 'e' || field.charAt(i) == 'E')) {
            i++;
            if (i < n && (field.charAt(i) == '+' || field.charAt(i) == '-')) {
                i++;
            }
            int exponentDigits = 0;
            while (i < n && isDigit(field.charAt(i))) {
                i++;
                exponentDigits++;
            }
            if (exponentDigits == 0) {
                return false;
            }
        }
        return i == n;
    }

    /** True for the words spreadsheets and instruments write for not-a-number and infinity. */
    static boolean isNonFiniteWord(String field) {
        return NON_FINITE_WORDS.contains(field.toLowerCase(Locale.ROOT));
    }

    /** The value of a field that passed {@link #isPlainDecimal}; may be infinite if out of range. */
    static double parsePlainDecimal(String field) {
        return Double.parseDouble(field);
    }

    /** Shortest decimal text that reads back to exactly {@code value}, never in E notation. */
    static String plain(double value) {
        if (value == 0) {
            return "0";
        }
        if (!Double.isFinite(value)) {
            return String.valueOf(value);
        }
        return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }

    /** The field cut to a length fit for an error message. */
    static String quote(String field) {
        String shown = field.length() > 40 ? field.substring(0, 40) + "…" : field;
        return "'" + shown + "'";
    }

    static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }
}
