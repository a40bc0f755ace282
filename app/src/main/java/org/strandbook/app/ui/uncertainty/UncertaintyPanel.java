package org.strandbook.app.ui.uncertainty;

import java.util.Locale;

import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

import org.strandbook.app.ui.sheet.TextColumns;

/**
 * The Uncertainty tab: per band of the selected point, which inputs make its prediction uncertain
 * and by how much (a table like the loss budget), and the design question below it.
 */
public final class UncertaintyPanel {

    private final VBox root = new VBox(4);

    public UncertaintyPanel(UncertaintyViewModel vm) {
        Label message = new Label();
        message.setId("uncertainty-message");
        message.setWrapText(true);
        message.textProperty().bind(vm.messageProperty());

        TableView<UncertaintyRow> table = new TableView<>();
        table.setId("uncertainty-table");
        table.setItems(vm.rows());
        table.setPlaceholder(new Label("No uncertainty budget: select a point with a prediction"));
        table.getColumns().add(TextColumns.of("uncertainty-band", "Band", 130, UncertaintyRow::band));
        table.getColumns().add(TextColumns.of("uncertainty-at", "At (nm)", 60, r -> f("%.0f", r.atNm())));
        table.getColumns().add(TextColumns.of("uncertainty-input", "Input", 210, UncertaintyRow::input));
        table.getColumns().add(TextColumns.of("uncertainty-u", "Std. uncertainty", 110,
                r -> f("%.3g", r.standardUncertainty()) + " " + r.unit()));
        table.getColumns().add(TextColumns.of("uncertainty-sensitivity", "Sensitivity", 100,
                r -> f("%.3g", r.sensitivity()) + " " + r.sensitivityUnit()));
        table.getColumns().add(TextColumns.of("uncertainty-contribution", "Contribution (dB)", 125,
                r -> f("%.3f", r.contributionDb())));
        table.getColumns().add(TextColumns.of("uncertainty-share", "Share (%)", 70, r -> f("%.1f", 100 * r.share())));
        table.getColumns().add(TextColumns.of("uncertainty-basis", "Basis", 420, UncertaintyRow::basis));

        TextField allowed = field("uncertainty-allowed-db", 60);
        allowed.textProperty().bindBidirectional(vm.allowedLossTextProperty());
        TextField atNm = field("uncertainty-question-nm", 60);
        atNm.textProperty().bindBidirectional(vm.questionNmTextProperty());
        Button ask = new Button("Chance");
        ask.setId("uncertainty-ask");
        ask.setOnAction(e -> vm.askChance());
        allowed.setOnAction(e -> vm.askChance());
        atNm.setOnAction(e -> vm.askChance());
        HBox question = new HBox(6, new Label("Design question: will the loop stay within"), allowed,
                new Label("dB at"), atNm, new Label("nm?"), ask);
        question.setAlignment(Pos.CENTER_LEFT);
        Label answer = new Label();
        answer.setId("uncertainty-answer");
        answer.setWrapText(true);
        answer.textProperty().bind(vm.answerProperty());

        root.setPadding(new Insets(4));
        root.getChildren().addAll(message, table, question, answer);
        VBox.setVgrow(table, Priority.ALWAYS);
    }

    public Node node() {
        return root;
    }

    private static TextField field(String id, double width) {
        TextField t = new TextField();
        t.setId(id);
        t.setPrefColumnCount(6);
        t.setPrefWidth(width);
        return t;
    }

    private static String f(String format, double v) {
        return String.format(Locale.ROOT, format, v);
    }
}
