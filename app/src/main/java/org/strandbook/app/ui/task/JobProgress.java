package org.strandbook.app.ui.task;

import java.util.concurrent.CancellationException;

/** What a running job sees of its executor. */
public interface JobProgress {

    /** {@code fraction} in 0..1, or negative when the end is unknown; {@code message} says what is happening. */
    void update(double fraction, String message);

    boolean isCancelled();

    /** Jobs call this between steps so that Cancel stops them cleanly. */
    default void stopIfCancelled() {
        if (isCancelled()) {
            throw new CancellationException("cancelled");
        }
    }
}
