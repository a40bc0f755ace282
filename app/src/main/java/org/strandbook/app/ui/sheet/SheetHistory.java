package org.strandbook.app.ui.sheet;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import java.util.Optional;

/**
 * Undo and redo as whole-sheet snapshots. Rows are immutable records, so a snapshot is a list of
 * references: cheap, and an undo can never leave a half-restored sheet.
 */
final class SheetHistory<R> {

    record Step<R>(String label, List<R> before, List<R> after) {
    }

    private final int limit;
    private final Deque<Step<R>> undo = new ArrayDeque<>();
    private final Deque<Step<R>> redo = new ArrayDeque<>();

    SheetHistory(int limit) {
        this.limit = limit;
    }

    void record(Step<R> step) {
        undo.push(step);
        while (undo.size() > limit) {
            undo.removeLast();
        }
        redo.clear();
    }

    Optional<Step<R>> undo() {
        Step<R> step = undo.poll();
        if (step != null) {
            redo.push(step);
        }
        return Optional.ofNullable(step);
    }

    Optional<Step<R>> redo() {
        Step<R> step = redo.poll();
        if (step != null) {
            undo.push(step);
        }
        return Optional.ofNullable(step);
    }

    boolean canUndo() {
        return !undo.isEmpty();
    }

    boolean canRedo() {
        return !redo.isEmpty();
    }

    void clear() {
        undo.clear();
        redo.clear();
    }
}
