package org.strandbook.app.ui.workbook;

import java.util.Locale;

import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.server.SyncProgress;

/**
 * A sync's or clone's stages on the window's progress bar. Cancel takes effect at the next stage or
 * batch: the sync is then cut off with a {@link java.util.concurrent.CancellationException}, which
 * rolls back the server's transaction (and a clone's part file goes), as a killed command would.
 */
final class ServerJobProgress implements SyncProgress {

    private final JobProgress job;
    private String stage = "";

    ServerJobProgress(JobProgress job) {
        this.job = job;
    }

    @Override
    public void step(String what) {
        job.stopIfCancelled();
        stage = what;
        job.update(-1, what);
    }

    @Override
    public void done(long count, long of) {
        job.stopIfCancelled();
        job.update(of == 0 ? 1 : (double) count / of, String.format(Locale.ROOT, "%s, %d of %d", stage, count, of));
    }
}
