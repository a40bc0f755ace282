package org.strandbook.app.ui.workbook;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import javafx.stage.Stage;
import javafx.stage.Window;

import org.strandbook.app.ui.MemoryPreferences;
import org.strandbook.app.ui.plot.PlotAxes;
import org.strandbook.app.ui.task.DirectTaskExecutor;
import org.testfx.api.FxRobot;
import org.testfx.api.FxToolkit;

/**
 * The real workbook window on the primary stage for a TestFX test class, background jobs run
 * synchronously; one per class, since building and showing it is most of what a test costs.
 */
record HeadlessWindow(Stage stage, WorkbookViewModel vm, WorkbookWindow window) {

    static HeadlessWindow show(SampleSite built, String user) throws Exception {
        return show(built.folder().resolveSibling("unused"), user);
    }

    /** The window with no sample site at hand; {@code sampleFolder} is only shown, never built. */
    static HeadlessWindow show(Path sampleFolder, String user) throws Exception {
        Stage stage = FxToolkit.registerPrimaryStage();
        WorkbookViewModel[] vm = new WorkbookViewModel[1];
        WorkbookWindow[] window = new WorkbookWindow[1];
        FxToolkit.setupStage(s -> {
            MemoryPreferences preferences = new MemoryPreferences();
            vm[0] = new WorkbookViewModel(new SqliteWorkbookService(user), new DirectTaskExecutor(),
                    new PlotAxes(preferences), new RecentFiles(preferences), sampleFolder,
                    Optional.empty());
            vm[0].setEvaluateOnOpen(false);
            window[0] = new WorkbookWindow(s, vm[0]);
            // a small stage renders faster in software; the window's own minimum size still applies
            s.setWidth(900);
            s.setHeight(560);
            s.show();
        });
        return new HeadlessWindow(stage, vm[0], window[0]);
    }

    /** Closes what a test left open (dialogs) and the workbook, so the temporary folder can go. */
    void closeDialogsAndWorkbook(FxRobot robot) {
        robot.interact(() -> {
            for (Window w : List.copyOf(Window.getWindows())) {
                if (w != stage && w instanceof Stage s) {
                    s.close();
                }
            }
            vm.close();
        });
    }
}
