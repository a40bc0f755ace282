package org.strandbook.store;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.DoubleBuffer;

import org.strandbook.site.Spectrum;

/**
 * The stored form of a spectrum: its n wavelengths (nm) then its n values, each an IEEE 754
 * binary64 in little-endian byte order, 16·n bytes in all. Any language reads it back without
 * Strandbook (e.g. {@code numpy.frombuffer(blob, '<f8').reshape(2, -1)}); Java serialization
 * would tie the data to one class version.
 */
final class SpectrumCodec {

    static final int BYTES_PER_POINT = 2 * Double.BYTES;

    private SpectrumCodec() {
    }

    static byte[] encode(Spectrum spectrum) {
        int n = spectrum.size();
        ByteBuffer bytes = ByteBuffer.allocate(n * BYTES_PER_POINT).order(ByteOrder.LITTLE_ENDIAN);
        DoubleBuffer doubles = bytes.asDoubleBuffer();
        doubles.put(spectrum.wavelengthsNm());
        doubles.put(spectrum.values());
        return bytes.array();
    }

    /**
     * The spectrum stored in {@code data}, which must hold exactly {@code nPoints} points.
     *
     * @throws WorkbookException when the stored bytes do not match the scan's point count
     */
    static Spectrum decode(byte[] data, int nPoints, long scanId) {
        if (data == null || nPoints < 2 || data.length != nPoints * BYTES_PER_POINT) {
            throw new WorkbookException("scan " + scanId + ": stored spectrum is damaged (expected "
                    + (long) nPoints * BYTES_PER_POINT + " bytes for " + nPoints + " points, found "
                    + (data == null ? 0 : data.length) + ")");
        }
        DoubleBuffer doubles = ByteBuffer.wrap(data).order(ByteOrder.LITTLE_ENDIAN).asDoubleBuffer();
        double[] wavelengthsNm = new double[nPoints];
        double[] values = new double[nPoints];
        doubles.get(wavelengthsNm);
        doubles.get(values);
        try {
            return new Spectrum(wavelengthsNm, values);
        } catch (IllegalArgumentException e) {
            throw new WorkbookException("scan " + scanId + ": stored spectrum is damaged (" + e.getMessage() + ")", e);
        }
    }
}
