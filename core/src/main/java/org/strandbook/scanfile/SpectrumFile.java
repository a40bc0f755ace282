package org.strandbook.scanfile;

import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.regex.Pattern;

import org.strandbook.optics.WavelengthGrid;

/**
 * One spectrum as read from (or about to be written to) an analyzer's file.
 *
 * <p>The axis is always held as strictly ascending wavelengths in nm, whatever the file used;
 * {@link #xUnit()} remembers the file's own unit. Values are index-aligned with the wavelengths
 * and carry the file's ordinate unit ({@link #yLabel()}, e.g. counts or transmittance).
 * Arrays are copied on the way in and on the way out, so a {@code SpectrumFile} never changes.
 *
 * @param sourceName    the file name the spectrum came from; empty for a spectrum built in memory
 * @param sha256Hex     SHA-256 of the file's bytes as 64 lower-case hex digits; empty for a spectrum
 *                      built in memory
 * @param title         the file's title (JCAMP-DX {@code ##TITLE=}, a delimited file's {@code # title:}
 *                      line, otherwise the file name without extension)
 * @param xUnit         the abscissa unit written in the file
 * @param yLabel        the ordinate unit or label as the file gives it (JCAMP-DX {@code ##YUNITS=}, the
 *                      header of a delimited file's value column); empty if the file names none
 * @param wavelengthsNm strictly ascending, positive, finite wavelengths in nm; at least {@link #MIN_POINTS}
 * @param values        finite ordinates, one per wavelength
 * @param metadata      the file's other labelled records or header fields (operator, date, integration
 *                      time...), in file order; keys as written in the file
 */
public record SpectrumFile(String sourceName, String sha256Hex, String title, XUnit xUnit, String yLabel,
                           double[] wavelengthsNm, double[] values, Map<String, String> metadata) {

    /** The fewest points that make a spectrum: two define an axis and a slope. */
    public static final int MIN_POINTS = 2;

    private static final Pattern SHA256_HEX = Pattern.compile("[0-9a-f]{64}");

    /**
     * Validates and copies.
     *
     * @throws IllegalArgumentException if the arrays differ in length, hold fewer than {@link #MIN_POINTS}
     *                                  points, the wavelengths are not strictly ascending positive finite
     *                                  numbers, a value is not finite, or the hash is not 64 hex digits
     */
    public SpectrumFile {
        Objects.requireNonNull(sourceName, "sourceName");
        Objects.requireNonNull(sha256Hex, "sha256Hex");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(xUnit, "xUnit");
        Objects.requireNonNull(yLabel, "yLabel");
        Objects.requireNonNull(wavelengthsNm, "wavelengthsNm");
        Objects.requireNonNull(values, "values");
        Objects.requireNonNull(metadata, "metadata");
        if (!sha256Hex.isEmpty() && !SHA256_HEX.matcher(sha256Hex).matches()) {
            throw new IllegalArgumentException("sha256Hex must be 64 lower-case hex digits, was '" + sha256Hex + "'");
        }
        if (wavelengthsNm.length != values.length) {
            throw new IllegalArgumentException(wavelengthsNm.length + " wavelengths but " + values.length + " values");
        }
        if (wavelengthsNm.length < MIN_POINTS) {
            throw new IllegalArgumentException("a spectrum needs at least " + MIN_POINTS + " points, got "
                    + wavelengthsNm.length);
        }
        wavelengthsNm = wavelengthsNm.clone();
        values = values.clone();
        for (int i = 0; i < wavelengthsNm.length; i++) {
            double w = wavelengthsNm[i];
            if (!(w > 0) || !Double.isFinite(w)) {
                throw new IllegalArgumentException("wavelength " + w + " nm at index " + i + " is not a positive number");
            }
            if (i > 0 && !(w > wavelengthsNm[i - 1])) {
                throw new IllegalArgumentException("wavelengths must be strictly ascending: "
                        + wavelengthsNm[i - 1] + " nm then " + w + " nm at index " + i);
            }
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException("value " + values[i] + " at index " + i + " is not finite");
            }
        }
        Map<String, String> copy = new LinkedHashMap<>();
        metadata.forEach((k, v) -> copy.put(Objects.requireNonNull(k, "metadata key"), Objects.requireNonNull(v, "metadata value")));
        metadata = Collections.unmodifiableMap(copy);
    }

    /**
     * A spectrum built in memory (a generator, a test, a conversion), not read from a file:
     * {@link #sourceName()} and {@link #sha256Hex()} are empty.
     */
    public static SpectrumFile inMemory(String title, XUnit xUnit, String yLabel, double[] wavelengthsNm,
                                        double[] values, Map<String, String> metadata) {
        return new SpectrumFile("", "", title, xUnit, yLabel, wavelengthsNm, values, metadata);
    }

    /** A copy of the wavelength axis in nm, strictly ascending. */
    @Override
    public double[] wavelengthsNm() {
        return wavelengthsNm.clone();
    }

    /** A copy of the ordinates, index-aligned with {@link #wavelengthsNm()}. */
    @Override
    public double[] values() {
        return values.clone();
    }

    /** Number of points. */
    public int size() {
        return values.length;
    }

    /** The wavelength axis as Strandbook's shared grid type. */
    public WavelengthGrid grid() {
        return WavelengthGrid.ofNm(wavelengthsNm);
    }

    /**
     * The abscissa in the file's own unit, index-aligned with {@link #wavelengthsNm()} (so a
     * wavenumber axis comes out descending).
     */
    public double[] xInFileUnit() {
        double[] x = new double[wavelengthsNm.length];
        for (int i = 0; i < x.length; i++) {
            x[i] = xUnit.fromNm(wavelengthsNm[i]);
        }
        return x;
    }

    /** The same spectrum attributed to a file: its name and the SHA-256 of its bytes. */
    public SpectrumFile withSource(String newSourceName, String newSha256Hex) {
        return new SpectrumFile(newSourceName, newSha256Hex, title, xUnit, yLabel, wavelengthsNm, values, metadata);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SpectrumFile other
                && sourceName.equals(other.sourceName)
                && sha256Hex.equals(other.sha256Hex)
                && title.equals(other.title)
                && xUnit == other.xUnit
                && yLabel.equals(other.yLabel)
                && Arrays.equals(wavelengthsNm, other.wavelengthsNm)
                && Arrays.equals(values, other.values)
                && metadata.equals(other.metadata);
    }

    @Override
    public int hashCode() {
        return Objects.hash(sourceName, sha256Hex, title, xUnit, yLabel, metadata)
                + 31 * Arrays.hashCode(wavelengthsNm) + 17 * Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "SpectrumFile[%s, '%s', %d points, %.3f–%.3f nm, file axis in %s]",
                sourceName.isEmpty() ? "(in memory)" : sourceName, title, values.length,
                wavelengthsNm[0], wavelengthsNm[wavelengthsNm.length - 1], xUnit.symbol());
    }
}
