package org.strandbook.schedule;

/** The accepted range of a whole-number column (channel, position, counts) and its message words. */
record WholeRange(String what, int min, int max) {

    String violation(double value) {
        if (value == Math.rint(value) && value >= min && value <= max) {
            return null;
        }
        return what + " must be a whole number from " + min + " to " + max + ", was " + DecimalText.display(value);
    }

    String notANumber(String raw) {
        return what + " must be a whole number from " + min + " to " + max + ", was '" + raw + "'";
    }

    String missing() {
        return what + " is missing: enter a whole number from " + min + " to " + max;
    }
}
