package org.strandbook.store;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;

import org.strandbook.site.Spectrum;

/**
 * The stored form of a spectrum: its n wavelengths (nm) then its n values, each an IEEE 754
 * binary64 in little-endian byte order, 16·n bytes in all. Any language reads it back without
 * Strandbook (e.g. {@code numpy.frombuffer(blob, '<f8').reshape(2, -1)}); Java serialization
 * would tie the data to one class version.
 */
public final class SpectrumCodec {

    static final int BYTES_PER_POINT = 2 * Double.BYTES;

    private static final VarHandle LITTLE_ENDIAN_DOUBLE =
            MethodHandles.byteArrayViewVarHandle(double[].class, ByteOrder.LITTLE_ENDIAN);

    private SpectrumCodec() {
    }

    /** The stored bytes of {@code spectrum}. */
    public static byte[] encode(Spectrum spectrum) {
        double[] wavelengthsNm = spectrum.wavelengthsNm();
        double[] values = spectrum.values();
        int n = values.length;
        byte[] out = new byte[n * BYTES_PER_POINT];
        for (int i = 0; i < n; i++) {
            LITTLE_ENDIAN_DOUBLE.set(out, i * Double.BYTES, wavelengthsNm[i]);
            LITTLE_ENDIAN_DOUBLE.set(out, (n + i) * Double.BYTES, values[i]);
        }
        return out;
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
        double[] wavelengthsNm = new double[nPoints];
        double[] values = new double[nPoints];
        for (int i = 0; i < nPoints; i++) {
            wavelengthsNm[i] = (double) LITTLE_ENDIAN_DOUBLE.get(data, i * Double.BYTES);
            values[i] = (double) LITTLE_ENDIAN_DOUBLE.get(data, (nPoints + i) * Double.BYTES);
        }
        try {
            return new Spectrum(wavelengthsNm, values);
        } catch (IllegalArgumentException e) {
            throw new WorkbookException("scan " + scanId + ": stored spectrum is damaged (" + e.getMessage() + ")", e);
        }
    }
}
