package org.strandbook.app.ui.workbook;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import java.util.function.BiFunction;

import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.Window;

import org.strandbook.app.ui.sheet.TextColumns;
import org.strandbook.handover.PointEvent;

/**
 * The selected point's history in time order (scans, inspections, maintenance actions, notes and
 * sign-offs) with a button for each kind of record the field and the commissioning lead make.
 */
final class HistoryPanel {

    private static final DateTimeFormatter MINUTE = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private final VBox root = new VBox(4);
    private final TableView<PointEvent> table = new TableView<>();

    HistoryPanel(PointHistoryViewModel vm, java.util.function.Supplier<Window> owner) {
        table.setId("history-table");
        table.setItems(vm.events());
        table.setPlaceholder(new Label("No records for this point yet"));
        table.getColumns().add(TextColumns.of("history-at", "Time (UTC)", 130, e -> MINUTE.format(e.at())));
        table.getColumns().add(TextColumns.of("history-kind", "Record", 90, e -> e.kind().word()));
        table.getColumns().add(TextColumns.of("history-subject", "On", 90, PointEvent::subject));
        table.getColumns().add(TextColumns.of("history-who", "By", 110, PointEvent::who));
        TableColumn<PointEvent, String> what = TextColumns.of("history-text", "What", 520, PointEvent::text);
        table.getColumns().add(what);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY);

        HBox buttons = new HBox(6,
                button("history-inspect", "Record inspection\u2026", vm, owner, RecordDialogs::inspection),
                button("history-maintain", "Record maintenance\u2026", vm, owner, RecordDialogs::maintenance),
                button("history-note", "Add note\u2026", vm, owner, RecordDialogs::note),
                button("history-sign", "Sign point\u2026", vm, owner, RecordDialogs::signOff),
                withdrawButton(vm, owner));
        Label message = new Label();
        message.setId("history-message");
        message.setWrapText(true);
        message.textProperty().bind(vm.messageProperty());
        root.setPadding(new Insets(4));
        root.getChildren().addAll(buttons, message, table);
        VBox.setVgrow(table, Priority.ALWAYS);
    }

    Node node() {
        return root;
    }

    private static Button button(String id, String text, PointHistoryViewModel vm,
                                 java.util.function.Supplier<Window> owner,
                                 BiFunction<Window, PointHistoryViewModel, RecordDialog<?>> dialog) {
        Button b = new Button(text);
        b.setId(id);
        b.setOnAction(e -> {
            if (vm.pointTag().isEmpty()) {
                return;
            }
            dialog.apply(owner.get(), vm).dialog().show();
        });
        return b;
    }

    /** Undo of the latest record, after a confirmation that says what it does. */
    private static Button withdrawButton(PointHistoryViewModel vm, java.util.function.Supplier<Window> owner) {
        Button b = new Button("Withdraw latest record\u2026");
        b.setId("history-withdraw");
        b.setOnAction(e -> {
            if (vm.pointTag().isEmpty()) {
                return;
            }
            Alert confirm = new Alert(Alert.AlertType.CONFIRMATION, "The inspection, maintenance action or note "
                    + "entered last at " + vm.pointTag() + " is withdrawn; a replacement it recorded is undone. The "
                    + "audit trail keeps the record and who withdrew it. A record covered by a later signature is "
                    + "not withdrawn.", ButtonType.OK, ButtonType.CANCEL);
            confirm.initOwner(owner.get());
            confirm.setTitle("Withdraw the latest record");
            confirm.setHeaderText("Withdraw the latest record of " + vm.pointTag() + "?");
            confirm.getDialogPane().setId("withdraw-dialog");
            ((Button) confirm.getDialogPane().lookupButton(ButtonType.OK)).setId("withdraw-dialog-ok");
            confirm.resultProperty().addListener((o, was, is) -> {
                if (is == ButtonType.OK) {
                    vm.withdrawLatest();
                }
            });
            confirm.show();
        });
        return b;
    }
}
