package org.strandbook.site;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * How far an input may lie from its entered value, as a site states it, in a form a technician
 * writes in a cell: "±0.3 dB" (rectangular, half-width), "u 0.05 dB" (normal, the standard
 * uncertainty, as a reading's certificate states it) or "5..40 ppm" (rectangular, the range of the
 * value itself, where the input allows it).
 *
 * @param form  which of the three
 * @param low   half-width or standard uncertainty (± and u forms), or the range's lower end
 * @param high  equal to {@code low} for the ± and u forms, or the range's upper end
 * @param unit  the unit as the input spells it ("dB", "%", "ppm", "m", "mm")
 */
public record StatedSpread(Form form, double low, double high, String unit) {

    /** The three ways of stating a spread. */
    public enum Form {
        /** ± a half-width about the entered value, rectangular. */
        PLUS_MINUS,
        /** A standard uncertainty about the entered value, normal. */
        STANDARD_UNCERTAINTY,
        /** The value lies between two bounds, rectangular. */
        RANGE
    }

    private static final String NUMBER = "(\\d+(?:[.,]\\d*)?|[.,]\\d+)";
    private static final Pattern PLUS_MINUS = Pattern.compile("(?:±|\\+/-|\\+-)\\s*" + NUMBER + "\\s*(\\S+)");
    private static final Pattern STANDARD = Pattern.compile("u\\s*=?\\s*" + NUMBER + "\\s*(\\S+)",
            Pattern.CASE_INSENSITIVE);
    private static final Pattern RANGE = Pattern.compile(NUMBER + "\\s*(?:\\.\\.|–|-|to)\\s*" + NUMBER + "\\s*(\\S+)",
            Pattern.CASE_INSENSITIVE);

    public StatedSpread {
        Objects.requireNonNull(form, "form");
        Objects.requireNonNull(unit, "unit");
        Require.nonNegative(low, "spread");
        Require.nonNegative(high, "spread");
        if (form != Form.RANGE && low != high) {
            throw new IllegalArgumentException("a ± or u spread has one size, was " + low + " and " + high);
        }
        if (high < low) {
            throw new IllegalArgumentException("a range runs from low to high, was " + plain(low) + ".." + plain(high));
        }
    }

    /** ± {@code halfWidth} {@code unit}, rectangular. */
    public static StatedSpread plusMinus(double halfWidth, String unit) {
        return new StatedSpread(Form.PLUS_MINUS, halfWidth, halfWidth, unit);
    }

    /** A normal spread of standard uncertainty {@code u} {@code unit}. */
    public static StatedSpread standardUncertainty(double u, String unit) {
        return new StatedSpread(Form.STANDARD_UNCERTAINTY, u, u, unit);
    }

    /**
     * Reads a spread of {@code input} as a person writes it.
     *
     * @throws IllegalArgumentException saying what was expected, with an example for the input
     */
    public static StatedSpread parse(String text, SpreadInput input) {
        String s = text == null ? "" : text.strip();
        Matcher m;
        StatedSpread spread;
        if ((m = PLUS_MINUS.matcher(s)).matches()) {
            spread = plusMinus(number(m.group(1)), unit(m.group(2), s, input));
        } else if ((m = STANDARD.matcher(s)).matches()) {
            spread = standardUncertainty(number(m.group(1)), unit(m.group(2), s, input));
        } else if ((m = RANGE.matcher(s)).matches() && input.rangeAllowed()) {
            double low = number(m.group(1));
            double high = number(m.group(2));
            if (high < low) {
                throw new IllegalArgumentException(input.words() + " spread '" + s + "': the range must run from low"
                        + " to high");
            }
            String unit = unit(m.group(3), s, input);
            if (unit.equals("%")) {
                throw new IllegalArgumentException(input.words() + " spread '" + s + "': a range is of the value"
                        + " itself, in " + input.units().get(0) + "; a relative spread is written ±n %");
            }
            spread = new StatedSpread(Form.RANGE, low, high, unit);
        } else {
            throw new IllegalArgumentException(input.words() + " spread '" + s + "' is not one; write it like "
                    + input.example());
        }
        if (spread.unit().equals("%") && spread.high() >= 100 && spread.form() != Form.RANGE) {
            throw new IllegalArgumentException(input.words() + " spread '" + s + "': a relative spread must be below"
                    + " 100 %");
        }
        return spread;
    }

    /** True for the u form, the one read as a normal distribution. */
    public boolean normal() {
        return form == Form.STANDARD_UNCERTAINTY;
    }

    /** True when stated relative to the entered value (%). */
    public boolean relative() {
        return unit.equals("%");
    }

    /** The spread as {@link #parse} reads it back: "±0.3 dB", "u 0.05 dB", "5..40 ppm". */
    @Override
    public String toString() {
        return switch (form) {
            case PLUS_MINUS -> "±" + plain(low) + " " + unit;
            case STANDARD_UNCERTAINTY -> "u " + plain(low) + " " + unit;
            case RANGE -> plain(low) + ".." + plain(high) + " " + unit;
        };
    }

    private static double number(String text) {
        double v = Double.parseDouble(text.replace(',', '.'));
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("spread must be a finite number, was " + text);
        }
        return v;
    }

    private static String unit(String written, String text, SpreadInput input) {
        for (String u : input.units()) {
            if (u.equalsIgnoreCase(written)) {
                return u;
            }
        }
        throw new IllegalArgumentException(input.words() + " spread '" + text + "': unit '" + written + "' is not one"
                + " of " + String.join(", ", input.units()) + "; write it like " + input.example());
    }

    private static String plain(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString().toLowerCase(Locale.ROOT);
    }
}
