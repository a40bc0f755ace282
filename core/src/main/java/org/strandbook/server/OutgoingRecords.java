package org.strandbook.server;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;

import org.strandbook.store.PortableFields;
import org.strandbook.store.PortableTable;
import org.strandbook.store.WorkbookRecords;

/**
 * The immutable records a push sends, in portable form, read from the workbook by a thread of their
 * own: while the server inserts and audits one batch, the next is read from the file and written as
 * JSON, so that the push costs about the larger of the two rather than their sum.
 */
final class OutgoingRecords implements AutoCloseable {

    /** One record ready for the server; {@code spectrum} only for a scan. */
    record Row(String key, String fieldsJson, byte[] spectrum) {
    }

    /** Rows read ahead of the server (design choice: a few batches, a few megabytes). */
    private static final int READ_AHEAD = 4096;
    private static final Row END = new Row("", "", null);

    private final BlockingQueue<Row> queue = new ArrayBlockingQueue<>(READ_AHEAD);
    private final Thread reader;
    private volatile boolean abandoned;
    private volatile RuntimeException failure;

    OutgoingRecords(WorkbookRecords records, PortableTable table, Map<String, Map<String, Object>> fields,
                    List<String> keys) {
        reader = new Thread(() -> {
            try {
                if (table == PortableTable.SCAN) {
                    records.spectra(new HashSet<>(keys), (key, spectrum) -> hand(new Row(key,
                            PortableFields.json(fields.get(key)), spectrum)));
                } else {
                    for (String key : keys) {
                        hand(new Row(key, PortableFields.json(fields.get(key)), null));
                    }
                }
            } catch (WorkbookRecords.SinkFailure f) {
                if (!abandoned) {
                    failure = f.getCause() instanceof RuntimeException r ? r : f;
                }
            } catch (RuntimeException e) {
                failure = e;
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            } finally {
                if (!abandoned) {
                    try {
                        queue.put(END);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                }
            }
        }, "push-reader");
        reader.setDaemon(true);
        reader.start();
    }

    private void hand(Row row) throws InterruptedException {
        if (abandoned) {
            throw new InterruptedException("the push stopped");
        }
        queue.put(row);
    }

    /** The next record, or null when all are read; a failure to read the workbook is thrown here. */
    Row next() {
        Row row;
        try {
            row = queue.take();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new ServerException("the push was interrupted", e);
        }
        if (row == END) {
            if (failure != null) {
                throw failure;
            }
            return null;
        }
        return row;
    }

    /** Stops the reader if the push ends early (the server refused a batch) and waits for it. */
    @Override
    public void close() {
        abandoned = true;
        queue.clear();
        reader.interrupt();
        try {
            reader.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
