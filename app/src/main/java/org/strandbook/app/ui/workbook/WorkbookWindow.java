package org.strandbook.app.ui.workbook;

import java.io.File;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

import javafx.beans.binding.Bindings;
import javafx.css.PseudoClass;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.geometry.Rectangle2D;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.Tooltip;
import javafx.scene.control.TreeItem;
import javafx.scene.control.TreeView;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Screen;
import javafx.stage.Stage;

import org.strandbook.app.ui.plot.SpectrumPlotView;
import org.strandbook.app.ui.safety.SafetyCaution;
import org.strandbook.app.ui.safety.SafetyCautionDialog;
import org.strandbook.app.ui.sheet.SheetView;
import org.strandbook.app.ui.sheet.Verdict;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ScanRecord;

/**
 * The workbook window: menu, site tree, the point's sheets in tabs, the loss plot and the status
 * bar with progress and Cancel. It binds to a {@link WorkbookViewModel} and holds no rules of its own.
 */
public final class WorkbookWindow {

    static final String STYLESHEET = "/org/strandbook/app/ui/strandbook.css";
    private static final FileChooser.ExtensionFilter WORKBOOK_FILES =
            new FileChooser.ExtensionFilter("Strandbook workbook (*.strandbook)", "*.strandbook");

    private final Stage stage;
    private final WorkbookViewModel vm;
    private final TreeView<SiteEntry> tree = new TreeView<>();
    private final TabPane tabs = new TabPane();
    private final SheetView<MeasurementPoint> pointsView;
    private final SheetView<LegSegment> segmentsView;
    private final SheetView<LegJoint> jointsView;
    private final SheetView<ScanRecord> scansView;
    private final SheetView<FiberType> fibersView;
    private final SpectrumPlotView plotView;
    private final Menu recentMenu = new Menu("Open recent");
    private final Scene scene;
    private boolean rebuildingTree;

    public WorkbookWindow(Stage stage, WorkbookViewModel vm) {
        this.stage = stage;
        this.vm = vm;
        pointsView = new SheetView<>(vm.points(), "points-sheet");
        segmentsView = new SheetView<>(vm.segments(), "segments-sheet");
        jointsView = new SheetView<>(vm.joints(), "joints-sheet");
        scansView = new SheetView<>(vm.scans(), "scans-sheet");
        fibersView = new SheetView<>(vm.fibers(), "fibers-sheet");
        plotView = new SpectrumPlotView(vm.plot());

        BorderPane root = new BorderPane();
        root.setTop(menuBar());
        SplitPane main = new SplitPane(siteTree(), workArea());
        main.setDividerPositions(0.21);
        SplitPane.setResizableWithParent(main.getItems().get(0), false);
        root.setCenter(main);
        root.setBottom(statusBar());

        Rectangle2D screen = Screen.getPrimary().getVisualBounds();
        scene = new Scene(root, Math.min(1360, screen.getWidth()), Math.min(740, screen.getHeight() - 28));
        scene.getStylesheets().add(Objects.requireNonNull(getClass().getResource(STYLESHEET)).toExternalForm());
        stage.titleProperty().bind(vm.titleProperty());
        stage.setScene(scene);
        stage.setMinWidth(900);
        stage.setMinHeight(560);
    }

    public Scene scene() {
        return scene;
    }

    public SheetView<LegSegment> segmentsView() {
        return segmentsView;
    }

    public SheetView<MeasurementPoint> pointsView() {
        return pointsView;
    }

    public SpectrumPlotView plotView() {
        return plotView;
    }

    public TabPane tabs() {
        return tabs;
    }

    // ---- menu

    private MenuBar menuBar() {
        MenuItem newItem = item("New", "Shortcut+N", vm::newWorkbook);
        MenuItem open = item("Open\u2026", "Shortcut+O", this::openWorkbook);
        MenuItem saveAs = item("Save As\u2026", "Shortcut+Shift+S", this::saveAs);
        MenuItem quit = item("Quit", "Shortcut+Q", stage::close);
        vm.recentFilesProperty().addListener((o, was, is) -> fillRecent(is));
        fillRecent(vm.recentFilesProperty().get());
        Menu file = new Menu("File", null, newItem, open, recentMenu, saveAs, new SeparatorMenuItem(), quit);
        MenuItem safety = item(SafetyCaution.TITLE + "\u2026", null, () -> SafetyCautionDialog.show(stage));
        safety.setId("menu-safety");
        MenuItem about = item("About Strandbook", null, this::about);
        Menu help = new Menu("Help", null, safety, about);
        return new MenuBar(file, help);
    }

    private static MenuItem item(String text, String accelerator, Runnable action) {
        MenuItem m = new MenuItem(text);
        if (accelerator != null) {
            m.setAccelerator(KeyCombination.keyCombination(accelerator));
        }
        m.setOnAction(e -> action.run());
        return m;
    }

    private void fillRecent(List<Path> files) {
        recentMenu.getItems().clear();
        for (Path f : files) {
            recentMenu.getItems().add(item(f.toString(), null, () -> vm.open(f)));
        }
        recentMenu.setDisable(files.isEmpty());
    }

    private void openWorkbook() {
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Open workbook");
        chooser.getExtensionFilters().add(WORKBOOK_FILES);
        File f = chooser.showOpenDialog(stage);
        if (f != null) {
            vm.open(f.toPath());
        }
    }

    private void saveAs() {
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Save workbook as");
        chooser.getExtensionFilters().add(WORKBOOK_FILES);
        File f = chooser.showSaveDialog(stage);
        if (f != null) {
            vm.saveAs(f.toPath());
        }
    }

    private void about() {
        String version = Objects.requireNonNullElse(WorkbookWindow.class.getPackage().getImplementationVersion(), "development");
        Alert a = new Alert(Alert.AlertType.INFORMATION, "Workbook for commissioning and maintaining the fiber-optic "
                + "light paths of process spectrometers.\nVersion " + version + ".", ButtonType.CLOSE);
        a.initOwner(stage);
        a.setTitle("About Strandbook");
        a.setHeaderText("Strandbook");
        a.showAndWait();
    }

    // ---- site tree

    private Node siteTree() {
        tree.setId("site-tree");
        tree.setShowRoot(true);
        tree.getSelectionModel().selectedItemProperty().addListener((o, was, is) -> {
            if (!rebuildingTree && is != null && is.getValue().kind() == SiteEntry.Kind.POINT) {
                vm.selectPoint(is.getValue().tag());
            }
        });
        vm.outlineProperty().addListener((o, was, is) -> rebuildTree(is));
        vm.selectedTagProperty().addListener((o, was, is) -> selectInTree(is));
        rebuildTree(vm.outlineProperty().get());
        Label heading = new Label("Site");
        heading.getStyleClass().add("pane-heading");
        VBox box = new VBox(4, heading, tree);
        VBox.setVgrow(tree, Priority.ALWAYS);
        box.setPadding(new Insets(4));
        box.setMinWidth(200);
        return box;
    }

    private void rebuildTree(SiteOutline outline) {
        rebuildingTree = true;
        try {
            String site = outline.site().name();
            TreeItem<SiteEntry> root = new TreeItem<>(new SiteEntry(SiteEntry.Kind.SITE, "", site));
            root.setExpanded(true);
            outline.analyzers().forEach(a -> {
                TreeItem<SiteEntry> ai = new TreeItem<>(new SiteEntry(SiteEntry.Kind.ANALYZER, a.tag(),
                        a.tag() + " \u00B7 " + a.description()));
                ai.setExpanded(true);
                outline.pointsOf(a.tag()).forEach(p -> ai.getChildren().add(new TreeItem<>(new SiteEntry(
                        SiteEntry.Kind.POINT, p.tag(), p.tag() + "  ch " + p.channel() + (p.hazardousArea() ? "  \u26A0 Ex" : "")))));
                root.getChildren().add(ai);
            });
            tree.setRoot(root);
            selectInTree(vm.selectedTagProperty().get());
        } finally {
            rebuildingTree = false;
        }
    }

    private void selectInTree(String tag) {
        if (tree.getRoot() == null || tag == null) {
            return;
        }
        for (TreeItem<SiteEntry> analyzer : tree.getRoot().getChildren()) {
            for (TreeItem<SiteEntry> p : analyzer.getChildren()) {
                if (p.getValue().tag().equals(tag) && tree.getSelectionModel().getSelectedItem() != p) {
                    tree.getSelectionModel().select(p);
                }
            }
        }
    }

    // ---- sheets and plot

    private Node workArea() {
        tabs.setId("workbook-tabs");
        tabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        tabs.getTabs().addAll(
                tab("Points", "tab-points", pointsView, heading("All measurement points of the site. "
                        + "Predicted loss, margin and status are computed.")),
                tab("Cable segments", "tab-segments", segmentsView, pointContext()),
                tab("Joints", "tab-joints", jointsView, pointContext()),
                tab("Scans", "tab-scans", scansView, pointContext(), scanActions()),
                tab("Catalogs", "tab-catalogs", fibersView, heading("Fiber types (connector and probe catalogs follow the same pattern)")));

        Label summary = new Label();
        summary.setId("budget-summary");
        summary.getStyleClass().add("budget-summary");
        summary.textProperty().bind(vm.budgetSummaryProperty());
        summary.setWrapText(true);
        summary.setMinHeight(Region.USE_PREF_SIZE);
        vm.budgetVerdictProperty().addListener((o, was, is) -> {
            for (Verdict v : Verdict.values()) {
                summary.pseudoClassStateChanged(PseudoClass.getPseudoClass(v.name().toLowerCase(Locale.ROOT)), v == is);
            }
        });
        VBox detail = new VBox(2, summary, plotView.node());
        VBox.setVgrow(plotView.node(), Priority.ALWAYS);
        detail.setPadding(new Insets(2, 6, 2, 6));

        SplitPane split = new SplitPane(tabs, detail);
        split.setOrientation(Orientation.VERTICAL);
        split.setDividerPositions(0.58);
        return split;
    }

    private Tab tab(String title, String id, SheetView<?> view, Node... above) {
        VBox box = new VBox(4);
        box.setPadding(new Insets(4));
        box.getChildren().addAll(above);
        box.getChildren().addAll(view.toolbar(), view.node());
        VBox.setVgrow(view.node(), Priority.ALWAYS);
        Tab t = new Tab(title, box);
        t.setId(id);
        return t;
    }

    private static Label heading(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("pane-heading");
        return l;
    }

    private Label pointContext() {
        Label l = new Label();
        l.getStyleClass().add("pane-heading");
        l.textProperty().bind(vm.pointContextProperty());
        return l;
    }

    private Node scanActions() {
        Button record = new Button("Record measurement\u2026");
        record.setId("record-measurement");
        record.setTooltip(new Tooltip("Add scan files of this point to the workbook"));
        record.setOnAction(e -> {
            if (vm.cautionBeforeRecording().map(reason -> SafetyCautionDialog.confirmOnce(stage, vm.caution(), reason)).orElse(true)) {
                FileChooser chooser = new FileChooser();
                chooser.setTitle("Scan files to record");
                List<File> files = chooser.showOpenMultipleDialog(stage);
                if (files != null) {
                    vm.recordMeasurement(files.stream().map(File::toPath).toList());
                }
            }
        });
        ToggleButton light = new ToggleButton("Light source step");
        light.setId("light-source");
        light.setTooltip(new Tooltip("Mark the step in which the analyzer's source is on"));
        light.setOnAction(e -> {
            if (light.isSelected()) {
                boolean go = vm.cautionBeforeLightSource()
                        .map(reason -> SafetyCautionDialog.confirmOnce(stage, vm.caution(), reason)).orElse(true);
                light.setSelected(go);
                if (go) {
                    vm.setLightSource(true);
                }
            } else {
                vm.setLightSource(false);
            }
        });
        light.textProperty().bind(Bindings.when(vm.lightSourceOnProperty())
                .then("\u2600 Light source step: ON").otherwise("Light source step: off"));
        HBox bar = new HBox(8, record, light);
        bar.setAlignment(Pos.CENTER_LEFT);
        return bar;
    }

    // ---- status bar

    private Node statusBar() {
        Label message = new Label("Ready");
        message.setId("task-message");
        message.setMaxWidth(Double.MAX_VALUE);
        HBox.setHgrow(message, Priority.ALWAYS);
        vm.tasks().messageProperty().addListener((o, was, is) -> message.setText(is));
        vm.noticeProperty().addListener((o, was, is) -> message.setText(is));
        ProgressBar progress = new ProgressBar();
        progress.setId("task-progress");
        progress.setPrefWidth(180);
        progress.progressProperty().bind(vm.tasks().progressProperty());
        progress.visibleProperty().bind(vm.tasks().runningProperty());
        Button cancel = new Button("Cancel");
        cancel.setId("task-cancel");
        cancel.disableProperty().bind(vm.tasks().runningProperty().not());
        cancel.setOnAction(e -> vm.tasks().cancel());
        HBox bar = new HBox(8, message, progress, cancel);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(3, 8, 3, 8));
        bar.getStyleClass().add("status-bar");
        return bar;
    }
}
