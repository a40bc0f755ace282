package org.strandbook.app.ui.task;

/** A piece of background work; it reports progress and checks for cancellation through {@code progress}. */
@FunctionalInterface
public interface Job<T> {

    T run(JobProgress progress) throws Exception;
}
