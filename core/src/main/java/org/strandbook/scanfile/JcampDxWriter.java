package org.strandbook.scanfile;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.function.IntFunction;

/**
 * Writes one spectrum as a JCAMP-DX 4.24 file (McDonald &amp; Wilks, Appl. Spectrosc. 42, 151 (1988)).
 *
 * <p>The abscissa is written in the spectrum's own {@link SpectrumFile#xUnit()}, ascending. If it is
 * evenly spaced in that unit (every point within 10⁻⁶ of a step of the straight line from the first
 * to the last) the table is {@code ##XYDATA=(X++(Y..Y))} in AFFN or in DIFDUP form with Y-value
 * checks and a final check line; otherwise it is {@code ##XYPOINTS=(XY..XY)}, one pair per line.
 *
 * <p>Ordinates are written as integers times {@code ##YFACTOR=}: {@link #yFactorFor(double[])}.
 * Values that are already whole numbers below 10^digits (raw detector counts) get YFACTOR = 1 and
 * are written exactly. Otherwise YFACTOR is the power of ten that gives the largest |value| at most
 * {@code significantDigits} digits (default 7), so every value is kept to within ½·YFACTOR, i.e.
 * to 5·10⁻⁸ of the largest value or better at 7 digits, and the integers stay below 10^digits.
 * XFACTOR is 1; line abscissae are printed to two decimals below the point spacing.
 *
 * <p>Immutable: {@code with...} methods return a new writer. Metadata entries are written as
 * records; keys that are not standard labels become user-defined labels {@code ##$KEY=}. Line breaks
 * in titles and metadata values are written as "; " and a {@code $$} (which would start a comment)
 * as "$ $", so that every record reads back as one value.
 */
public final class JcampDxWriter {

    /** How the ordinates of an evenly spaced table are written. */
    public enum Form {
        /** Blank-separated integers (ASCII free format numeric). */
        AFFN,
        /** Differences with duplicate suppression, the compact form most analyzers write. */
        DIFDUP
    }

    /** Significant digits of the largest ordinate unless told otherwise. */
    public static final int DEFAULT_SIGNIFICANT_DIGITS = 7;

    private static final int MAX_SIGNIFICANT_DIGITS = 15;
    private static final double EVEN_SPACING_TOLERANCE = 1e-6;

    /** Labels the writer sets itself: metadata under these labels is not copied. */
    private static final Set<String> WRITER_LABELS = Set.of("TITLE", "JCAMPDX", "DATATYPE", "DATACLASS", "ORIGIN",
            "OWNER", "XUNITS", "YUNITS", "XFACTOR", "YFACTOR", "FIRSTX", "LASTX", "DELTAX", "NPOINTS", "FIRSTY",
            "MAXX", "MINX", "MAXY", "MINY", "XYDATA", "XYPOINTS", "PEAKTABLE", "PEAKASSIGNMENTS", "NTUPLES",
            "BLOCKS", "BLOCKID", "END");

    /** Standard 4.24 labels for sample and measurement notes, written under their own name. */
    private static final Set<String> NOTE_LABELS = Set.of("DATE", "TIME", "LONGDATE", "SOURCEREFERENCE",
            "CROSSREFERENCE", "SPECTROMETERDATASYSTEM", "INSTRUMENTPARAMETERS", "SAMPLEDESCRIPTION", "CASNAME",
            "NAMES", "MOLFORM", "CASREGISTRYNO", "STATE", "PATHLENGTH", "PRESSURE", "TEMPERATURE",
            "DATAPROCESSING", "RESOLUTION", "SAMPLINGPROCEDURE", "XLABEL", "YLABEL");

    private final Form form;
    private final int significantDigits;
    private final String dataType;

    private JcampDxWriter(Form form, int significantDigits, String dataType) {
        this.form = form;
        this.significantDigits = significantDigits;
        this.dataType = dataType;
    }

    /** A writer of compressed DIFDUP tables with Y-value checks. */
    public static JcampDxWriter difDup() {
        return new JcampDxWriter(Form.DIFDUP, DEFAULT_SIGNIFICANT_DIGITS, null);
    }

    /** A writer of plain AFFN tables. */
    public static JcampDxWriter affn() {
        return new JcampDxWriter(Form.AFFN, DEFAULT_SIGNIFICANT_DIGITS, null);
    }

    /**
     * The same writer keeping {@code digits} significant digits of the largest ordinate.
     *
     * @param digits 1 to 15
     */
    public JcampDxWriter withSignificantDigits(int digits) {
        if (digits < 1 || digits > MAX_SIGNIFICANT_DIGITS) {
            throw new IllegalArgumentException("significant digits must be 1 to " + MAX_SIGNIFICANT_DIGITS
                    + ", was " + digits);
        }
        return new JcampDxWriter(form, digits, dataType);
    }

    /**
     * The same writer with a fixed {@code ##DATA TYPE=}. Without it the writer takes the spectrum's
     * metadata entry "DATA TYPE" if present, else "UV/VIS SPECTRUM" for spectra ending at or below
     * 780 nm and "INFRARED SPECTRUM" otherwise (780 nm: start of the near infrared in ISO 20473).
     */
    public JcampDxWriter withDataType(String newDataType) {
        return new JcampDxWriter(form, significantDigits, oneLine(Objects.requireNonNull(newDataType, "dataType")));
    }

    /** The form of evenly spaced tables this writer produces. */
    public Form form() {
        return form;
    }

    /** Significant digits kept of the largest |ordinate| (1 to 15). */
    public int significantDigits() {
        return significantDigits;
    }

    /**
     * The YFACTOR this writer uses for these ordinates (see class comment); a written value is
     * within half of it of the original.
     */
    public double yFactorFor(double[] values) {
        return BigDecimal.ONE.scaleByPowerOfTen(yExponent(values)).doubleValue();
    }

    /** The file's text, lines ending in LF. */
    public String toText(SpectrumFile spectrum) {
        double[] x = spectrum.xInFileUnit();
        double[] y = spectrum.values();
        if (x[x.length - 1] < x[0]) {
            reverse(x);
            reverse(y);
        }
        int n = x.length;
        int exponent = yExponent(y);
        long[] ordinates = toIntegers(y, exponent);
        double dx = (x[n - 1] - x[0]) / (n - 1);
        boolean even = isEvenlySpaced(x, dx);

        StringBuilder out = new StringBuilder(64 + 12 * n);
        Map<String, String> metadata = spectrum.metadata();
        record(out, "TITLE", spectrum.title().isBlank() ? "spectrum" : oneLine(spectrum.title()));
        record(out, "JCAMP-DX", "4.24");
        record(out, "DATA TYPE", dataTypeFor(spectrum));
        record(out, "ORIGIN", noteOr(metadata, "ORIGIN", "Strandbook"));
        record(out, "OWNER", noteOr(metadata, "OWNER", ""));
        for (Map.Entry<String, String> e : metadata.entrySet()) {
            String key = JcampDxReader.normalizeLabel(e.getKey());
            if (!WRITER_LABELS.contains(key)) {
                record(out, labelFor(e.getKey()), oneLine(e.getValue()));
            }
        }
        record(out, "XUNITS", spectrum.xUnit().jcampName());
        record(out, "YUNITS", spectrum.yLabel().isBlank() ? "ARBITRARY UNITS" : oneLine(spectrum.yLabel()));
        record(out, "XFACTOR", "1");
        record(out, "YFACTOR", BigDecimal.ONE.scaleByPowerOfTen(exponent).toPlainString());
        record(out, "FIRSTX", NumberField.plain(x[0]));
        record(out, "LASTX", NumberField.plain(x[n - 1]));
        if (even) {
            record(out, "DELTAX", NumberField.plain(dx));
        }
        record(out, "NPOINTS", Integer.toString(n));
        record(out, "FIRSTY", BigDecimal.valueOf(ordinates[0]).scaleByPowerOfTen(exponent).stripTrailingZeros()
                .toPlainString());
        if (even) {
            record(out, "XYDATA", "(X++(Y..Y))");
            int decimals = abscissaDecimals(dx);
            IntFunction<String> abscissa = i -> BigDecimal.valueOf(i == n - 1 ? x[n - 1] : x[0] + i * dx)
                    .setScale(decimals, RoundingMode.HALF_EVEN).stripTrailingZeros().toPlainString();
            List<String> lines = form == Form.DIFDUP
                    ? AsdfEncoder.difDupLines(ordinates, abscissa)
                    : AsdfEncoder.affnLines(ordinates, abscissa);
            lines.forEach(line -> out.append(line).append('\n'));
        } else {
            record(out, "XYPOINTS", "(XY..XY)");
            for (int i = 0; i < n; i++) {
                out.append(NumberField.plain(x[i])).append(", ").append(ordinates[i]).append('\n');
            }
        }
        record(out, "END", "");
        return out.toString();
    }

    /** The file's bytes: the text in UTF-8 (plain ASCII unless a title or note holds other characters). */
    public byte[] toBytes(SpectrumFile spectrum) {
        return toText(spectrum).getBytes(StandardCharsets.UTF_8);
    }

    /**
     * Writes the file so that {@code target} holds either the old content or the whole new file,
     * never half of it.
     */
    public void write(SpectrumFile spectrum, Path target) throws IOException {
        AtomicFile.write(target, toBytes(spectrum));
    }

    private int yExponent(double[] values) {
        double maxAbs = 0;
        boolean integers = true;
        for (double v : values) {
            maxAbs = Math.max(maxAbs, Math.abs(v));
            integers &= v == Math.rint(v);
        }
        long limit = (long) Math.pow(10, significantDigits);
        if (maxAbs == 0 || (integers && maxAbs < limit)) {
            return 0;
        }
        int exponent = (int) Math.ceil(Math.log10(maxAbs)) - significantDigits;
        while (Math.abs(scaledInteger(maxAbs, exponent)) >= limit) {
            exponent++;
        }
        return exponent;
    }

    // Decimal arithmetic: the value as Java prints it, shifted and rounded, so 0.1234567 at 10^-7 is exactly 1234567.
    private static long scaledInteger(double v, int exponent) {
        return BigDecimal.valueOf(v).scaleByPowerOfTen(-exponent).setScale(0, RoundingMode.HALF_EVEN).longValueExact();
    }

    private static long[] toIntegers(double[] values, int exponent) {
        long[] ints = new long[values.length];
        for (int i = 0; i < values.length; i++) {
            ints[i] = scaledInteger(values[i], exponent);
        }
        return ints;
    }

    private static boolean isEvenlySpaced(double[] x, double dx) {
        for (int i = 1; i < x.length - 1; i++) {
            if (Math.abs(x[i] - (x[0] + i * dx)) > EVEN_SPACING_TOLERANCE * Math.abs(dx)) {
                return false;
            }
        }
        return true;
    }

    private static int abscissaDecimals(double dx) {
        int decimals = (int) Math.ceil(-Math.log10(Math.abs(dx))) + 2;
        return Math.max(0, Math.min(12, decimals));
    }

    private String dataTypeFor(SpectrumFile spectrum) {
        if (dataType != null) {
            return dataType;
        }
        String fromFile = noteOr(spectrum.metadata(), "DATATYPE", "");
        if (!fromFile.isBlank()) {
            return fromFile;
        }
        double[] nm = spectrum.wavelengthsNm();
        return nm[nm.length - 1] <= 780 ? "UV/VIS SPECTRUM" : "INFRARED SPECTRUM";
    }

    private static String noteOr(Map<String, String> metadata, String normalizedKey, String fallback) {
        for (Map.Entry<String, String> e : metadata.entrySet()) {
            if (JcampDxReader.normalizeLabel(e.getKey()).equals(normalizedKey)) {
                return oneLine(e.getValue());
            }
        }
        return fallback;
    }

    private static String labelFor(String key) {
        String k = key.strip();
        String normalized = JcampDxReader.normalizeLabel(k);
        if (NOTE_LABELS.contains(normalized) || k.startsWith("$") || k.startsWith(".")) {
            return sanitizeLabel(k);
        }
        return "$" + sanitizeLabel(k.toUpperCase(Locale.ROOT));
    }

    private static String sanitizeLabel(String label) {
        StringBuilder sb = new StringBuilder(label.length());
        for (int i = 0; i < label.length(); i++) {
            char c = label.charAt(i);
            boolean allowed = (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') || (c >= '0' && c <= '9')
                    || c == ' ' || c == '$' || c == '.' || c == '/' || c == '-' || c == '_';
            sb.append(allowed ? c : '_');
        }
        String s = sb.toString().strip();
        return s.isEmpty() || s.equals("$") ? "$NOTE" : s;
    }

    private static String oneLine(String value) {
        String flat = value.strip().replace("\r\n", "\n").replace('\r', '\n').replace("\n", "; ");
        while (flat.contains("$$")) {
            flat = flat.replace("$$", "$ $");
        }
        StringBuilder sb = new StringBuilder(flat.length());
        for (int i = 0; i < flat.length(); i++) {
            char c = flat.charAt(i);
            sb.append(Character.isISOControl(c) ? ' ' : c);
        }
        return sb.toString();
    }

    private static void record(StringBuilder out, String label, String value) {
        out.append("##").append(label).append('=');
        if (!value.isEmpty()) {
            out.append(' ').append(value);
        }
        out.append('\n');
    }

    private static void reverse(double[] a) {
        for (int i = 0, j = a.length - 1; i < j; i++, j--) {
            double t = a[i];
            a[i] = a[j];
            a[j] = t;
        }
    }
}
