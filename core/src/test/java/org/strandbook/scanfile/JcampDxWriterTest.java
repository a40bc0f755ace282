package org.strandbook.scanfile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;
import org.strandbook.optics.WavelengthGrid;

class JcampDxWriterTest {

    @Test
    void writesThePublishedDifDupLine() {
        // McDonald & Wilks, Appl. Spectrosc. 42, 151 (1988): 1 2 3 3 2 1 0 -1 -2 -3 at X = 1000 is "1000AJT%jX"
        SpectrumFile s = SpectrumFile.inMemory("example", XUnit.NM, "", WavelengthGrid.uniformNm(1000, 1009, 10)
                .wavelengthsNm(), new double[] {1, 2, 3, 3, 2, 1, 0, -1, -2, -3}, Map.of());
        List<String> lines = JcampDxWriter.difDup().toText(s).lines().toList();
        int table = lines.indexOf("##XYDATA= (X++(Y..Y))");
        assertEquals(List.of("1000AJT%jX", "1009c", "##END="), lines.subList(table + 1, lines.size()));
        assertTrue(lines.contains("##YFACTOR= 1"), "whole-number ordinates are written exactly");
    }

    @ParameterizedTest
    @EnumSource(JcampDxWriter.Form.class)
    void roundTripKeepsValuesWithinHalfAYFactorStep(JcampDxWriter.Form form) throws Exception {
        // quantisation bound of rounding to a grid of step YFACTOR (McDonald & Wilks 1988: values = integers x YFACTOR)
        double[] nm = WavelengthGrid.uniformNm(1000, 2200, 2001).wavelengthsNm();
        double[] values = noisyCurve(nm.length, 21);
        JcampDxWriter writer = form == JcampDxWriter.Form.AFFN ? JcampDxWriter.affn() : JcampDxWriter.difDup();
        SpectrumFile back = roundTrip(writer, SpectrumFile.inMemory("loop scan", XUnit.NM, "TRANSMITTANCE", nm, values,
                Map.of("$OPERATOR", "A. Example", "DATE", "2026-03-14")));
        double step = writer.yFactorFor(values);
        double[] got = back.values();
        for (int i = 0; i < values.length; i++) {
            assertEquals(values[i], got[i], 0.5 * step * (1 + 1e-9), "value " + i);
        }
        assertArrayEquals(nm, back.wavelengthsNm(), 1e-9);
        assertEquals("TRANSMITTANCE", back.yLabel());
        assertEquals("A. Example", back.metadata().get("$OPERATOR"));
        assertEquals("2026-03-14", back.metadata().get("DATE"));
    }

    @Test
    void wavenumberAxisIsWrittenInWavenumbers() throws Exception {
        // IUPAC Green Book (2007): wavenumber = 1/wavelength; an FT analyzer's even cm-1 grid stays even in cm-1
        WavelengthGrid grid = WavelengthGrid.uniformWavenumberCm(4000, 10000, 3001);
        double[] values = noisyCurve(grid.size(), 22);
        SpectrumFile written = SpectrumFile.inMemory("FT reference", XUnit.WAVENUMBER_CM, "", grid.wavelengthsNm(),
                values, Map.of());
        String text = JcampDxWriter.difDup().toText(written);
        assertTrue(text.contains("##XUNITS= 1/CM\n"));
        assertTrue(text.contains("##XYDATA= (X++(Y..Y))\n"), "an even cm-1 grid is an XYDATA table");
        SpectrumFile back = SpectrumFiles.read("ft.jdx", text.getBytes(StandardCharsets.UTF_8));
        assertArrayEquals(grid.wavelengthsNm(), back.wavelengthsNm(), 1e-9);
        assertEquals(XUnit.WAVENUMBER_CM, back.xUnit());
    }

    @Test
    void unevenAxisFallsBackToXyPoints() throws Exception {
        // McDonald & Wilks 1988: ##XYPOINTS=(XY..XY) for unequally spaced abscissae
        double[] nm = {1000, 1001.5, 1004, 1010};
        double[] values = {0.5, 0.25, 0.125, 0.0625};
        String text = JcampDxWriter.difDup().toText(SpectrumFile.inMemory("uneven", XUnit.NM, "", nm, values, Map.of()));
        assertTrue(text.contains("##XYPOINTS= (XY..XY)\n"), text);
        SpectrumFile back = SpectrumFiles.read("uneven.jdx", text.getBytes(StandardCharsets.UTF_8));
        assertArrayEquals(nm, back.wavelengthsNm());
        assertArrayEquals(values, back.values());
    }

    @ParameterizedTest
    @CsvSource(textBlock = """
            # YFACTOR rule of this writer (class Javadoc): whole numbers below 10^7 exactly, else the power of ten
            # that leaves the largest |value| 7 digits
            0.8123,     1E-7
            65535,      1
            65535.5,    1E-2
            -1234.5678, 1E-3
            0,          1
            3.2E9,      1E3
            """)
    void yFactorKeepsSevenSignificantDigits(double largest, double expectedFactor) {
        assertEquals(expectedFactor, JcampDxWriter.difDup().yFactorFor(new double[] {0, largest}), expectedFactor * 1e-12);
    }

    @Test
    void linesStayWithinEightyCharacters() {
        // McDonald & Wilks 1988: data lines of at most 80 characters
        SpectrumFile s = SpectrumFile.inMemory("wide", XUnit.NM, "", WavelengthGrid.uniformNm(500, 1500, 1001)
                .wavelengthsNm(), noisyCurve(1001, 23), Map.of());
        for (JcampDxWriter writer : List.of(JcampDxWriter.difDup(), JcampDxWriter.affn())) {
            writer.toText(s).lines().forEach(line -> assertTrue(line.length() <= 80, line));
        }
    }

    @Test
    void writeReplacesTheFileWholeAndLeavesNoTemporaryFile(@TempDir Path dir) throws Exception {
        // write to a temporary file, then rename over the target [design choice]
        Path target = dir.resolve("loop_A3.jdx");
        Files.writeString(target, "old content");
        SpectrumFile s = SpectrumFile.inMemory("loop A3", XUnit.NM, "COUNTS",
                WavelengthGrid.uniformNm(900, 1700, 801).wavelengthsNm(), noisyCurve(801, 24), Map.of());
        JcampDxWriter.difDup().write(s, target);
        SpectrumFile back = SpectrumFiles.read(target);
        assertEquals(801, back.size());
        assertEquals(SpectrumFiles.sha256Hex(Files.readAllBytes(target)), back.sha256Hex());
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(target), files.toList());
        }
    }

    @Test
    void metadataKeysThatAreNotLabelsBecomeUserDefinedLabels() throws Exception {
        // McDonald & Wilks 1988 [from memory]: labels starting with $ are user-defined; $$ starts a comment
        Map<String, String> metadata = new LinkedHashMap<>();
        metadata.put("integration time (ms)", "120");
        metadata.put("comment", "line one\nline two $$ not a comment");
        SpectrumFile s = SpectrumFile.inMemory("notes", XUnit.NM, "", new double[] {1000, 1001}, new double[] {1, 2},
                metadata);
        String text = JcampDxWriter.affn().toText(s);
        assertTrue(text.contains("##$INTEGRATION TIME _MS_= 120\n"), text);
        SpectrumFile back = SpectrumFiles.read("notes.jdx", text.getBytes(StandardCharsets.UTF_8));
        assertEquals("line one; line two $ $ not a comment", back.metadata().get("$COMMENT"));
    }

    static SpectrumFile roundTrip(JcampDxWriter writer, SpectrumFile s) throws SpectrumFileException {
        return SpectrumFiles.read("round.jdx", writer.toBytes(s));
    }

    /** Invented demo values: a transmission-like curve with seeded noise, 0..1. */
    static double[] noisyCurve(int n, long seed) {
        Random random = new Random(seed);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = (double) i / (n - 1);
            y[i] = 0.8 - 0.3 * Math.exp(-Math.pow((t - 0.6) / 0.05, 2)) + 0.002 * random.nextGaussian();
        }
        return y;
    }
}
