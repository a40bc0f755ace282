package org.strandbook.app.ui.sheet;

import javafx.css.PseudoClass;
import javafx.geometry.Pos;
import javafx.scene.control.TableCell;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;

/** One cell of a {@link SheetView}: shows a {@link CellContent}, edits through a text field. */
final class SheetCell<R> extends TableCell<SheetRow<R>, CellContent> {

    private static final PseudoClass PROBLEM = PseudoClass.getPseudoClass("problem");
    private static final PseudoClass PASS = PseudoClass.getPseudoClass("pass");
    private static final PseudoClass REVIEW = PseudoClass.getPseudoClass("review");
    private static final PseudoClass FAIL = PseudoClass.getPseudoClass("fail");
    private static final PseudoClass HINT = PseudoClass.getPseudoClass("hint");

    private final SheetView<R> view;
    private final int modelColumn;
    private TextField editor;
    private boolean committing;

    SheetCell(SheetView<R> view, int modelColumn) {
        this.view = view;
        this.modelColumn = modelColumn;
        getStyleClass().add(modelColumn < 0 ? SheetView.ROW_NUMBER_STYLE : "sheet-cell");
        if (modelColumn >= 0) {
            SheetColumn<R> def = view.model().columns().get(modelColumn);
            if (!def.editable()) {
                getStyleClass().add("sheet-computed");
            }
            setAlignment(def.numeric() ? Pos.CENTER_RIGHT : Pos.CENTER_LEFT);
            setOnDragDetected(e -> {
                view.startDrag(this);
                startFullDrag();
            });
            setOnMouseDragEntered(e -> view.dragOver(this));
            setOnMouseReleased(e -> view.endDrag());
        }
    }

    int modelColumn() {
        return modelColumn;
    }

    @Override
    protected void updateItem(CellContent item, boolean empty) {
        super.updateItem(item, empty);
        if (isEditing()) {
            return;
        }
        render(empty ? null : item);
    }

    private void render(CellContent item) {
        setGraphic(null);
        if (modelColumn < 0) {
            setText(isEmpty() || getIndex() < 0 ? null : Integer.toString(getIndex() + 1));
            return;
        }
        if (item == null || isEmpty()) {
            setText(null);
            setTooltip(null);
            setStates(null, false);
            pseudoClassStateChanged(HINT, false);
            return;
        }
        String shown = item.showsHint() ? item.hint() : item.text();
        setText(item.hasProblem() ? "\u26A0 " + shown : shown);
        pseudoClassStateChanged(HINT, item.showsHint());
        setTooltip(item.hasProblem() ? new Tooltip(item.problem()) : null);
        setStates(item.verdict(), item.hasProblem());
    }

    private void setStates(Verdict verdict, boolean problem) {
        pseudoClassStateChanged(PROBLEM, problem);
        pseudoClassStateChanged(PASS, verdict == Verdict.PASS);
        pseudoClassStateChanged(REVIEW, verdict == Verdict.REVIEW);
        pseudoClassStateChanged(FAIL, verdict == Verdict.FAIL);
    }

    @Override
    public void startEdit() {
        if (modelColumn < 0 || isEmpty() || !getTableColumn().isEditable()) {
            return;
        }
        super.startEdit();
        if (!isEditing()) {
            return;
        }
        String typed = view.takeTypedText();
        editor = new TextField(typed != null ? typed : getItem() == null ? "" : getItem().text());
        editor.getStyleClass().add("sheet-editor");
        editor.addEventFilter(KeyEvent.KEY_PRESSED, this::onEditorKey);
        editor.focusedProperty().addListener((o, was, is) -> {
            if (!is && isEditing() && !committing) {
                if (!view.commit(address(), editor.getText())) {
                    cancelEdit();
                } else {
                    finishEdit();
                }
            }
        });
        setText(null);
        setGraphic(editor);
        view.editingStarted(this);
        // the skin carries the text field's key handling; create it now, not at the next pulse,
        // or keys typed right after the first one are lost
        editor.applyCss();
        editor.requestFocus();
        if (typed != null) {
            editor.end();
        } else {
            editor.selectAll();
        }
    }

    private void onEditorKey(KeyEvent e) {
        switch (e.getCode()) {
            case ENTER -> {
                commitAndMove(e.isShiftDown() ? -1 : 1, 0);
                e.consume();
            }
            case TAB -> {
                commitAndMove(0, e.isShiftDown() ? -1 : 1);
                e.consume();
            }
            case ESCAPE -> {
                cancelEdit();
                getTableView().requestFocus();
                e.consume();
            }
            default -> {
                if (e.getCode() == KeyCode.UNDEFINED) {
                    e.consume();
                }
            }
        }
    }

    private void commitAndMove(int rows, int columns) {
        committing = true;
        try {
            if (view.commit(address(), editor.getText())) {
                finishEdit();
                getTableView().requestFocus();
                view.move(rows, columns);
            } else {
                // keep the typed text so it can be corrected; the status line and marker say why
                editor.pseudoClassStateChanged(PROBLEM, true);
                editor.setTooltip(getItem() == null ? null : new Tooltip(getItem().problem()));
                pseudoClassStateChanged(PROBLEM, true);
            }
        } finally {
            committing = false;
        }
    }

    /** Appends a key typed before the editor could take it; false when the editor takes keys itself. */
    boolean takeTypedKey(String ch) {
        if (editor == null || (editor.getSkin() != null && editor.isFocused())) {
            return false;
        }
        editor.appendText(ch);
        editor.end();
        return true;
    }

    private void finishEdit() {
        // the model already holds the value; leave edit mode without TableView's commit machinery
        super.cancelEdit();
        leaveEditor();
    }

    @Override
    public void cancelEdit() {
        super.cancelEdit();
        leaveEditor();
    }

    private void leaveEditor() {
        view.editingEnded(this);
        editor = null;
        render(getItem());
    }

    private CellAddress address() {
        return new CellAddress(getIndex(), modelColumn);
    }
}
