package org.strandbook.app.ui.workbook;

import java.util.List;

import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableView;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

import org.strandbook.app.ui.sheet.TextColumns;

/**
 * The site's attention view: above, the failing and review points with their findings and
 * follow-ups; below, every point by how soon its margin runs out. Double-click or Enter opens a
 * point.
 */
final class AttentionView {

    private final VBox root = new VBox(4);
    private final TableView<AttentionRow> needing = new TableView<>();
    private final TableView<AttentionRow> ranking = new TableView<>();

    /** @param opened told after a point was opened from a list, to show it */
    AttentionView(AttentionViewModel vm, Runnable opened) {
        needing.setId("attention-needing");
        needing.setItems(vm.needing());
        needing.setPlaceholder(new Label("No failing or review point, or the site is not ranked yet"));
        needing.getColumns().add(TextColumns.of("attention-point", "Point", 80, AttentionRow::pointTag));
        needing.getColumns().add(TextColumns.of("attention-status", "Status", 110, AttentionRow::statusText));
        needing.getColumns().add(TextColumns.of("attention-finding", "Finding", 420, AttentionRow::finding));
        needing.getColumns().add(TextColumns.of("attention-follow-up", "Follow-up", 420, AttentionRow::followUpText));
        needing.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);

        ranking.setId("attention-ranking");
        ranking.setItems(vm.ranking());
        ranking.setPlaceholder(new Label("Not ranked yet"));
        ranking.getColumns().add(TextColumns.of("ranking-rank", "Rank", 50, r -> Integer.toString(r.rank())));
        ranking.getColumns().add(TextColumns.of("ranking-point", "Point", 80, AttentionRow::pointTag));
        ranking.getColumns().add(TextColumns.of("ranking-status", "Status", 110, AttentionRow::statusText));
        ranking.getColumns().add(TextColumns.of("ranking-band", "Worst band", 160, AttentionRow::worstBand));
        ranking.getColumns().add(TextColumns.of("ranking-margin", "Margin (dB)", 90, AttentionRow::marginText));
        ranking.getColumns().add(TextColumns.of("ranking-run-out", "Runs out (date)", 120, AttentionRow::runOutText));
        ranking.getColumns().add(TextColumns.of("ranking-finding", "Finding", 380, AttentionRow::finding));
        ranking.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);

        for (TableView<AttentionRow> t : List.of(needing, ranking)) {
            t.setOnMouseClicked(e -> {
                if (e.getButton() == MouseButton.PRIMARY && e.getClickCount() == 2) {
                    open(vm, t, opened);
                }
            });
            t.setOnKeyPressed(e -> {
                if (e.getCode() == KeyCode.ENTER) {
                    open(vm, t, opened);
                    e.consume();
                }
            });
        }

        Button rank = new Button("Rank the site");
        rank.setId("attention-refresh");
        rank.setOnAction(e -> vm.refresh());
        Label summary = new Label();
        summary.setId("attention-summary");
        summary.textProperty().bind(vm.summaryProperty());
        HBox bar = new HBox(8, rank, summary);
        bar.setAlignment(Pos.CENTER_LEFT);

        SplitPane lists = new SplitPane(titled("Needs attention: failing and review points, most urgent first",
                needing), titled("Every point by margin run-out, most urgent first (as the trend command ranks them)",
                ranking));
        lists.setOrientation(Orientation.VERTICAL);
        root.setPadding(new Insets(4));
        root.getChildren().addAll(bar, lists);
        VBox.setVgrow(lists, Priority.ALWAYS);
    }

    Node node() {
        return root;
    }

    private static void open(AttentionViewModel vm, TableView<AttentionRow> table, Runnable opened) {
        AttentionRow row = table.getSelectionModel().getSelectedItem();
        if (row != null) {
            vm.open(row);
            opened.run();
        }
    }

    private static Node titled(String title, TableView<AttentionRow> table) {
        Label heading = new Label(title);
        heading.getStyleClass().add("pane-heading");
        VBox box = new VBox(2, heading, table);
        VBox.setVgrow(table, Priority.ALWAYS);
        return box;
    }
}
