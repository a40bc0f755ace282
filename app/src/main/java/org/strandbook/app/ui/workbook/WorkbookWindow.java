package org.strandbook.app.ui.workbook;

import java.io.File;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyObjectProperty;
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
import javafx.scene.control.CustomMenuItem;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.TextInputDialog;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.Tooltip;
import javafx.scene.control.TreeItem;
import javafx.scene.control.TreeView;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.RowConstraints;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.DirectoryChooser;
import javafx.stage.FileChooser;
import javafx.stage.Screen;
import javafx.stage.Stage;

import org.strandbook.app.ui.path.LegJoint;
import org.strandbook.app.ui.path.LegSegment;
import org.strandbook.app.ui.plot.PlotAxesBar;
import org.strandbook.app.ui.plot.SpectrumPlotView;
import org.strandbook.app.ui.plot.TrendPlotView;
import org.strandbook.app.ui.uncertainty.UncertaintyPanel;
import org.strandbook.app.ui.safety.SafetyCaution;
import org.strandbook.app.ui.safety.SafetyCautionDialog;
import org.strandbook.app.ui.sheet.SheetView;
import org.strandbook.app.ui.sheet.Verdict;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanRecord;

/**
 * The workbook window: menu, site tree, the sheets in tabs, the selected point's three plots and
 * the status bar with progress and Cancel. Without an open workbook it offers the sample site. It
 * binds to a {@link WorkbookViewModel} and holds no rules of its own.
 */
public final class WorkbookWindow {

    static final String STYLESHEET = "/org/strandbook/app/ui/strandbook.css";
    private static final FileChooser.ExtensionFilter WORKBOOK_FILES =
            new FileChooser.ExtensionFilter("Strandbook workbook (*.strandbook)", "*.strandbook");
    private static final FileChooser.ExtensionFilter SCHEDULE_FILES =
            new FileChooser.ExtensionFilter("Cable schedule (*.xlsx)", "*.xlsx");

    private final Stage stage;
    private final WorkbookViewModel vm;
    private final TreeView<SiteEntry> tree = new TreeView<>();
    private final TabPane tabs = new TabPane();
    private final SheetView<MeasurementPoint> pointsView;
    private final SheetView<LegSegment> segmentsView;
    private final SheetView<LegJoint> jointsView;
    private final SheetView<ScanRecord> scansView;
    private final SheetView<FiberType> fibersView;
    private final SheetView<ConnectorType> connectorsView;
    private final SheetView<ProbeType> probesView;
    private final SpectrumPlotView budgetPlot;
    private final SpectrumPlotView measuredPlot;
    private final TrendPlotView trendPlot;
    private final SplitPane workArea = new SplitPane();
    private final Menu recentMenu = new Menu("Open recent");
    private final Scene scene;
    private final String stylesheet;
    private boolean rebuildingTree;

    public WorkbookWindow(Stage stage, WorkbookViewModel vm) {
        this.stage = stage;
        this.vm = vm;
        this.stylesheet = Objects.requireNonNull(getClass().getResource(STYLESHEET)).toExternalForm();
        PointViewModel point = vm.point();
        pointsView = new SheetView<>(vm.points(), "points-sheet");
        segmentsView = new SheetView<>(point.segments(), "segments-sheet");
        jointsView = new SheetView<>(point.joints(), "joints-sheet");
        scansView = new SheetView<>(point.scans(), "scans-sheet");
        fibersView = new SheetView<>(vm.fibers(), "fibers-sheet");
        connectorsView = new SheetView<>(vm.connectors(), "connectors-sheet");
        probesView = new SheetView<>(vm.probes(), "probes-sheet");
        budgetPlot = new SpectrumPlotView(point.budgetPlot(), "budget-plot");
        measuredPlot = new SpectrumPlotView(point.measuredPlot(), "measured-plot");
        trendPlot = new TrendPlotView(point.trendPlot(), "trend-plot");

        SplitPane main = new SplitPane(siteTree(), buildWorkArea());
        main.setDividerPositions(0.16);
        SplitPane.setResizableWithParent(main.getItems().get(0), false);
        Node welcome = welcome();
        welcome.visibleProperty().bind(vm.openProperty().not());
        main.visibleProperty().bind(vm.openProperty());

        BorderPane root = new BorderPane();
        root.setTop(menuBar());
        root.setCenter(new StackPane(main, welcome));
        root.setBottom(statusBar());

        Rectangle2D screen = Screen.getPrimary().getVisualBounds();
        scene = new Scene(root, Math.min(1366, screen.getWidth()), Math.min(768, screen.getHeight()));
        scene.getStylesheets().add(stylesheet);
        stage.titleProperty().bind(vm.titleProperty());
        stage.setScene(scene);
        stage.setMinWidth(900);
        stage.setMinHeight(560);
        vm.scheduleProblemsProperty().addListener((o, was, is) -> {
            if (!is.isEmpty()) {
                showScheduleProblems(is);
            }
        });
        pointsView.table().getFocusModel().focusedIndexProperty().addListener((o, was, is) -> {
            int row = is.intValue();
            if (row >= 0 && row < vm.points().rowCount()) {
                vm.selectPoint(vm.points().records().get(row).tag());
            }
        });
    }

    public Scene scene() {
        return scene;
    }

    public TabPane tabs() {
        return tabs;
    }

    public SheetView<MeasurementPoint> pointsView() {
        return pointsView;
    }

    public SheetView<LegSegment> segmentsView() {
        return segmentsView;
    }

    public SheetView<LegJoint> jointsView() {
        return jointsView;
    }

    public SheetView<FiberType> fibersView() {
        return fibersView;
    }

    public SheetView<ConnectorType> connectorsView() {
        return connectorsView;
    }

    public SheetView<ProbeType> probesView() {
        return probesView;
    }

    public SpectrumPlotView budgetPlot() {
        return budgetPlot;
    }

    public SpectrumPlotView measuredPlot() {
        return measuredPlot;
    }

    public TrendPlotView trendPlot() {
        return trendPlot;
    }

    /** The split between the sheets (above) and the point's plots (below). */
    public SplitPane sheetsAndPlots() {
        return workArea;
    }

    // ---- menu

    private MenuBar menuBar() {
        MenuItem newItem = item("New workbook\u2026", "Shortcut+N", this::newWorkbook);
        MenuItem open = item("Open\u2026", "Shortcut+O", this::openWorkbook);
        MenuItem sample = item("Open the sample site", null, () -> vm.openSample(vm.sampleFolder()));
        MenuItem fromServer = item("Open from plant server\u2026", "Shortcut+Shift+O", this::openFromServer);
        fromServer.setId("menu-open-from-server");
        MenuItem saveAs = item("Save As\u2026", "Shortcut+Shift+S", this::saveAs);
        saveAs.disableProperty().bind(vm.openProperty().not());
        MenuItem schedule = item("Import cable schedule\u2026", null, this::importSchedule);
        schedule.disableProperty().bind(vm.openProperty().not());
        MenuItem record = item("Record measurement\u2026", "Shortcut+R", this::recordMeasurement);
        record.disableProperty().bind(vm.selectedTagProperty().isEmpty());
        MenuItem quit = item("Quit", "Shortcut+Q", stage::close);
        vm.recentFilesProperty().addListener((o, was, is) -> fillRecent(is));
        fillRecent(vm.recentFilesProperty().get());
        Menu file = new Menu("File", null, newItem, open, recentMenu, fromServer, sample, saveAs, new SeparatorMenuItem(), schedule,
                record, dossierItem(), new SeparatorMenuItem(), quit);
        MenuItem evaluate = item("Evaluate every point against its scans", "F5", vm::evaluateSite);
        evaluate.disableProperty().bind(vm.openProperty().not());
        MenuItem sync = item("Sync with plant server", "Shortcut+Shift+Y", this::syncWithServer);
        sync.setId("menu-sync");
        sync.disableProperty().bind(vm.openProperty().not());
        MenuItem syncAs = item("Sync with plant server as\u2026", null, this::syncWithServerAs);
        syncAs.disableProperty().bind(vm.openProperty().not());
        MenuItem settle = item("Edits to settle", null, () -> tabs.getSelectionModel().select(tabById("tab-conflicts")));
        settle.disableProperty().bind(vm.openProperty().not());
        Menu site = new Menu("Site", null, evaluate, new SeparatorMenuItem(), sync, syncAs, settle);
        MenuItem safety = item(SafetyCaution.TITLE + "\u2026", null, () -> SafetyCautionDialog.show(stage));
        safety.setId("menu-safety");
        MenuItem about = item("About Strandbook", null, this::about);
        Menu help = new Menu("Help", null, safety, about);
        return new MenuBar(file, site, help);
    }

    /** Export dossier: enabled when this build has the export, else shown greyed with the reason. */
    private MenuItem dossierItem() {
        if (vm.dossierAvailable()) {
            MenuItem export = item("Export dossier\u2026", "Shortcut+E", this::exportDossier);
            export.setId("menu-export-dossier");
            export.disableProperty().bind(vm.openProperty().not());
            return export;
        }
        // a disabled menu item cannot show a tooltip; this one looks disabled, does nothing and says why
        Label text = new Label("Export dossier\u2026");
        text.getStyleClass().add("menu-item-unavailable");
        Tooltip.install(text, new Tooltip("The commissioning dossier export is not part of this build yet"));
        CustomMenuItem export = new CustomMenuItem(text, false);
        export.setId("menu-export-dossier");
        return export;
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

    private Optional<Path> chooseWorkbook(boolean save, String title) {
        FileChooser chooser = new FileChooser();
        chooser.setTitle(title);
        chooser.getExtensionFilters().add(WORKBOOK_FILES);
        File f = save ? chooser.showSaveDialog(stage) : chooser.showOpenDialog(stage);
        if (f == null) {
            return Optional.empty();
        }
        Path p = f.toPath();
        return Optional.of(save && !p.getFileName().toString().contains(".") ? p.resolveSibling(p.getFileName() + ".strandbook") : p);
    }

    private void openWorkbook() {
        chooseWorkbook(false, "Open workbook").ifPresent(vm::open);
    }

    private void newWorkbook() {
        Optional<Path> file = chooseWorkbook(true, "New workbook");
        if (file.isEmpty()) {
            return;
        }
        TextInputDialog name = new TextInputDialog();
        name.initOwner(stage);
        name.setTitle("New workbook");
        name.setHeaderText("One workbook holds one site. Name the site as the plant names it.");
        name.setContentText("Site name:");
        name.showAndWait().filter(n -> !n.isBlank()).ifPresent(n -> vm.createWorkbook(file.get(), n));
    }

    /** Opens the dialog that clones a site from the plant server into a new workbook. */
    public Stage openFromServer() {
        return PlantServerDialog.openSite(stage, vm.plantServer(), vm.tasks(), stylesheet);
    }

    /** Syncs with the workbook's server; a workbook that never synced asks for the address first. */
    private void syncWithServer() {
        if (vm.plantServer().serverProperty().get().isEmpty()) {
            syncWithServerAs();
        } else {
            vm.plantServer().sync();
        }
    }

    /** Opens the dialog that gives a sync its server and user: the first sync, another user, TLS parameters. */
    Stage syncWithServerAs() {
        return PlantServerDialog.syncAs(stage, vm.plantServer(), stylesheet);
    }

    private void saveAs() {
        chooseWorkbook(true, "Save a copy of the workbook as").ifPresent(vm::saveAs);
    }

    private void importSchedule() {
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Import a filled cable schedule");
        chooser.getExtensionFilters().add(SCHEDULE_FILES);
        File f = chooser.showOpenDialog(stage);
        if (f != null) {
            vm.importSchedule(f.toPath());
        }
    }

    private void exportDossier() {
        String ext = vm.dossierExtension().orElse("xlsx");
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Export the commissioning dossier");
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Dossier (*." + ext + ")", "*." + ext));
        File f = chooser.showSaveDialog(stage);
        if (f != null) {
            vm.exportDossier(f.toPath());
        }
    }

    private void chooseSampleFolder() {
        DirectoryChooser chooser = new DirectoryChooser();
        chooser.setTitle("Folder for the sample site");
        File f = chooser.showDialog(stage);
        if (f != null) {
            vm.openSample(f.toPath().resolve("strandbook-sample"));
        }
    }

    /**
     * Asks for the safety caution when the point needs it, then opens the record dialog on the
     * returned import (empty when the user stopped or no point is selected).
     */
    public Optional<ScanImportViewModel> recordMeasurement() {
        if (!vm.cautionBeforeRecording().map(reason -> SafetyCautionDialog.confirmOnce(stage, vm.caution(), reason)).orElse(true)) {
            return Optional.empty();
        }
        Optional<ScanImportViewModel> importVm = vm.recordMeasurement();
        importVm.ifPresent(i -> ScanImportDialog.open(stage, i, stylesheet));
        return importVm;
    }

    private void showScheduleProblems(List<String> problems) {
        Alert a = new Alert(Alert.AlertType.WARNING, "", ButtonType.CLOSE);
        a.initOwner(stage);
        a.setTitle("Cable schedule refused");
        a.setHeaderText("Nothing was written. Correct these cells in the schedule and import it again:");
        ListView<String> list = new ListView<>();
        list.getItems().setAll(problems);
        list.setPrefSize(640, 260);
        a.getDialogPane().setContent(list);
        a.show();
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

    // ---- welcome: no workbook open

    private Node welcome() {
        Label heading = new Label("No workbook is open");
        heading.getStyleClass().add("welcome-heading");
        Label text = new Label("A workbook holds one site: its analyzers, measurement points, light paths, catalogs "
                + "and every scan. Start from a contractor's cable schedule in a new workbook, open one, or look "
                + "around the sample site first: an invented plant with twelve points, some of them with faults, and two "
                + "years of scans.");
        text.setWrapText(true);
        text.setMaxWidth(620);
        Button sample = new Button("Open the sample site");
        sample.setId("welcome-sample");
        sample.setDefaultButton(true);
        sample.setOnAction(e -> vm.openSample(vm.sampleFolder()));
        Label where = new Label("built in " + vm.sampleFolder() + " the first time (a few seconds)");
        where.getStyleClass().add("welcome-note");
        Button elsewhere = new Button("Build the sample in another folder\u2026");
        elsewhere.setOnAction(e -> chooseSampleFolder());
        Button open = new Button("Open a workbook\u2026");
        open.setOnAction(e -> openWorkbook());
        Button create = new Button("New workbook\u2026");
        create.setOnAction(e -> newWorkbook());
        Button fromServer = new Button("Open from plant server\u2026");
        fromServer.setId("welcome-from-server");
        fromServer.setOnAction(e -> openFromServer());
        VBox box = new VBox(12, heading, text, new VBox(2, sample, where), elsewhere,
                new HBox(8, open, create, fromServer));
        box.setAlignment(Pos.CENTER_LEFT);
        box.setMaxWidth(660);
        box.setPadding(new Insets(24));
        StackPane pane = new StackPane(box);
        pane.setId("welcome");
        pane.getStyleClass().add("welcome");
        return pane;
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
        box.setMinWidth(170);
        return box;
    }

    private void rebuildTree(SiteOutline outline) {
        rebuildingTree = true;
        try {
            TreeItem<SiteEntry> root = new TreeItem<>(new SiteEntry(SiteEntry.Kind.SITE, "", outline.site().name()));
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

    // ---- sheets and plots

    private Node buildWorkArea() {
        PointViewModel point = vm.point();
        tabs.setId("workbook-tabs");
        tabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        TabPane catalogs = new TabPane(
                tab("Fiber types", "tab-fibers", fibersView),
                tab("Connector types", "tab-connectors", connectorsView),
                tab("Probe types", "tab-probes", probesView));
        catalogs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        catalogs.setId("catalog-tabs");
        Tab catalogTab = new Tab("Catalogs", catalogs);
        catalogTab.setId("tab-catalogs");
        tabs.getTabs().addAll(
                tab("Points", "tab-points", pointsView, heading("All measurement points of the site. Predicted status, "
                        + "margin and losses are computed from the light paths; measured status from the latest scans.")),
                tab("Cable segments", "tab-segments", segmentsView, pointContext(point)),
                tab("Joints", "tab-joints", jointsView, pointContext(point)),
                readOnlyTab("Scans", "tab-scans", scansView, pointContext(point), scanActions()),
                historyTab(point),
                uncertaintyTab(point),
                attentionTab(),
                conflictsTab(),
                catalogTab);

        Label summary = verdictLabel("budget-summary", point.summaryProperty(), point.summaryVerdictProperty());
        Label finding = verdictLabel("measured-finding", point.findingProperty(), point.findingVerdictProperty());
        GridPane plots = new GridPane();
        plots.setId("point-plots");
        plots.setHgap(6);
        for (int i = 0; i < 3; i++) {
            ColumnConstraints c = new ColumnConstraints();
            c.setPercentWidth(100.0 / 3);
            c.setHgrow(Priority.ALWAYS);
            plots.getColumnConstraints().add(c);
        }
        RowConstraints r = new RowConstraints();
        r.setVgrow(Priority.ALWAYS);
        plots.getRowConstraints().add(r);
        plots.addRow(0, budgetPlot.node(), measuredPlot.node(), trendPlot.node());
        VBox detail = new VBox(2, summary, finding, new PlotAxesBar(point.budgetPlot().axes()).node(), plots);
        VBox.setVgrow(plots, Priority.ALWAYS);
        detail.setPadding(new Insets(2, 6, 2, 6));
        detail.setMinHeight(0);

        workArea.getItems().setAll(tabs, detail);
        workArea.setOrientation(Orientation.VERTICAL);
        workArea.setDividerPositions(0.45);
        return workArea;
    }

    private static Label verdictLabel(String id, javafx.beans.property.ReadOnlyStringProperty text,
                                      ReadOnlyObjectProperty<Verdict> verdict) {
        Label l = new Label();
        l.setId(id);
        l.getStyleClass().add("budget-summary");
        l.textProperty().bind(text);
        l.setWrapText(true);
        l.setMinHeight(Region.USE_PREF_SIZE);
        verdict.addListener((o, was, is) -> {
            for (Verdict v : Verdict.values()) {
                l.pseudoClassStateChanged(PseudoClass.getPseudoClass(v.name().toLowerCase(Locale.ROOT)), v == is);
            }
        });
        return l;
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

    /** A tab for a sheet nobody types into: no undo, fill or row buttons. */
    private Tab readOnlyTab(String title, String id, SheetView<?> view, Node... above) {
        VBox box = new VBox(4);
        box.setPadding(new Insets(4));
        box.getChildren().addAll(above);
        box.getChildren().add(view.node());
        VBox.setVgrow(view.node(), Priority.ALWAYS);
        Tab t = new Tab(title, box);
        t.setId(id);
        return t;
    }

    /** The point's history with its record buttons; the dialogs open over this window. */
    private Tab historyTab(PointViewModel point) {
        HistoryPanel panel = new HistoryPanel(point.history(), () -> stage);
        VBox box = new VBox(4, pointContext(point), panel.node());
        box.setPadding(new Insets(4));
        VBox.setVgrow(panel.node(), Priority.ALWAYS);
        Tab t = new Tab("History", box);
        t.setId("tab-history");
        return t;
    }

    /** The selected point's uncertainty budget per band and the design question. */
    private Tab uncertaintyTab(PointViewModel point) {
        UncertaintyPanel panel = new UncertaintyPanel(point.uncertainty());
        VBox box = new VBox(4, pointContext(point), panel.node());
        box.setPadding(new Insets(4));
        VBox.setVgrow(panel.node(), Priority.ALWAYS);
        Tab t = new Tab("Uncertainty", box);
        t.setId("tab-uncertainty");
        return t;
    }

    /**
     * The site's attention view; ranked when the tab is shown and the lists are out of date. A point
     * opened from it shows in the History tab, with its plots below.
     */
    private Tab attentionTab() {
        AttentionViewModel attention = vm.attention();
        Tab t = new Tab("Attention");
        AttentionView view = new AttentionView(attention, () -> tabs.getSelectionModel().select(tabById("tab-history")));
        t.setContent(view.node());
        t.setId("tab-attention");
        t.selectedProperty().addListener((o, was, is) -> {
            if (is && attention.staleProperty().get() && vm.openProperty().get()) {
                attention.refresh();
            }
        });
        attention.changesProperty().addListener((o, was, is) -> {
            if (t.isSelected() && vm.openProperty().get()) {
                attention.refresh();
            }
        });
        return t;
    }

    /** The conflicts with the plant server, titled with how many wait for a choice. */
    private Tab conflictsTab() {
        PlantServerViewModel server = vm.plantServer();
        Tab t = new Tab("", new ConflictsView(server, this::syncWithServer).node());
        t.setId("tab-conflicts");
        t.textProperty().bind(Bindings.createStringBinding(() -> server.openConflictsProperty().get() == 0
                ? "Edits to settle" : "Edits to settle (" + server.openConflictsProperty().get() + ")",
                server.openConflictsProperty()));
        return t;
    }

    private Tab tabById(String id) {
        return tabs.getTabs().stream().filter(t -> id.equals(t.getId())).findFirst().orElseThrow();
    }

    private static Label heading(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("pane-heading");
        return l;
    }

    private static Label pointContext(PointViewModel point) {
        Label l = new Label();
        l.getStyleClass().add("pane-heading");
        l.textProperty().bind(point.contextProperty());
        return l;
    }

    private Node scanActions() {
        Button record = new Button("Record measurement\u2026");
        record.setId("record-measurement");
        record.setTooltip(new Tooltip("Add scan files of this point to the workbook"));
        record.disableProperty().bind(vm.selectedTagProperty().isEmpty());
        record.setOnAction(e -> recordMeasurement());
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
        message.setText(vm.noticeProperty().get().isEmpty() ? "Ready" : vm.noticeProperty().get());
        ProgressBar progress = new ProgressBar();
        progress.setId("task-progress");
        progress.setPrefWidth(200);
        progress.progressProperty().bind(vm.tasks().progressProperty());
        progress.visibleProperty().bind(vm.tasks().runningProperty());
        Button cancel = new Button("Cancel");
        cancel.setId("task-cancel");
        cancel.disableProperty().bind(vm.tasks().runningProperty().not());
        cancel.setOnAction(e -> vm.tasks().cancel());
        cancel.setMinWidth(Region.USE_PREF_SIZE);
        message.setMinWidth(220);
        Label sync = new Label();
        sync.setId("sync-state");
        sync.textProperty().bind(vm.syncStateProperty());
        // the server's address can be long: the line gives way to the task message, the tooltip keeps it whole
        sync.setMinWidth(0);
        sync.setMaxWidth(560);
        Tooltip whole = new Tooltip();
        whole.textProperty().bind(vm.syncStateProperty());
        sync.setTooltip(whole);
        HBox bar = new HBox(8, message, sync, progress, cancel);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(3, 8, 3, 8));
        bar.getStyleClass().add("status-bar");
        return bar;
    }
}
