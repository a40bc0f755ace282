package org.strandbook.scanfile;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;

/**
 * Writes one spectrum as delimited text that {@link SpectrumFiles} reads back: comment
 * lines {@code # key: value} for the title and metadata, a header naming the abscissa unit, then
 * one row per point in the spectrum's own x unit and order of ascending wavelength. Title, unit, label,
 * metadata values and numbers read back as written.
 *
 * <p>Numbers are written in the shortest form that reads back to the same double, so values and
 * abscissae survive a round trip exactly (a wavenumber or µm axis goes through the nm conversion
 * and back, which can move the last digit). A decimal comma is available with semicolon or tab
 * delimiters, as European instruments write it. Immutable.
 */
public final class DelimitedSpectrumWriter {

    /** The column separator. */
    public enum Delimiter {
        /** {@code ,} with a decimal point. */
        COMMA(','),
        /** {@code ;}, the usual choice with a decimal comma. */
        SEMICOLON(';'),
        /** A tab character. */
        TAB('\t');

        private final char character;

        Delimiter(char character) {
            this.character = character;
        }
    }

    private final Delimiter delimiter;
    private final boolean decimalComma;

    private DelimitedSpectrumWriter(Delimiter delimiter, boolean decimalComma) {
        this.delimiter = delimiter;
        this.decimalComma = decimalComma;
    }

    /** Comma-separated, decimal point. */
    public static DelimitedSpectrumWriter csv() {
        return new DelimitedSpectrumWriter(Delimiter.COMMA, false);
    }

    /**
     * @param delimiter    column separator
     * @param decimalComma write {@code 1500,25} instead of {@code 1500.25}; not with {@link Delimiter#COMMA}
     */
    public static DelimitedSpectrumWriter of(Delimiter delimiter, boolean decimalComma) {
        if (decimalComma && delimiter == Delimiter.COMMA) {
            throw new IllegalArgumentException("a decimal comma needs a semicolon or tab between columns");
        }
        return new DelimitedSpectrumWriter(delimiter, decimalComma);
    }

    /** The file's text, lines ending in LF. */
    public String toText(SpectrumFile spectrum) {
        StringBuilder out = new StringBuilder(64 + 24 * spectrum.size());
        out.append("# title: ").append(oneLine(spectrum.title())).append('\n');
        for (Map.Entry<String, String> e : spectrum.metadata().entrySet()) {
            if (!e.getKey().equalsIgnoreCase("title")) {
                out.append("# ").append(oneLine(e.getKey()).replace(":", "_").replace("=", "_"))
                        .append(": ").append(oneLine(e.getValue())).append('\n');
            }
        }
        XUnit unit = spectrum.xUnit();
        String xHeader = switch (unit) {
            case NM -> "Wavelength (nm)";
            case UM -> "Wavelength (µm)";
            case WAVENUMBER_CM -> "Wavenumber (cm-1)";
        };
        String yHeader = spectrum.yLabel().isBlank() ? "Value" : oneLine(spectrum.yLabel());
        out.append(xHeader).append(delimiter.character).append(quoteIfNeeded(yHeader)).append('\n');
        double[] x = spectrum.xInFileUnit();
        double[] y = spectrum.values();
        for (int i = 0; i < x.length; i++) {
            out.append(number(x[i])).append(delimiter.character).append(number(y[i])).append('\n');
        }
        return out.toString();
    }

    /** The file's bytes in UTF-8. */
    public byte[] toBytes(SpectrumFile spectrum) {
        return toText(spectrum).getBytes(StandardCharsets.UTF_8);
    }

    /** Writes the file all at once (never half-written). */
    public void write(SpectrumFile spectrum, Path target) throws IOException {
        AtomicFile.write(target, toBytes(spectrum));
    }

    private String number(double v) {
        String s = NumberField.plain(v);
        return decimalComma ? s.replace('.', ',') : s;
    }

    private String quoteIfNeeded(String field) {
        if (field.indexOf(delimiter.character) < 0 && field.indexOf('"') < 0) {
            return field;
        }
        return '"' + field.replace("\"", "\"\"") + '"';
    }

    private static String oneLine(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            sb.append(Character.isISOControl(c) ? ' ' : c);
        }
        return sb.toString().strip();
    }
}
