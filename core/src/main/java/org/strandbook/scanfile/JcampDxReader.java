package org.strandbook.scanfile;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reads one spectrum from JCAMP-DX text, versions 4.24 (McDonald &amp; Wilks, Appl. Spectrosc. 42,
 * 151 (1988)) and 5.x (Lampen et al., Appl. Spectrosc. 48, 1545 (1994)).
 *
 * <p>Accepted: a single block with {@code ##XYDATA=(X++(Y..Y))} in AFFN or any ASDF form, or
 * {@code ##XYPOINTS=(XY..XY)} in AFFN; {@code ##XUNITS=} NANOMETERS, MICROMETERS or 1/CM. Labels are
 * compared as the format prescribes: case, blanks, dashes, slashes and underscores ignored
 * ({@code ##DATA TYPE=} = {@code ##DATATYPE=} = {@code ##Data_Type=}); {@code $$} starts a comment.
 * Refused with a reason: multi-block (LINK) files, NTUPLES, peak tables, other abscissa units, and
 * any table that disagrees with its own header.
 *
 * <p>Checks and their tolerances, Δx = (LASTX − FIRSTX)/(NPOINTS − 1):
 * <ul>
 *   <li>each {@code (X++(Y..Y))} line's abscissa × XFACTOR lies within ½|Δx| plus one printed
 *       abscissa step (e.g. 1 for "4400", 0.01 for "4400.25", times XFACTOR) of the abscissa that
 *       FIRSTX, LASTX and NPOINTS give its first ordinate: this finds lost or extra ordinates;</li>
 *   <li>the ordinate count equals NPOINTS exactly;</li>
 *   <li>after a line ending in DIF form, the next line's first ordinate repeats its last one (the
 *       Y-value check), exactly for integers, to 10⁻⁹ relative otherwise;</li>
 *   <li>DELTAX, if given, agrees with Δx to 10⁻³ relative (writers print it rounded);</li>
 *   <li>FIRSTY, if given, equals the first ordinate × YFACTOR within one YFACTOR step plus 10⁻⁵
 *       relative; for XYPOINTS, FIRSTX and LASTX, if given, lie within half a point spacing of the
 *       first and last abscissa.</li>
 * </ul>
 * XFACTOR and YFACTOR default to 1 when absent. At most {@link #MAX_POINTS} points are read.
 */
final class JcampDxReader {

    /** The most points one spectrum may hold; analyzer spectra have a few thousand. */
    static final int MAX_POINTS = 1_000_000;

    private static final double DELTAX_RELATIVE_TOLERANCE = 1e-3;
    private static final double FIRSTY_RELATIVE_TOLERANCE = 1e-5;
    private static final double Y_CHECK_RELATIVE_TOLERANCE = 1e-9;

    /** Records with one meaning each; a second occurrence in the block is an error. */
    private static final Set<String> SINGLE_RECORDS = Set.of("TITLE", "JCAMPDX", "DATATYPE", "DATACLASS",
            "XUNITS", "YUNITS", "XFACTOR", "YFACTOR", "FIRSTX", "LASTX", "DELTAX", "NPOINTS", "FIRSTY",
            "MAXX", "MINX", "MAXY", "MINY", "XYDATA", "XYPOINTS");

    /** Records that hold a table: never accepted twice, even when equal. */
    private static final Set<String> TABLES = Set.of("XYDATA", "XYPOINTS", "PEAKTABLE", "PEAKASSIGNMENTS");

    /** Records that describe the table's encoding, already represented in the result: not metadata. */
    private static final Set<String> NOT_METADATA = Set.of("TITLE", "XUNITS", "YUNITS", "XFACTOR", "YFACTOR",
            "FIRSTX", "LASTX", "DELTAX", "NPOINTS", "FIRSTY", "MAXX", "MINX", "MAXY", "MINY", "XYDATA", "XYPOINTS",
            "PEAKTABLE", "PEAKASSIGNMENTS");

    /** A labelled data record: {@code ##LABEL= value}, then continuation (or data) lines. */
    private static final class Record {
        final String label;
        final String key;
        final StringBuilder value;
        final int line;
        int endLine;

        Record(String label, String key, String value, int line) {
            this.label = label;
            this.key = key;
            this.value = new StringBuilder(value);
            this.line = line;
            this.endLine = line;
        }

        String text() {
            return value.toString().strip();
        }
    }

    private final String fileName;
    private final String sha256Hex;
    private String[] lines;
    /** The lines of the block being read: indexes {@code from} (its ##TITLE=) to {@code to}, exclusive. */
    private int from;
    private int to;
    private final Map<String, Record> single = new HashMap<>();
    private final List<String> tolerated = new ArrayList<>();
    /** Data lines labelled one point off the declared axis: the offset in points and the lines. */
    private int lineOffsetPoints;
    private int firstOffLine;
    private int lastOffLine;
    private int dataLinesSeen;

    JcampDxReader(String fileName, String sha256Hex) {
        this.fileName = fileName;
        this.sha256Hex = sha256Hex;
    }

    SpectrumFile read(String text) throws SpectrumFileException {
        return read(text, SpectrumFiles.WHOLE_FILE);
    }

    /** Reads the file's one spectrum, or block {@code block} (1-based) of a multi-block file. */
    SpectrumFile read(String text, int block) throws SpectrumFileException {
        String[] all = SpectrumText.lines(text);
        List<JcampBlocks.Block> blocks = JcampBlocks.innermost(all);
        if (blocks.isEmpty()) {
            if (block > 1) {
                throw fail(0, "block " + block + " was asked for, but the file holds one block");
            }
            return readBlock(all, 0, all.length);
        }
        return new MultiBlockChoice(fileName, sha256Hex, all, blocks).read(block);
    }

    /** Reads the block on lines {@code from} to {@code to} (0-based indexes, {@code to} exclusive). */
    SpectrumFile readBlock(String[] fileLines, int fromIndex, int toIndex) throws SpectrumFileException {
        Header header = header(fileLines, fromIndex, toIndex);
        XUnit unit = header.unit();
        List<Record> records = header.records();
        Map<String, String> metadata = header.metadata();
        String yLabel = single.containsKey("YUNITS") ? single.get("YUNITS").text() : "";
        double xFactor = factor("XFACTOR");
        double yFactor = factor("YFACTOR");
        Table table = single.containsKey("XYDATA")
                ? readXyData(single.get("XYDATA"), xFactor, yFactor)
                : readXyPoints(single.get("XYPOINTS"), xFactor, yFactor);
        FileAxis.Ascending axis = FileAxis.toAscendingNm(fileName, unit, table.x, table.y, table.lines);
        Record title = records.get(0);
        String titleText = title.text().isEmpty() ? baseName(fileName) : title.text();
        if (lineOffsetPoints != 0) {
            tolerated.add(0, "data lines " + firstOffLine + "–" + lastOffLine + " label X one point "
                    + (lineOffsetPoints > 0 ? "after" : "before") + " their first ordinate's place on the axis "
                    + "##FIRSTX=, ##LASTX= and ##NPOINTS= give; that axis was used (the point count agrees)");
        }
        return new SpectrumFile(fileName, sha256Hex, titleText, unit, yLabel, axis.wavelengthsNm(), axis.values(),
                metadata, header.metadataLines(), tolerated);
    }

    /** A block's records, checked to be one optical spectrum, before its table is read. */
    record Header(List<Record> records, Map<String, String> metadata, Map<String, Integer> metadataLines,
                  XUnit unit) {
    }

    /**
     * Parses and checks the block's records: everything but the table. Throws when the block is
     * not one optical spectrum Strandbook reads (the test a multi-block file's blocks must pass).
     */
    Header header(String[] fileLines, int fromIndex, int toIndex) throws SpectrumFileException {
        lines = fileLines;
        from = fromIndex;
        to = toIndex;
        List<Record> records = parseRecords();
        Map<String, String> metadata = new LinkedHashMap<>();
        Map<String, Integer> metadataLines = new HashMap<>();
        for (Record r : records) {
            if (SINGLE_RECORDS.contains(r.key)) {
                Record earlier = single.putIfAbsent(r.key, r);
                if (earlier != null) {
                    if (!TABLES.contains(r.key) && earlier.text().equals(r.text())) {
                        tolerated.add("##" + r.label + "= on line " + r.line + " repeats line " + earlier.line
                                + " with the same value");
                        continue;
                    }
                    throw fail(r.line, "##" + r.label + "= appears twice in the block with different values (lines "
                            + earlier.line + " and " + r.line + ")");
                }
            }
            if (!NOT_METADATA.contains(r.key)) {
                metadata.merge(r.label, r.text(), (a, b) -> a + "\n" + b);
                metadataLines.putIfAbsent(r.label, r.line);
            }
        }
        if (single.containsKey("YUNITS")) {
            metadataLines.put(SpectrumFile.Y_LABEL_LINE_KEY, single.get("YUNITS").line);
        }
        rejectWhatIsNotASingleSpectrum(records);
        checkDataType();
        return new Header(records, metadata, metadataLines, xUnit(records));
    }

    private void checkDataType() throws SpectrumFileException {
        Record dataType = single.get("DATATYPE");
        if (dataType == null) {
            return;
        }
        String refusal = LightDataType.refusal(dataType.text());
        if (refusal != null) {
            throw fail(dataType.line, "##" + dataType.label + "= " + NumberField.quote(dataType.text()) + ": " + refusal);
        }
    }

    /** The canonical form of a label: upper case without blanks, dashes, slashes or underscores. */
    static String normalizeLabel(String label) {
        StringBuilder sb = new StringBuilder(label.length());
        for (int i = 0; i < label.length(); i++) {
            char c = label.charAt(i);
            if (c != ' ' && c != '\t' && c != '-' && c != '/' && c != '_') {
                sb.append(Character.toUpperCase(c));
            }
        }
        return sb.toString();
    }

    private List<Record> parseRecords() throws SpectrumFileException {
        List<Record> records = new ArrayList<>();
        Record current = null;
        int endLine = 0;
        int lastContentLine = from + 1;
        for (int i = from; i < to; i++) {
            int lineNo = i + 1;
            String content = stripComment(lines[i]).strip();
            if (endLine > 0) {
                if (content.isEmpty()) {
                    continue;
                }
                if (content.startsWith("##")) {
                    throw fail(lineNo, "a second block starts after ##END= (line " + endLine
                            + "); Strandbook reads single-spectrum files only");
                }
                throw fail(lineNo, "text after ##END= (line " + endLine + "): " + NumberField.quote(content));
            }
            if (content.startsWith("##")) {
                int eq = content.indexOf('=');
                if (eq < 0) {
                    throw fail(lineNo, "labelled data record without '=': " + NumberField.quote(content));
                }
                String label = content.substring(2, eq).strip();
                String key = normalizeLabel(label);
                if (key.isEmpty()) {
                    throw fail(lineNo, "labelled data record without a label: " + NumberField.quote(content));
                }
                if (records.isEmpty() && !key.equals("TITLE")) {
                    throw fail(lineNo, "a JCAMP-DX block must begin with ##TITLE= (found ##" + label + "=)");
                }
                if (key.equals("TITLE") && !records.isEmpty()) {
                    throw fail(lineNo, "a second ##TITLE= before ##END= opens a nested block; multi-block (LINK) "
                            + "files are not supported, export one spectrum per file");
                }
                if (key.equals("END")) {
                    endLine = lineNo;
                    current = null;
                    continue;
                }
                current = new Record(label, key, content.substring(eq + 1).strip(), lineNo);
                records.add(current);
            } else if (current == null) {
                if (!content.isEmpty()) {
                    throw fail(lineNo, "text before ##TITLE=: " + NumberField.quote(content));
                }
            } else {
                current.endLine = lineNo;
                if (!isTable(current) && !content.isEmpty()) {
                    current.value.append('\n').append(content);
                }
            }
        }
        if (records.isEmpty()) {
            throw fail(Math.max(1, lastNonBlankLine()), "no ##TITLE= record: not a JCAMP-DX spectrum");
        }
        if (endLine == 0) {
            throw fail(to, "the file ends without ##END= (cut short?)");
        }
        this.endLine = endLine;
        return records;
    }

    private static boolean isTable(Record r) {
        return r.key.equals("XYDATA") || r.key.equals("XYPOINTS") || r.key.equals("PEAKTABLE")
                || r.key.equals("PEAKASSIGNMENTS");
    }

    private int endLine;

    private int lastNonBlankLine() {
        for (int i = to - 1; i >= from; i--) {
            if (!lines[i].isBlank()) {
                return i + 1;
            }
        }
        return 0;
    }

    /** The line without its comment: from {@code $$} on, or the whole line when it starts with {@code ##=}. */
    static String stripComment(String line) {
        // "##=" is a comment line for JCAMP-DX readers (an empty label), wherever it stands
        int start = 0;
        while (start < line.length() && (line.charAt(start) == ' ' || line.charAt(start) == '\t')) {
            start++;
        }
        if (line.startsWith("##=", start)) {
            return "";
        }
        int comment = line.indexOf("$$");
        return comment < 0 ? line : line.substring(0, comment);
    }

    private void rejectWhatIsNotASingleSpectrum(List<Record> records) throws SpectrumFileException {
        Record version = single.get("JCAMPDX");
        if (version != null) {
            String v = version.text();
            if (!(v.startsWith("4.") || v.startsWith("5.") || v.equals("4") || v.equals("5"))) {
                throw fail(version.line, "JCAMP-DX version " + NumberField.quote(v)
                        + " is not supported; Strandbook reads versions 4.24 and 5.x");
            }
        }
        for (Record r : records) {
            switch (r.key) {
                case "BLOCKS" -> throw fail(r.line, "##BLOCKS= marks a multi-block (LINK) file; "
                        + "Strandbook reads single-spectrum files only");
                case "NTUPLES" -> throw fail(r.line, "##NTUPLES= (multi-variable data) is not supported; "
                        + "export the spectrum as ##XYDATA=(X++(Y..Y))");
                default -> {
                }
            }
        }
        Record dataType = single.get("DATATYPE");
        if (dataType != null && normalizeLabel(dataType.text()).contains("LINK")) {
            throw fail(dataType.line, "##DATA TYPE= LINK marks a multi-block file; Strandbook reads "
                    + "single-spectrum files only");
        }
        Record dataClass = single.get("DATACLASS");
        if (dataClass != null) {
            String c = normalizeLabel(dataClass.text());
            if (!c.equals("XYDATA") && !c.equals("XYPOINTS")) {
                throw fail(dataClass.line, "##DATA CLASS= " + dataClass.text()
                        + " is not supported; Strandbook reads XYDATA and XYPOINTS spectra");
            }
        }
        Record xyData = single.get("XYDATA");
        Record xyPoints = single.get("XYPOINTS");
        if (xyData != null && xyPoints != null) {
            throw fail(xyPoints.line, "the block holds both ##XYDATA= (line " + xyData.line
                    + ") and ##XYPOINTS=; a single spectrum has one table");
        }
        if (xyData == null && xyPoints == null) {
            for (Record r : records) {
                if (r.key.equals("PEAKTABLE")) {
                    throw fail(r.line, "##PEAK TABLE= holds peaks, not a spectrum; Strandbook needs "
                            + "##XYDATA= or ##XYPOINTS=");
                }
            }
            throw fail(endLine, "no spectrum table: the block (##TITLE= on line " + records.get(0).line
                    + ") has neither ##XYDATA= nor ##XYPOINTS=");
        }
        if (xyData != null && !compact(xyData.text()).startsWith("(X++(Y..Y)")) {
            throw fail(xyData.line, "##XYDATA= " + xyData.text()
                    + " is not supported; Strandbook reads (X++(Y..Y)) tables");
        }
        if (xyPoints != null && !compact(xyPoints.text()).equals("(XY..XY)")) {
            throw fail(xyPoints.line, "##XYPOINTS= " + xyPoints.text()
                    + " is not supported; Strandbook reads (XY..XY) tables");
        }
    }

    private static String compact(String s) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (!Character.isWhitespace(c)) {
                sb.append(Character.toUpperCase(c));
            }
        }
        return sb.toString();
    }

    private XUnit xUnit(List<Record> records) throws SpectrumFileException {
        Record r = single.get("XUNITS");
        if (r == null) {
            Record table = single.containsKey("XYDATA") ? single.get("XYDATA") : single.get("XYPOINTS");
            throw fail(table == null ? records.get(0).line : table.line, "no ##XUNITS= record before the table "
                    + "(block from line " + records.get(0).line + "): the abscissa unit is unknown");
        }
        String k = compact(r.text().replace('µ', 'U').replace('μ', 'U'));
        return switch (k) {
            case "NANOMETERS", "NANOMETER", "NANOMETRES", "NANOMETRE", "NM" -> XUnit.NM;
            case "MICROMETERS", "MICROMETER", "MICROMETRES", "MICROMETRE", "MICRONS", "MICRON", "UM" -> XUnit.UM;
            case "1/CM", "CM-1", "CM^-1", "CM**-1" -> XUnit.WAVENUMBER_CM;
            default -> throw fail(r.line, "##XUNITS= " + NumberField.quote(r.text())
                    + " is not a light axis; NANOMETERS, MICROMETERS or 1/CM expected");
        };
    }

    private double factor(String key) throws SpectrumFileException {
        Record r = single.get(key);
        if (r == null) {
            return 1.0;
        }
        double f = number(r);
        if (f == 0) {
            throw fail(r.line, "##" + r.label + "= is zero: every value would be zero");
        }
        return f;
    }

    private double number(Record r) throws SpectrumFileException {
        String v = r.text();
        if (!NumberField.isPlainDecimal(v)) {
            throw fail(r.line, "##" + r.label + "= " + NumberField.quote(v) + " is not a number"
                    + (v.indexOf(',') >= 0 ? " (JCAMP-DX writes a decimal point, not a comma)" : ""));
        }
        double d = NumberField.parsePlainDecimal(v);
        if (!Double.isFinite(d)) {
            throw fail(r.line, "##" + r.label + "= " + NumberField.quote(v) + " is too large to store");
        }
        return d;
    }

    private Record required(String key, Record table) throws SpectrumFileException {
        Record r = single.get(key);
        if (r == null) {
            throw fail(table.line, "##" + table.label + "= needs ##" + key + "=, which is missing");
        }
        return r;
    }

    private int pointCount(Record r) throws SpectrumFileException {
        double d = number(r);
        if (d != Math.rint(d) || d < 1) {
            throw fail(r.line, "##" + r.label + "= " + NumberField.quote(r.text()) + " is not a whole number of points");
        }
        if (d > MAX_POINTS) {
            throw fail(r.line, "##" + r.label + "= " + r.text() + " exceeds the " + MAX_POINTS
                    + " points Strandbook reads from one spectrum");
        }
        if (d < SpectrumFile.MIN_POINTS) {
            throw fail(r.line, "##" + r.label + "= " + r.text() + ": a spectrum needs at least "
                    + SpectrumFile.MIN_POINTS + " points");
        }
        return (int) d;
    }

    /** Abscissae and ordinates in file order and unit, with the line of each point. */
    private record Table(double[] x, double[] y, int[] lines) {
    }

    /** The (X++(Y..Y)) table's declared axis: ##NPOINTS=, ##FIRSTX=, ##LASTX= and the spacing they give. */
    private record DeclaredAxis(int n, double firstX, double lastX, double dx, Record nRecord, Record firstXRecord) {
    }

    // kept apart from the table's loop so that the JIT compiles two small methods, not one large one:
    // a batch import runs both once per file
    private DeclaredAxis declaredAxis(Record table) throws SpectrumFileException {
        Record nRecord = required("NPOINTS", table);
        Record firstXRecord = required("FIRSTX", table);
        Record lastXRecord = required("LASTX", table);
        int n = pointCount(nRecord);
        double firstX = number(firstXRecord);
        double lastX = number(lastXRecord);
        if (firstX == lastX) {
            throw fail(lastXRecord.line, "##LASTX= equals ##FIRSTX= (line " + firstXRecord.line + "): the axis has no extent");
        }
        double dx = (lastX - firstX) / (n - 1);
        if (!Double.isFinite(dx)) {
            throw fail(lastXRecord.line, "##FIRSTX= and ##LASTX= are too far apart to store");
        }
        Record deltaX = single.get("DELTAX");
        if (deltaX != null) {
            double d = number(deltaX);
            if (Math.abs(d - dx) > DELTAX_RELATIVE_TOLERANCE * Math.abs(dx)) {
                throw fail(deltaX.line, "##DELTAX= " + NumberField.plain(d) + " disagrees with (LASTX − FIRSTX)/(NPOINTS − 1) = "
                        + NumberField.plain(dx) + " (##FIRSTX= on line " + firstXRecord.line + ", ##LASTX= on line "
                        + lastXRecord.line + ", ##NPOINTS= on line " + nRecord.line + ")");
            }
        }
        return new DeclaredAxis(n, firstX, lastX, dx, nRecord, firstXRecord);
    }

    private Table readXyData(Record table, double xFactor, double yFactor) throws SpectrumFileException {
        DeclaredAxis axis = declaredAxis(table);
        int n = axis.n();
        double firstX = axis.firstX();
        double dx = axis.dx();
        Record nRecord = axis.nRecord();
        Record firstXRecord = axis.firstXRecord();
        double[] y = new double[n];
        int[] pointLines = new int[n];
        int count = 0;
        AsdfDecoder decoder = new AsdfDecoder();
        boolean checkPending = false;
        double lastOrdinate = 0;
        int lastDataLine = 0;
        for (int i = table.line; i < table.endLine; i++) {
            String content = stripComment(lines[i]);
            if (content.isBlank()) {
                continue;
            }
            int lineNo = i + 1;
            try {
                decoder.decodeXyDataLine(content, n - count + 1);
            } catch (AsdfDecoder.SyntaxError e) {
                throw fail(lineNo, e.getMessage());
            }
            int m = decoder.count();
            if (m == 0) {
                throw fail(lineNo, "data line holds an abscissa but no ordinates");
            }
            int skip = 0;
            int firstIndex = count;
            if (checkPending) {
                if (!sameOrdinate(decoder.ordinate(0), lastOrdinate)) {
                    throw fail(lineNo, "DIF Y-value check failed: line ends with " + NumberField.plain(lastOrdinate)
                            + ", next line starts with " + NumberField.plain(decoder.ordinate(0)));
                }
                skip = 1;
                firstIndex = count - 1;
            }
            checkAbscissa(lineNo, decoder, xFactor, firstX, dx, firstIndex, n, lastDataLine == 0, firstXRecord);
            if (count + m - skip > n) {
                throw fail(lineNo, "more ordinates than ##NPOINTS= " + n + " (line " + nRecord.line + ")");
            }
            count = takeOrdinates(decoder, skip, yFactor, y, pointLines, count, lineNo);
            lastOrdinate = decoder.ordinate(m - 1);
            checkPending = decoder.endsInDif();
            lastDataLine = lineNo;
        }
        if (lastDataLine == 0) {
            throw fail(table.line, "##XYDATA= has no data lines");
        }
        if (count != n) {
            throw fail(lastDataLine, "the table holds " + count + " ordinates but ##NPOINTS= says " + n
                    + " (line " + nRecord.line + ")");
        }
        checkFirstY(y[0] / yFactor, yFactor, y[0], pointLines[0]);
        return new Table(evenlySpaced(firstX, dx, axis.lastX(), n), y, pointLines);
    }

    /** Appends the line's ordinates from {@code skip} on, scaled, at {@code count}; gives the new count. */
    private int takeOrdinates(AsdfDecoder decoder, int skip, double yFactor, double[] y, int[] pointLines, int count,
                              int lineNo) throws SpectrumFileException {
        int at = count;
        for (int j = skip; j < decoder.count(); j++) {
            double v = scale(decoder.ordinate(j), yFactor);
            if (!Double.isFinite(v)) {
                throw fail(lineNo, "ordinate × YFACTOR is too large to store");
            }
            y[at] = v;
            pointLines[at] = lineNo;
            at++;
        }
        return at;
    }

    /** The n abscissae firstX, firstX + dx, ..., ending exactly on lastX as declared. */
    private static double[] evenlySpaced(double firstX, double dx, double lastX, int n) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = firstX + i * dx;
        }
        x[n - 1] = lastX;
        return x;
    }

    /**
     * Checks the line's abscissa against the declared axis. A file whose first line agrees with
     * FIRSTX and whose every later line sits exactly one point off that axis is accepted: McDonald &amp; Wilks (1988) make the
     * line's X the abscissa of its first ordinate, but some public collections (a national standards
     * lab's gas-phase infrared files among them) label every line after the first with the point
     * before it, and readers that build the axis from FIRSTX, LASTX and NPOINTS alone take them. The ordinate count must still equal NPOINTS, so no point is lost
     * unseen; a line that breaks the file's pattern is refused as before.
     */
    private void checkAbscissa(int lineNo, AsdfDecoder decoder, double xFactor, double firstX, double dx,
                               int firstIndex, int n, boolean firstLine, Record firstXRecord)
            throws SpectrumFileException {
        double xLine = decoder.abscissa() * xFactor;
        double expected = firstX + firstIndex * dx;
        double tolerance = 0.5 * Math.abs(dx) + decoder.abscissaQuantum() * Math.abs(xFactor);
        dataLinesSeen++;
        if (lineOffsetPoints == 0) {
            if (Math.abs(xLine - expected) <= tolerance) {
                return;
            }
            // the first line must agree with FIRSTX (else FIRSTX itself may be a point off), and the
            // pattern must start on the second: a shift further down means lost or extra points
            if (n > 2 && dataLinesSeen == 2) {
                int k = Math.abs(xLine - (expected + dx)) <= tolerance ? 1
                        : Math.abs(xLine - (expected - dx)) <= tolerance ? -1 : 0;
                if (k != 0) {
                    lineOffsetPoints = k;
                    firstOffLine = lineNo;
                    lastOffLine = lineNo;
                    return;
                }
            }
        } else if (Math.abs(xLine - (expected + lineOffsetPoints * dx)) <= tolerance) {
            lastOffLine = lineNo;
            return;
        }
        if (firstLine) {
            throw fail(lineNo, "the first data line starts at X = " + NumberField.plain(xLine) + " but ##FIRSTX= "
                    + NumberField.plain(firstX) + " (line " + firstXRecord.line + ")");
        }
        throw fail(lineNo, "line starts at X = " + NumberField.plain(xLine) + " but its first ordinate is point "
                + (firstIndex + 1) + " of " + n + ", at X = " + NumberField.plain(expected)
                + " by ##FIRSTX=, ##LASTX= and ##NPOINTS=: ordinates are missing or extra before this line, "
                + "or one of those records is wrong");
    }

    private static boolean sameOrdinate(double a, double b) {
        return a == b || Math.abs(a - b) <= Y_CHECK_RELATIVE_TOLERANCE * Math.max(Math.abs(a), Math.abs(b));
    }

    private void checkFirstY(double firstOrdinate, double yFactor, double firstY, int dataLine)
            throws SpectrumFileException {
        Record r = single.get("FIRSTY");
        if (r == null) {
            return;
        }
        double declared = number(r);
        double tolerance = Math.abs(yFactor) + FIRSTY_RELATIVE_TOLERANCE * Math.abs(declared);
        if (Math.abs(declared - firstY) > tolerance) {
            throw fail(r.line, "##FIRSTY= " + NumberField.plain(declared) + " but the first ordinate (line " + dataLine
                    + ") is " + NumberField.plain(firstOrdinate) + " × YFACTOR " + NumberField.plain(yFactor)
                    + " = " + NumberField.plain(firstY));
        }
    }

    private Table readXyPoints(Record table, double xFactor, double yFactor) throws SpectrumFileException {
        Record nRecord = single.get("NPOINTS");
        int n = nRecord == null ? -1 : pointCount(nRecord);
        int maxNumbers = 2 * (n < 0 ? MAX_POINTS : n);
        double[] numbers = new double[256];
        int[] numberLines = new int[256];
        int count = 0;
        int lastDataLine = 0;
        AsdfDecoder decoder = new AsdfDecoder();
        for (int i = table.line; i < table.endLine; i++) {
            String content = stripComment(lines[i]);
            if (content.isBlank()) {
                continue;
            }
            int lineNo = i + 1;
            try {
                decoder.decodeAffnLine(content, maxNumbers - count);
            } catch (AsdfDecoder.SyntaxError e) {
                throw fail(lineNo, e.getMessage().replace("##NPOINTS= allows", n < 0
                        ? MAX_POINTS + " points allow" : "##NPOINTS= allows"));
            }
            int m = decoder.count();
            if (count + m > numbers.length) {
                int size = Math.max(numbers.length * 2, count + m);
                numbers = Arrays.copyOf(numbers, size);
                numberLines = Arrays.copyOf(numberLines, size);
            }
            for (int j = 0; j < m; j++) {
                numbers[count] = decoder.ordinate(j);
                numberLines[count] = lineNo;
                count++;
            }
            lastDataLine = lineNo;
        }
        if (lastDataLine == 0) {
            throw fail(table.line, "##XYPOINTS= has no data lines");
        }
        if (count % 2 != 0) {
            throw fail(lastDataLine, "odd number of values in (XY..XY): the last abscissa has no ordinate");
        }
        int points = count / 2;
        if (n >= 0 && points != n) {
            throw fail(lastDataLine, "the table holds " + points + " points but ##NPOINTS= says " + n
                    + " (line " + nRecord.line + ")");
        }
        double[] x = new double[points];
        double[] y = new double[points];
        int[] pointLines = new int[points];
        for (int i = 0; i < points; i++) {
            x[i] = numbers[2 * i] * xFactor;
            y[i] = scale(numbers[2 * i + 1], yFactor);
            pointLines[i] = numberLines[2 * i + 1];
            if (!Double.isFinite(x[i]) || !Double.isFinite(y[i])) {
                throw fail(pointLines[i], "value × XFACTOR or YFACTOR is too large to store");
            }
        }
        if (points >= SpectrumFile.MIN_POINTS) {
            checkEnd("FIRSTX", x[0], Math.abs(x[1] - x[0]), pointLines[0]);
            checkEnd("LASTX", x[points - 1], Math.abs(x[points - 1] - x[points - 2]), pointLines[points - 1]);
            checkFirstY(numbers[1], yFactor, y[0], pointLines[0]);
        }
        return new Table(x, y, pointLines);
    }

    private void checkEnd(String key, double actual, double spacing, int dataLine) throws SpectrumFileException {
        Record r = single.get(key);
        if (r == null) {
            return;
        }
        double declared = number(r);
        double tolerance = 0.5 * spacing + 1e-9 * Math.abs(declared);
        if (Math.abs(declared - actual) > tolerance) {
            throw fail(r.line, "##" + r.label + "= " + NumberField.plain(declared) + " but the table's "
                    + (key.equals("FIRSTX") ? "first" : "last") + " abscissa (line " + dataLine + ") is "
                    + NumberField.plain(actual));
        }
    }

    private static String baseName(String fileName) {
        int dot = fileName.lastIndexOf('.');
        return dot > 0 ? fileName.substring(0, dot) : fileName;
    }

    private SpectrumFileException fail(int line, String problem) {
        return new SpectrumFileException(fileName, line, problem);
    }

    /**
     * value × factor; a factor of 10⁻ᵏ (what writers choose to keep k decimals) is applied as a
     * division by 10ᵏ, which gives the double nearest the decimal the file means (799.8416, not
     * 799.8416000000001).
     */
    static double scale(double value, double factor) {
        if (factor > 0 && factor < 1) {
            double inverse = Math.rint(1.0 / factor);
            if (inverse <= 1e15 && 1.0 / inverse == factor) {
                return value / inverse;
            }
        }
        return value * factor;
    }
}
