package org.strandbook.scanfile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.strandbook.optics.WavelengthGrid;

class DelimitedSpectrumReaderTest {

    private static final double RELATIVE_TOLERANCE = 1e-12;

    @Test
    void decimalCommaWithSemicolonsIsRead() throws Exception {
        // ISO 80000-1:2009, 7.3.2: the decimal sign is a comma or a point on the line
        SpectrumFile s = read("ref.csv", """
                Wellenlänge (nm);Intensität (counts)
                1500,25;0,8123
                1500,50;0,8131
                1500,75;0,8140
                """);
        assertArrayEquals(new double[] {1500.25, 1500.5, 1500.75}, s.wavelengthsNm());
        assertArrayEquals(new double[] {0.8123, 0.8131, 0.8140}, s.values());
        assertEquals(XUnit.NM, s.xUnit());
        assertEquals("Intensität (counts)", s.yLabel());
    }

    @Test
    void tabsAreADelimiterAndTheDecimalCommaStillWorks() throws Exception {
        // ISO 80000-1:2009, 7.3.2: either decimal sign
        SpectrumFile s = read("dark.txt", "Wavelength (nm)\tCounts\n900\t102,5\n901\t103\n");
        assertArrayEquals(new double[] {900, 901}, s.wavelengthsNm());
        assertArrayEquals(new double[] {102.5, 103}, s.values());
    }

    @Test
    void blankSeparatedDecimalCommaNumbersAreTwoColumns() throws Exception {
        // ISO 80000-1:2009, 7.3.2: "1500,25 0,8123" holds two numbers with decimal commas
        SpectrumFile s = read("loop.txt", "1500,25 0,8123\n1501,25 0,8200\n");
        assertArrayEquals(new double[] {1500.25, 1501.25}, s.wavelengthsNm());
        assertArrayEquals(new double[] {0.8123, 0.82}, s.values());
    }

    @Test
    void micrometreHeaderConvertsToNanometres() throws Exception {
        // SI Brochure, 9th ed. (BIPM 2019), prefixes: micro = 1e-6, nano = 1e-9, so 1 um = 1000 nm
        SpectrumFile s = read("nir.csv", "wavelength_um,transmittance\n1.55,0.91\n1.65,0.93\n");
        assertEquals(XUnit.UM, s.xUnit());
        assertArrayEquals(new double[] {1550, 1650}, s.wavelengthsNm(), 1650 * RELATIVE_TOLERANCE);
    }

    @Test
    void wavenumberHeaderConvertsAndTheDescendingAxisIsReversed() throws Exception {
        // IUPAC Green Book, 3rd ed. (2007): wavenumber = 1/wavelength, so lambda[nm] = 1e7 / nu[cm-1]
        SpectrumFile s = read("ft.csv", "Wavenumber [cm-1],Absorbance\n8000,0.10\n7000,0.20\n6250,0.30\n");
        assertEquals(XUnit.WAVENUMBER_CM, s.xUnit());
        assertArrayEquals(new double[] {1250, 1e7 / 7000, 1600}, s.wavelengthsNm(), 1600 * RELATIVE_TOLERANCE);
        assertArrayEquals(new double[] {0.10, 0.20, 0.30}, s.values());
    }

    @Test
    void descendingWavelengthAxisIsReversedWithItsValues() throws Exception {
        // contract of DelimitedSpectrumReader (class Javadoc): one-way axes in either direction, values carried
        SpectrumFile s = read("desc.csv", "Wavelength (nm),Counts\n1700,7\n1600,6\n1500,5\n");
        assertArrayEquals(new double[] {1500, 1600, 1700}, s.wavelengthsNm());
        assertArrayEquals(new double[] {5, 6, 7}, s.values());
    }

    @ParameterizedTest
    @CsvSource(textBlock = """
            # thresholds of this reader (class Javadoc) [design choice], set around the silica fiber
            # window of about 0.2-2.5 um [common practice]: first, last abscissa -> unit
            0.9,    2.5,    UM
            190,    1100,   NM
            900,    2600,   NM
            4000,   12500,  WAVENUMBER_CM
            12500,  4000,   WAVENUMBER_CM
            """)
    void unitFollowsTheRangeWhenNoHeaderNamesIt(double first, double last, XUnit expected) throws Exception {
        String text = first + ";1\n" + ((first + last) / 2) + ";2\n" + last + ";3\n";
        assertEquals(expected, read("bare.csv", text).xUnit());
    }

    @Test
    void rangeThatFitsNoUnitAsksForAHeader() {
        // contract of DelimitedSpectrumReader (class Javadoc): 30..100 is neither um, nm nor cm-1
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> read("odd.csv", "40;1\n60;2\n"));
        assertEquals(1, e.lineNumber());
        assertTrue(e.problem().contains("name it in a header"), e.getMessage());
    }

    @Test
    void commentLinesBecomeMetadataAndTitle() throws Exception {
        // contract of DelimitedSpectrumReader (class Javadoc): "# key: value" and "# key = value" lines
        SpectrumFile s = read("loop3.csv", """
                # title: Loop 3 after re-termination
                # operator: A. Example
                # integration time (ms) = 120
                # taken after cleaning both SMA 905 ends
                Wavelength (nm),Counts
                1000,10
                1001,11
                """);
        assertEquals("Loop 3 after re-termination", s.title());
        Map<String, String> expected = new LinkedHashMap<>();
        expected.put("title", "Loop 3 after re-termination");
        expected.put("operator", "A. Example");
        expected.put("integration time (ms)", "120");
        expected.put("comment", "taken after cleaning both SMA 905 ends");
        assertEquals(expected, s.metadata());
    }

    @Test
    void quotedHeaderFieldsMayHoldTheDelimiter() throws Exception {
        // RFC 4180, section 2: fields holding the delimiter are enclosed in double quotes
        SpectrumFile s = read("q.csv", "\"Wavelength (nm)\",\"Intensity, counts\"\n1000,5\n1001,6,\n");
        assertEquals("Intensity, counts", s.yLabel());
        assertArrayEquals(new double[] {5, 6}, s.values(), "a trailing delimiter is ignored");
    }

    @Test
    void fileNameWithoutExtensionIsTheTitleWhenNoneIsGiven() throws Exception {
        // contract of SpectrumFile (record Javadoc): title falls back to the file name without extension
        assertEquals("lamp_2026-03-14", read("lamp_2026-03-14.csv", "1000;1\n1001;2\n").title());
    }

    @ParameterizedTest
    @CsvSource(textBlock = """
            # this writer's three layouts must each read back to the same doubles
            COMMA,     false
            SEMICOLON, true
            TAB,       true
            TAB,       false
            """)
    void writerOutputReadsBackExactly(DelimitedSpectrumWriter.Delimiter delimiter, boolean decimalComma)
            throws Exception {
        double[] nm = WavelengthGrid.uniformNm(900, 1700, 401).wavelengthsNm();
        double[] values = JcampDxWriterTest.noisyCurve(401, 31);
        Map<String, String> metadata = new LinkedHashMap<>();
        metadata.put("operator", "A. Example");
        SpectrumFile written = SpectrumFile.inMemory("scan", XUnit.NM, "Counts; dark corrected", nm, values, metadata);
        SpectrumFile back = read("w.csv", DelimitedSpectrumWriter.of(delimiter, decimalComma).toText(written));
        assertArrayEquals(nm, back.wavelengthsNm());
        assertArrayEquals(values, back.values());
        assertEquals("Counts; dark corrected", back.yLabel());
        assertEquals("A. Example", back.metadata().get("operator"));
        assertEquals("scan", back.title());
    }

    private static SpectrumFile read(String name, String text) throws SpectrumFileException {
        return SpectrumFiles.read(name, text.getBytes(StandardCharsets.UTF_8));
    }
}
