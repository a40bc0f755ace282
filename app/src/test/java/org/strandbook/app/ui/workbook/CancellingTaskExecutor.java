package org.strandbook.app.ui.workbook;

import java.util.function.Consumer;

import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.app.ui.task.TaskExecutor;

/**
 * Runs each job on the caller's thread as if the user pressed Cancel the moment it started: every
 * check of {@link JobProgress#isCancelled()} answers yes. A job that stops delivers nothing, as
 * {@link TaskExecutor} promises.
 */
final class CancellingTaskExecutor implements TaskExecutor {

    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");

    @Override
    public <T> void submit(String title, org.strandbook.app.ui.task.Job<T> job, Consumer<? super T> onSuccess,
                           Consumer<? super Exception> onFailure) {
        JobProgress cancelled = new JobProgress() {
            @Override
            public void update(double fraction, String what) {
            }

            @Override
            public boolean isCancelled() {
                return true;
            }
        };
        try {
            onSuccess.accept(job.run(cancelled));
        } catch (java.util.concurrent.CancellationException e) {
            message.set(title + " cancelled");
        } catch (Exception e) {
            onFailure.accept(e);
        }
    }

    @Override
    public ReadOnlyBooleanProperty runningProperty() {
        return new ReadOnlyBooleanWrapper(false).getReadOnlyProperty();
    }

    @Override
    public ReadOnlyDoubleProperty progressProperty() {
        return new ReadOnlyDoubleWrapper(0).getReadOnlyProperty();
    }

    @Override
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    @Override
    public ReadOnlyStringProperty titleProperty() {
        return new ReadOnlyStringWrapper("").getReadOnlyProperty();
    }

    @Override
    public void cancel() {
    }

    @Override
    public void close() {
    }
}
