package org.strandbook.app.ui.workbook;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

import javafx.beans.binding.Bindings;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

import org.strandbook.app.ui.sheet.TextColumns;

/**
 * "Edits to settle": the fields edited both here and on the plant server since the last sync, each
 * with both values and who changed the server's, and a choice per row. Nothing is settled until a
 * person chooses; the choice is an audited change in the workbook and reaches the server with the
 * next sync.
 */
final class ConflictsView {

    private static final DateTimeFormatter FOUND = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private final VBox root = new VBox(4);
    private final ObservableList<ConflictRow> rows = FXCollections.observableArrayList();

    ConflictsView(PlantServerViewModel vm, Runnable sync) {
        TableView<ConflictRow> table = new TableView<>(rows);
        table.setId("conflicts-table");
        table.setPlaceholder(new Label("Nothing to settle: no field was edited both here and on the plant server"));
        table.getColumns().add(TextColumns.of("conflict-record", "Record", 120, ConflictRow::record));
        table.getColumns().add(TextColumns.of("conflict-field", "Field", 100, ConflictRow::field));
        table.getColumns().add(TextColumns.of("conflict-mine", "This workbook", 230, ConflictRow::mine));
        table.getColumns().add(TextColumns.of("conflict-theirs", "Plant server", 230, ConflictRow::theirs));
        table.getColumns().add(TextColumns.of("conflict-by", "Changed there by", 140, ConflictRow::theirsBy));
        table.getColumns().add(TextColumns.of("conflict-found", "Found (UTC)", 135, r -> FOUND.format(r.foundAt())));
        table.getColumns().add(choiceColumn(vm));
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        vm.conflictsProperty().addListener((o, was, is) -> rows.setAll(is));
        rows.setAll(vm.conflictsProperty().get());

        Label heading = new Label();
        heading.setId("conflicts-summary");
        heading.getStyleClass().add("pane-heading");
        heading.textProperty().bind(Bindings.createStringBinding(() -> vm.openConflictsProperty().get() == 0
                ? "No edit to settle. A field edited both here and on the plant server since the last sync waits here"
                  + " for your choice; nothing is overwritten until you choose."
                : vm.openConflictsProperty().get() + " edit(s) wait for a choice: a field edited both here and on the"
                  + " plant server, or a whole record removed on one side and changed on the other (what belongs to"
                  + " it waits with it and follows its choice). Keep this workbook's value (sent with the next sync)"
                  + " or take the server's; each choice is recorded in the audit trail.", vm.openConflictsProperty()));
        heading.setWrapText(true);
        heading.setMinHeight(Region.USE_PREF_SIZE);
        // a value too long for its column is read whole here
        Label chosen = new Label();
        chosen.setId("conflict-detail");
        chosen.setWrapText(true);
        chosen.setMinHeight(Region.USE_PREF_SIZE);
        chosen.textProperty().bind(Bindings.createStringBinding(() -> {
            ConflictRow r = table.getSelectionModel().getSelectedItem();
            return r == null ? "Select a row to read both values whole." : r.record() + ", " + r.field()
                    + ": this workbook \u201C" + r.mine() + "\u201D; plant server \u201C" + r.theirs() + "\u201D"
                    + (r.theirsBy().isEmpty() ? "" : " (changed there by " + r.theirsBy() + ")");
        }, table.getSelectionModel().selectedItemProperty()));
        Button syncNow = new Button("Sync with plant server");
        syncNow.setId("conflicts-sync");
        syncNow.disableProperty().bind(vm.serverProperty().isEmpty());
        syncNow.setOnAction(e -> sync.run());
        Label server = new Label();
        server.textProperty().bind(Bindings.createStringBinding(() -> vm.serverProperty().get().isEmpty()
                ? "never synced" : "syncs with " + vm.serverProperty().get() + ".", vm.serverProperty()));
        Label last = new Label();
        last.setId("conflicts-last-sync");
        last.textProperty().bind(vm.lastSyncProperty());
        last.setWrapText(true);
        last.setMinHeight(Region.USE_PREF_SIZE);
        syncNow.setMinWidth(Region.USE_PREF_SIZE);
        HBox bar = new HBox(8, syncNow, server);
        bar.setAlignment(Pos.CENTER_LEFT);
        root.setPadding(new Insets(4));
        root.getChildren().addAll(heading, bar, last, table, chosen);
        VBox.setVgrow(table, Priority.ALWAYS);
    }

    Node node() {
        return root;
    }

    private static TableColumn<ConflictRow, ConflictRow> choiceColumn(PlantServerViewModel vm) {
        TableColumn<ConflictRow, ConflictRow> c = new TableColumn<>("Choose");
        c.setId("conflict-choose");
        c.setSortable(false);
        c.setPrefWidth(200);
        c.setCellValueFactory(f -> new javafx.beans.property.ReadOnlyObjectWrapper<>(f.getValue()));
        c.setCellFactory(col -> new TableCell<>() {
            private final Button mine = new Button("Keep mine");
            private final Button theirs = new Button("Keep theirs");
            private final HBox box = new HBox(6, mine, theirs);

            {
                mine.getStyleClass().add("keep-mine");
                theirs.getStyleClass().add("keep-theirs");
                mine.setOnAction(e -> vm.settle(getItem(), true));
                theirs.setOnAction(e -> vm.settle(getItem(), false));
            }

            @Override
            protected void updateItem(ConflictRow row, boolean empty) {
                super.updateItem(row, empty);
                setGraphic(empty || row == null ? null : box);
            }
        });
        return c;
    }
}
