package org.strandbook.store;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.locks.ReentrantLock;

/**
 * The one connection of an open workbook, its transactions and its prepared-statement cache.
 *
 * <p>Write transactions start with {@code BEGIN IMMEDIATE}: the write lock is taken (or waited for,
 * up to the busy timeout) before anything is read, so that the audit chain head read inside the
 * transaction cannot be overtaken by another process. Nested calls join the outer transaction
 * under a savepoint, so a failed inner step (a duplicate file in a batch) undoes only itself.
 * Transactions are managed with SQL rather than {@code setAutoCommit}, because the driver
 * re-opens a transaction at once after every commit when auto-commit is off, which would hold the
 * write lock between our transactions.
 *
 * <p>Statements of hot paths (scan insert, audit append) are prepared once per connection and
 * cached here; they are closed with the session, not by their callers.
 */
final class Session implements AutoCloseable {

    @FunctionalInterface
    interface SqlWork<T> {
        T run() throws SQLException;
    }

    private final Connection connection;
    private final Path file;
    private final String user;
    private final ReentrantLock lock = new ReentrantLock();
    private final Map<String, PreparedStatement> statements = new HashMap<>();
    private int depth;
    private boolean writing;
    private volatile boolean checkedBeforeWriting;
    private long writeGeneration;

    Session(Connection connection, Path file, String user) {
        this.connection = connection;
        this.file = file;
        this.user = user;
    }

    Path file() {
        return file;
    }

    String user() {
        return user;
    }

    Connection connection() {
        return connection;
    }

    /**
     * A number that changes whenever what this connection last wrote may no longer be what the file
     * holds: at the start of every write transaction (another program may have written since) and
     * at every rollback, whole or to a savepoint. Code that keeps a value read or written inside a
     * write transaction may trust it while the number stays the same.
     */
    long writeGeneration() {
        return writeGeneration;
    }

    /** A statement prepared once for this connection. Do not close it; close its result sets. */
    PreparedStatement prepared(String sql) throws SQLException {
        PreparedStatement ps = statements.get(sql);
        if (ps == null) {
            ps = connection.prepareStatement(sql);
            statements.put(sql, ps);
        }
        return ps;
    }

    /**
     * Sets how many pages the write-ahead log may hold before a commit copies them into the file
     * (0: never; SQLite's default is 1000). Outside transactions only.
     */
    void setAutoCheckpointPages(int pages) {
        withoutTransaction(() -> {
            try (Statement s = connection.createStatement()) {
                s.execute("PRAGMA wal_autocheckpoint=" + pages);
            }
        });
    }

    /**
     * Copies what the write-ahead log holds into the file, as far as no reader needs it. Best effort:
     * a checkpoint that cannot run now (another program is checkpointing) loses nothing, since the
     * log keeps every committed page until some checkpoint copies it, so it is not an error.
     */
    void checkpoint() {
        withoutTransaction(() -> {
            try (Statement s = connection.createStatement()) {
                s.execute("PRAGMA wal_checkpoint(PASSIVE)");
            } catch (SQLException e) {
                // see above: the next checkpoint, or the last connection's close, copies the pages
            }
        });
    }

    /**
     * Writes a consistent snapshot of the whole database, compacted, to a new file (SQLite's
     * {@code VACUUM INTO}). Other programs may read and write the workbook meanwhile.
     */
    void vacuumInto(Path newFile) {
        withoutTransaction(() -> {
            try (PreparedStatement ps = connection.prepareStatement("VACUUM INTO ?")) {
                ps.setString(1, newFile.toAbsolutePath().toString());
                ps.execute();
            }
        });
    }

    private interface SqlStep {
        void run() throws SQLException;
    }

    private void withoutTransaction(SqlStep step) {
        lock.lock();
        try {
            if (depth > 0) {
                throw new IllegalStateException("not inside a transaction");
            }
            step.run();
        } catch (SQLException e) {
            throw SqlFailures.translate(e, file);
        } finally {
            lock.unlock();
        }
    }

    /** Runs {@code work} in a write transaction (or a savepoint of the enclosing one). */
    <T> T write(SqlWork<T> work) {
        lock.lock();
        try {
            if (depth > 0 && !writing) {
                throw new IllegalStateException("a write cannot start inside a read of the workbook");
            }
            String savepoint = "nested_" + depth;
            exec(depth == 0 ? "BEGIN IMMEDIATE" : "SAVEPOINT " + savepoint);
            if (depth == 0) {
                writing = true;
                writeGeneration++;
                checkBeforeFirstWrite();
            }
            depth++;
            boolean done = false;
            try {
                T result = work.run();
                done = true;
                return result;
            } finally {
                depth--;
                if (depth == 0) {
                    writing = false;
                    finishOutermost(done);
                } else if (done) {
                    exec("RELEASE " + savepoint);
                } else {
                    rollbackQuietly("ROLLBACK TO " + savepoint);
                    rollbackQuietly("RELEASE " + savepoint);
                }
            }
        } catch (SQLException e) {
            throw SqlFailures.translate(e, file);
        } finally {
            lock.unlock();
        }
    }

    /**
     * Opens a write transaction that stays open across calls until {@link #commitOpenWrite()}; calls
     * of {@link #write} in between run under savepoints inside it. The calling thread holds the
     * session until then.
     */
    void beginOpenWrite() {
        lock.lock();
        try {
            if (depth > 0) {
                throw new IllegalStateException("a long write cannot start inside another transaction");
            }
            exec("BEGIN IMMEDIATE");
            depth = 1;
            writing = true;
            writeGeneration++;
            checkBeforeFirstWrite();
        } catch (SQLException e) {
            lock.unlock();
            throw SqlFailures.translate(e, file);
        } catch (RuntimeException e) {
            lock.unlock();
            throw e;
        }
    }

    /**
     * The first write of a session, with the write lock just taken, first checks the whole file
     * ({@link #checkIntegrity()}), so nothing is added to a damaged workbook; on damage the
     * transaction is rolled back and nothing is written.
     */
    private void checkBeforeFirstWrite() throws SQLException {
        if (checkedBeforeWriting) {
            return;
        }
        try {
            quickCheck();
        } catch (SQLException | RuntimeException e) {
            depth = 0;
            writing = false;
            rollbackQuietly("ROLLBACK");
            throw e;
        }
        checkedBeforeWriting = true;
    }

    /** SQLite's quick check of the whole file; see {@link Workbook#checkIntegrity()}. Once passed, writes skip it. */
    void checkIntegrity() {
        lock.lock();
        try {
            quickCheck();
            checkedBeforeWriting = true;
        } catch (SQLException e) {
            throw SqlFailures.translate(e, file);
        } finally {
            lock.unlock();
        }
    }

    /** Whether a quick check of the file passed on this connection. */
    boolean integrityChecked() {
        return checkedBeforeWriting;
    }

    /** Counts a quick check another connection to this file passed as this session's own. */
    void integrityCheckedElsewhere() {
        checkedBeforeWriting = true;
    }

    private void quickCheck() throws SQLException {
        String first;
        try (Statement st = connection.createStatement();
             ResultSet rs = st.executeQuery("PRAGMA quick_check(1)")) {
            // sqlite.org/pragma.html#pragma_quick_check: a sound file gives the single row "ok"
            first = rs.next() ? rs.getString(1) : "no result";
        } catch (SQLException e) {
            if (SqlFailures.isCorruption(e)) {
                throw new DamagedWorkbookException(file, e.getMessage(), e);
            }
            throw e;
        }
        if (!"ok".equals(first)) {
            throw new DamagedWorkbookException(file, first, null);
        }
    }

    /** Commits the transaction of {@link #beginOpenWrite()} (or rolls it back if the commit fails). */
    void commitOpenWrite() {
        try {
            depth = 0;
            writing = false;
            finishOutermost(true);
        } catch (SQLException e) {
            throw SqlFailures.translate(e, file);
        } finally {
            lock.unlock();
        }
    }

    /**
     * Runs {@code work} on one consistent snapshot of the workbook; inside a write transaction it
     * simply joins it.
     */
    <T> T read(SqlWork<T> work) {
        lock.lock();
        try {
            if (depth > 0) {
                return work.run();
            }
            exec("BEGIN");
            depth++;
            try {
                return work.run();
            } finally {
                depth--;
                endRead();
            }
        } catch (SQLException e) {
            throw SqlFailures.translate(e, file);
        } finally {
            lock.unlock();
        }
    }

    private void finishOutermost(boolean done) throws SQLException {
        if (!done) {
            rollbackQuietly("ROLLBACK");
            return;
        }
        try {
            exec("COMMIT");
        } catch (SQLException e) {
            rollbackQuietly("ROLLBACK");
            throw e;
        }
    }

    private void endRead() {
        try {
            exec("COMMIT");
        } catch (SQLException e) {
            rollbackQuietly("ROLLBACK");
        }
    }

    /** Transaction statements are few and run on every change, so they are prepared once too. */
    private void exec(String sql) throws SQLException {
        prepared(sql).execute();
    }

    /** Undo steps may find SQLite already rolled back (disk full, I/O error); that is the wanted state. */
    private void rollbackQuietly(String sql) {
        writeGeneration++;
        try {
            exec(sql);
        } catch (SQLException ignored) {
            // the transaction or savepoint is already gone: nothing left to undo
        }
    }

    @Override
    public void close() {
        lock.lock();
        try {
            for (PreparedStatement ps : statements.values()) {
                try {
                    ps.close();
                } catch (SQLException ignored) {
                    // closing the connection below releases it anyway
                }
            }
            statements.clear();
            try {
                connection.close();
            } catch (SQLException e) {
                throw SqlFailures.translate(e, file);
            }
        } finally {
            lock.unlock();
        }
    }
}
