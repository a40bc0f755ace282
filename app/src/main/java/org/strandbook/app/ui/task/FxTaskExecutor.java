package org.strandbook.app.ui.task;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;

import javafx.application.Platform;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyStringProperty;

/**
 * Runs jobs on one background thread (so writes to the workbook file never interleave, and the one
 * workbook connection is only ever used from that thread) and comes back to the FX thread in
 * exactly one place, {@link #onFx(Runnable)}.
 *
 * <p>Cancel is cooperative: the running job sees it through {@link JobProgress#isCancelled()}. The
 * thread is not interrupted, because an interrupt closes any file channel the job is reading and
 * would turn a clean stop into a reading error.
 */
public final class FxTaskExecutor implements TaskExecutor {

    private static final long CLOSE_WAIT_S = 10;

    private final TaskBoard board = new TaskBoard();
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "strandbook-task");
        t.setDaemon(true);
        return t;
    });
    /** The cancel flag of the running job, null between jobs. */
    private final AtomicReference<AtomicBoolean> current = new AtomicReference<>();

    @Override
    public <T> void submit(String title, Job<T> job, Consumer<? super T> onSuccess, Consumer<? super Exception> onFailure) {
        board.queued();
        Future<?> ignored = worker.submit(() -> {
            AtomicBoolean cancelled = new AtomicBoolean(false);
            current.set(cancelled);
            onFx(() -> board.started(title));
            JobProgress progress = new JobProgress() {
                @Override
                public void update(double fraction, String message) {
                    onFx(() -> board.progressed(title, fraction, message));
                }

                @Override
                public boolean isCancelled() {
                    return cancelled.get();
                }
            };
            try {
                T result = job.run(progress);
                onFx(() -> {
                    board.finished(title, null);
                    onSuccess.accept(result);
                });
            } catch (Exception e) {
                onFx(() -> {
                    board.finished(title, e);
                    if (!TaskBoard.isCancellation(e)) {
                        onFailure.accept(e);
                    }
                });
            } catch (LinkageError | AssertionError | StackOverflowError e) {
                // a broken build or a bug: report it like a failure rather than leave the bar running
                Exception reported = new IllegalStateException(e.toString(), e);
                onFx(() -> {
                    board.finished(title, reported);
                    onFailure.accept(reported);
                });
            } finally {
                current.set(null);
            }
        });
    }

    private static void onFx(Runnable r) {
        Platform.runLater(r);
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

    @Override
    public void cancel() {
        AtomicBoolean running = current.get();
        if (running != null) {
            running.set(true);
        }
    }

    /** Cancels the running job, lets queued jobs (the closing of the workbook) run, and waits a little for them. */
    @Override
    public void close() {
        cancel();
        worker.shutdown();
        try {
            if (!worker.awaitTermination(CLOSE_WAIT_S, TimeUnit.SECONDS)) {
                worker.shutdownNow();
            }
        } catch (InterruptedException e) {
            worker.shutdownNow();
            Thread.currentThread().interrupt();
        }
    }
}
