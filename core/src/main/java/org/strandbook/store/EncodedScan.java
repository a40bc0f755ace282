package org.strandbook.store;

import java.util.Objects;

/**
 * A new scan with its spectrum already in stored form: the BLOB bytes and their SHA-256, which the
 * audit trail records. Encoding and digesting the 32 kB of a 2,000-point spectrum took over a
 * quarter of the writing thread's time in a fresh import, so an importer makes these on the threads
 * that read files ahead and leaves the one writing thread only the inserts. Pure: safe to make on
 * any thread.
 */
public final class EncodedScan {

    private final NewScan scan;
    private final byte[] data;
    private final String dataSha256;

    private EncodedScan(NewScan scan, byte[] data, String dataSha256) {
        this.scan = scan;
        this.data = data;
        this.dataSha256 = dataSha256;
    }

    /** Encodes the scan's spectrum as the workbook stores it and digests the bytes. */
    public static EncodedScan of(NewScan scan) {
        Objects.requireNonNull(scan, "scan");
        byte[] data = SpectrumCodec.encode(scan.spectrum());
        return new EncodedScan(scan, data, Sha256.hex(data));
    }

    public NewScan scan() {
        return scan;
    }

    /** The stored bytes; never handed out, so nothing can change them between digest and insert. */
    byte[] data() {
        return data;
    }

    String dataSha256() {
        return dataSha256;
    }
}
