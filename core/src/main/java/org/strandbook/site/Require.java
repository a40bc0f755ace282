package org.strandbook.site;

/** Argument checks shared by the site records, with messages a technician can act on. */
final class Require {

    private Require() {
    }

    static String text(String value, String what) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(what + " must not be empty");
        }
        return value.strip();
    }

    static double positive(double value, String what) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " must be a positive number, was " + value);
        }
        return value;
    }

    static double nonNegative(double value, String what) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " must be zero or more, was " + value);
        }
        return value;
    }

    static double finite(double value, String what) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " must be a finite number, was " + value);
        }
        return value;
    }
}
