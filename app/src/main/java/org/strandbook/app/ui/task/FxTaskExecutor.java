package org.strandbook.app.ui.task;

import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;

import javafx.application.Platform;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyStringProperty;

/**
 * Runs jobs on one background thread (so writes to the workbook file never interleave) and comes
 * back to the FX thread in exactly one place, {@link #onFx(Runnable)}.
 */
public final class FxTaskExecutor implements TaskExecutor {

    private final TaskBoard board = new TaskBoard();
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "strandbook-task");
        t.setDaemon(true);
        return t;
    });
    private final AtomicReference<Running> current = new AtomicReference<>();

    private record Running(AtomicBoolean cancelled, Thread thread) {
    }

    @Override
    public <T> void submit(String title, Job<T> job, Consumer<? super T> onSuccess, Consumer<? super Exception> onFailure) {
        board.queued();
        Future<?> ignored = worker.submit(() -> {
            AtomicBoolean cancelled = new AtomicBoolean(false);
            current.set(new Running(cancelled, Thread.currentThread()));
            onFx(() -> board.started(title));
            JobProgress progress = new JobProgress() {
                @Override
                public void update(double fraction, String message) {
                    onFx(() -> board.progressed(title, fraction, message));
                }

                @Override
                public boolean isCancelled() {
                    return cancelled.get() || Thread.currentThread().isInterrupted();
                }
            };
            try {
                T result = job.run(progress);
                progress.stopIfCancelled();
                onFx(() -> {
                    board.finished(title, null);
                    onSuccess.accept(result);
                });
            } catch (Exception e) {
                Exception reported = cancelled.get() ? new CancellationException() : e;
                onFx(() -> {
                    board.finished(title, reported);
                    if (!TaskBoard.isCancellation(reported)) {
                        onFailure.accept(reported);
                    }
                });
            } finally {
                current.set(null);
                Thread.interrupted();
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
    public void cancel() {
        Running r = current.get();
        if (r != null) {
            r.cancelled().set(true);
            r.thread().interrupt();
        }
    }

    @Override
    public void close() {
        cancel();
        worker.shutdownNow();
    }
}
