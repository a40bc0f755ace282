package org.strandbook.app.ui.sheet;

/** A pass/review/fail outcome, written with a symbol and a word so colour never carries it alone. */
public enum Verdict {
    PASS("\u2714", "PASS"),
    REVIEW("\u25B2", "REVIEW"),
    FAIL("\u2716", "FAIL");

    private final String symbol;
    private final String word;

    Verdict(String symbol, String word) {
        this.symbol = symbol;
        this.word = word;
    }

    public String symbol() {
        return symbol;
    }

    /** "✔ PASS", "▲ REVIEW", "✖ FAIL". */
    public String label() {
        return symbol + " " + word;
    }
}
