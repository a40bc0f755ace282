package org.strandbook.app.ui.workbook;

import java.util.prefs.Preferences;

import javafx.application.Application;
import javafx.stage.Stage;

import org.strandbook.app.ui.plot.SpectrumPlotModel;
import org.strandbook.app.ui.task.FxTaskExecutor;
import org.strandbook.app.ui.task.TaskExecutor;

/**
 * The JavaFX application behind the window. {@link org.strandbook.app.Launcher} starts it through
 * {@link #open(String...)}, so the jar's main class need not extend {@link Application}.
 */
public final class StrandbookWindow extends Application {

    private TaskExecutor tasks;

    /** Blocks until the window is closed. */
    public static void open(String... args) {
        Application.launch(StrandbookWindow.class, args);
    }

    @Override
    public void start(Stage stage) {
        Preferences preferences = Preferences.userRoot().node("org/strandbook/app");
        tasks = new FxTaskExecutor();
        WorkbookViewModel vm = new WorkbookViewModel(createService(), tasks, new SpectrumPlotModel(preferences),
                new RecentFiles(preferences));
        new WorkbookWindow(stage, vm);
        stage.show();
        vm.start();
    }

    /** The one place that decides which workbook implementation the window talks to. */
    private static WorkbookService createService() {
        return new InMemoryWorkbookService(DemoWorkbook.create());
    }

    @Override
    public void stop() {
        if (tasks != null) {
            tasks.close();
        }
    }
}
