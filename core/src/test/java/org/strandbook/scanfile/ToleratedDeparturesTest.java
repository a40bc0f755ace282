package org.strandbook.scanfile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What the readers accept although it departs from the letter of the format, as other readers do,
 * and what they still refuse; each departure is named in {@link SpectrumFile#tolerated()}.
 */
class ToleratedDeparturesTest {

    /** The published ASDF example as a whole single-spectrum file (McDonald & Wilks 1988). */
    private static final String PUBLISHED_EXAMPLE = JcampDxReaderTest.PUBLISHED_EXAMPLE;

    /** Twelve points 10 nm apart in AFFN, four to a line (McDonald & Wilks 1988, (X++(Y..Y))). */
    private static final String TEN_NM_STEPS = """
            ##TITLE= ten nm steps
            ##JCAMP-DX= 4.24
            ##DATA TYPE= INFRARED SPECTRUM
            ##XUNITS= NANOMETERS
            ##YUNITS= COUNTS
            ##FIRSTX= 1000
            ##LASTX= 1110
            ##NPOINTS= 12
            ##XYDATA= (X++(Y..Y))
            1000 1 2 3 4
            1040 5 6 7 8
            1080 9 10 11 12
            ##END=
            """;

    @TempDir
    Path dir;

    @Test
    void anEmptyLabelIsACommentLineEvenInsideTheTable() throws Exception {
        // JCAMP-DX readers take "##=" as a comment (common practice); it was refused as a record without a label
        String text = PUBLISHED_EXAMPLE.replace("##JCAMP-DX= 4.24\n", "##JCAMP-DX= 4.24\n##= exported by hand\n")
                .replace("1009c", "##= second line follows\n1009c");
        SpectrumFile s = read(text);
        assertArrayEquals(new double[] {1, 2, 3, 3, 2, 1, 0, -1, -2, -3}, s.values());
    }

    @Test
    void aRecordRepeatedWithTheSameValueIsAcceptedAndNamed() throws Exception {
        // McDonald & Wilks 1988 give each record once a block; a repeat that says the same changes nothing (common practice)
        SpectrumFile s = read(PUBLISHED_EXAMPLE.replace("##FIRSTY= 1\n", "##FIRSTY= 1\n##XUNITS= NANOMETERS\n"));
        assertEquals(10, s.size());
        assertEquals(1, s.tolerated().size());
        assertTrue(s.tolerated().get(0).contains("line 12 repeats line 4"), s.tolerated().toString());
        SpectrumFileException e = assertThrows(SpectrumFileException.class,
                () -> read(PUBLISHED_EXAMPLE.replace("##FIRSTY= 1\n", "##FIRSTY= 1\n##XUNITS= MICROMETERS\n")));
        assertEquals(12, e.lineNumber(), e.getMessage());
    }

    @Test
    void aDosEndOfFileByteAfterEndIsIgnored() throws Exception {
        // MS-DOS text files may end with SUB (0x1A) (common practice); it was refused as a control character
        byte[] bytes = (PUBLISHED_EXAMPLE + "\u001A").getBytes(StandardCharsets.UTF_8);
        SpectrumFile s = SpectrumFiles.read("ex.jdx", bytes);
        assertEquals(10, s.size());
        assertTrue(s.tolerated().get(0).contains("0x1A"), s.tolerated().toString());
    }

    @Test
    void aMetadataLineInLatin1IsReadAsLatin1ButADataLineIsNot() throws Exception {
        // ISO/IEC 8859-1: 0xFC is u-umlaut, a byte that cannot stand alone in UTF-8 (RFC 3629)
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        out.writeBytes(PUBLISHED_EXAMPLE.replace("##XFACTOR= 1\n", "##ORIGIN= Pr\u00fcflabor\n##XFACTOR= 1\n")
                .getBytes(StandardCharsets.ISO_8859_1));
        SpectrumFile s = SpectrumFiles.read("ex.jdx", out.toByteArray());
        assertEquals("Pr\u00fcflabor", s.metadata().get("ORIGIN"));
        assertTrue(s.tolerated().get(0).contains("line 6") && s.tolerated().get(0).contains("ISO-8859-1"),
                s.tolerated().toString());
        byte[] dataLine = PUBLISHED_EXAMPLE.replace("1009c", "1009c \u00fc").getBytes(StandardCharsets.ISO_8859_1);
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> SpectrumFiles.read("ex.jdx", dataLine));
        assertEquals(14, e.lineNumber(), e.getMessage());
    }

    @Test
    void dataLinesLabelledOnePointOffAreAcceptedWhenCountAndEndsAgree() throws Exception {
        // McDonald & Wilks 1988 make each line's X the abscissa of its first ordinate; files that label
        // every line after the first one point later are read from FIRSTX, LASTX and NPOINTS by common
        // readers (common practice); the count and FIRSTX still have to agree
        String text = TEN_NM_STEPS.replace("1040 5", "1050 5").replace("1080 9", "1090 9");
        SpectrumFile s = read(text);
        assertEquals(1000, s.wavelengthsNm()[0]);
        assertEquals(1110, s.wavelengthsNm()[11]);
        assertArrayEquals(new double[] {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12}, s.values());
        assertTrue(s.tolerated().get(0).contains("lines 11–12") && s.tolerated().get(0).contains("one point after"),
                s.tolerated().toString());
    }

    @Test
    void aShiftThatStartsFurtherDownIsStillRefused() {
        // McDonald & Wilks 1988: a line whose X moves mid-table means lost or extra ordinates
        SpectrumFileException e = assertThrows(SpectrumFileException.class,
                () -> read(TEN_NM_STEPS.replace("1080 9", "1090 9")));
        assertEquals(12, e.lineNumber(), e.getMessage());
    }

    @Test
    void ramanShiftIsRefusedOnItsDataTypeLine() {
        // a Raman spectrum's 1/CM axis is a shift from the laser line, not an absolute wavenumber
        // (from memory); stored as light it would land at wrong wavelengths
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> read(PUBLISHED_EXAMPLE
                .replace("INFRARED SPECTRUM", "RAMAN SPECTRUM").replace("NANOMETERS", "1/CM")));
        assertEquals(3, e.lineNumber(), e.getMessage());
        assertTrue(e.problem().contains("raman"), e.getMessage());
    }

    @Test
    void aMicrometreHeaderOverNanometreValuesIsRefusedNamingBoth() {
        // 1 µm = 1000 nm (SI Brochure, 9th ed., 2019): 1500 µm is 1.5 mm, no light a fiber carries
        byte[] csv = "Wavelength (µm);Counts\n1000;1\n1500;2\n2500;3\n".getBytes(StandardCharsets.UTF_8);
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> SpectrumFiles.read("um.csv", csv));
        assertEquals("um.csv:2: abscissa 1000 in the declared unit µm lies outside 0.1–100 µm, where light spectra "
                + "lie in that unit (100 nm to 100 µm): the unit named in the file does not fit its values", e.getMessage());
    }

    @Test
    void headerProblemsNameTheirLine() {
        // McDonald & Wilks 1988: ##XUNITS= must precede the table it describes; ##END= closes the block
        SpectrumFileException noUnit = assertThrows(SpectrumFileException.class,
                () -> read(PUBLISHED_EXAMPLE.replace("##XUNITS= NANOMETERS\n", "")));
        assertEquals(11, noUnit.lineNumber(), noUnit.getMessage());
        SpectrumFileException noTable = assertThrows(SpectrumFileException.class,
                () -> read(PUBLISHED_EXAMPLE.replace("##XYDATA= (X++(Y..Y))\n1000AJT%jX\n1009c\n", "")));
        assertEquals(12, noTable.lineNumber(), noTable.getMessage());
    }

    @Test
    void delimitedTextHasThePointLimitOfJcampDx() {
        // design choice: one limit for every format, JcampDxReader.MAX_POINTS
        StringBuilder sb = new StringBuilder("Wavelength (nm);Counts\n");
        for (int i = 0; i <= JcampDxReader.MAX_POINTS; i++) {
            sb.append(200 + i * 0.01).append(";1\n");
        }
        byte[] bytes = sb.toString().getBytes(StandardCharsets.UTF_8);
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> SpectrumFiles.read("big.csv", bytes));
        assertEquals(JcampDxReader.MAX_POINTS + 2, e.lineNumber(), e.getMessage());
    }

    @Test
    void aFifoIsRefusedAtOnceInsteadOfWaitingForAWriter() throws Exception {
        // POSIX mkfifo(1): opening a FIFO for reading blocks until a writer opens it
        Path fifo = dir.resolve("scan.jdx");
        Process mk = new ProcessBuilder("mkfifo", fifo.toString()).start();
        assumeTrue(mk.waitFor() == 0 && Files.exists(fifo), "mkfifo is not available here");
        SpectrumFileException e = assertTimeoutPreemptively(Duration.ofSeconds(30),
                () -> assertThrows(SpectrumFileException.class, () -> SpectrumFiles.read(fifo)));
        assertTrue(e.problem().contains("not a regular file"), e.getMessage());
    }

    @Test
    void aControlCharacterInTheFileNameIsEscapedInTheMessage() {
        // ECMA-48: ESC (0x1B) starts a terminal control sequence; a line feed would forge a second message line
        SpectrumFileException e = assertThrows(SpectrumFileException.class,
                () -> SpectrumFiles.read("evil\u001B[2J\nname.csv", new byte[0]));
        assertEquals("evil\\e[2J\\nname.csv:0: the file is empty", e.getMessage());
    }

    private static SpectrumFile read(String text) throws SpectrumFileException {
        return SpectrumFiles.read("ex.jdx", text.getBytes(StandardCharsets.UTF_8));
    }
}
