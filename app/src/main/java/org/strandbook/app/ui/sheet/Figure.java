package org.strandbook.app.ui.sheet;

import java.util.Locale;

/**
 * The content of a computed cell: its text and, for status cells, the verdict the view styles
 * (the text already carries the verdict's symbol and word).
 *
 * @param text    what the cell shows
 * @param verdict null for cells that are not a verdict
 */
public record Figure(String text, Verdict verdict) {

    public static final Figure BLANK = new Figure("", null);

    public Figure {
        text = text == null ? "" : text;
    }

    public static Figure text(String text) {
        return new Figure(text, null);
    }

    /** A number with fixed decimals, Locale.ROOT. */
    public static Figure number(double value, int places) {
        return new Figure(String.format(Locale.ROOT, "%." + places + "f", value), null);
    }

    public static Figure of(Verdict verdict) {
        return new Figure(verdict.label(), verdict);
    }
}
