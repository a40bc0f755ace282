package org.strandbook.app.ui.sheet;

import java.util.List;
import java.util.Optional;

import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.collections.ListChangeListener;
import javafx.css.PseudoClass;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.SelectionMode;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TablePosition;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;

/**
 * A spreadsheet-like table over a {@link SheetModel}. This class only maps keys, mouse and the
 * system clipboard onto the model; every rule lives there.
 *
 * <p>Keys: arrows move, Shift+arrows and mouse drag extend the selection, Tab / Shift+Tab and
 * Enter / Shift+Enter move right/left and down/up, typing starts editing, F2 edits the current
 * text, Enter commits (and moves down), Tab commits (and moves right), Escape cancels, Delete
 * clears, Ctrl+C / Ctrl+V copy and paste tab-separated blocks, Ctrl+D fills down, Ctrl+Z undoes,
 * Ctrl+Y and Ctrl+Shift+Z redo, Ctrl+Shift+Plus inserts a row below, Ctrl+Minus deletes the
 * selected rows.
 */
public final class SheetView<R> {

    static final String ROW_NUMBER_STYLE = "sheet-row-number";
    private static final Font CELL_FONT = Font.font(13);
    private static final Font HEADER_FONT = Font.font(null, FontWeight.BOLD, 13);
    private static final double MIN_COLUMN_WIDTH = 56;
    private static final double MAX_COLUMN_WIDTH = 280;

    private static final KeyCombination COPY = new KeyCodeCombination(KeyCode.C, KeyCombination.SHORTCUT_DOWN);
    private static final KeyCombination PASTE = new KeyCodeCombination(KeyCode.V, KeyCombination.SHORTCUT_DOWN);
    private static final KeyCombination FILL_DOWN = new KeyCodeCombination(KeyCode.D, KeyCombination.SHORTCUT_DOWN);
    private static final KeyCombination UNDO = new KeyCodeCombination(KeyCode.Z, KeyCombination.SHORTCUT_DOWN);
    private static final KeyCombination REDO = new KeyCodeCombination(KeyCode.Y, KeyCombination.SHORTCUT_DOWN);
    private static final KeyCombination REDO_SHIFT = new KeyCodeCombination(KeyCode.Z, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN);
    private static final KeyCombination INSERT_ROW = new KeyCodeCombination(KeyCode.PLUS, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_ANY);
    private static final KeyCombination INSERT_ROW_ADD = new KeyCodeCombination(KeyCode.ADD, KeyCombination.SHORTCUT_DOWN);
    private static final KeyCombination INSERT_ROW_EQUALS = new KeyCodeCombination(KeyCode.EQUALS, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN);
    private static final KeyCombination DELETE_ROWS = new KeyCodeCombination(KeyCode.MINUS, KeyCombination.SHORTCUT_DOWN);
    private static final KeyCombination DELETE_ROWS_SUBTRACT = new KeyCodeCombination(KeyCode.SUBTRACT, KeyCombination.SHORTCUT_DOWN);

    private final SheetModel<R> model;
    private final TableView<SheetRow<R>> table = new TableView<>();
    private final Label status = new Label();
    private final BorderPane root = new BorderPane();
    private String typedText;
    private SheetCell<R> editingCell;
    private SheetCell<R> dragAnchor;

    /** {@code id} names the table node; the status line is {@code id + "-status"}. */
    public SheetView(SheetModel<R> model, String id) {
        this.model = model;
        table.setId(id);
        table.getStyleClass().add("sheet");
        table.setItems(model.rows());
        table.setEditable(true);
        table.getSelectionModel().setCellSelectionEnabled(true);
        table.getSelectionModel().setSelectionMode(SelectionMode.MULTIPLE);
        table.setPlaceholder(new Label("No rows"));
        table.getColumns().add(rowNumberColumn());
        for (int c = 0; c < model.columnCount(); c++) {
            table.getColumns().add(dataColumn(c));
        }
        model.rows().addListener((ListChangeListener<SheetRow<R>>) change -> fitColumns());
        fitColumns();
        table.addEventFilter(KeyEvent.KEY_PRESSED, this::onKeyPressed);
        table.addEventFilter(KeyEvent.KEY_TYPED, this::onKeyTyped);

        status.setId(id + "-status");
        status.getStyleClass().add("sheet-status");
        status.textProperty().bind(model.statusProperty());
        status.setMaxWidth(Double.MAX_VALUE);
        status.setMinHeight(Region.USE_PREF_SIZE);
        status.setWrapText(true);
        model.statusIsProblemProperty().addListener((o, was, is) -> status.pseudoClassStateChanged(
                PseudoClass.getPseudoClass("problem"), is));
        status.tooltipProperty().bind(Bindings.createObjectBinding(
                () -> model.statusProperty().get().isEmpty() ? null : new Tooltip(model.statusProperty().get()),
                model.statusProperty()));

        root.setCenter(table);
        root.setBottom(new VBox(status));
        root.getStyleClass().add("sheet-pane");
    }

    /** The table with an undo/redo/fill toolbar and the status line. */
    public Node node() {
        return root;
    }

    public TableView<SheetRow<R>> table() {
        return table;
    }

    public SheetModel<R> model() {
        return model;
    }

    /** A toolbar with buttons for the keyboard actions, so they can be found without the keys. */
    public Node toolbar() {
        Button undo = button("Undo", "Ctrl+Z", this::undo);
        undo.disableProperty().bind(model.canUndoProperty().not());
        Button redo = button("Redo", "Ctrl+Y or Ctrl+Shift+Z", this::redo);
        redo.disableProperty().bind(model.canRedoProperty().not());
        Button fill = button("Fill down", "Ctrl+D: copy the top cell of the selection into the cells below", this::fillDown);
        Button insert = button("Insert row", "Ctrl+Shift+Plus: a new row below, derived from the current one", this::insertRow);
        Button delete = button("Delete rows", "Ctrl+Minus: delete the selected rows (undo brings them back)", this::deleteRows);
        Label hint = new Label("Type to edit \u00B7 Enter/Tab move \u00B7 Ctrl+C / Ctrl+V copy/paste blocks");
        hint.getStyleClass().add("sheet-hint");
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        HBox bar = new HBox(6, undo, redo, fill, insert, delete, gap, hint);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.getStyleClass().add("sheet-toolbar");
        return bar;
    }

    private Button button(String text, String tip, Runnable action) {
        Button b = new Button(text);
        b.setTooltip(new Tooltip(tip));
        b.setFocusTraversable(false);
        b.setOnAction(e -> {
            action.run();
            table.requestFocus();
        });
        return b;
    }

    // ---- columns

    private TableColumn<SheetRow<R>, CellContent> rowNumberColumn() {
        TableColumn<SheetRow<R>, CellContent> c = new TableColumn<>("#");
        c.setSortable(false);
        c.setReorderable(false);
        c.setEditable(false);
        c.setPrefWidth(44);
        c.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(new CellContent("", null, "")));
        c.setCellFactory(col -> new SheetCell<>(this, -1));
        return c;
    }

    private TableColumn<SheetRow<R>, CellContent> dataColumn(int index) {
        SheetColumn<R> def = model.columns().get(index);
        TableColumn<SheetRow<R>, CellContent> c = new TableColumn<>();
        Label letter = new Label(CellAddress.columnName(index));
        letter.getStyleClass().add("sheet-column-letter");
        Label title = new Label(def.header());
        title.getStyleClass().add("sheet-column-title");
        VBox header = new VBox(letter, title);
        header.setAlignment(Pos.CENTER);
        if (!def.editable()) {
            header.getStyleClass().add("sheet-computed-header");
            Tooltip.install(header, new Tooltip(def.header() + ": computed, read-only"));
        }
        c.setGraphic(header);
        c.setId(def.key());
        c.setUserData(def.header());
        c.setSortable(false);
        c.setReorderable(false);
        c.setEditable(def.editable());
        c.setCellValueFactory(cd -> cd.getValue().cellProperty(index));
        c.setCellFactory(col -> new SheetCell<>(this, index));
        return c;
    }

    /** Widths that fit the header and the first rows' text, within bounds, so a sheet reads at a glance. */
    private void fitColumns() {
        int sample = Math.min(model.rows().size(), 200);
        for (int c = 0; c < model.columnCount(); c++) {
            double w = textWidth(model.columns().get(c).header(), HEADER_FONT) + 22;
            for (int r = 0; r < sample; r++) {
                w = Math.max(w, textWidth(model.rows().get(r).cell(c).text(), CELL_FONT) + 18);
            }
            table.getColumns().get(c + 1).setPrefWidth(Math.max(MIN_COLUMN_WIDTH, Math.min(w, MAX_COLUMN_WIDTH)));
        }
    }

    private static double textWidth(String s, Font font) {
        Text t = new Text(s);
        t.setFont(font);
        return t.getLayoutBounds().getWidth();
    }

    // ---- actions the keys and buttons call

    void copy() {
        selection().ifPresent(range -> {
            ClipboardContent content = new ClipboardContent();
            content.putString(model.copy(range));
            Clipboard.getSystemClipboard().setContent(content);
        });
    }

    void paste() {
        String text = Clipboard.getSystemClipboard().getString();
        Optional<CellRange> range = selection();
        if (range.isEmpty()) {
            return;
        }
        SheetOutcome outcome = model.paste(range.get(), text == null ? "" : text);
        if (outcome.applied()) {
            List<List<String>> block = TabularText.parse(text);
            boolean oneValue = block.size() == 1 && block.get(0).size() == 1;
            CellRange r = range.get();
            if (!oneValue) {
                r = new CellRange(r.top(), r.left(), r.top() + block.size() - 1, r.left() + block.get(0).size() - 1);
            }
            select(r);
        }
    }

    void fillDown() {
        selection().ifPresent(model::fillDown);
    }

    void clear() {
        selection().ifPresent(model::clear);
    }

    void undo() {
        model.undo();
        clampFocus();
    }

    void redo() {
        model.redo();
        clampFocus();
    }

    void insertRow() {
        focused().ifPresent(at -> {
            if (model.insertRowBelow(at.row()).applied()) {
                moveTo(at.row() + 1, at.column());
            }
        });
    }

    void deleteRows() {
        selection().ifPresent(r -> {
            model.deleteRows(r.top(), r.bottom());
            clampFocus();
        });
    }

    /** Commits {@code text} typed into the cell at {@code at}; true when the model took it. */
    boolean commit(CellAddress at, String text) {
        return model.edit(at, text).applied();
    }

    void editingStarted(SheetCell<R> cell) {
        editingCell = cell;
    }

    void editingEnded(SheetCell<R> cell) {
        if (editingCell == cell) {
            editingCell = null;
        }
    }

    String takeTypedText() {
        String t = typedText;
        typedText = null;
        return t;
    }

    void startDrag(SheetCell<R> cell) {
        dragAnchor = cell;
    }

    void dragOver(SheetCell<R> cell) {
        if (dragAnchor == null || dragAnchor.modelColumn() < 0 || cell.modelColumn() < 0 || cell.isEmpty()) {
            return;
        }
        select(CellRange.of(new CellAddress(dragAnchor.getIndex(), dragAnchor.modelColumn()),
                new CellAddress(cell.getIndex(), cell.modelColumn())));
        table.getFocusModel().focus(cell.getIndex(), cell.getTableColumn());
    }

    void endDrag() {
        dragAnchor = null;
    }

    /** Moves the focus (and a single-cell selection) by the given steps, staying in the sheet. */
    void move(int rows, int columns) {
        focused().ifPresent(at -> moveTo(at.row() + rows, at.column() + columns));
    }

    // ---- key mapping

    private void onKeyPressed(KeyEvent e) {
        if (table.getEditingCell() != null) {
            return;
        }
        boolean handled = true;
        if (COPY.match(e)) {
            copy();
        } else if (PASTE.match(e)) {
            paste();
        } else if (FILL_DOWN.match(e)) {
            fillDown();
        } else if (REDO.match(e) || REDO_SHIFT.match(e)) {
            redo();
        } else if (UNDO.match(e)) {
            undo();
        } else if (INSERT_ROW.match(e) || INSERT_ROW_ADD.match(e) || INSERT_ROW_EQUALS.match(e)) {
            insertRow();
        } else if (DELETE_ROWS.match(e) || DELETE_ROWS_SUBTRACT.match(e)) {
            deleteRows();
        } else if (e.isShortcutDown() || e.isAltDown()) {
            handled = false;
        } else if (e.getCode() == KeyCode.TAB) {
            move(0, e.isShiftDown() ? -1 : 1);
        } else if (e.getCode() == KeyCode.ENTER) {
            move(e.isShiftDown() ? -1 : 1, 0);
        } else if (e.getCode() == KeyCode.F2) {
            focused().ifPresent(at -> table.edit(at.row(), table.getColumns().get(at.column() + 1)));
        } else if (e.getCode() == KeyCode.DELETE || e.getCode() == KeyCode.BACK_SPACE) {
            clear();
        } else if (e.getCode() == KeyCode.LEFT && !e.isShiftDown() && focused().map(a -> a.column() == 0).orElse(false)) {
            // the row-number column is not a cell of the sheet
        } else if (e.getCode() == KeyCode.HOME && !e.isShiftDown()) {
            focused().ifPresent(at -> moveTo(at.row(), 0));
        } else {
            handled = false;
        }
        if (handled) {
            e.consume();
        }
    }

    private void onKeyTyped(KeyEvent e) {
        if (e.isShortcutDown() || e.isControlDown() || e.isAltDown() || e.isMetaDown()) {
            return;
        }
        String ch = e.getCharacter();
        if (ch.isEmpty() || ch.equals(KeyEvent.CHAR_UNDEFINED) || Character.isISOControl(ch.charAt(0))) {
            return;
        }
        if (table.getEditingCell() != null) {
            // keys typed fast, before the new editor holds the focus, still belong to it
            if (editingCell != null && editingCell.takeTypedKey(ch)) {
                e.consume();
            }
            return;
        }
        Optional<CellAddress> at = focused();
        if (at.isEmpty() || !model.columns().get(at.get().column()).editable()) {
            at.ifPresent(a -> model.edit(a, ch));
            e.consume();
            return;
        }
        typedText = ch;
        table.edit(at.get().row(), table.getColumns().get(at.get().column() + 1));
        if (table.getEditingCell() == null) {
            typedText = null;
        }
        e.consume();
    }

    // ---- selection <-> cell ranges

    /** The focused cell in model coordinates. */
    Optional<CellAddress> focused() {
        TablePosition<SheetRow<R>, ?> pos = table.getFocusModel().getFocusedCell();
        if (pos == null || pos.getRow() < 0 || pos.getTableColumn() == null) {
            return table.getItems().isEmpty() ? Optional.empty() : Optional.of(new CellAddress(0, 0));
        }
        int column = table.getColumns().indexOf(pos.getTableColumn()) - 1;
        return Optional.of(new CellAddress(pos.getRow(), Math.max(0, column)));
    }

    /** The selected block (row-number column ignored), or the focused cell when nothing is selected. */
    Optional<CellRange> selection() {
        List<TablePosition> cells = table.getSelectionModel().getSelectedCells();
        int top = Integer.MAX_VALUE;
        int left = Integer.MAX_VALUE;
        int bottom = -1;
        int right = -1;
        for (TablePosition<?, ?> p : cells) {
            int column = table.getColumns().indexOf(p.getTableColumn()) - 1;
            if (column < 0 || p.getRow() < 0) {
                continue;
            }
            top = Math.min(top, p.getRow());
            bottom = Math.max(bottom, p.getRow());
            left = Math.min(left, column);
            right = Math.max(right, column);
        }
        if (bottom < 0) {
            return focused().map(CellRange::single);
        }
        return Optional.of(new CellRange(top, left, bottom, right));
    }

    /** Selects {@code range} and focuses its top-left cell. */
    public void select(CellRange range) {
        table.getSelectionModel().clearSelection();
        table.getSelectionModel().selectRange(range.top(), table.getColumns().get(range.left() + 1),
                range.bottom(), table.getColumns().get(range.right() + 1));
        table.getFocusModel().focus(range.top(), table.getColumns().get(range.left() + 1));
    }

    private void moveTo(int row, int column) {
        if (table.getItems().isEmpty()) {
            return;
        }
        int r = Math.max(0, Math.min(row, table.getItems().size() - 1));
        int c = Math.max(0, Math.min(column, model.columnCount() - 1));
        TableColumn<SheetRow<R>, ?> col = table.getColumns().get(c + 1);
        table.getSelectionModel().clearAndSelect(r, col);
        table.getFocusModel().focus(r, col);
        table.scrollTo(Math.max(0, r - 3));
        table.scrollToColumn(col);
    }

    private void clampFocus() {
        focused().ifPresent(at -> moveTo(at.row(), at.column()));
    }
}
