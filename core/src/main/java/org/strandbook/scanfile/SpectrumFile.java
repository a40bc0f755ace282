package org.strandbook.scanfile;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.Spectrum;

/**
 * One spectrum as read from (or about to be written to) an analyzer's file.
 *
 * <p>The axis is always held as strictly ascending wavelengths in nm, whatever the file used;
 * {@link #xUnit()} remembers the file's own unit. Values are index-aligned with the wavelengths
 * and carry the file's ordinate unit ({@link #yLabel()}, e.g. counts or transmittance). The
 * spectrum itself is the workbook's immutable {@link Spectrum}, so a file read for import is
 * checked and copied once, not again on its way into the workbook.
 *
 * @param sourceName the file name the spectrum came from; empty for a spectrum built in memory
 * @param sha256Hex  SHA-256 of the file's bytes as 64 lower-case hex digits; empty for a spectrum
 *                   built in memory
 * @param title      the file's title (JCAMP-DX {@code ##TITLE=}, a delimited file's {@code # title:}
 *                   line, otherwise the file name without extension)
 * @param xUnit      the abscissa unit written in the file
 * @param yLabel     the ordinate unit or label as the file gives it (JCAMP-DX {@code ##YUNITS=}, the
 *                   header of a delimited file's value column); empty if the file names none
 * @param spectrum   strictly ascending, positive, finite wavelengths in nm and finite values; at
 *                   least {@link #MIN_POINTS} points
 * @param metadata   the file's other labelled records or header fields (operator, date, integration
 *                   time...), in file order; keys as written in the file
 * @param metadataLines the 1-based line of each metadata key, for messages about its value, and of
 *                   the ordinate unit under {@link #Y_LABEL_LINE_KEY}; keys missing here have no
 *                   line (a spectrum built in memory)
 * @param tolerated  what the reader accepted although it departs from the format's letter (a DOS
 *                   end-of-file byte, data lines labelled one point off...), in words for the import
 *                   summary; empty for a file that follows the format
 */
public record SpectrumFile(String sourceName, String sha256Hex, String title, XUnit xUnit, String yLabel,
                           Spectrum spectrum, Map<String, String> metadata, Map<String, Integer> metadataLines,
                           List<String> tolerated) {

    /** The key in {@link #metadataLines()} that holds the line of the ordinate unit or label. */
    public static final String Y_LABEL_LINE_KEY = "(ordinate unit)";

    /** The fewest points that make a spectrum: two define an axis and a slope. */
    public static final int MIN_POINTS = 2;

    public SpectrumFile {
        Objects.requireNonNull(sourceName, "sourceName");
        Objects.requireNonNull(sha256Hex, "sha256Hex");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(xUnit, "xUnit");
        Objects.requireNonNull(yLabel, "yLabel");
        Objects.requireNonNull(spectrum, "spectrum");
        Objects.requireNonNull(metadata, "metadata");
        if (!sha256Hex.isEmpty() && !isLowerHex64(sha256Hex)) {
            throw new IllegalArgumentException("sha256Hex must be 64 lower-case hex digits, was '" + sha256Hex + "'");
        }
        Map<String, String> copy = new LinkedHashMap<>();
        metadata.forEach((k, v) -> copy.put(Objects.requireNonNull(k, "metadata key"), Objects.requireNonNull(v, "metadata value")));
        metadata = Collections.unmodifiableMap(copy);
        metadataLines = Map.copyOf(Objects.requireNonNull(metadataLines, "metadataLines"));
        tolerated = List.copyOf(Objects.requireNonNull(tolerated, "tolerated"));
    }

    /** A spectrum whose file follows its format to the letter, with no metadata lines known. */
    public SpectrumFile(String sourceName, String sha256Hex, String title, XUnit xUnit, String yLabel,
                        Spectrum spectrum, Map<String, String> metadata) {
        this(sourceName, sha256Hex, title, xUnit, yLabel, spectrum, metadata, Map.of(), List.of());
    }

    /**
     * A file's spectrum from its axis and values.
     *
     * @throws IllegalArgumentException when the wavelengths are not strictly ascending, positive and
     *                                  finite, a value is not finite, or there are fewer than
     *                                  {@link #MIN_POINTS} points
     */
    public SpectrumFile(String sourceName, String sha256Hex, String title, XUnit xUnit, String yLabel,
                        double[] wavelengthsNm, double[] values, Map<String, String> metadata) {
        this(sourceName, sha256Hex, title, xUnit, yLabel, new Spectrum(wavelengthsNm, values), metadata);
    }

    /** As read from a file: with the line of each metadata key and what was tolerated. */
    SpectrumFile(String sourceName, String sha256Hex, String title, XUnit xUnit, String yLabel,
                 double[] wavelengthsNm, double[] values, Map<String, String> metadata,
                 Map<String, Integer> metadataLines, List<String> tolerated) {
        this(sourceName, sha256Hex, title, xUnit, yLabel, new Spectrum(wavelengthsNm, values), metadata,
                metadataLines, tolerated);
    }

    /** The same spectrum with more remarks on what was tolerated. */
    SpectrumFile withTolerated(List<String> more) {
        if (more.isEmpty()) {
            return this;
        }
        List<String> all = new java.util.ArrayList<>(more);
        all.addAll(tolerated);
        return new SpectrumFile(sourceName, sha256Hex, title, xUnit, yLabel, spectrum, metadata, metadataLines, all);
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
    public double[] wavelengthsNm() {
        return spectrum.wavelengthsNm();
    }

    /** A copy of the ordinates, index-aligned with {@link #wavelengthsNm()}. */
    public double[] values() {
        return spectrum.values();
    }

    /** Number of points. */
    public int size() {
        return spectrum.size();
    }

    /** The wavelength axis as Strandbook's shared grid type. */
    public WavelengthGrid grid() {
        return WavelengthGrid.ofNm(spectrum.wavelengthsNm());
    }

    /**
     * The abscissa in the file's own unit, index-aligned with {@link #wavelengthsNm()} (so a
     * wavenumber axis comes out descending).
     */
    public double[] xInFileUnit() {
        double[] x = spectrum.wavelengthsNm();
        for (int i = 0; i < x.length; i++) {
            x[i] = xUnit.fromNm(x[i]);
        }
        return x;
    }

    /** The same spectrum attributed to a file: its name and the SHA-256 of its bytes. */
    public SpectrumFile withSource(String newSourceName, String newSha256Hex) {
        return new SpectrumFile(newSourceName, newSha256Hex, title, xUnit, yLabel, spectrum, metadata, metadataLines,
                tolerated);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "SpectrumFile[%s, '%s', %d points, %.3f–%.3f nm, file axis in %s]",
                sourceName.isEmpty() ? "(in memory)" : sourceName, title, spectrum.size(),
                spectrum.minNm(), spectrum.maxNm(), xUnit.symbol());
    }

    private static boolean isLowerHex64(String s) {
        if (s.length() != 64) {
            return false;
        }
        for (int i = 0; i < 64; i++) {
            char c = s.charAt(i);
            if (!((c >= '0' && c <= '9') || (c >= 'a' && c <= 'f'))) {
                return false;
            }
        }
        return true;
    }
}
