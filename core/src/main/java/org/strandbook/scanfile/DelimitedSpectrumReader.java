package org.strandbook.scanfile;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Reads one spectrum from delimited text: two columns, abscissa then value, one point per row.
 *
 * <p>What is accepted, in file order:
 * <ol>
 *   <li>Comment lines starting with {@code #}, anywhere. {@code # key: value} or {@code # key = value}
 *       becomes a metadata entry (operator, date, integration time...); other comment text is kept
 *       under the key {@code comment}. A {@code # title: ...} line gives the spectrum's title.</li>
 *   <li>At most one header line, recognised by a first field that is not a number (and not a
 *       not-a-number word such as NaN, which is a bad data row instead). The abscissa header names
 *       the unit: "nm"/"nanometer", "µm"/"um"/"micron", or "cm-1"/"cm⁻¹"/"1/cm"/"wavenumber", as in
 *       "Wavelength (nm)", "wavelength_um", "Wavenumber [cm-1]". The value header becomes the
 *       y label.</li>
 *   <li>Data rows. The delimiter is taken from the first data row: a tab if it has one, else a
 *       semicolon, else a comma, else blanks; a row like {@code 1500,25 0,8123} (blank-separated
 *       fields that are numbers with a decimal comma) is blank-delimited. With tab, semicolon or
 *       blank delimiters a comma inside a number is a decimal comma (ISO 80000-1 allows either
 *       decimal sign); with comma delimiters the decimal sign is the point. Fields may be quoted
 *       with {@code "}; a trailing delimiter at the end of a row is ignored.</li>
 * </ol>
 * Without a unit in the header the unit follows from the value range, for fiber-coupled
 * spectrometers that work within the transmission window of silica fiber (about 0.2–2.5 µm):
 * all abscissae in (0, {@value #MAX_UM}] → µm; in [{@value #MIN_NM}, {@value #MAX_NM}] → nm;
 * in [{@value #MIN_WAVENUMBER_CM}, {@value #MAX_WAVENUMBER_CM}] → cm⁻¹ (3300 cm⁻¹ ≈ 3.0 µm,
 * 50000 cm⁻¹ = 200 nm); anything else is refused with a request to name the unit. Rows must
 * have the same number of fields, exactly two; every value must be a finite number; the axis
 * must run strictly one way (a descending axis is reversed, values carried along).
 */
final class DelimitedSpectrumReader {

    static final double MAX_UM = 30;
    static final double MIN_NM = 100;
    static final double MAX_NM = 3300;
    static final double MIN_WAVENUMBER_CM = 3300;
    static final double MAX_WAVENUMBER_CM = 50000;

    private static final Pattern UM_TOKEN = Pattern.compile("(^|[^a-z])um([^a-z]|$)");
    private static final Pattern NM_TOKEN = Pattern.compile("(^|[^a-z])nm([^a-z]|$)");

    enum Delimiter {
        TAB('\t'), SEMICOLON(';'), COMMA(','), BLANKS(' ');

        final char character;

        Delimiter(char character) {
            this.character = character;
        }
    }

    private final String fileName;
    private final String sha256Hex;

    DelimitedSpectrumReader(String fileName, String sha256Hex) {
        this.fileName = fileName;
        this.sha256Hex = sha256Hex;
    }

    SpectrumFile read(String text) throws SpectrumFileException {
        String[] lines = SpectrumText.lines(text);
        Map<String, String> metadata = new LinkedHashMap<>();
        List<Integer> content = new ArrayList<>();
        for (int i = 0; i < lines.length; i++) {
            String t = lines[i].strip();
            if (t.isEmpty()) {
                continue;
            }
            if (t.charAt(0) == '#') {
                addComment(metadata, t, i + 1);
            } else {
                content.add(i);
                // a header row and MAX_POINTS data rows at most: refused before the rows are parsed
                if (content.size() > JcampDxReader.MAX_POINTS + 1) {
                    throw fail(i + 1, "more than " + JcampDxReader.MAX_POINTS + " data rows: Strandbook reads at "
                            + "most " + JcampDxReader.MAX_POINTS + " points from one spectrum, as from JCAMP-DX");
                }
            }
        }
        if (content.isEmpty()) {
            throw fail(lines.length, "no data rows: the file holds only comments");
        }
        int headerIndex = isHeader(lines[content.get(0)]) ? content.get(0) : -1;
        int firstData = headerIndex >= 0 ? 1 : 0;
        if (firstData >= content.size()) {
            throw fail(headerIndex + 1, "a header line but no data rows");
        }
        int firstDataLine = content.get(firstData) + 1;
        Delimiter delimiter = detectDelimiter(lines[content.get(firstData)]);

        int rows = content.size() - firstData;
        double[] x = new double[rows];
        double[] y = new double[rows];
        int[] rowLines = new int[rows];
        int fieldCount = -1;
        for (int r = 0; r < rows; r++) {
            int lineNo = content.get(firstData + r) + 1;
            List<String> fields = split(lines[lineNo - 1], delimiter, lineNo);
            // a delimiter after the last field, as some spreadsheets write it
            if (fields.size() > 2 && fields.size() != fieldCount && fields.get(fields.size() - 1).isEmpty()) {
                fields.remove(fields.size() - 1);
            }
            if (fieldCount < 0) {
                fieldCount = fields.size();
                requireTwoColumns(fieldCount, delimiter, lineNo);
            } else if (fields.size() != fieldCount) {
                throw fail(lineNo, "row has " + fields.size() + " field" + (fields.size() == 1 ? "" : "s")
                        + ", the first data row (line " + firstDataLine + ") has " + fieldCount);
            }
            x[r] = number(fields.get(0), 1, delimiter, lineNo);
            y[r] = number(fields.get(1), 2, delimiter, lineNo);
            rowLines[r] = lineNo;
        }

        XUnit unit = null;
        String yLabel = "";
        if (headerIndex >= 0) {
            String headerLine = lines[headerIndex];
            List<String> header = split(headerLine, delimiter, headerIndex + 1);
            if (header.size() == fieldCount + 1 && header.get(fieldCount).isEmpty()) {
                header.remove(fieldCount);
            }
            if (header.size() == fieldCount) {
                unit = unitFromHeader(header.get(0)).orElse(null);
                yLabel = header.get(1);
            } else if (delimiter == Delimiter.BLANKS) {
                // "Wavelength (nm) Intensity (counts)": blanks inside the names, so read the unit from the whole line
                unit = unitFromHeader(headerLine).orElse(null);
            } else {
                throw fail(headerIndex + 1, "header has " + header.size() + " columns but the data rows have "
                        + fieldCount);
            }
        }
        if (unit == null) {
            unit = unitFromRange(x, rowLines);
        }
        FileAxis.Ascending axis = FileAxis.toAscendingNm(fileName, unit, x, y, rowLines);
        String title = metadata.entrySet().stream()
                .filter(e -> e.getKey().equalsIgnoreCase("title"))
                .map(Map.Entry::getValue)
                .findFirst()
                .orElse(baseName(fileName));
        Map<String, Integer> metadataLines = new java.util.HashMap<>(metadataLineNumbers);
        if (headerIndex >= 0) {
            metadataLines.put(SpectrumFile.Y_LABEL_LINE_KEY, headerIndex + 1);
        }
        return new SpectrumFile(fileName, sha256Hex, title, unit, yLabel, axis.wavelengthsNm(), axis.values(), metadata,
                metadataLines, java.util.List.of());
    }

    /** The abscissa unit named in a column header, if any. */
    static Optional<XUnit> unitFromHeader(String header) {
        String h = header.toLowerCase(Locale.ROOT)
                .replace('µ', 'u').replace('μ', 'u')
                .replace("⁻¹", "-1").replace('−', '-').replace('–', '-');
        if (h.contains("cm-1") || h.contains("cm^-1") || h.contains("cm**-1") || h.contains("1/cm")
                || h.contains("wavenumber")) {
            return Optional.of(XUnit.WAVENUMBER_CM);
        }
        if (UM_TOKEN.matcher(h).find() || h.contains("micron") || h.contains("micromet")) {
            return Optional.of(XUnit.UM);
        }
        if (NM_TOKEN.matcher(h).find() || h.contains("nanomet")) {
            return Optional.of(XUnit.NM);
        }
        return Optional.empty();
    }

    private XUnit unitFromRange(double[] x, int[] rowLines) throws SpectrumFileException {
        double min = Arrays.stream(x).min().orElseThrow();
        double max = Arrays.stream(x).max().orElseThrow();
        if (min > 0 && max <= MAX_UM) {
            return XUnit.UM;
        }
        if (min >= MIN_NM && max <= MAX_NM) {
            return XUnit.NM;
        }
        if (min >= MIN_WAVENUMBER_CM && max <= MAX_WAVENUMBER_CM) {
            return XUnit.WAVENUMBER_CM;
        }
        throw fail(rowLines[0], "the abscissa unit is not named and the range " + NumberField.plain(min) + " to "
                + NumberField.plain(max) + " fits none of µm (≤ " + (int) MAX_UM + "), nm (" + (int) MIN_NM + "–"
                + (int) MAX_NM + ") or cm⁻¹ (" + (int) MIN_WAVENUMBER_CM + "–" + (int) MAX_WAVENUMBER_CM
                + "); name it in a header, e.g. 'Wavelength (nm)'");
    }

    private static boolean isHeader(String line) {
        String t = line.strip();
        String first;
        if (t.startsWith("\"")) {
            int close = t.indexOf('"', 1);
            first = close > 0 ? t.substring(1, close).strip() : t;
        } else {
            int end = 0;
            while (end < t.length() && " \t;,".indexOf(t.charAt(end)) < 0) {
                end++;
            }
            first = t.substring(0, end);
        }
        if (first.isEmpty()) {
            return false;
        }
        String asNumber = first.replace(',', '.');
        return !NumberField.isPlainDecimal(asNumber) && !NumberField.isNonFiniteWord(asNumber);
    }

    static Delimiter detectDelimiter(String dataRow) {
        if (dataRow.indexOf('\t') >= 0) {
            return Delimiter.TAB;
        }
        if (dataRow.indexOf(';') >= 0) {
            return Delimiter.SEMICOLON;
        }
        if (dataRow.indexOf(',') >= 0) {
            List<String> blankFields = splitBlanks(dataRow);
            boolean decimalCommaNumbers = blankFields.size() >= 2;
            for (String f : blankFields) {
                String asNumber = f.replace(',', '.');
                decimalCommaNumbers &= f.indexOf('.') < 0 && NumberField.isPlainDecimal(asNumber);
            }
            return decimalCommaNumbers ? Delimiter.BLANKS : Delimiter.COMMA;
        }
        return Delimiter.BLANKS;
    }

    private List<String> split(String line, Delimiter delimiter, int lineNo) throws SpectrumFileException {
        if (delimiter == Delimiter.BLANKS) {
            return splitBlanks(line);
        }
        if (line.indexOf('"') >= 0) {
            return splitQuoted(line, delimiter.character, lineNo);
        }
        List<String> fields = new ArrayList<>(4);
        int start = 0;
        while (true) {
            int end = line.indexOf(delimiter.character, start);
            if (end < 0) {
                fields.add(line.substring(start).strip());
                return fields;
            }
            fields.add(line.substring(start, end).strip());
            start = end + 1;
        }
    }

    private List<String> splitQuoted(String line, char delimiter, int lineNo) throws SpectrumFileException {
        List<String> fields = new ArrayList<>(4);
        StringBuilder field = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < line.length() && line.charAt(i + 1) == '"') {
                        field.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    field.append(c);
                }
            } else if (c == '"' && field.toString().isBlank()) {
                field.setLength(0);
                quoted = true;
            } else if (c == delimiter) {
                fields.add(field.toString().strip());
                field.setLength(0);
            } else {
                field.append(c);
            }
        }
        if (quoted) {
            throw fail(lineNo, "a quoted field is not closed");
        }
        fields.add(field.toString().strip());
        return fields;
    }

    private static List<String> splitBlanks(String line) {
        List<String> fields = new ArrayList<>(4);
        int i = 0;
        int n = line.length();
        while (i < n) {
            while (i < n && Character.isWhitespace(line.charAt(i))) {
                i++;
            }
            int start = i;
            while (i < n && !Character.isWhitespace(line.charAt(i))) {
                i++;
            }
            if (i > start) {
                fields.add(line.substring(start, i));
            }
        }
        return fields;
    }

    private void requireTwoColumns(int fieldCount, Delimiter delimiter, int lineNo) throws SpectrumFileException {
        if (fieldCount == 2) {
            return;
        }
        if (fieldCount == 1) {
            throw fail(lineNo, "only one column: no tab, semicolon, comma or blank between abscissa and value");
        }
        String hint = delimiter == Delimiter.COMMA && fieldCount == 4
                ? " (numbers with a decimal comma need ';' or a tab between columns)" : "";
        throw fail(lineNo, fieldCount + " columns; Strandbook reads two: the abscissa (wavelength or wavenumber) "
                + "and one value column" + hint);
    }

    private double number(String field, int column, Delimiter delimiter, int lineNo) throws SpectrumFileException {
        if (field.isEmpty()) {
            throw fail(lineNo, "empty value in column " + column);
        }
        String f = field;
        if (delimiter != Delimiter.COMMA && f.indexOf(',') >= 0) {
            if (f.indexOf('.') >= 0) {
                throw fail(lineNo, NumberField.quote(field) + " in column " + column
                        + " mixes '.' and ',': digit grouping is not read, write plain numbers");
            }
            f = f.replace(',', '.');
        }
        if (!NumberField.isPlainDecimal(f)) {
            throw fail(lineNo, NumberField.quote(field) + " in column " + column
                    + (NumberField.isNonFiniteWord(f) ? " is not a finite number" : " is not a number"));
        }
        double v = NumberField.parsePlainDecimal(f);
        if (!Double.isFinite(v)) {
            throw fail(lineNo, NumberField.quote(field) + " in column " + column + " is too large to store");
        }
        return v;
    }

    /** The line of each metadata key, filled by {@link #addComment}. */
    private final Map<String, Integer> metadataLineNumbers = new java.util.HashMap<>();

    private void addComment(Map<String, String> metadata, String line, int lineNo) {
        int start = 0;
        while (start < line.length() && line.charAt(start) == '#') {
            start++;
        }
        String body = line.substring(start).strip();
        if (body.isEmpty()) {
            return;
        }
        int colon = body.indexOf(':');
        int equals = body.indexOf('=');
        int sep = colon < 0 ? equals : (equals < 0 ? colon : Math.min(colon, equals));
        if (sep > 0) {
            String key = body.substring(0, sep).strip();
            metadata.merge(key, body.substring(sep + 1).strip(), (a, b) -> a + "\n" + b);
            metadataLineNumbers.putIfAbsent(key, lineNo);
        } else {
            metadata.merge("comment", body, (a, b) -> a + "\n" + b);
        }
    }

    private static String baseName(String fileName) {
        int dot = fileName.lastIndexOf('.');
        return dot > 0 ? fileName.substring(0, dot) : fileName;
    }

    private SpectrumFileException fail(int line, String problem) {
        return new SpectrumFileException(fileName, line, problem);
    }
}
