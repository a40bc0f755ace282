package org.strandbook.app.ui.workbook;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;

import javafx.event.ActionEvent;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import javafx.stage.Window;

import org.strandbook.handover.RecordedTime;

/**
 * A small form that makes one record: its fields, a line for what is wrong, and OK, which builds the
 * record and hands it on only when it is whole; otherwise the dialog stays open saying why.
 *
 * @param <R> the record made
 */
abstract class RecordDialog<R> {

    private static final DateTimeFormatter MINUTE = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private final Dialog<ButtonType> dialog = new Dialog<>();
    private final GridPane form = new GridPane();
    private final Label problem = new Label();
    private int rows;

    RecordDialog(Window owner, String id, String title, String header) {
        dialog.initOwner(owner);
        dialog.setTitle(title);
        dialog.setHeaderText(header);
        dialog.getDialogPane().setId(id);
        form.setHgap(8);
        form.setVgap(6);
        problem.setId(id + "-problem");
        problem.setWrapText(true);
        problem.getStyleClass().add("record-problem");
        dialog.getDialogPane().setContent(new VBox(8, form, problem));
        dialog.getDialogPane().getButtonTypes().addAll(ButtonType.OK, ButtonType.CANCEL);
        Button ok = (Button) dialog.getDialogPane().lookupButton(ButtonType.OK);
        ok.setId(id + "-ok");
        ok.addEventFilter(ActionEvent.ACTION, e -> {
            try {
                submit(build());
            } catch (IllegalArgumentException refused) {
                problem.setText(refused.getMessage());
                e.consume();
            }
        });
    }

    /** Builds the record from the fields. @throws IllegalArgumentException saying what is missing or wrong */
    abstract R build();

    /** Hands the whole record on (to a background job). */
    abstract void submit(R record);

    Dialog<ButtonType> dialog() {
        return dialog;
    }

    final TextField text(String id, String label, String prompt) {
        TextField f = new TextField();
        f.setId(id);
        f.setPromptText(prompt);
        row(label, f);
        return f;
    }

    final TextField when(String id) {
        TextField f = text(id, "When (UTC)", "2026-05-03 10:15");
        f.setText(MINUTE.format(Instant.now()));
        return f;
    }

    final <T> ComboBox<T> choice(String id, String label, List<T> items) {
        ComboBox<T> c = new ComboBox<>();
        c.setId(id);
        c.getItems().setAll(items);
        if (!items.isEmpty()) {
            c.getSelectionModel().select(0);
        }
        row(label, c);
        return c;
    }

    private void row(String label, javafx.scene.Node field) {
        form.addRow(rows++, new Label(label), field);
    }

    static Instant time(TextField f) {
        return RecordedTime.parse(f.getText());
    }

    static String required(TextField f, String what) {
        String v = f.getText() == null ? "" : f.getText().strip();
        if (v.isEmpty()) {
            throw new IllegalArgumentException(what + " is missing");
        }
        return v;
    }
}
