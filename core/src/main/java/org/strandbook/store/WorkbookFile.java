package org.strandbook.store;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

/**
 * Recognises a workbook by its file header before SQLite opens it. Opening with our settings
 * (WAL journal) would write to the file, and a file that is not ours must be left as it was.
 *
 * <p>Offsets from "Database File Format", sqlite.org/fileformat.html, section 1.3: the 16-byte
 * header string at 0, the user version at 60 and the application ID at 68, both 4-byte big-endian.
 * Strandbook keeps its schema version in the user version and {@link #APPLICATION_ID} in the
 * application ID, which SQLite reserves for exactly this purpose.
 */
final class WorkbookFile {

    /** "Stbk" in ASCII. */
    static final int APPLICATION_ID = 0x5374626B;

    private static final byte[] SQLITE_HEADER = "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);
    private static final int HEADER_BYTES = 100;
    private static final int USER_VERSION_OFFSET = 60;
    private static final int APPLICATION_ID_OFFSET = 68;

    private WorkbookFile() {
    }

    /**
     * Checks that {@code file} holds a workbook this Strandbook can open, reading only its header.
     *
     * @throws WorkbookMissingException when there is no file
     * @throws NotAWorkbookException    when it is not a Strandbook workbook
     * @throws NewerWorkbookException   when a newer Strandbook wrote it
     * @return the schema version the header records
     */
    static int checkHeader(Path file) {
        if (!Files.exists(file)) {
            throw new WorkbookMissingException("no workbook at " + file);
        }
        if (Files.isDirectory(file)) {
            throw new NotAWorkbookException("not a Strandbook workbook: " + file + " is a folder");
        }
        byte[] header = new byte[HEADER_BYTES];
        int n;
        try (InputStream in = Files.newInputStream(file)) {
            n = in.readNBytes(header, 0, HEADER_BYTES);
        } catch (IOException e) {
            throw new WorkbookException("cannot read " + file + " (" + e.getMessage() + ")", e);
        }
        if (n == 0) {
            throw new NotAWorkbookException("not a Strandbook workbook: " + file + " is empty");
        }
        if (n < HEADER_BYTES || !Arrays.equals(header, 0, SQLITE_HEADER.length, SQLITE_HEADER, 0, SQLITE_HEADER.length)) {
            throw new NotAWorkbookException("not a Strandbook workbook: " + file + " is not an SQLite database");
        }
        ByteBuffer b = ByteBuffer.wrap(header);
        checkIdentity(file, b.getInt(APPLICATION_ID_OFFSET), b.getInt(USER_VERSION_OFFSET));
        return b.getInt(USER_VERSION_OFFSET);
    }

    /** The same check on the values SQLite reports once the file is open. */
    static void checkIdentity(Path file, int applicationId, int schemaVersion) {
        if (applicationId != APPLICATION_ID) {
            throw new NotAWorkbookException("not a Strandbook workbook: " + file
                    + " is an SQLite database of another program");
        }
        if (schemaVersion < 0) {
            throw new NotAWorkbookException("workbook " + file + " records an unknown schema version ("
                    + schemaVersion + "); no Strandbook wrote that, so the file is left unchanged: restore it from a"
                    + " backup");
        }
        if (schemaVersion > SchemaMigrator.LATEST) {
            throw new NewerWorkbookException("workbook " + file + " was written by a newer Strandbook (schema "
                    + schemaVersion + "); this Strandbook reads up to schema " + SchemaMigrator.LATEST
                    + ", so the file is left unchanged", schemaVersion);
        }
    }
}
