package org.strandbook.server;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.sql.SQLException;

import org.postgresql.copy.CopyIn;

/**
 * Rows sent to a running {@code COPY ... FROM STDIN (FORMAT binary)} in PostgreSQL's binary copy
 * format (PostgreSQL documentation, "COPY", section "Binary Format"): a signature and two zero
 * words, then per row a 16-bit field count and per field a 32-bit length and its bytes, all in
 * network byte order, and a count of -1 at the end. Binary, so a spectrum travels as its bytes, not
 * as twice as many hex digits the server must decode.
 */
final class BinaryCopyStream {

    private static final byte[] SIGNATURE = {'P', 'G', 'C', 'O', 'P', 'Y', '\n', (byte) 0xff, '\r', '\n', 0};
    /** jsonb's binary form: a version byte, then the JSON text. */
    private static final byte JSONB_VERSION = 1;
    /** Bytes gathered before one CopyData message (design choice: large enough to amortise each send). */
    private static final int FLUSH_AT = 1 << 16;

    private final CopyIn copy;
    private ByteBuffer buffer = ByteBuffer.allocate(FLUSH_AT * 2);

    BinaryCopyStream(CopyIn copy) {
        this.copy = copy;
        buffer.put(SIGNATURE).putInt(0).putInt(0);
    }

    /** Starts a row of {@code fields} fields. */
    BinaryCopyStream row(int fields) throws SQLException {
        flushIfFull();
        room(2);
        buffer.putShort((short) fields);
        return this;
    }

    BinaryCopyStream int4(int value) {
        room(8);
        buffer.putInt(4).putInt(value);
        return this;
    }

    BinaryCopyStream text(String value) {
        return bytes(value.getBytes(StandardCharsets.UTF_8));
    }

    BinaryCopyStream jsonb(String json) {
        byte[] text = json.getBytes(StandardCharsets.UTF_8);
        room(5 + text.length);
        buffer.putInt(1 + text.length).put(JSONB_VERSION).put(text);
        return this;
    }

    /** A bytea or a text already in UTF-8; null writes SQL NULL. */
    BinaryCopyStream bytes(byte[] value) {
        if (value == null) {
            room(4);
            buffer.putInt(-1);
            return this;
        }
        room(4 + value.length);
        buffer.putInt(value.length).put(value);
        return this;
    }

    /** Sends the end marker and ends the COPY; the rows it copied. */
    long finish() throws SQLException {
        room(2);
        buffer.putShort((short) -1);
        flush();
        return copy.endCopy();
    }

    /** Abandons the COPY (its rows are discarded by the server) if it is still open. */
    void cancel() {
        try {
            if (copy.isActive()) {
                copy.cancelCopy();
            }
        } catch (SQLException e) {
            // the connection is gone: the server discards the COPY with the transaction
        }
    }

    private void flushIfFull() throws SQLException {
        if (buffer.position() >= FLUSH_AT) {
            flush();
        }
    }

    private void flush() throws SQLException {
        copy.writeToCopy(buffer.array(), 0, buffer.position());
        buffer.clear();
    }

    private void room(int bytes) {
        if (buffer.remaining() < bytes) {
            ByteBuffer larger = ByteBuffer.allocate(Math.max(buffer.capacity() * 2, buffer.position() + bytes));
            buffer.flip();
            larger.put(buffer);
            buffer = larger;
        }
    }
}
