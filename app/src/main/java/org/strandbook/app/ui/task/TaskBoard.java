package org.strandbook.app.ui.task;

import java.util.Objects;
import java.util.concurrent.CancellationException;

import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

/** The observable state both executors share; always changed on the thread the view models use. */
final class TaskBoard {

    private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running", false);
    private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(this, "progress", 0);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "Ready");
    private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "");
    private int pending;

    ReadOnlyBooleanProperty runningProperty() {
        return running.getReadOnlyProperty();
    }

    ReadOnlyDoubleProperty progressProperty() {
        return progress.getReadOnlyProperty();
    }

    ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    ReadOnlyStringProperty titleProperty() {
        return title.getReadOnlyProperty();
    }

    void queued() {
        pending++;
        running.set(true);
    }

    void started(String jobTitle) {
        title.set(jobTitle);
        progress.set(-1);
        message.set(jobTitle + "\u2026");
    }

    void progressed(String title, double fraction, String detail) {
        progress.set(fraction);
        message.set(detail == null || detail.isBlank() ? title + "\u2026" : title + ": " + detail);
    }

    void finished(String title, Exception failure) {
        this.title.set("");
        pending--;
        running.set(pending > 0);
        progress.set(0);
        if (failure == null) {
            message.set(title + ": done");
        } else if (failure instanceof CancellationException || failure instanceof InterruptedException) {
            message.set(title + ": cancelled");
        } else {
            message.set(title + " failed: " + Objects.requireNonNullElse(failure.getMessage(), failure.getClass().getSimpleName()));
        }
    }

    static boolean isCancellation(Exception e) {
        return e instanceof CancellationException || e instanceof InterruptedException;
    }
}
