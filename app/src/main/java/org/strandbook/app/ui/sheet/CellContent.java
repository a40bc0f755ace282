package org.strandbook.app.ui.sheet;

/**
 * What one cell shows.
 *
 * @param text    the value as text
 * @param verdict null unless the cell is a status
 * @param problem the reason the last change to this cell was refused; empty when none
 */
public record CellContent(String text, Verdict verdict, String problem) {

    public CellContent {
        text = text == null ? "" : text;
        problem = problem == null ? "" : problem;
    }

    public boolean hasProblem() {
        return !problem.isEmpty();
    }
}
