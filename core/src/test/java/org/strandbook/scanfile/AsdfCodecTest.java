package org.strandbook.scanfile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class AsdfCodecTest {

    // McDonald & Wilks, Appl. Spectrosc. 42, 151 (1988): the published ASDF example,
    // ordinates 1 2 3 3 2 1 0 -1 -2 -3 starting at X = 1000.
    private static final double[] PUBLISHED_ORDINATES = {1, 2, 3, 3, 2, 1, 0, -1, -2, -3};

    @Test
    void decodesThePublishedSqzExample() throws Exception {
        // McDonald & Wilks 1988: SQZ form "1000ABCCBA@abc"
        AsdfDecoder decoder = new AsdfDecoder();
        decoder.decodeXyDataLine("1000ABCCBA@abc", 100);
        assertEquals(1000, decoder.abscissa());
        assertArrayEquals(PUBLISHED_ORDINATES, ordinates(decoder));
        assertFalse(decoder.endsInDif(), "an SQZ line needs no Y-value check");
    }

    @Test
    void decodesThePublishedDifDupExample() throws Exception {
        // McDonald & Wilks 1988: DIFDUP form "1000AJT%jX"
        AsdfDecoder decoder = new AsdfDecoder();
        decoder.decodeXyDataLine("1000AJT%jX", 100);
        assertEquals(1000, decoder.abscissa());
        assertArrayEquals(PUBLISHED_ORDINATES, ordinates(decoder));
        assertTrue(decoder.endsInDif(), "a line ending in DIF form asks for a Y-value check");
    }

    @Test
    void encodesThePublishedDifDupExample() {
        // McDonald & Wilks 1988: DIFDUP form "1000AJT%jX"; the closing check line repeats the last
        // ordinate (-3 = SQZ "c") at its abscissa 1009, as the Y-value check rule asks
        List<String> lines = AsdfEncoder.difDupLines(new long[] {1, 2, 3, 3, 2, 1, 0, -1, -2, -3},
                i -> Integer.toString(1000 + i));
        assertEquals(List.of("1000AJT%jX", "1009c"), lines);
    }

    @Test
    void affnExponentNeedsASign() throws Exception {
        // McDonald & Wilks 1988, AFFN: E is an exponent only when followed by + or -; otherwise it is SQZ 5
        AsdfDecoder decoder = new AsdfDecoder();
        decoder.decodeXyDataLine("1000 1E+03 1E3", 100);
        assertArrayEquals(new double[] {1000, 1, 53}, ordinates(decoder));
    }

    @Test
    void pacSignsSeparateValues() throws Exception {
        // McDonald & Wilks 1988, AFFN: a field starting with + or - is a new numeric field (PAC form)
        AsdfDecoder decoder = new AsdfDecoder();
        decoder.decodeXyDataLine("1000+1+2+3+3+2+1+0-1-2-3", 100);
        assertArrayEquals(PUBLISHED_ORDINATES, ordinates(decoder));
    }

    @Test
    void decodesTheIncompleteDifDupExampleFile() throws Exception {
        // JCAMP-DX test file "difdup_example.jdx" (repository nzhagen/jcamp, data/test/difdup_example.jdx):
        // its header says NPOINTS= 53 from X = 4 to 56, and its check line "56A28" repeats the last ordinate, 128
        String line = lines("difdup_example.jdx").get(10);
        AsdfDecoder decoder = new AsdfDecoder();
        decoder.decodeXyDataLine(line, 1000);
        assertEquals(4, decoder.abscissa());
        assertEquals(53, decoder.count());
        assertEquals(0, decoder.ordinate(0), "##FIRSTY= 0 of the same file");
        assertEquals(128, decoder.ordinate(52));
        assertTrue(decoder.endsInDif());
    }

    @ParameterizedTest
    @CsvSource(textBlock = """
            # McDonald & Wilks 1988, Table VII: SQZ @ A-I = 0..9, a-i = -1..-9; further digits plain ASCII
            1000@,        0
            1000I,        9
            1000i,       -9
            1000A23,      123
            1000a23,     -123
            # DIF % J-R = 0..9, j-r = -1..-9 relative to the previous ordinate
            1000E%,       5 5
            1000ER,       5 14
            1000Er,       5 -4
            # DUP S-Z = 1..8, s = 9, counting the repeated token itself; S0 = 10
            1000AS,       1
            1000AT,       1 1
            1000As,       1 1 1 1 1 1 1 1 1
            1000AS0,      1 1 1 1 1 1 1 1 1 1
            1000AJU,      1 2 3 4
            """)
    void decodesEachPseudoDigitClass(String line, String expected) throws Exception {
        AsdfDecoder decoder = new AsdfDecoder();
        decoder.decodeXyDataLine(line, 100);
        double[] want = Arrays.stream(expected.trim().split(" +")).mapToDouble(Double::parseDouble).toArray();
        assertArrayEquals(want, ordinates(decoder));
    }

    @ParameterizedTest
    @CsvSource(textBlock = """
            # McDonald & Wilks 1988: pseudo-digit encoding is its own inverse on these values
            0
            7
            -7
            10
            -10
            1234567
            -9876543
            """)
    void sqzAndDifTokensReadBack(long value) throws Exception {
        StringBuilder sb = new StringBuilder("1000");
        AsdfEncoder.appendSqz(sb, 0);
        AsdfEncoder.appendDif(sb, value);
        AsdfEncoder.appendSqz(sb, value);
        AsdfDecoder decoder = new AsdfDecoder();
        decoder.decodeXyDataLine(sb, 100);
        assertArrayEquals(new double[] {0, value, value}, ordinates(decoder));
    }

    @Test
    void difAtTheStartOfALineIsRefused() {
        // McDonald & Wilks 1988: each line's first ordinate is absolute, so that lines decode on their own
        AsdfDecoder decoder = new AsdfDecoder();
        AsdfDecoder.SyntaxError e = assertThrows(AsdfDecoder.SyntaxError.class,
                () -> decoder.decodeXyDataLine("1000J", 100));
        assertTrue(e.getMessage().contains("first ordinate of a line must be an absolute value"), e.getMessage());
    }

    @Test
    void dupCountBeyondTheLimitIsRefusedBeforeFillingMemory() {
        // contract of AsdfDecoder: a line never holds more ordinates than the caller allows
        AsdfDecoder decoder = new AsdfDecoder();
        AsdfDecoder.SyntaxError e = assertThrows(AsdfDecoder.SyntaxError.class,
                () -> decoder.decodeXyDataLine("1000As99999999999", 4000));
        assertTrue(e.getMessage().contains("DUP count"), e.getMessage());
    }

    private static double[] ordinates(AsdfDecoder decoder) {
        double[] out = new double[decoder.count()];
        for (int i = 0; i < out.length; i++) {
            out[i] = decoder.ordinate(i);
        }
        return out;
    }

    static List<String> lines(String resource) throws IOException {
        try (InputStream in = AsdfCodecTest.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IOException("test resource missing: " + resource);
            }
            return Arrays.asList(new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n"));
        }
    }
}
