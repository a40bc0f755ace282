package org.strandbook.app.ui.sheet;

import java.util.List;

/** Whether an edit, paste, fill or undo changed the sheet, with the message and any refused cells. */
public record SheetOutcome(boolean applied, String message, List<CellProblem> problems) {

    public SheetOutcome {
        problems = List.copyOf(problems);
    }

    static SheetOutcome done(String message) {
        return new SheetOutcome(true, message, List.of());
    }

    static SheetOutcome refused(String message) {
        return new SheetOutcome(false, message, List.of());
    }
}
