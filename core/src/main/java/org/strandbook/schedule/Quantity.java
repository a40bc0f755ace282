package org.strandbook.schedule;

/**
 * The accepted range of one numeric column and the words its messages use. Upper bounds are
 * sanity limits well beyond any real installation (a typo guard), not physics.
 *
 * @param what        the quantity as messages name it, e.g. "length"
 * @param unit        unit words, e.g. "metres"; empty for a pure number such as NA
 * @param min         lower bound
 * @param minExcluded true when {@code min} itself is not allowed
 * @param max         upper bound
 * @param maxExcluded true when {@code max} itself is not allowed
 */
record Quantity(String what, String unit, double min, boolean minExcluded, double max, boolean maxExcluded) {

    static Quantity positive(String what, String unit, double max) {
        return new Quantity(what, unit, 0, true, max, false);
    }

    static Quantity zeroOrMore(String what, String unit, double max) {
        return new Quantity(what, unit, 0, false, max, false);
    }

    static Quantity between(String what, String unit, double min, double max) {
        return new Quantity(what, unit, min, false, max, false);
    }

    static Quantity strictlyBetween(String what, String unit, double min, double max) {
        return new Quantity(what, unit, min, true, max, true);
    }

    /** The message for a value outside the range, or null when the value is accepted. */
    String violation(double value) {
        boolean belowMin = minExcluded ? !(value > min) : !(value >= min);
        boolean aboveMax = maxExcluded ? !(value < max) : !(value <= max);
        if (!belowMin && !aboveMax) {
            return null;
        }
        String was = ", was " + DecimalText.display(value);
        if (minExcluded && maxExcluded) {
            return what + " must lie between " + DecimalText.display(min) + " and " + DecimalText.display(max)
                    + " (both excluded)" + was;
        }
        if (belowMin) {
            if (min == 0 && minExcluded) {
                return what + " must be a positive number" + ofUnit() + was;
            }
            if (min == 0) {
                return what + " must be zero or a positive number" + ofUnit() + was;
            }
            return what + " must be at least " + DecimalText.display(min) + withUnit() + was;
        }
        return what + " must be at most " + DecimalText.display(max) + withUnit() + was;
    }

    String notANumber(String raw) {
        return what + " must be a number" + ofUnit() + ", was '" + raw + "'";
    }

    String ambiguous(String raw) {
        return what + " '" + raw + "' is ambiguous (thousands separator or decimal sign?): "
                + "enter it as a number cell, or without grouping";
    }

    String missing() {
        return what + " is missing: enter a number" + ofUnit();
    }

    private String ofUnit() {
        return unit.isEmpty() ? "" : " of " + unit;
    }

    private String withUnit() {
        return unit.isEmpty() ? "" : " " + unit;
    }
}
