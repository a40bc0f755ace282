package org.strandbook.server;

/** Where a sync tells how far it is: the command line prints steps, the window moves a bar. */
public interface SyncProgress {

    SyncProgress SILENT = new SyncProgress() {
        @Override
        public void step(String what) {
        }

        @Override
        public void done(long count, long of) {
        }
    };

    /** A new stage begins. */
    void step(String what);

    /** {@code count} of {@code of} items of the current stage are done. */
    void done(long count, long of);
}
