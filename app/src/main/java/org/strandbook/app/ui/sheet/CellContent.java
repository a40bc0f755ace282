package org.strandbook.app.ui.sheet;

/**
 * What one cell shows.
 *
 * @param text    the value as text
 * @param verdict null unless the cell is a status
 * @param problem the reason the last change to this cell was refused; empty when none
 * @param hint    shown greyed in place of a blank text (what a blank stands for); empty when none
 */
public record CellContent(String text, Verdict verdict, String problem, String hint) {

    public CellContent {
        text = text == null ? "" : text;
        problem = problem == null ? "" : problem;
        hint = hint == null ? "" : hint;
    }

    public CellContent(String text, Verdict verdict, String problem) {
        this(text, verdict, problem, "");
    }

    /** True when the cell shows its hint rather than a value. */
    public boolean showsHint() {
        return text.isEmpty() && !hint.isEmpty();
    }

    public boolean hasProblem() {
        return !problem.isEmpty();
    }
}
