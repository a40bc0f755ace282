package org.strandbook.app.ui.workbook;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.ServiceLoader;
import java.util.prefs.Preferences;

import javafx.application.Application;
import javafx.stage.Stage;

import org.strandbook.app.ui.plot.PlotAxes;
import org.strandbook.app.ui.task.FxTaskExecutor;
import org.strandbook.app.ui.task.TaskExecutor;

/**
 * The JavaFX application behind the window and the one place that wires it together: the SQLite
 * workbook service, the background executor, the user's preferences, the sample site's folder and
 * the dossier export if the build has one. {@link org.strandbook.app.Launcher} and
 * {@code strandbook open} start it through {@link #open(Optional)}, so the jar's main class need
 * not extend {@link Application}.
 */
public final class StrandbookWindow extends Application {

    /** Where the sample site is built unless the user picks another folder. */
    static final String SAMPLE_FOLDER = "strandbook-sample";

    private TaskExecutor tasks;
    private WorkbookViewModel vm;

    /** Opens the window, with {@code file} or else the last workbook; blocks until it is closed. */
    public static void open(Optional<Path> file) {
        Application.launch(StrandbookWindow.class, file.map(f -> new String[] {f.toString()}).orElse(new String[0]));
    }

    @Override
    public void start(Stage stage) {
        Preferences preferences = Preferences.userRoot().node("org/strandbook/app");
        tasks = new FxTaskExecutor();
        String user = Optional.ofNullable(System.getProperty("user.name")).filter(u -> !u.isBlank()).orElse("unknown user");
        Path sample = Path.of(System.getProperty("user.home"), SAMPLE_FOLDER);
        Optional<DossierExport> dossier = ServiceLoader.load(DossierExport.class).findFirst();
        vm = new WorkbookViewModel(new SqliteWorkbookService(user), tasks, new PlotAxes(preferences),
                new RecentFiles(preferences), sample, dossier);
        new WorkbookWindow(stage, vm);
        stage.show();
        List<String> args = getParameters().getRaw();
        vm.start(args.isEmpty() ? Optional.empty() : Optional.of(Path.of(args.get(0))));
    }

    @Override
    public void stop() {
        if (vm != null) {
            vm.close();
        }
        if (tasks != null) {
            tasks.close();
        }
    }
}
