package org.strandbook.store;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Optional;
import java.util.concurrent.Semaphore;

import org.sqlite.SQLiteConfig;
import org.sqlite.SQLiteOpenMode;

/**
 * Copies committed pages from the write-ahead log into the workbook file on a thread of its own
 * while a large import goes on writing. SQLite normally does this inside the commit that fills the
 * log ({@code PRAGMA wal_autocheckpoint}), so the importing thread would stand still for the copy
 * and its disk syncs at every commit; a passive checkpoint from a second connection does the same
 * work beside it, on another core. Safety is unchanged: the log is the record of every committed
 * transaction until it is copied, whoever copies it, and a program killed mid-copy leaves the log
 * to be copied at the next open (SQLite, "Write-Ahead Logging", sqlite.org/wal.html).
 */
final class WalCheckpointer implements AutoCloseable {

    private final Connection connection;
    private final Thread thread;
    private final Semaphore requests = new Semaphore(0);
    private volatile boolean stopping;

    private WalCheckpointer(Connection connection) {
        this.connection = connection;
        this.thread = new Thread(this::run, "wal-checkpointer");
        thread.setDaemon(true);
        thread.start();
    }

    /** A checkpointer on a second connection to {@code file}, or empty if that cannot be opened. */
    static Optional<WalCheckpointer> start(Path file) {
        SQLiteConfig config = new SQLiteConfig();
        config.setSynchronous(SQLiteConfig.SynchronousMode.NORMAL);
        config.resetOpenMode(SQLiteOpenMode.CREATE);
        try {
            return Optional.of(new WalCheckpointer(config.createConnection("jdbc:sqlite:" + file.toAbsolutePath())));
        } catch (SQLException e) {
            // the import still works, with SQLite copying inside its own commits
            return Optional.empty();
        }
    }

    /** Asks for a checkpoint of what is committed so far; requests made while one runs merge into one. */
    void request() {
        if (requests.availablePermits() == 0) {
            requests.release();
        }
    }

    private void run() {
        try (Statement s = connection.createStatement()) {
            while (true) {
                requests.acquire();
                requests.drainPermits();
                if (stopping) {
                    return;
                }
                checkpoint(s);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (SQLException e) {
            // the statement could not be made: nothing was copied, the writing connection copies at the end
        }
    }

    private static void checkpoint(Statement s) {
        try {
            s.execute("PRAGMA wal_checkpoint(PASSIVE)");
        } catch (SQLException e) {
            // a passive checkpoint that could not run (another program checkpointing) loses nothing:
            // the log keeps every page until some checkpoint copies it
        }
    }

    /** Lets a running checkpoint finish, then closes the second connection. */
    @Override
    public void close() {
        stopping = true;
        requests.release();
        boolean interrupted = false;
        while (thread.isAlive()) {
            try {
                thread.join();
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        try {
            connection.close();
        } catch (SQLException e) {
            // closing a connection that only read and copied pages cannot lose data
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }
}
