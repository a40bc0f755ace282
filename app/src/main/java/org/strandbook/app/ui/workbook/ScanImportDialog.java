package org.strandbook.app.ui.workbook;

import java.io.File;
import java.util.List;

import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TextField;
import javafx.scene.input.TransferMode;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Modality;
import javafx.stage.Stage;
import javafx.stage.Window;
import javafx.util.StringConverter;

import org.strandbook.site.ScanKind;

/**
 * The "Record measurement" dialog: the files to import, their kind and operator, Import, and the
 * progress bar with Cancel while it runs; afterwards what was stored and what was refused and why.
 * It binds to a {@link ScanImportViewModel}; the file chooser only adds to its list.
 */
public final class ScanImportDialog {

    private ScanImportDialog() {
    }

    /** Opens the dialog over {@code owner} and returns at once. */
    public static Stage open(Window owner, ScanImportViewModel vm, String stylesheet) {
        Stage stage = new Stage();
        stage.initOwner(owner);
        stage.initModality(Modality.WINDOW_MODAL);
        stage.setTitle("Record measurement \u2013 " + vm.pointTag());

        Label title = new Label("Record measurement \u2013 " + vm.pointTag());
        title.getStyleClass().add("pane-heading");
        Label heading = new Label("Scan files of " + vm.pointTag()
                + ": each file is stored whole or not at all; a refused file does not stop the others.");
        heading.setWrapText(true);

        ListView<File> list = new ListView<>();
        list.setId("scan-import-files");
        list.setPrefHeight(150);
        vm.files().addListener((javafx.collections.ListChangeListener<java.nio.file.Path>) c ->
                list.getItems().setAll(vm.files().stream().map(java.nio.file.Path::toFile).toList()));
        list.getItems().setAll(vm.files().stream().map(java.nio.file.Path::toFile).toList());
        list.setPlaceholder(new Label("No files chosen yet: Add files\u2026, or drop them here"));
        list.setOnDragOver(e -> {
            if (e.getDragboard().hasFiles() && !vm.runningProperty().get()) {
                e.acceptTransferModes(TransferMode.COPY);
            }
            e.consume();
        });
        list.setOnDragDropped(e -> {
            boolean taken = e.getDragboard().hasFiles() && !vm.runningProperty().get();
            if (taken) {
                vm.addFiles(e.getDragboard().getFiles().stream().filter(File::isFile).map(File::toPath).toList());
            }
            e.setDropCompleted(taken);
            e.consume();
        });

        Button add = new Button("Add files\u2026");
        add.setId("scan-import-add");
        add.setOnAction(e -> {
            FileChooser chooser = new FileChooser();
            chooser.setTitle("Scan files of " + vm.pointTag());
            chooser.getExtensionFilters().addAll(
                    new FileChooser.ExtensionFilter("Scan files (*.jdx, *.dx, *.csv, *.txt)", "*.jdx", "*.dx", "*.jcm",
                            "*.csv", "*.txt"),
                    new FileChooser.ExtensionFilter("All files", "*.*"));
            List<File> chosen = chooser.showOpenMultipleDialog(stage);
            if (chosen != null) {
                vm.addFiles(chosen.stream().map(File::toPath).toList());
            }
        });
        add.disableProperty().bind(vm.runningProperty());

        ChoiceBox<ScanKind> kind = new ChoiceBox<>();
        kind.setId("scan-import-kind");
        kind.getItems().setAll(ScanKind.values());
        kind.setConverter(new StringConverter<>() {
            @Override
            public String toString(ScanKind k) {
                return k == null ? "" : switch (k) {
                    case LOOP -> "loop (light through the whole point)";
                    case REFERENCE -> "reference (lamp through the patch cord)";
                    case DARK -> "dark (lamp blocked)";
                };
            }

            @Override
            public ScanKind fromString(String s) {
                return ScanKind.fromWord(s);
            }
        });
        kind.valueProperty().bindBidirectional(vm.kindProperty());
        kind.disableProperty().bind(vm.runningProperty());
        TextField operator = new TextField();
        operator.setId("scan-import-operator");
        operator.textProperty().bindBidirectional(vm.operatorProperty());
        operator.disableProperty().bind(vm.runningProperty());

        GridPane form = new GridPane();
        form.setHgap(8);
        form.setVgap(6);
        form.addRow(0, new Label("Kind of scan"), kind);
        form.addRow(1, new Label("Operator (when a file names none)"), operator);

        ProgressBar progress = new ProgressBar(0);
        progress.setId("scan-import-progress");
        progress.setMaxWidth(Double.MAX_VALUE);
        progress.progressProperty().bind(vm.progressProperty());
        progress.visibleProperty().bind(vm.runningProperty().or(vm.finishedProperty()));
        Label message = new Label();
        message.setId("scan-import-message");
        message.setWrapText(true);
        message.textProperty().bind(vm.messageProperty());

        ListView<String> refused = new ListView<>();
        refused.setId("scan-import-refused");
        refused.setPrefHeight(90);
        refused.itemsProperty().bind(Bindings.createObjectBinding(
                () -> javafx.collections.FXCollections.observableArrayList(vm.refusedProperty().get()), vm.refusedProperty()));
        refused.visibleProperty().bind(Bindings.createBooleanBinding(() -> !vm.refusedProperty().get().isEmpty(),
                vm.refusedProperty()));
        refused.managedProperty().bind(refused.visibleProperty());
        // accepted departures from the format (a LINK block chosen, lines labelled one point off...):
        // stored, but the technician should know what was read
        ListView<String> tolerated = new ListView<>();
        tolerated.setId("scan-import-tolerated");
        tolerated.setPrefHeight(60);
        tolerated.itemsProperty().bind(Bindings.createObjectBinding(
                () -> javafx.collections.FXCollections.observableArrayList(vm.toleratedProperty().get()),
                vm.toleratedProperty()));
        tolerated.visibleProperty().bind(Bindings.createBooleanBinding(() -> !vm.toleratedProperty().get().isEmpty(),
                vm.toleratedProperty()));
        tolerated.managedProperty().bind(tolerated.visibleProperty());

        Button start = new Button("Import");
        start.setId("scan-import-start");
        start.setDefaultButton(true);
        start.disableProperty().bind(vm.canImportProperty().not());
        start.setOnAction(e -> vm.start());
        Button cancel = new Button("Cancel");
        cancel.setId("scan-import-cancel");
        cancel.disableProperty().bind(vm.runningProperty().not());
        cancel.setOnAction(e -> vm.cancel());
        Button close = new Button("Close");
        close.setId("scan-import-close");
        close.disableProperty().bind(vm.runningProperty());
        close.setOnAction(e -> stage.close());
        stage.setOnCloseRequest(e -> {
            if (vm.runningProperty().get()) {
                e.consume();
            }
        });
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        HBox buttons = new HBox(8, add, gap, start, cancel, close);
        buttons.setAlignment(Pos.CENTER_LEFT);

        VBox root = new VBox(8, title, heading, list, form, buttons, progress, message, refused, tolerated);
        root.setPadding(new Insets(12));
        root.setPrefWidth(620);
        Scene scene = new Scene(root);
        if (stylesheet != null) {
            scene.getStylesheets().add(stylesheet);
        }
        stage.setScene(scene);
        stage.show();
        return stage;
    }
}
