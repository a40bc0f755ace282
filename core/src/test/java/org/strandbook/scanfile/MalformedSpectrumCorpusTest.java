package org.strandbook.scanfile;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Named;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.strandbook.optics.WavelengthGrid;

/**
 * A generated corpus of broken spectrum files, all from fixed seeds. Every one must be refused with
 * a {@link SpectrumFileException} whose message reads {@code file:line: what is wrong}; any other
 * throwable (a parser bug: index out of range, number format, out of memory) fails the test.
 */
public class MalformedSpectrumCorpusTest {

    private static final Pattern MESSAGE = Pattern.compile("^.+:\\d+: .+");

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void everyMalformedInputIsRejectedWithFileAndLine(byte[] content) {
        Throwable thrown = null;
        SpectrumFile accepted = null;
        try {
            accepted = SpectrumFiles.read("bad_input.dat", content);
        } catch (Throwable t) {
            thrown = t;
        }
        SpectrumFile wronglyAccepted = accepted;
        assertNotNull(thrown, () -> "accepted: " + wronglyAccepted);
        Throwable caught = thrown;
        assertTrue(caught instanceof SpectrumFileException, () -> "wrong exception type escaped:\n" + trace(caught));
        assertTrue(MESSAGE.matcher(caught.getMessage()).matches(), caught.getMessage());
    }

    @Test
    void corpusHoldsAtLeastTwoHundredInputs() {
        long count = corpus().count();
        assertTrue(count >= 200, "corpus has " + count + " inputs");
    }

    public static Stream<Named<byte[]>> corpus() {
        List<Named<byte[]>> cases = new ArrayList<>();
        String difDup = JcampDxWriter.difDup().toText(baseSpectrum());
        String affn = JcampDxWriter.affn().toText(baseSpectrum());
        String csv = DelimitedSpectrumWriter.of(DelimitedSpectrumWriter.Delimiter.SEMICOLON, true).toText(baseSpectrum());

        // McDonald & Wilks 1988: a block ends with ##END=; a file cut anywhere before it is incomplete
        truncations(cases, "difdup", difDup, 5);
        truncations(cases, "affn", affn, 17);
        encodings(cases, csv, difDup);
        binaryJunk(cases);
        delimitedContent(cases);
        jcampHeaderMutations(cases, difDup);
        jcampDataMutations(cases, difDup, affn);
        xyPointsMutations(cases);
        digitCorruptions(cases, difDup);
        return cases.stream();
    }

    /** Invented demo spectrum: 120 points, 900–1700 nm, seeded noise. */
    private static SpectrumFile baseSpectrum() {
        return SpectrumFile.inMemory("corpus base", XUnit.NM, "TRANSMITTANCE",
                WavelengthGrid.uniformNm(900, 1700, 120).wavelengthsNm(), JcampDxWriterTest.noisyCurve(120, 41),
                Map.of("$OPERATOR", "A. Example"));
    }

    private static void truncations(List<Named<byte[]>> cases, String name, String text, int step) {
        int lastCut = text.indexOf("##END=") + "##END".length();
        for (int cut = 0; cut <= lastCut; cut += step) {
            add(cases, name + " cut at byte " + cut, text.substring(0, cut));
        }
    }

    private static void encodings(List<Named<byte[]>> cases, String csv, String jcamp) {
        // Unicode Standard ch. 23.8 and RFC 3629: without a byte-order mark, UTF-16 and UTF-32 are not UTF-8
        cases.add(Named.of("csv as UTF-16LE without BOM", csv.getBytes(StandardCharsets.UTF_16LE)));
        cases.add(Named.of("csv as UTF-16BE without BOM", csv.getBytes(StandardCharsets.UTF_16BE)));
        cases.add(Named.of("jcamp as UTF-16LE without BOM", jcamp.getBytes(StandardCharsets.UTF_16LE)));
        cases.add(Named.of("csv as UTF-32", csv.getBytes(Charset.forName("UTF-32"))));
        // RFC 3629: 0xB5 (Latin-1 micro sign) and 0xB0 (degree sign) are not UTF-8 sequences
        cases.add(Named.of("micro sign in Latin-1",
                "Wavelength (µm);Counts\n1,5;2\n1,6;3\n".getBytes(StandardCharsets.ISO_8859_1)));
        // comment and ##record lines in an 8-bit code are read as ISO-8859-1; header and data lines are not
        cases.add(Named.of("degree sign in Windows-1252 column header", ("Wavelength (nm);Counts at 23 °C\n900;1\n901;2\n")
                .getBytes(Charset.forName("windows-1252"))));
        cases.add(Named.of("Latin-1 byte inside the JCAMP-DX table", jcamp.replace("##END=", "° \n##END=")
                .getBytes(StandardCharsets.ISO_8859_1)));
        byte[] midEof = csv.replaceFirst("\n", "\n\u001A\n").getBytes(StandardCharsets.UTF_8);
        cases.add(Named.of("DOS end-of-file byte before the last line", midEof));
        cases.add(Named.of("DOS end-of-file byte only", new byte[] {0x1A}));
        cases.add(Named.of("DOS end-of-file byte before ##END=", (jcamp.replace("##END=", "\u001A\n##END="))
                .getBytes(StandardCharsets.UTF_8)));

        byte[] utf16 = ("\uFEFF" + csv).getBytes(StandardCharsets.UTF_16LE);
        cases.add(Named.of("UTF-16 with BOM cut mid-character", java.util.Arrays.copyOf(utf16, utf16.length - 1)));
        byte[] overlong = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF, '1', ';', (byte) 0xC0, (byte) 0xAF, '\n'};
        cases.add(Named.of("overlong UTF-8 after a BOM", overlong));
        byte[] surrogate = csv.getBytes(StandardCharsets.UTF_8);
        byte[] withSurrogate = new byte[surrogate.length + 3];
        System.arraycopy(surrogate, 0, withSurrogate, 0, surrogate.length);
        withSurrogate[surrogate.length] = (byte) 0xED;
        withSurrogate[surrogate.length + 1] = (byte) 0xA0;
        withSurrogate[surrogate.length + 2] = (byte) 0x80;
        cases.add(Named.of("encoded surrogate in UTF-8", withSurrogate));
    }

    /** Fixed-seed random bytes and text, and the signatures of common binary formats (PNG, ZIP). */
    private static void binaryJunk(List<Named<byte[]>> cases) {
        Random random = new Random(20260314L);
        for (int i = 0; i < 40; i++) {
            byte[] junk = new byte[1 + random.nextInt(2048)];
            random.nextBytes(junk);
            cases.add(Named.of("random bytes #" + i + " (" + junk.length + " bytes)", junk));
        }
        String letters = "abcdefghijklmnopqrstuvwxyz ;,.\t#:=-+0123456789";
        for (int i = 0; i < 15; i++) {
            StringBuilder sb = new StringBuilder();
            int length = 20 + random.nextInt(400);
            for (int k = 0; k < length; k++) {
                sb.append(random.nextInt(25) == 0 ? '\n' : letters.charAt(random.nextInt(letters.length())));
            }
            add(cases, "random printable text #" + i, "garbage " + sb);
        }
        cases.add(Named.of("PNG signature", new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n', 0, 0, 0, 13}));
        cases.add(Named.of("ZIP signature", new byte[] {'P', 'K', 3, 4, 20, 0, 0, 0}));
        cases.add(Named.of("bell character in a row", "1000;1\n1001;\u00072\n".getBytes(StandardCharsets.UTF_8)));
    }

    /**
     * RFC 4180 (one record per line, same field count), IEEE 754-2019 (NaN and infinities are not
     * finite numbers; 1e400 overflows binary64), ISO 80000-1:2009 7.3.2 (one decimal sign, no
     * digit grouping with points), and the reader's documented contract (two columns, one-way axis).
     */
    private static void delimitedContent(List<Named<byte[]>> cases) {
        String header = "Wavelength (nm);Counts\n";
        add(cases, "empty file", "");
        add(cases, "blanks only", "   \n\t\n  ");
        add(cases, "comments only", "# operator: A. Example\n# date: 2026-03-14\n");
        add(cases, "header only", header);
        add(cases, "one data row", header + "1000;1\n");
        add(cases, "NaN value", header + "1000;1\n1001;NaN\n1002;3\n");
        add(cases, "Inf value", header + "1000;1\n1001;Inf\n");
        add(cases, "-Infinity value", header + "1000;1\n1001;-Infinity\n");
        add(cases, "nan abscissa", "nan;1\n1001;2\n1002;3\n");
        // a unit named in the header must fit the values: µm over 1000-2500 is nm mislabelled
        add(cases, "µm header over nm values", "Wavelength (µm);Counts\n1000;1\n1500;2\n2500;3\n");
        add(cases, "nm header over µm values", "Wavelength (nm);Counts\n1.0;1\n1.5;2\n2.5;3\n");
        add(cases, "cm-1 header over nm values", "Wavenumber (cm-1);Counts\n10;1\n20;2\n");
        add(cases, "1e400 value", header + "1000;1\n1001;1e400\n");
        add(cases, "-1e400 value", header + "1000;1\n1001;-1e400\n");
        add(cases, "1e400 abscissa", header + "1000;1\n1e400;2\n");
        add(cases, "word value", header + "1000;1\n1001;abc\n");
        add(cases, "number with suffix", header + "1000;1\n1001;12abc\n");
        add(cases, "hexadecimal float", header + "1000;1\n1001;0x1p3\n");
        add(cases, "Java double suffix", header + "1000;1\n1001;1.5d\n");
        add(cases, "empty abscissa", header + "1000;1\n;2\n");
        add(cases, "empty value", header + "1000;1\n1001;\n1002;3\n");
        add(cases, "ragged row", header + "1000;1\n1001;2;3\n1002;3\n");
        add(cases, "three columns", "Wavelength (nm);Dark;Sample\n1000;1;2\n1001;1;3\n");
        add(cases, "single column", "1000\n1001\n1002\n");
        add(cases, "duplicate abscissa", header + "1000;1\n1001;2\n1001;3\n");
        add(cases, "axis turns back", header + "1000;1\n1002;2\n1001;3\n");
        add(cases, "zero abscissa", "Wavelength (nm);Counts\n0;1\n1;2\n");
        add(cases, "negative abscissa", "Wavenumber (cm-1);A\n-1;1\n4000;2\n");
        add(cases, "digit grouping", header + "1.500,25;0,8\n1.501,25;0,9\n");
        add(cases, "range fits no unit", "40;1\n50;2\n60;3\n");
        add(cases, "unclosed quote", "\"Wavelength (nm);Counts\n1000;1\n1001;2\n");
        add(cases, "two header lines", "Wavelength;Counts\nnm;counts\n1000;1\n1001;2\n");
        add(cases, "header column count differs", "Wavelength (nm);Counts;Flag\n1000;1\n1001;2\n");
        add(cases, "decimal comma with comma delimiter", "1500,25,0,8123\n1501,25,0,8200\n");
        add(cases, "data row is text", header + "1000;1\nend of scan\n");
    }

    private static void jcampHeaderMutations(List<Named<byte[]>> cases, String t) {
        // McDonald & Wilks 1988 and Lampen et al. 1994: header records and their agreement with the table
        String npoints = recordValue(t, "NPOINTS");
        int n = Integer.parseInt(npoints);
        mutate(cases, "NPOINTS one more", t, "##NPOINTS= " + n, "##NPOINTS= " + (n + 1));
        mutate(cases, "NPOINTS one less", t, "##NPOINTS= " + n, "##NPOINTS= " + (n - 1));
        mutate(cases, "NPOINTS zero", t, "##NPOINTS= " + n, "##NPOINTS= 0");
        mutate(cases, "NPOINTS one", t, "##NPOINTS= " + n, "##NPOINTS= 1");
        mutate(cases, "NPOINTS negative", t, "##NPOINTS= " + n, "##NPOINTS= -5");
        mutate(cases, "NPOINTS text", t, "##NPOINTS= " + n, "##NPOINTS= abc");
        mutate(cases, "NPOINTS huge", t, "##NPOINTS= " + n, "##NPOINTS= 1000000000000");
        mutate(cases, "NPOINTS fractional", t, "##NPOINTS= " + n, "##NPOINTS= 119.5");
        String firstX = recordValue(t, "FIRSTX");
        String lastX = recordValue(t, "LASTX");
        mutate(cases, "FIRSTX ten steps off", t, "##FIRSTX= " + firstX, "##FIRSTX= " + (Double.parseDouble(firstX) - 70));
        mutate(cases, "FIRSTX text", t, "##FIRSTX= " + firstX, "##FIRSTX= nine hundred");
        mutate(cases, "FIRSTX decimal comma", t, "##FIRSTX= " + firstX, "##FIRSTX= 900,0");
        mutate(cases, "FIRSTX missing", t, "##FIRSTX= " + firstX + "\n", "");
        mutate(cases, "LASTX stretched", t, "##LASTX= " + lastX, "##LASTX= " + (Double.parseDouble(lastX) + 300));
        mutate(cases, "LASTX equals FIRSTX", t, "##LASTX= " + lastX, "##LASTX= " + firstX);
        mutate(cases, "LASTX 1e400", t, "##LASTX= " + lastX, "##LASTX= 1e400");
        String deltaX = recordValue(t, "DELTAX");
        mutate(cases, "DELTAX wrong", t, "##DELTAX= " + deltaX, "##DELTAX= 7.5");
        // without ##DELTAX= the line abscissae and the ordinate count must still catch the same faults
        String noDelta = t.replace("##DELTAX= " + deltaX + "\n", "");
        mutate(cases, "NPOINTS one more, no DELTAX", noDelta, "##NPOINTS= " + n, "##NPOINTS= " + (n + 1));
        mutate(cases, "NPOINTS one less, no DELTAX", noDelta, "##NPOINTS= " + n, "##NPOINTS= " + (n - 1));
        mutate(cases, "NPOINTS doubled, no DELTAX", noDelta, "##NPOINTS= " + n, "##NPOINTS= " + (2 * n));
        mutate(cases, "FIRSTX off, no DELTAX", noDelta, "##FIRSTX= " + firstX, "##FIRSTX= " + (Double.parseDouble(firstX) - 70));
        mutate(cases, "LASTX stretched, no DELTAX", noDelta, "##LASTX= " + lastX, "##LASTX= " + (Double.parseDouble(lastX) + 300));
        String firstY = recordValue(t, "FIRSTY");
        mutate(cases, "FIRSTY wrong", t, "##FIRSTY= " + firstY, "##FIRSTY= 0.1");
        mutate(cases, "XFACTOR zero", t, "##XFACTOR= 1", "##XFACTOR= 0");
        mutate(cases, "XFACTOR 1e400", t, "##XFACTOR= 1", "##XFACTOR= 1e400");
        mutate(cases, "YFACTOR text", t, "##YFACTOR= " + recordValue(t, "YFACTOR"), "##YFACTOR= abc");
        mutate(cases, "XUNITS hertz", t, "##XUNITS= NANOMETERS", "##XUNITS= HZ");
        mutate(cases, "XUNITS missing", t, "##XUNITS= NANOMETERS\n", "");
        mutate(cases, "XYDATA real/imaginary", t, "##XYDATA= (X++(Y..Y))", "##XYDATA= (X++(R..R))");
        mutate(cases, "NTUPLES", t, "##XUNITS=", "##NTUPLES= NMR SPECTRUM\n##XUNITS=");
        mutate(cases, "DATA TYPE LINK", t, "##DATA TYPE= INFRARED SPECTRUM", "##DATA TYPE= LINK");
        mutate(cases, "BLOCKS", t, "##XUNITS=", "##BLOCKS= 2\n##XUNITS=");
        mutate(cases, "DATA CLASS peak table", t, "##XUNITS=", "##DATA CLASS= PEAK TABLE\n##XUNITS=");
        mutate(cases, "PEAK TABLE instead of XYDATA", t, "##XYDATA= (X++(Y..Y))", "##PEAK TABLE= (XY..XY)");
        mutate(cases, "version 6", t, "##JCAMP-DX= 4.24", "##JCAMP-DX= 6.00");
        mutate(cases, "missing END", t, "##END=\n", "");
        mutate(cases, "text after END", t, "##END=\n", "##END=\nleftover text\n");
        // two optical spectra one after another: which one is the scan is not guessed (--block N chooses)
        mutate(cases, "second spectrum after END", t, "##END=\n", "##END=\n" + t);
        mutate(cases, "second block without its END", t, "##END=\n", "##END=\n##TITLE= second\n");
        mutate(cases, "LINK block without its own END", t, "##TITLE= corpus base\n",
                "##TITLE= link\n##DATA TYPE= LINK\n##TITLE= corpus base\n");
        mutate(cases, "LINK of a spectrum and an empty block", t, "##TITLE= corpus base\n",
                "##TITLE= link\n##DATA TYPE= LINK\n##TITLE= empty\n##END=\n##TITLE= corpus base\n");
        // Raman shift and neutron energy transfer are relative axes: as absolute wavenumbers they would be wrong light
        mutate(cases, "DATA TYPE Raman", t, "##DATA TYPE= INFRARED SPECTRUM", "##DATA TYPE= RAMAN SPECTRUM");
        mutate(cases, "DATA TYPE neutron", t, "##DATA TYPE= INFRARED SPECTRUM",
                "##DATA TYPE= INELASTIC NEUTRON SCATTERING");
        mutate(cases, "DATA TYPE NMR", t, "##DATA TYPE= INFRARED SPECTRUM", "##DATA TYPE= NMR SPECTRUM");
        mutate(cases, "DATA TYPE unknown", t, "##DATA TYPE= INFRARED SPECTRUM", "##DATA TYPE= SOMETHING");
        mutate(cases, "XUNITS micrometres over nanometre values", t, "##XUNITS= NANOMETERS", "##XUNITS= MICROMETERS");
        mutate(cases, "nested TITLE", t, "##XUNITS=", "##TITLE= inner\n##XUNITS=");
        mutate(cases, "first record not TITLE", t, "##TITLE= corpus base\n##JCAMP-DX= 4.24\n",
                "##JCAMP-DX= 4.24\n##TITLE= corpus base\n");
        mutate(cases, "text before TITLE", t, "##TITLE=", "exported by analyzer\n##TITLE=");
        mutate(cases, "duplicate XFACTOR, other value", t, "##XFACTOR= 1\n", "##XFACTOR= 1\n##X_FACTOR= 2\n");
        mutate(cases, "XYDATA twice", t, "##END=", "##XYDATA= (X++(Y..Y))\n##END=");
        mutate(cases, "record without equals", t, "##XFACTOR= 1", "##XFACTOR 1");
        mutate(cases, "blank label", t, "##XFACTOR= 1", "## = 1");
        mutate(cases, "XYDATA and XYPOINTS", t, "##XYDATA=", "##XYPOINTS= (XY..XY)\n##XYDATA=");
        mutate(cases, "no table at all", t, t.substring(t.indexOf("##XYDATA="), t.indexOf("##END=")), "");
    }

    private static void jcampDataMutations(List<Named<byte[]>> cases, String difDup, String affn) {
        // McDonald & Wilks 1988, Table VII and the Y-value check
        List<String> lines = difDup.lines().toList();
        int first = lines.indexOf("##XYDATA= (X++(Y..Y))") + 1;
        String line1 = lines.get(first);
        String line2 = lines.get(first + 1);
        int ordinateStart = abscissaLength(line2);
        char lead = line2.charAt(ordinateStart);
        char other = lead == 'A' ? 'B' : (lead == 'a' ? 'b' : (lead == '@' ? 'A' : (char) (lead - 1)));
        mutate(cases, "broken DIF Y check", difDup, line2,
                line2.substring(0, ordinateStart) + other + line2.substring(ordinateStart + 1));
        mutate(cases, "question mark ordinate", difDup, line1, line1 + "?");
        mutate(cases, "illegal character", difDup, line1, line1.substring(0, line1.length() - 1) + "!");
        mutate(cases, "DUP at line start", difDup, line2,
                line2.substring(0, ordinateStart) + "T" + line2.substring(ordinateStart + 1));
        mutate(cases, "DIF at line start", difDup, line2,
                line2.substring(0, ordinateStart) + "J" + line2.substring(ordinateStart + 1));
        mutate(cases, "huge SQZ number", difDup, line1, line1.substring(0, abscissaLength(line1)) + "A" + "0".repeat(400));
        mutate(cases, "huge DUP count", difDup, line1, line1 + "s99999999999");
        mutate(cases, "DUP after DUP", difDup, line1, line1 + "JTT");
        mutate(cases, "line without abscissa", difDup, line2, line2.substring(ordinateStart));
        mutate(cases, "abscissa only", difDup, line2, line2.substring(0, ordinateStart));
        mutate(cases, "line dropped", difDup, line2 + "\n", "");
        mutate(cases, "line doubled", difDup, line2 + "\n", line2 + "\n" + line2 + "\n");
        mutate(cases, "sign without digits", difDup, line1, line1 + "-");
        mutate(cases, "exponent without digits", difDup, line1, line1 + "1E+");

        List<String> affnLines = affn.lines().toList();
        String affnLine = affnLines.get(affnLines.indexOf("##XYDATA= (X++(Y..Y))") + 1);
        String lastValue = affnLine.substring(affnLine.lastIndexOf(' ') + 1);
        String stem = affnLine.substring(0, affnLine.lastIndexOf(' ') + 1);
        mutate(cases, "AFFN 1E+400", affn, affnLine, stem + "1E+400");
        mutate(cases, "AFFN NaN", affn, affnLine, stem + "NaN");
        mutate(cases, "AFFN Infinity", affn, affnLine, stem + "Infinity");
        mutate(cases, "AFFN value dropped", affn, affnLine, stem.strip());
        mutate(cases, "AFFN value added", affn, affnLine, affnLine + " " + lastValue);
        mutate(cases, "AFFN decimal comma", affn, affnLine, stem + lastValue.charAt(0) + ",5");
        String negativeAxis = """
                ##TITLE= negative axis
                ##XUNITS= 1/CM
                ##FIRSTX= -5
                ##LASTX= 4
                ##NPOINTS= 10
                ##XYDATA= (X++(Y..Y))
                -5 1 2 3 4 5 6 7 8 9 10
                ##END=
                """;
        add(cases, "non-positive wavenumbers", negativeAxis);
        add(cases, "no data lines", negativeAxis.replace("-5 1 2 3 4 5 6 7 8 9 10\n", ""));
    }

    private static void xyPointsMutations(List<Named<byte[]>> cases) {
        // McDonald & Wilks 1988: ##XYPOINTS=(XY..XY) pairs
        String good = """
                ##TITLE= pairs
                ##JCAMP-DX= 5.01
                ##XUNITS= NANOMETERS
                ##YUNITS= COUNTS
                ##FIRSTX= 1000
                ##LASTX= 1003
                ##NPOINTS= 3
                ##XYPOINTS= (XY..XY)
                1000, 10
                1001.5, 11
                1003, 12
                ##END=
                """;
        mutate(cases, "XYPOINTS odd count", good, "1003, 12", "1003, 12, 1004");
        mutate(cases, "XYPOINTS duplicate x", good, "1001.5, 11", "1000, 11");
        mutate(cases, "XYPOINTS axis turns back", good, "1001.5, 11", "1004, 11");
        mutate(cases, "XYPOINTS NPOINTS mismatch", good, "##NPOINTS= 3", "##NPOINTS= 4");
        mutate(cases, "XYPOINTS FIRSTX wrong", good, "##FIRSTX= 1000", "##FIRSTX= 990");
        mutate(cases, "XYPOINTS LASTX wrong", good, "##LASTX= 1003", "##LASTX= 1013");
        mutate(cases, "XYPOINTS unknown value", good, "1001.5, 11", "1001.5, ?");
        mutate(cases, "XYPOINTS compressed", good, "1001.5, 11", "1001.5 A1");
        mutate(cases, "XYPOINTS wrong variable list", good, "(XY..XY)", "(XYW..XYW)");
        mutate(cases, "XYPOINTS empty", good, "1000, 10\n1001.5, 11\n1003, 12\n", "");
    }

    private static void digitCorruptions(List<Named<byte[]>> cases, String difDup) {
        // McDonald & Wilks 1988: a changed digit alters every later ordinate of its line, which the
        // Y-value check, the line abscissae or NPOINTS then catch
        Random random = new Random(7L);
        int tableStart = difDup.indexOf("##XYDATA=");
        tableStart = difDup.indexOf('\n', tableStart) + 1;
        int tableEnd = difDup.indexOf("##END=");
        List<Integer> positions = new ArrayList<>();
        int lineStart = tableStart;
        while (lineStart < tableEnd) {
            int lineEnd = difDup.indexOf('\n', lineStart);
            String line = difDup.substring(lineStart, lineEnd);
            for (int k = abscissaLength(line); k < line.length(); k++) {
                if (Character.isDigit(line.charAt(k))) {
                    positions.add(lineStart + k);
                }
            }
            lineStart = lineEnd + 1;
        }
        for (int i = 0; i < 40; i++) {
            int at = positions.get(random.nextInt(positions.size()));
            char digit = difDup.charAt(at);
            char replacement = (char) ('0' + (digit - '0' + 1 + random.nextInt(9)) % 10);
            add(cases, "digit " + digit + "->" + replacement + " at byte " + at,
                    difDup.substring(0, at) + replacement + difDup.substring(at + 1));
        }
    }

    private static int abscissaLength(String line) {
        int k = 0;
        while (k < line.length() && (Character.isDigit(line.charAt(k)) || line.charAt(k) == '.' || line.charAt(k) == '-')) {
            k++;
        }
        return k;
    }

    private static String recordValue(String text, String label) {
        int at = text.indexOf("##" + label + "= ");
        if (at < 0) {
            throw new IllegalStateException("corpus base has no ##" + label + "=");
        }
        int start = at + label.length() + 4;
        return text.substring(start, text.indexOf('\n', start));
    }

    private static void mutate(List<Named<byte[]>> cases, String name, String text, String from, String to) {
        if (!text.contains(from)) {
            throw new IllegalStateException("mutation '" + name + "' does not apply: no '" + from + "'");
        }
        add(cases, name, text.replace(from, to));
    }

    private static void add(List<Named<byte[]>> cases, String name, String text) {
        cases.add(Named.of(name, text.getBytes(StandardCharsets.UTF_8)));
    }

    private static String trace(Throwable t) {
        StringWriter out = new StringWriter();
        t.printStackTrace(new PrintWriter(out));
        return out.toString();
    }
}
