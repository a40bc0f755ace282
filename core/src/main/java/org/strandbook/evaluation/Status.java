package org.strandbook.evaluation;

/**
 * Acceptance status. Every report carries it as a word and a symbol, never as colour alone.
 */
public enum Status {
    PASS("✔"),
    REVIEW("▲"),
    FAIL("✖");

    private final String symbol;

    Status(String symbol) {
        this.symbol = symbol;
    }

    public String symbol() {
        return symbol;
    }

    /** Symbol and word, e.g. "✖ FAIL". */
    public String label() {
        return symbol + " " + name();
    }

    public Status worse(Status other) {
        return other.ordinal() > ordinal() ? other : this;
    }
}
