package org.strandbook.store;

import java.time.Duration;

/**
 * Stores many scans quickly while keeping each one atomic: scans go in under their own savepoint
 * inside a transaction that is committed every {@code scansPerCommit} scans or
 * {@code commitInterval}, whichever comes first, and on {@link #close()}. A file already in the
 * workbook is reported, not thrown; any other refusal (an unknown point) undoes only that scan and
 * is thrown, and the import may go on. A program killed mid-import keeps every scan committed
 * before, each whole.
 *
 * <p>Between commits this import holds the workbook's write lock: other writers wait (up to their
 * busy timeout), readers do not. While it runs, committed pages are copied from the write-ahead
 * log into the file by a {@link WalCheckpointer} beside it rather than inside each commit; closing
 * the import copies what is left, so the file ends as after any other commit. Use it from one
 * thread and close it in a finally block or try-with-resources.
 */
public final class ScanImport implements AutoCloseable {

    /** What became of one scan offered to the import. */
    public enum Result {
        STORED,
        ALREADY_STORED
    }

    /**
     * @param result  stored now, or found already stored (same file SHA-256)
     * @param scanId  the new scan's id, or the id of the scan that already holds the file
     */
    public record Outcome(Result result, long scanId) {
    }

    private final Session session;
    private final ScanRepository scans;
    private final int scansPerCommit;
    private final long commitIntervalNanos;
    private boolean open;
    private boolean closed;
    private int sinceCommit;
    private long openedAt;
    private int stored;
    private int alreadyStored;
    private boolean checkpointerTried;
    private WalCheckpointer checkpointer;

    ScanImport(Session session, ScanRepository scans, int scansPerCommit, Duration commitInterval) {
        if (scansPerCommit < 1) {
            throw new IllegalArgumentException("scans per commit must be 1 or more, was " + scansPerCommit);
        }
        this.session = session;
        this.scans = scans;
        this.scansPerCommit = scansPerCommit;
        this.commitIntervalNanos = commitInterval.toNanos();
    }

    /**
     * Stores one scan, or reports the scan that already holds its file.
     *
     * @throws UnknownEntryException when no point has the scan's tag (nothing of it is stored)
     * @throws WorkbookBusyException when another writer held the workbook beyond the busy timeout
     */
    public Outcome add(NewScan scan) {
        return add(EncodedScan.of(scan));
    }

    /** Stores one scan already encoded (see {@link EncodedScan}); otherwise as {@link #add(NewScan)}. */
    public Outcome add(EncodedScan scan) {
        if (closed) {
            throw new IllegalStateException("this import is closed");
        }
        if (!open) {
            if (!checkpointerTried) {
                startCheckpointer();
            }
            session.beginOpenWrite();
            open = true;
            openedAt = System.nanoTime();
        }
        Outcome outcome;
        try {
            outcome = new Outcome(Result.STORED, scans.insert(scan));
            stored++;
        } catch (DuplicateScanException e) {
            outcome = new Outcome(Result.ALREADY_STORED, e.existingScanId());
            alreadyStored++;
        }
        sinceCommit++;
        if (sinceCommit >= scansPerCommit || System.nanoTime() - openedAt >= commitIntervalNanos) {
            commit();
        }
        return outcome;
    }

    /** Scans stored by this import so far. */
    public int stored() {
        return stored;
    }

    /** Scans offered whose file was already in the workbook. */
    public int alreadyStored() {
        return alreadyStored;
    }

    private void startCheckpointer() {
        checkpointerTried = true;
        checkpointer = WalCheckpointer.start(session.file()).orElse(null);
        if (checkpointer != null) {
            session.setAutoCheckpointPages(0);
        }
    }

    private void commit() {
        open = false;
        sinceCommit = 0;
        session.commitOpenWrite();
        if (checkpointer != null) {
            checkpointer.request();
        }
    }

    private void stopCheckpointer() {
        if (checkpointer == null) {
            return;
        }
        checkpointer.close();
        checkpointer = null;
        session.setAutoCheckpointPages(Workbook.AUTO_CHECKPOINT_PAGES);
        session.checkpoint();
    }

    /** Commits what was added since the last commit and copies the log into the file. */
    @Override
    public void close() {
        if (closed) {
            return;
        }
        closed = true;
        RuntimeException failure = null;
        try {
            if (open) {
                commit();
            }
        } catch (RuntimeException e) {
            failure = e;
        }
        try {
            stopCheckpointer();
        } catch (RuntimeException e) {
            // the commit's failure is the one to report; this one rides along
            if (failure == null) {
                failure = e;
            } else {
                failure.addSuppressed(e);
            }
        }
        if (failure != null) {
            throw failure;
        }
    }
}
