package org.strandbook.scanfile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class JcampDxReaderTest {

    private static final double RELATIVE_TOLERANCE = 1e-12;

    /** The published ASDF example as a whole single-spectrum file (McDonald & Wilks 1988). */
    static final String PUBLISHED_EXAMPLE = """
            ##TITLE= published ASDF example
            ##JCAMP-DX= 4.24
            ##DATA TYPE= INFRARED SPECTRUM
            ##XUNITS= NANOMETERS
            ##YUNITS= ARBITRARY UNITS
            ##XFACTOR= 1
            ##YFACTOR= 1
            ##FIRSTX= 1000
            ##LASTX= 1009
            ##NPOINTS= 10
            ##FIRSTY= 1
            ##XYDATA= (X++(Y..Y))
            1000AJT%jX
            1009c
            ##END=
            """;

    @Test
    void readsThePublicDomainTestSpectrumDupdec1() throws Exception {
        // JCAMP-DX test file dupdec1.jdx (##OWNER= public domain), from repository nzhagen/jcamp,
        // data/Robert_J_Lancashire_test_data/dupdec1.jdx: its own header gives NPOINTS 3951 from
        // 4400 to 450 1/CM and FIRSTY 82.25; its final line "450G858" is 7858 x YFACTOR 0.01
        SpectrumFile s = SpectrumFiles.read("dupdec1.jdx", resource("dupdec1.jdx"));
        assertEquals(3951, s.size());
        assertEquals(XUnit.WAVENUMBER_CM, s.xUnit());
        assertEquals("TRANSMITTANCE", s.yLabel());
        assertEquals("dupdec1.jdx", s.title());
        // descending wavenumber = ascending wavelength: the file's order is kept
        assertEquals(1e7 / 4400, s.wavelengthsNm()[0], 1e7 / 4400 * RELATIVE_TOLERANCE);
        assertEquals(82.25, s.values()[0], 1e-9);
        assertEquals(1e7 / 450, s.wavelengthsNm()[3950], 1e7 / 450 * RELATIVE_TOLERANCE);
        assertEquals(78.58, s.values()[3950], 1e-9);
        assertEquals("public domain", s.metadata().get("OWNER"));
        assertEquals("Chem. Dep't, UWI, JAMAICA", s.metadata().get("ORIGIN"));
        assertEquals("4.24", s.metadata().get("JCAMP-DX"), "the $$ comment after the version is dropped");
    }

    @Test
    void readsThePublishedExampleAsAFile() throws Exception {
        // McDonald & Wilks 1988: 1000AJT%jX = 1 2 3 3 2 1 0 -1 -2 -3 from X = 1000
        SpectrumFile s = read(PUBLISHED_EXAMPLE);
        assertArrayEquals(new double[] {1000, 1001, 1002, 1003, 1004, 1005, 1006, 1007, 1008, 1009}, s.wavelengthsNm());
        assertArrayEquals(new double[] {1, 2, 3, 3, 2, 1, 0, -1, -2, -3}, s.values());
    }

    @Test
    void labelsIgnoreCaseBlanksDashesSlashesAndUnderscores() throws Exception {
        // McDonald & Wilks 1988, labelled data records: labels compare without case, blanks, -, / and _
        String text = PUBLISHED_EXAMPLE.replace("##XUNITS=", "##x_units=").replace("##NPOINTS=", "##N Points=")
                .replace("##FIRSTX=", "##first-x=").replace("##LASTX=", "##Last/X=");
        assertEquals(10, read(text).size());
    }

    @Test
    void brokenDifYCheckIsReportedOnTheLineThatRepeatsTheOrdinate() {
        // McDonald & Wilks 1988: a DIF line's last ordinate is repeated as the next line's first (Y-value check)
        String text = PUBLISHED_EXAMPLE.replace("1009c", "1009b");
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> read(text));
        assertEquals("ex.jdx:14: DIF Y-value check failed: line ends with -3, next line starts with -2", e.getMessage());
    }

    @Test
    void npointsDisagreeingWithTheTableIsRefused() {
        // McDonald & Wilks 1988: NPOINTS is the number of ordinates in the table
        String text = PUBLISHED_EXAMPLE.replace("##NPOINTS= 10", "##NPOINTS= 11");
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> read(text));
        assertEquals(14, e.lineNumber(), e.getMessage());
        assertTrue(e.problem().contains("##NPOINTS= says 11"), e.getMessage());
    }

    @Test
    void firstXDisagreeingWithTheFirstLineIsRefused() {
        // McDonald & Wilks 1988: each (X++(Y..Y)) line starts with the abscissa of its first ordinate
        String text = PUBLISHED_EXAMPLE.replace("##FIRSTX= 1000", "##FIRSTX= 990");
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> read(text));
        assertEquals("ex.jdx:13: the first data line starts at X = 1000 but ##FIRSTX= 990 (line 8)", e.getMessage());
    }

    @Test
    void firstYDisagreeingWithTheFirstOrdinateIsRefused() {
        // McDonald & Wilks 1988: FIRSTY is the first ordinate in real units (ordinate x YFACTOR)
        String text = PUBLISHED_EXAMPLE.replace("##FIRSTY= 1", "##FIRSTY= 3");
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> read(text));
        assertEquals(11, e.lineNumber(), e.getMessage());
    }

    @Test
    void lastXThatMovesTheLineAbscissaeIsRefused() {
        // McDonald & Wilks 1988: point i lies at FIRSTX + i (LASTX - FIRSTX)/(NPOINTS - 1);
        // two lines: the second line's X (1006) no longer matches point 6 once LASTX is stretched
        String text = PUBLISHED_EXAMPLE.replace("##LASTX= 1009", "##LASTX= 1027").replace("1000AJT%jX\n1009c",
                "1000AJT%jA\n1006@jU\n1009c");
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> read(text));
        assertEquals(14, e.lineNumber(), e.getMessage());
    }

    @Test
    void windowsAndClassicMacLineEndsReadTheSame() throws Exception {
        // CR LF (Windows) and lone CR (classic Mac OS) line ends are read too [design choice]
        SpectrumFile lf = read(PUBLISHED_EXAMPLE);
        assertEquals(lf, read(PUBLISHED_EXAMPLE.replace("\n", "\r\n")).withSource("ex.jdx", lf.sha256Hex()));
        assertEquals(lf, read(PUBLISHED_EXAMPLE.replace("\n", "\r")).withSource("ex.jdx", lf.sha256Hex()));
    }

    @Test
    void version501AndCommentsAreAccepted() throws Exception {
        // Lampen et al., Appl. Spectrosc. 48, 1545 (1994): version 5 keeps the 4.24 XYDATA table
        String text = PUBLISHED_EXAMPLE.replace("##JCAMP-DX= 4.24", "##JCAMP-DX= 5.01 $$ written by an analyzer")
                .replace("1009c", "$$ final check line\n1009c $$ -3");
        assertEquals(10, read(text).size());
    }

    @ParameterizedTest
    @CsvSource(textBlock = """
            # McDonald & Wilks 1988: ##XUNITS= names the abscissa; 1 um = 1000 nm, 1/CM per nu = 1e7/lambda[nm]
            NANOMETERS,  1,     1000,  1000
            MICROMETERS, 0.001, 1,     1000
            1/CM,        1,     1000,  10000
            """)
    void abscissaUnitsConvertToNanometres(String unit, double xFactor, double firstX, double firstNm) throws Exception {
        String text = PUBLISHED_EXAMPLE.replace("NANOMETERS", unit).replace("##XFACTOR= 1\n", "##XFACTOR= " + xFactor + "\n")
                .replace("##FIRSTX= 1000", "##FIRSTX= " + 1000 * xFactor).replace("##LASTX= 1009", "##LASTX= " + 1009 * xFactor);
        SpectrumFile s = read(text);
        double[] nm = s.wavelengthsNm();
        double got = unit.equals("1/CM") ? nm[nm.length - 1] : nm[0];
        assertEquals(firstNm, got, firstNm * RELATIVE_TOLERANCE);
        assertEquals(firstX, s.xInFileUnit()[unit.equals("1/CM") ? nm.length - 1 : 0], firstX * RELATIVE_TOLERANCE);
    }

    @Test
    void xyPointsTableIsRead() throws Exception {
        // McDonald & Wilks 1988: ##XYPOINTS=(XY..XY) holds unevenly spaced pairs
        String text = """
                ##TITLE= uneven
                ##JCAMP-DX= 4.24
                ##XUNITS= NANOMETERS
                ##YUNITS= COUNTS
                ##XFACTOR= 0.1
                ##YFACTOR= 2
                ##FIRSTX= 1500
                ##LASTX= 1520.5
                ##NPOINTS= 3
                ##XYPOINTS= (XY..XY)
                15000, 10; 15100, 11
                15205, 12
                ##END=
                """;
        SpectrumFile s = read(text);
        assertArrayEquals(new double[] {1500, 1510, 1520.5}, s.wavelengthsNm(), 1e-9);
        assertArrayEquals(new double[] {20, 22, 24}, s.values());
    }

    /** A peak table block (Lampen et al. 1994, ##PEAK TABLE=): not a spectrum. */
    private static final String PEAK_BLOCK = """
            ##TITLE= peaks
            ##JCAMP-DX= 5.01
            ##DATA TYPE= INFRARED PEAK TABLE
            ##XUNITS= NANOMETERS
            ##YUNITS= ARBITRARY UNITS
            ##PEAK TABLE= (XY..XY)
            1002, 3; 1003, 3
            ##END=
            """;

    private static String link(String... blocks) {
        return "##TITLE= link\n##JCAMP-DX= 5.01\n##DATA TYPE= LINK\n##BLOCKS= " + blocks.length + "\n"
                + String.join("", blocks) + "##END=\n";
    }

    @Test
    void aLinkFileWithOneOpticalSpectrumAmongOtherBlocksGivesThatSpectrum() throws Exception {
        // McDonald & Wilks 1988 / Lampen et al. 1994: a LINK block holds further blocks, each from ##TITLE= to ##END=
        String text = link(PEAK_BLOCK, PUBLISHED_EXAMPLE);
        SpectrumFile s = read(text);
        assertArrayEquals(new double[] {1, 2, 3, 3, 2, 1, 0, -1, -2, -3}, s.values());
        assertEquals(1, s.tolerated().size(), s.tolerated().toString());
        assertTrue(s.tolerated().get(0).contains("block 2 of 2"), s.tolerated().toString());
    }

    @Test
    void aLinkFileWithTwoOpticalSpectraIsRefusedListingThemUntilOneIsChosen() throws Exception {
        // McDonald & Wilks 1988: blocks are numbered in file order; which one is the scan is the user's call
        String second = PUBLISHED_EXAMPLE.replace("published ASDF example", "second scan").replace("1009c", "1009b")
                .replace("1000AJT%jX", "1000BJT%jX").replace("##FIRSTY= 1", "##FIRSTY= 2");
        String text = link(PUBLISHED_EXAMPLE, PEAK_BLOCK, second);
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> read(text));
        assertEquals(5, e.lineNumber(), e.getMessage());
        assertTrue(e.problem().contains("block 1 'published ASDF example' on line 5")
                && e.problem().contains("block 3 'second scan' on line 28") && e.problem().contains("--block N"),
                e.getMessage());
        SpectrumFile third = SpectrumFiles.read("ex.jdx", text.getBytes(StandardCharsets.UTF_8), 3);
        assertEquals(2, third.values()[0]);
        assertEquals("second scan", third.title());
        SpectrumFileException peak = assertThrows(SpectrumFileException.class,
                () -> SpectrumFiles.read("ex.jdx", text.getBytes(StandardCharsets.UTF_8), 2));
        assertTrue(peak.problem().contains("PEAK TABLE"), peak.getMessage());
    }

    @Test
    void ntuplesAreRefused() {
        // Lampen et al. 1994: NTUPLES carry multi-variable data, not one (X++(Y..Y)) spectrum
        String text = PUBLISHED_EXAMPLE.replace("##XYDATA= (X++(Y..Y))", "##NTUPLES= NMR SPECTRUM\n##XYDATA= (X++(Y..Y))");
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> read(text));
        assertEquals(12, e.lineNumber());
        assertTrue(e.problem().contains("NTUPLES"), e.getMessage());
    }

    @Test
    void missingEndIsRefusedAsCutShort() {
        // McDonald & Wilks 1988: every block ends with ##END=
        String text = PUBLISHED_EXAMPLE.replace("##END=\n", "");
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> read(text));
        assertEquals("ex.jdx:14: the file ends without ##END= (cut short?)", e.getMessage());
    }

    @Test
    void nonLightAxisIsRefused() {
        // test file difdup_example.jdx (repository nzhagen/jcamp, data/test/difdup_example.jdx) has a time axis
        SpectrumFileException e = assertThrows(SpectrumFileException.class,
                () -> SpectrumFiles.read("difdup_example.jdx", resource("difdup_example.jdx")));
        assertEquals(2, e.lineNumber());
        assertTrue(e.problem().contains("MILLISECONDS"), e.getMessage());
    }

    private static SpectrumFile read(String text) throws SpectrumFileException {
        return SpectrumFiles.read("ex.jdx", text.getBytes(StandardCharsets.UTF_8));
    }

    static byte[] resource(String name) throws IOException {
        try (InputStream in = JcampDxReaderTest.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IOException("test resource missing: " + name);
            }
            return in.readAllBytes();
        }
    }
}
