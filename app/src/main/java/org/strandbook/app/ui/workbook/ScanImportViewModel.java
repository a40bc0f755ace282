package org.strandbook.app.ui.workbook;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import javafx.beans.binding.BooleanBinding;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import org.strandbook.app.ui.task.TaskExecutor;
import org.strandbook.intake.ScanFileImporter;
import org.strandbook.scanfile.PrintableName;
import org.strandbook.site.ScanKind;

/**
 * Recording a measurement: scan files of one kind for the selected point, imported in the
 * background file by file with progress and Cancel. A file is stored whole or not at all; a bad
 * file is refused with its reason (file:line: what is wrong) and the others go on. Cancel stops
 * before the next file: what was stored stays stored.
 */
public final class ScanImportViewModel {

    private final WorkbookService service;
    private final TaskExecutor tasks;
    private final String pointTag;
    private final Consumer<ScanFileImporter.Summary> imported;

    private final ObservableList<Path> files = FXCollections.observableArrayList();
    private final ObjectProperty<ScanKind> kind = new SimpleObjectProperty<>(this, "kind", ScanKind.LOOP);
    private final StringProperty operator = new SimpleStringProperty(this, "operator", "");
    private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running", false);
    private final ReadOnlyBooleanWrapper finished = new ReadOnlyBooleanWrapper(this, "finished", false);
    private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(this, "progress", 0);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private final ReadOnlyObjectWrapper<List<String>> refused = new ReadOnlyObjectWrapper<>(this, "refused", List.of());
    private final ReadOnlyObjectWrapper<List<String>> tolerated = new ReadOnlyObjectWrapper<>(this, "tolerated", List.of());
    private final BooleanBinding canImport;

    ScanImportViewModel(WorkbookService service, TaskExecutor tasks, String pointTag, String operatorName,
                        Consumer<ScanFileImporter.Summary> imported) {
        this.service = service;
        this.tasks = tasks;
        this.pointTag = pointTag;
        this.imported = imported;
        operator.set(operatorName);
        canImport = Bindings.createBooleanBinding(() -> !files.isEmpty() && !running.get() && kind.get() != null,
                files, running, kind);
        message.set("Choose the scan files of " + pointTag + " to record");
    }

    public String pointTag() {
        return pointTag;
    }

    /** The files to import, in the order given. */
    public ObservableList<Path> files() {
        return files;
    }

    public ObjectProperty<ScanKind> kindProperty() {
        return kind;
    }

    /** The operator recorded for files that name none. */
    public StringProperty operatorProperty() {
        return operator;
    }

    public ReadOnlyBooleanProperty runningProperty() {
        return running.getReadOnlyProperty();
    }

    /** True once an import has finished (all files, or stopped by Cancel). */
    public ReadOnlyBooleanProperty finishedProperty() {
        return finished.getReadOnlyProperty();
    }

    /** Files done over files given, 0–1; negative while the first file is read. */
    public ReadOnlyDoubleProperty progressProperty() {
        return progress.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** The refused files, one line each with the reason. */
    public ReadOnlyObjectProperty<List<String>> refusedProperty() {
        return refused.getReadOnlyProperty();
    }

    /** What stored files departed from their format in an accepted way, one line each: {@code file: what}. */
    public ReadOnlyObjectProperty<List<String>> toleratedProperty() {
        return tolerated.getReadOnlyProperty();
    }

    public BooleanBinding canImportProperty() {
        return canImport;
    }

    public void addFiles(List<Path> more) {
        more.stream().filter(f -> !files.contains(f)).forEach(files::add);
    }

    /** Starts the import in the background. */
    public void start() {
        if (!canImport.get()) {
            return;
        }
        List<Path> chosen = List.copyOf(files);
        ScanFileImporter.Request request = new ScanFileImporter.Request(pointTag, kind.get(), chosen, Optional.<Instant>empty(),
                operator.get());
        running.set(true);
        finished.set(false);
        refused.set(List.of());
        tolerated.set(List.of());
        String title = String.format(Locale.ROOT, "Recording %d %s scan file%s for %s", chosen.size(), kind.get().word(),
                chosen.size() == 1 ? "" : "s", pointTag);
        // the executor runs one job at a time: show its progress only while it is this import
        BooleanBinding ours = tasks.titleProperty().isEqualTo(title);
        progress.bind(Bindings.when(ours).then(tasks.progressProperty()).otherwise(-1.0));
        message.bind(Bindings.when(ours).then(tasks.messageProperty())
                .otherwise("Waiting for the work before it to finish\u2026"));
        tasks.submit(title, p -> service.importScans(request, (done, total, file) -> {
            p.update((double) done / total, done + " of " + total + ": " + file.getFileName());
            return !p.isCancelled();
        }), this::done, this::failed);
    }

    public void cancel() {
        if (running.get()) {
            tasks.cancel();
        }
    }

    private void done(ScanFileImporter.Summary summary) {
        unbind();
        int handled = summary.accepted().size() + summary.rejected().size();
        progress.set((double) handled / Math.max(1, files.size()));
        refused.set(summary.rejected().stream().map(ScanFileImporter.Rejected::reason).toList());
        tolerated.set(summary.accepted().stream().flatMap(a -> a.tolerated().stream()
                .map(note -> PrintableName.of(String.valueOf(a.file().getFileName())) + ": " + note)).toList());
        message.set(String.format(Locale.ROOT, "%s %d of %d file%s for %s%s%s",
                summary.stoppedEarly() ? "Stopped: stored" : "Stored", summary.accepted().size(), files.size(),
                files.size() == 1 ? "" : "s", pointTag,
                summary.rejected().isEmpty() ? "" : ", " + summary.rejected().size() + " refused",
                summary.stoppedEarly() ? "; the files not reached were not stored" : ""));
        running.set(false);
        finished.set(true);
        imported.accept(summary);
    }

    private void failed(Exception e) {
        unbind();
        progress.set(0);
        message.set("Nothing recorded: " + (e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage()));
        running.set(false);
        finished.set(true);
    }

    private void unbind() {
        progress.unbind();
        message.unbind();
    }
}
