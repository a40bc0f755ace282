package org.strandbook.app.ui.workbook;

import java.io.File;
import java.nio.file.Path;
import java.util.Optional;

import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Modality;
import javafx.stage.Stage;
import javafx.stage.Window;

import org.strandbook.app.ui.task.TaskExecutor;

/**
 * The plant server dialogs: "Open from plant server" (a new workbook cloned from a site on the
 * server, with its own progress bar and Cancel) and "Sync with plant server as" (the address and
 * user of a first sync). No password field: the password comes from where the command line takes
 * it, and the dialog says so. Bound to a {@link PlantServerViewModel}.
 */
public final class PlantServerDialog {

    private PlantServerDialog() {
    }

    /** Opens "Open from plant server" over {@code owner} and returns at once; it closes once the clone is open. */
    public static Stage openSite(Window owner, PlantServerViewModel vm, TaskExecutor tasks, String stylesheet) {
        Stage stage = stage(owner, "Open a site from the plant server", stylesheet);
        vm.forgetSites();
        TextField url = field("server-url", vm.suggestedUrl(), "jdbc:postgresql://HOST:PORT/DATABASE");
        TextField user = field("server-user", vm.suggestedUser(), "login role");
        ComboBox<String> site = new ComboBox<>();
        site.setId("server-site");
        site.setEditable(true);
        site.setPromptText("site name");
        site.setMaxWidth(Double.MAX_VALUE);
        vm.sitesProperty().addListener((o, was, is) -> {
            site.getItems().setAll(is);
            if (site.getValue() == null || site.getValue().isBlank()) {
                site.getSelectionModel().selectFirst();
            }
        });
        Button list = new Button("List sites");
        list.setId("server-list-sites");
        list.setOnAction(e -> vm.listSites(url.getText(), user.getText()));
        Label sites = note("");
        sites.setId("server-sites-message");
        sites.setMinHeight(18);
        sites.textProperty().bind(vm.sitesMessageProperty());
        TextField target = field("server-target", "", "the new workbook (.strandbook)");
        site.valueProperty().addListener((o, was, is) -> {
            if (is != null && !is.isBlank() && (target.getText().isBlank()
                    || target.getText().equals(was == null ? "" : vm.suggestedTarget(was).toString()))) {
                target.setText(vm.suggestedTarget(is).toString());
            }
        });
        Button choose = new Button("Choose\u2026");
        choose.setMinWidth(Region.USE_PREF_SIZE);
        list.setMinWidth(Region.USE_PREF_SIZE);
        choose.setOnAction(e -> {
            FileChooser chooser = new FileChooser();
            chooser.setTitle("The new workbook");
            chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Strandbook workbook (*.strandbook)",
                    "*.strandbook"));
            File f = chooser.showSaveDialog(stage);
            if (f != null) {
                target.setText(f.getName().contains(".") ? f.toString() : f + ".strandbook");
            }
        });

        GridPane grid = grid();
        grid.addRow(0, new Label("Server"), url);
        grid.addRow(1, new Label("User"), user);
        grid.add(note(PlantServerViewModel.PASSWORD_SOURCE), 1, 2);
        grid.addRow(3, new Label("Site"), new HBox(6, site, list));
        grid.add(sites, 1, 4);
        grid.addRow(5, new Label("New workbook"), new HBox(6, target, choose));
        HBox.setHgrow(site, Priority.ALWAYS);
        HBox.setHgrow(target, Priority.ALWAYS);

        Label problem = problem();
        problem.textProperty().bind(vm.cloneProblemProperty());
        Button open = new Button("Open");
        open.setId("server-open");
        open.setDefaultButton(true);
        open.disableProperty().bind(tasks.runningProperty());
        open.setOnAction(e -> vm.cloneSite(url.getText(), user.getText(), site.getValue(), targetOf(target)));
        vm.clonedProperty().addListener((o, was, is) -> {
            if (is != null) {
                stage.close();
            }
        });
        VBox root = new VBox(10, heading("A new workbook on this computer holding everything the server has of one"
                + " site; you then work offline and sync when the network is in reach. An existing file is never"
                + " overwritten."), grid, problem, progressRow(tasks, stage, open));
        root.setPadding(new Insets(12));
        stage.setScene(scene(root, stylesheet));
        stage.show();
        return stage;
    }

    /** Opens "Sync with plant server as" over {@code owner}; Sync closes it and the sync runs in the status bar. */
    public static Stage syncAs(Window owner, PlantServerViewModel vm, String stylesheet) {
        Stage stage = stage(owner, "Sync with plant server", stylesheet);
        TextField url = field("server-url", vm.suggestedUrl(), "jdbc:postgresql://HOST:PORT/DATABASE");
        TextField user = field("server-user", vm.suggestedUser(), "login role");
        GridPane grid = grid();
        grid.addRow(0, new Label("Server"), url);
        grid.addRow(1, new Label("User"), user);
        grid.add(note(PlantServerViewModel.PASSWORD_SOURCE), 1, 2);
        Label problem = problem();
        Button sync = new Button("Sync");
        sync.setId("server-sync");
        sync.setDefaultButton(true);
        sync.setOnAction(e -> {
            Optional<String> bad = vm.checkServer(url.getText(), user.getText());
            problem.setText(bad.orElse(""));
            if (bad.isEmpty()) {
                stage.close();
                vm.sync(url.getText(), user.getText());
            }
        });
        Button close = new Button("Close");
        close.setCancelButton(true);
        close.setOnAction(e -> stage.close());
        HBox buttons = new HBox(8, spacer(), sync, close);
        VBox root = new VBox(10, heading("Sends what is new in this workbook to its site on the server and takes what"
                + " others recorded. The first sync of a site creates it on the server. A workbook that fails its audit"
                + " check is refused and nothing is sent."), grid, problem, buttons);
        root.setPadding(new Insets(12));
        stage.setScene(scene(root, stylesheet));
        stage.show();
        return stage;
    }

    private static Path targetOf(TextField target) {
        String t = target.getText().strip();
        return t.isEmpty() ? null : Path.of(t);
    }

    /** The running job's bar, message and Cancel, and the dialog's own buttons. */
    private static VBox progressRow(TaskExecutor tasks, Stage stage, Button action) {
        ProgressBar bar = new ProgressBar();
        bar.setId("server-progress");
        bar.setMaxWidth(Double.MAX_VALUE);
        bar.setMinHeight(Region.USE_PREF_SIZE);
        bar.progressProperty().bind(tasks.progressProperty());
        bar.visibleProperty().bind(tasks.runningProperty());
        Label message = note("");
        message.setId("server-task-message");
        // room for two lines from the start: the dialog is sized once, before any message arrives
        message.setMinHeight(36);
        message.textProperty().bind(Bindings.when(tasks.runningProperty()).then(tasks.messageProperty()).otherwise(""));
        Button cancel = new Button("Cancel");
        cancel.setId("server-cancel");
        cancel.disableProperty().bind(tasks.runningProperty().not());
        cancel.setOnAction(e -> tasks.cancel());
        Button close = new Button("Close");
        close.setCancelButton(true);
        close.setOnAction(e -> stage.close());
        close.disableProperty().bind(tasks.runningProperty());
        HBox buttons = new HBox(8, spacer(), action, cancel, close);
        return new VBox(6, bar, message, buttons);
    }

    private static Stage stage(Window owner, String title, String stylesheet) {
        Stage stage = new Stage();
        stage.initOwner(owner);
        stage.initModality(Modality.WINDOW_MODAL);
        stage.setTitle(title);
        return stage;
    }

    private static Scene scene(VBox root, String stylesheet) {
        root.setPrefWidth(640);
        Scene scene = new Scene(root);
        scene.getStylesheets().add(stylesheet);
        return scene;
    }

    private static GridPane grid() {
        GridPane grid = new GridPane();
        grid.setHgap(8);
        grid.setVgap(6);
        javafx.scene.layout.ColumnConstraints labels = new javafx.scene.layout.ColumnConstraints();
        labels.setMinWidth(Region.USE_PREF_SIZE);
        javafx.scene.layout.ColumnConstraints fields = new javafx.scene.layout.ColumnConstraints();
        fields.setHgrow(Priority.ALWAYS);
        grid.getColumnConstraints().addAll(labels, fields);
        return grid;
    }

    private static TextField field(String id, String text, String prompt) {
        TextField f = new TextField(text);
        f.setId(id);
        f.setPromptText(prompt);
        f.setPrefColumnCount(36);
        return f;
    }

    /** A label that wraps and never shrinks below its lines. */
    private static Label heading(String text) {
        Label l = new Label(text);
        l.setWrapText(true);
        l.setMinHeight(Region.USE_PREF_SIZE);
        return l;
    }

    private static Label note(String text) {
        Label l = heading(text);
        l.getStyleClass().add("welcome-note");
        return l;
    }

    private static Label problem() {
        Label l = heading("");
        l.setId("server-problem");
        l.getStyleClass().add("server-problem");
        return l;
    }

    private static Region spacer() {
        Region r = new Region();
        HBox.setHgrow(r, Priority.ALWAYS);
        return r;
    }
}
