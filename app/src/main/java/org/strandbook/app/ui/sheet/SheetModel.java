package org.strandbook.app.ui.sheet;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.BiFunction;
import java.util.stream.Collectors;

import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The view model of one spreadsheet-like table: rows of immutable records {@code R}, their columns,
 * and every change a technician makes (typing, pasting a block, filling down, clearing, inserting
 * and deleting rows, undo, redo). Plain Java on javafx.base properties only: no scene graph.
 *
 * <p>Every change is all-or-nothing: each cell is parsed and validated, the sheet-wide checks run
 * (unique key), and only then is the new list of records applied as one undo step. A refused
 * change leaves the rows as they were, marks the refused cells and names them in {@link #statusProperty()}.
 *
 * <p>Computed columns are refreshed after every change by the evaluator, a
 * {@code Function<List<R>, List<RowFigures>>} that sees all rows; change listeners then receive the
 * new rows, e.g. to save them or run a longer evaluation in the background. Not thread-safe: call
 * it from one thread (the FX thread in the window).
 */
public final class SheetModel<R> {

    private static final int UNDO_LIMIT = 200;
    private static final int REASONS_SHOWN = 4;

    private final List<SheetColumn<R>> columns;
    private final BiFunction<R, List<R>, R> nextRow;
    private final Function<R, String> uniqueKey;
    private final int uniqueColumn;
    private Function<List<R>, List<RowFigures>> evaluator;

    private final ObservableList<SheetRow<R>> rows = FXCollections.observableArrayList();
    private final ObservableList<SheetRow<R>> rowsView = FXCollections.unmodifiableObservableList(rows);
    private List<R> records = List.of();
    private List<RowFigures> figures = new ArrayList<>();
    private String evaluationProblem = "";
    private final Map<CellAddress, String> problems = new HashMap<>();
    private final SheetHistory<R> history = new SheetHistory<>(UNDO_LIMIT);
    private final List<Consumer<List<R>>> changeListeners = new CopyOnWriteArrayList<>();

    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "");
    private final ReadOnlyBooleanWrapper statusIsProblem = new ReadOnlyBooleanWrapper(this, "statusIsProblem", false);
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper(this, "canUndo", false);
    private final ReadOnlyBooleanWrapper canRedo = new ReadOnlyBooleanWrapper(this, "canRedo", false);

    private SheetModel(Builder<R> b) {
        if (b.columns.isEmpty()) {
            throw new IllegalArgumentException("a sheet needs at least one column");
        }
        this.columns = List.copyOf(b.columns);
        this.nextRow = b.nextRow;
        this.uniqueKey = b.uniqueKey;
        this.uniqueColumn = b.uniqueKeyColumn == null ? -1 : columnIndex(b.uniqueKeyColumn);
        if (uniqueKey != null && uniqueColumn < 0) {
            throw new IllegalArgumentException("unique key column '" + b.uniqueKeyColumn + "' is not in the sheet");
        }
        this.evaluator = b.evaluator;
    }

    public static <R> Builder<R> builder() {
        return new Builder<>();
    }

    /** An evaluator that computes each row's figures from that row alone. */
    public static <R> Function<List<R>, List<RowFigures>> perRow(Function<R, RowFigures> f) {
        return rs -> rs.stream().map(f).toList();
    }

    // ---- reading

    public List<SheetColumn<R>> columns() {
        return columns;
    }

    public int columnCount() {
        return columns.size();
    }

    public int rowCount() {
        return records.size();
    }

    /** The rows the view shows; changes only through this model. */
    public ObservableList<SheetRow<R>> rows() {
        return rowsView;
    }

    public List<R> records() {
        return records;
    }

    public String text(CellAddress at) {
        return rows.get(at.row()).cell(at.column()).text();
    }

    public Optional<String> problemAt(CellAddress at) {
        return Optional.ofNullable(problems.get(at));
    }

    public int columnIndex(String key) {
        for (int c = 0; c < columns.size(); c++) {
            if (columns.get(c).key().equals(key)) {
                return c;
            }
        }
        return -1;
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    /** True while the status line reports a refusal. */
    public ReadOnlyBooleanProperty statusIsProblemProperty() {
        return statusIsProblem.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo.getReadOnlyProperty();
    }

    // ---- hooks

    /** Replaces the evaluator of computed columns and recomputes at once. */
    public void setEvaluator(Function<List<R>, List<RowFigures>> evaluator) {
        this.evaluator = evaluator;
        recompute();
    }

    /** Recomputes the computed columns, e.g. after a catalog the evaluator reads has changed. */
    public void recompute() {
        evaluate();
        refreshCells();
    }

    /**
     * Recomputes one row's figures. Only for evaluators whose rows do not depend on each other, such
     * as {@link #perRow}: on a long sheet it spares every other row.
     */
    public void recomputeRow(int row) {
        if (row < 0 || row >= records.size() || evaluator == null) {
            return;
        }
        try {
            figures.set(row, evaluator.apply(List.of(records.get(row))).get(0));
        } catch (RuntimeException e) {
            figures.set(row, RowFigures.NONE);
        }
        fill(rows.get(row), row);
    }

    /** Called with the new rows after every applied change (not after {@link #load}). */
    public void addChangeListener(Consumer<List<R>> listener) {
        changeListeners.add(listener);
    }

    // ---- changes

    /** Shows {@code newRecords} as the sheet's content, forgetting the undo history. */
    public void load(List<R> newRecords) {
        history.clear();
        problems.clear();
        apply(List.copyOf(newRecords));
        say("", false);
    }

    /** Sets one cell from typed text. */
    public SheetOutcome edit(CellAddress at, String text) {
        Optional<String> outside = outside(CellRange.single(at));
        if (outside.isPresent()) {
            return refuse(outside.get(), List.of());
        }
        SheetColumn<R> column = columns.get(at.column());
        if (!(column instanceof InputColumn<R, ?> input)) {
            return refuse(at.name() + " " + column.header() + " is computed; change the inputs it is computed from", List.of());
        }
        ParseResult<R> result = input.withText(records.get(at.row()), text);
        if (result instanceof ParseResult.Rejected<R> r) {
            return refuse("", List.of(new CellProblem(at, column.header(), r.reason())));
        }
        R changed = ((ParseResult.Accepted<R>) result).value();
        if (changed.equals(records.get(at.row()))) {
            clearProblems();
            say("", false);
            return SheetOutcome.done("");
        }
        List<R> candidate = new ArrayList<>(records);
        candidate.set(at.row(), changed);
        return commit("edit of " + at.name(), candidate);
    }

    /**
     * Pastes tab-separated text with its top-left cell at the selection's top-left. A single value
     * pasted onto a larger selection fills the selection. A block reaching below the last row adds
     * rows, each derived from the row above. Computed cells in the target keep their figures.
     */
    public SheetOutcome paste(CellRange selection, String clipboardText) {
        List<List<String>> block = TabularText.parse(clipboardText);
        if (block.isEmpty()) {
            return refuse("Nothing pasted: the clipboard holds no text", List.of());
        }
        Optional<String> ragged = TabularText.notRectangular(block);
        if (ragged.isPresent()) {
            return refuse("Nothing pasted: " + ragged.get(), List.of());
        }
        boolean oneValue = block.size() == 1 && block.get(0).size() == 1;
        CellRange target = oneValue ? selection
                : new CellRange(selection.top(), selection.left(), selection.top() + block.size() - 1,
                selection.left() + block.get(0).size() - 1);
        if (target.right() >= columns.size()) {
            return refuse("Nothing pasted: the block is " + target.columnCount() + " columns wide but the sheet has only "
                    + (columns.size() - target.left()) + " columns from " + CellAddress.columnName(target.left()), List.of());
        }
        List<R> candidate = new ArrayList<>(records);
        if (target.bottom() >= candidate.size()) {
            if (nextRow == null || candidate.isEmpty()) {
                return refuse("Nothing pasted: the block reaches row " + (target.bottom() + 1) + " but the sheet ends at row "
                        + candidate.size(), List.of());
            }
            while (candidate.size() <= target.bottom()) {
                candidate.add(nextRow.apply(candidate.get(candidate.size() - 1), List.copyOf(candidate)));
            }
        }
        List<CellProblem> refused = new ArrayList<>();
        int kept = 0;
        for (int r = target.top(); r <= target.bottom(); r++) {
            R row = candidate.get(r);
            for (int c = target.left(); c <= target.right(); c++) {
                String text = oneValue ? block.get(0).get(0) : block.get(r - target.top()).get(c - target.left());
                if (!(columns.get(c) instanceof InputColumn<R, ?> input)) {
                    kept++;
                    continue;
                }
                ParseResult<R> result = input.withText(row, text);
                if (result instanceof ParseResult.Accepted<R> a) {
                    row = a.value();
                } else {
                    refused.add(new CellProblem(new CellAddress(r, c), input.header(), ((ParseResult.Rejected<R>) result).reason()));
                }
            }
            candidate.set(r, row);
        }
        if (!refused.isEmpty()) {
            return refuse("Nothing pasted", refused);
        }
        SheetOutcome outcome = commit("paste into " + target.name(), candidate);
        if (outcome.applied() && kept > 0) {
            say(status.get() + "; " + kept + " computed cell" + (kept == 1 ? "" : "s") + " kept their figures", false);
        }
        return outcome;
    }

    /** The selected cells as tab-separated text, as shown. */
    public String copy(CellRange selection) {
        List<List<String>> block = new ArrayList<>();
        for (int r = selection.top(); r <= Math.min(selection.bottom(), rows.size() - 1); r++) {
            List<String> line = new ArrayList<>();
            for (int c = selection.left(); c <= Math.min(selection.right(), columns.size() - 1); c++) {
                line.add(rows.get(r).cell(c).text());
            }
            block.add(line);
        }
        say("Copied " + selection.name(), false);
        return TabularText.format(block);
    }

    /** Copies the top cell of each selected column into the selected cells below it. */
    public SheetOutcome fillDown(CellRange selection) {
        Optional<String> outside = outside(selection);
        if (outside.isPresent()) {
            return refuse(outside.get(), List.of());
        }
        if (selection.rowCount() < 2) {
            return refuse("Fill down: select the cell to copy and the cells below it", List.of());
        }
        List<R> candidate = new ArrayList<>(records);
        List<CellProblem> refused = new ArrayList<>();
        for (int c = selection.left(); c <= selection.right(); c++) {
            if (!(columns.get(c) instanceof InputColumn<R, ?> input)) {
                continue;
            }
            R source = candidate.get(selection.top());
            for (int r = selection.top() + 1; r <= selection.bottom(); r++) {
                ParseResult<R> result = input.withValueOf(source, candidate.get(r));
                if (result instanceof ParseResult.Accepted<R> a) {
                    candidate.set(r, a.value());
                } else {
                    refused.add(new CellProblem(new CellAddress(r, c), input.header(), ((ParseResult.Rejected<R>) result).reason()));
                }
            }
        }
        if (!refused.isEmpty()) {
            return refuse("Nothing filled", refused);
        }
        return commit("fill down " + selection.name(), candidate);
    }

    /** Empties the selected input cells; columns that need a value refuse, and then nothing changes. */
    public SheetOutcome clear(CellRange selection) {
        Optional<String> outside = outside(selection);
        if (outside.isPresent()) {
            return refuse(outside.get(), List.of());
        }
        List<R> candidate = new ArrayList<>(records);
        List<CellProblem> refused = new ArrayList<>();
        for (int r = selection.top(); r <= selection.bottom(); r++) {
            R row = candidate.get(r);
            for (int c = selection.left(); c <= selection.right(); c++) {
                if (columns.get(c) instanceof InputColumn<R, ?> input) {
                    ParseResult<R> result = input.withText(row, "");
                    if (result instanceof ParseResult.Accepted<R> a) {
                        row = a.value();
                    } else {
                        refused.add(new CellProblem(new CellAddress(r, c), input.header(), ((ParseResult.Rejected<R>) result).reason()));
                    }
                }
            }
            candidate.set(r, row);
        }
        if (!refused.isEmpty()) {
            return refuse("Nothing cleared", refused);
        }
        return commit("clear " + selection.name(), candidate);
    }

    /** Inserts below {@code row} a row derived from it (as the sheet derives new rows). */
    public SheetOutcome insertRowBelow(int row) {
        if (nextRow == null || row < 0 || row >= records.size()) {
            return refuse("Rows cannot be added here", List.of());
        }
        List<R> candidate = new ArrayList<>(records);
        candidate.add(row + 1, nextRow.apply(records.get(row), records));
        return commit("insert row " + (row + 2), candidate);
    }

    /** Deletes rows {@code top} to {@code bottom}, inclusive. */
    public SheetOutcome deleteRows(int top, int bottom) {
        if (nextRow == null || top < 0 || bottom >= records.size() || bottom < top) {
            return refuse("Rows cannot be deleted here", List.of());
        }
        List<R> candidate = new ArrayList<>(records);
        candidate.subList(top, bottom + 1).clear();
        return commit("delete rows " + (top + 1) + (bottom > top ? "-" + (bottom + 1) : ""), candidate);
    }

    public SheetOutcome undo() {
        Optional<SheetHistory.Step<R>> step = history.undo();
        if (step.isEmpty()) {
            return refuse("Nothing to undo", List.of());
        }
        return restore(step.get().before(), "Undone: " + step.get().label());
    }

    public SheetOutcome redo() {
        Optional<SheetHistory.Step<R>> step = history.redo();
        if (step.isEmpty()) {
            return refuse("Nothing to redo", List.of());
        }
        return restore(step.get().after(), "Redone: " + step.get().label());
    }

    // ---- internals

    private SheetOutcome restore(List<R> snapshot, String message) {
        problems.clear();
        apply(snapshot);
        say(message, false);
        notifyListeners();
        return SheetOutcome.done(message);
    }

    private SheetOutcome commit(String label, List<R> candidate) {
        List<CellProblem> duplicates = duplicateKeys(candidate);
        if (!duplicates.isEmpty()) {
            return refuse("Nothing changed", duplicates);
        }
        history.record(new SheetHistory.Step<>(label, records, List.copyOf(candidate)));
        problems.clear();
        apply(List.copyOf(candidate));
        String message = capitalise(label) + " applied" + (evaluationProblem.isEmpty() ? "" : "; " + evaluationProblem);
        say(message, !evaluationProblem.isEmpty());
        notifyListeners();
        return SheetOutcome.done(message);
    }

    private List<CellProblem> duplicateKeys(List<R> candidate) {
        if (uniqueKey == null) {
            return List.of();
        }
        Map<String, Integer> firstRow = new HashMap<>();
        List<CellProblem> found = new ArrayList<>();
        for (int r = 0; r < candidate.size(); r++) {
            String key = uniqueKey.apply(candidate.get(r)).toLowerCase(Locale.ROOT);
            Integer earlier = firstRow.putIfAbsent(key, r);
            if (earlier != null) {
                found.add(new CellProblem(new CellAddress(r, uniqueColumn), columns.get(uniqueColumn).header(),
                        "'" + uniqueKey.apply(candidate.get(r)) + "' is already used in row " + (earlier + 1)));
            }
        }
        return found;
    }

    private SheetOutcome refuse(String message, List<CellProblem> refused) {
        clearProblems();
        for (CellProblem p : refused) {
            if (p.address().row() < rows.size()) {
                problems.put(p.address(), p.reason());
            }
        }
        refreshCells();
        String reasons = refused.stream().limit(REASONS_SHOWN).map(CellProblem::describe).collect(Collectors.joining("; "));
        if (refused.size() > REASONS_SHOWN) {
            reasons += "; and " + (refused.size() - REASONS_SHOWN) + " more";
        }
        String full = message.isEmpty() ? reasons : reasons.isEmpty() ? message : message + ": " + reasons;
        say(full, true);
        return new SheetOutcome(false, full, refused);
    }

    private void clearProblems() {
        if (!problems.isEmpty()) {
            problems.clear();
            refreshCells();
        }
    }

    private Optional<String> outside(CellRange range) {
        if (range.bottom() >= records.size() || range.right() >= columns.size()) {
            return Optional.of(range.name() + " is outside the sheet");
        }
        return Optional.empty();
    }

    private void apply(List<R> next) {
        records = Collections.unmodifiableList(next);
        evaluate();
        if (rows.size() > next.size()) {
            rows.remove(next.size(), rows.size());
        }
        // new rows get their content before they are added, so list listeners see finished rows
        List<SheetRow<R>> added = new ArrayList<>();
        int existing = rows.size();
        for (int r = 0; r < next.size(); r++) {
            SheetRow<R> row;
            if (r < existing) {
                row = rows.get(r);
                row.setRecord(next.get(r));
            } else {
                row = new SheetRow<>(next.get(r), columns.size());
                added.add(row);
            }
            fill(row, r);
        }
        rows.addAll(added);
    }

    private void evaluate() {
        evaluationProblem = "";
        if (evaluator == null) {
            figures = new ArrayList<>(Collections.nCopies(records.size(), RowFigures.NONE));
            return;
        }
        try {
            List<RowFigures> computed = evaluator.apply(records);
            if (computed.size() != records.size()) {
                throw new IllegalStateException("the evaluator returned " + computed.size() + " rows for " + records.size());
            }
            figures = new ArrayList<>(computed);
        } catch (RuntimeException e) {
            figures = new ArrayList<>(Collections.nCopies(records.size(), RowFigures.NONE));
            evaluationProblem = "computed columns unavailable: " + Objects.requireNonNullElse(e.getMessage(), e.getClass().getSimpleName());
        }
    }

    private void refreshCells() {
        for (int r = 0; r < rows.size(); r++) {
            fill(rows.get(r), r);
        }
    }

    private void fill(SheetRow<R> row, int r) {
        for (int c = 0; c < columns.size(); c++) {
            row.setCell(c, contentOf(r, c));
        }
    }

    private CellContent contentOf(int r, int c) {
        R record = records.get(r);
        String problem = problems.get(new CellAddress(r, c));
        SheetColumn<R> column = columns.get(c);
        if (column instanceof InputColumn<R, ?> input) {
            return new CellContent(input.text(record), null, problem, input.hint(record));
        }
        ComputedColumn<R> computed = (ComputedColumn<R>) column;
        Figure figure = computed.fromRow() != null ? computed.fromRow().apply(record) : figures.get(r).figure(column.key());
        return new CellContent(figure.text(), figure.verdict(), problem);
    }

    private void notifyListeners() {
        for (Consumer<List<R>> l : changeListeners) {
            l.accept(records);
        }
    }

    private void say(String message, boolean problem) {
        status.set(message);
        statusIsProblem.set(problem);
        canUndo.set(history.canUndo());
        canRedo.set(history.canRedo());
    }

    private static String capitalise(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    /** Builds a {@link SheetModel}. */
    public static final class Builder<R> {

        private final List<SheetColumn<R>> columns = new ArrayList<>();
        private BiFunction<R, List<R>, R> nextRow;
        private Function<R, String> uniqueKey;
        private String uniqueKeyColumn;
        private Function<List<R>, List<RowFigures>> evaluator;

        private Builder() {
        }

        public Builder<R> column(SheetColumn<R> column) {
            columns.add(column);
            return this;
        }

        /**
         * Lets the sheet grow: a new row is derived from the row above it; the function also sees
         * all rows so far, e.g. to pick an unused label.
         */
        public Builder<R> newRowsFrom(BiFunction<R, List<R>, R> nextRow) {
            this.nextRow = nextRow;
            return this;
        }

        /** No two rows may share {@code key} (ignoring case); refusals point at {@code columnKey}. */
        public Builder<R> uniqueKey(String columnKey, Function<R, String> key) {
            this.uniqueKeyColumn = columnKey;
            this.uniqueKey = key;
            return this;
        }

        public Builder<R> evaluator(Function<List<R>, List<RowFigures>> evaluator) {
            this.evaluator = evaluator;
            return this;
        }

        public SheetModel<R> build() {
            return new SheetModel<>(this);
        }
    }
}
