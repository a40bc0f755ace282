package org.strandbook.store;

import java.nio.file.Path;
import java.sql.SQLException;

import org.sqlite.SQLiteErrorCode;
import org.sqlite.SQLiteException;

/** Turns SQLite's errors into one-line messages a technician can act on. */
final class SqlFailures {

    private SqlFailures() {
    }

    static WorkbookException translate(SQLException e, Path file) {
        int primary = primaryCode(e);
        String detail = oneLine(e.getMessage());
        if (primary == SQLiteErrorCode.SQLITE_BUSY.code || primary == SQLiteErrorCode.SQLITE_LOCKED.code) {
            return new WorkbookBusyException("workbook is busy: another program is writing to " + file
                    + "; nothing was changed, try again when it has finished", e);
        }
        if (primary == SQLiteErrorCode.SQLITE_NOTADB.code) {
            return new NotAWorkbookException("not a Strandbook workbook: " + file + " is not an SQLite database");
        }
        if (primary == SQLiteErrorCode.SQLITE_CORRUPT.code) {
            return new DamagedWorkbookException(file, detail, e);
        }
        if (primary == SQLiteErrorCode.SQLITE_FULL.code) {
            return new WorkbookException("disk full while writing " + file + "; the change was not written", e);
        }
        if (primary == SQLiteErrorCode.SQLITE_READONLY.code) {
            return readOnly(file, e);
        }
        if (primary == SQLiteErrorCode.SQLITE_CANTOPEN.code) {
            return new WorkbookException("cannot open workbook " + file + " (" + detail + ")", e);
        }
        if (primary == SQLiteErrorCode.SQLITE_IOERR.code) {
            return new WorkbookException("disk error on workbook " + file + " (" + detail + ")", e);
        }
        return new WorkbookException("workbook " + file + ": " + detail, e);
    }

    /** A write into a workbook that cannot be written. */
    static WorkbookException readOnly(Path file, SQLException e) {
        return new WorkbookException("workbook " + file + " is read-only; nothing was changed", e);
    }

    /** True when SQLite found the file damaged. */
    static boolean isCorruption(SQLException e) {
        return primaryCode(e) == SQLiteErrorCode.SQLITE_CORRUPT.code;
    }

    /** True when SQLite refused a row for a UNIQUE or PRIMARY KEY constraint. */
    static boolean isUniqueViolation(SQLException e) {
        return e instanceof SQLiteException se
                && (se.getResultCode() == SQLiteErrorCode.SQLITE_CONSTRAINT_UNIQUE
                || se.getResultCode() == SQLiteErrorCode.SQLITE_CONSTRAINT_PRIMARYKEY);
    }

    /** True when SQLite refused a row for a NOT NULL constraint. */
    static boolean isNotNullViolation(SQLException e) {
        return e instanceof SQLiteException se && se.getResultCode() == SQLiteErrorCode.SQLITE_CONSTRAINT_NOTNULL;
    }

    private static int primaryCode(SQLException e) {
        if (e instanceof SQLiteException se) {
            return se.getResultCode().code & 0xff;
        }
        return e.getErrorCode() & 0xff;
    }

    private static String oneLine(String message) {
        return message == null ? "SQLite error" : message.replaceAll("\\s+", " ").strip();
    }
}
