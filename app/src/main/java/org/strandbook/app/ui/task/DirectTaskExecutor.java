package org.strandbook.app.ui.task;

import java.util.function.Consumer;

import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyStringProperty;

/** Runs each job at once on the caller's thread: for tests, where waiting for a worker only adds flakiness. */
public final class DirectTaskExecutor implements TaskExecutor {

    private final TaskBoard board = new TaskBoard();
    private boolean cancelRequested;

    @Override
    public <T> void submit(String title, Job<T> job, Consumer<? super T> onSuccess, Consumer<? super Exception> onFailure) {
        board.queued();
        board.started(title);
        cancelRequested = false;
        JobProgress progress = new JobProgress() {
            @Override
            public void update(double fraction, String message) {
                board.progressed(title, fraction, message);
            }

            @Override
            public boolean isCancelled() {
                return cancelRequested;
            }
        };
        T result;
        try {
            result = job.run(progress);
        } catch (Exception e) {
            board.finished(title, e);
            if (!TaskBoard.isCancellation(e)) {
                onFailure.accept(e);
            }
            return;
        }
        board.finished(title, null);
        onSuccess.accept(result);
    }

    @Override
    public ReadOnlyBooleanProperty runningProperty() {
        return board.runningProperty();
    }

    @Override
    public ReadOnlyDoubleProperty progressProperty() {
        return board.progressProperty();
    }

    @Override
    public ReadOnlyStringProperty messageProperty() {
        return board.messageProperty();
    }

    @Override
    public ReadOnlyStringProperty titleProperty() {
        return board.titleProperty();
    }

    /** Takes effect when the running job next checks {@link JobProgress#isCancelled()}. */
    @Override
    public void cancel() {
        cancelRequested = true;
    }

    @Override
    public void close() {
        cancelRequested = true;
    }
}
