package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.Locale;

import org.strandbook.server.SyncProgress;

/** A sync's stages on standard error, so that standard output holds only the result. */
final class ServerProgress implements SyncProgress {

    private final PrintWriter err;
    private String stage = "";
    private long lastPercent = -1;

    ServerProgress(PrintWriter err) {
        this.err = err;
    }

    @Override
    public void step(String what) {
        stage = what;
        lastPercent = -1;
        err.println(what + " ...");
        err.flush();
    }

    @Override
    public void done(long count, long of) {
        long percent = of == 0 ? 100 : 100 * count / of;
        if (percent / 10 != lastPercent / 10 && of >= 1000) {
            err.println(String.format(Locale.ROOT, "  %s: %d of %d (%d %%)", stage, count, of, percent));
            err.flush();
        }
        lastPercent = percent;
    }
}
