package org.strandbook.app.ui.task;

import java.util.function.Consumer;

import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyStringProperty;

/**
 * Runs jobs away from the FX thread, one at a time in submission order, and delivers each result
 * back where the view models live. The status bar binds to the three properties and the Cancel
 * button calls {@link #cancel()}.
 */
public interface TaskExecutor extends AutoCloseable {

    /**
     * Runs {@code job}; on success {@code onSuccess} receives its result, on failure {@code onFailure}
     * the exception. A job that stops because it saw a cancellation (it throws
     * {@link java.util.concurrent.CancellationException}, e.g. from {@link JobProgress#stopIfCancelled()})
     * calls neither; the message property says it was cancelled. A job that finishes is delivered
     * even if Cancel came too late to stop it: its work is done.
     */
    <T> void submit(String title, Job<T> job, Consumer<? super T> onSuccess, Consumer<? super Exception> onFailure);

    /** True while a job runs or waits. */
    ReadOnlyBooleanProperty runningProperty();

    /** Progress of the running job in 0..1, negative when its end is unknown. */
    ReadOnlyDoubleProperty progressProperty();

    /** What the running job does, or how the last one ended. */
    ReadOnlyStringProperty messageProperty();

    /** The title of the running job; empty between jobs. */
    ReadOnlyStringProperty titleProperty();

    /** Asks the running job to stop at its next check of {@link JobProgress#isCancelled()}. */
    void cancel();

    @Override
    void close();
}
