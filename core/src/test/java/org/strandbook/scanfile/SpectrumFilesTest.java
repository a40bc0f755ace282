package org.strandbook.scanfile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SpectrumFilesTest {

    private static final String CSV = "Wavelength (nm);Counts\n1000;5\n1001;6\n";

    @Test
    void sha256MatchesThePublishedTestVector() {
        // FIPS 180-4 / NIST example "abc": ba7816bf 8f01cfea 414140de 5dae2223 b00361a3 96177a9c b410ff61 f20015ad
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                SpectrumFiles.sha256Hex("abc".getBytes(StandardCharsets.US_ASCII)));
    }

    @Test
    void readFromPathKeepsNameAndHashOfTheBytes(@TempDir Path dir) throws Exception {
        // FIPS 180-4: SHA-256 of exactly the file's bytes
        Path file = dir.resolve("dark_0314.csv");
        Files.writeString(file, CSV);
        SpectrumFile s = SpectrumFiles.read(file);
        assertEquals("dark_0314.csv", s.sourceName());
        assertEquals(SpectrumFiles.sha256Hex(CSV.getBytes(StandardCharsets.UTF_8)), s.sha256Hex());
    }

    @Test
    void formatIsChosenByContentNotByName() throws Exception {
        // McDonald & Wilks 1988: a JCAMP-DX file opens with ##TITLE=, whatever its name
        byte[] jcamp = JcampDxWriter.affn().toBytes(SpectrumFile.inMemory("t", XUnit.NM, "", new double[] {1000, 1001},
                new double[] {1, 2}, Map.of()));
        assertEquals("t", SpectrumFiles.read("misnamed.csv", jcamp).title());
        assertEquals("misnamed", SpectrumFiles.read("misnamed.jdx", CSV.getBytes(StandardCharsets.UTF_8)).title());
    }

    @Test
    void utf8ByteOrderMarkIsSkipped() throws Exception {
        // Unicode Standard, ch. 23.8: U+FEFF encoded in UTF-8 is EF BB BF
        byte[] bytes = concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, CSV.getBytes(StandardCharsets.UTF_8));
        assertEquals(XUnit.NM, SpectrumFiles.read("bom.csv", bytes).xUnit());
    }

    @Test
    void utf16WithByteOrderMarkIsRead() throws Exception {
        // Unicode Standard, ch. 23.8: FF FE opens little-endian UTF-16, FE FF big-endian
        byte[] little = concat(new byte[] {(byte) 0xFF, (byte) 0xFE}, CSV.getBytes(StandardCharsets.UTF_16LE));
        byte[] big = concat(new byte[] {(byte) 0xFE, (byte) 0xFF}, CSV.getBytes(StandardCharsets.UTF_16BE));
        assertArrayEquals(new double[] {5, 6}, SpectrumFiles.read("le.csv", little).values());
        assertArrayEquals(new double[] {5, 6}, SpectrumFiles.read("be.csv", big).values());
    }

    @Test
    void utf16WithoutByteOrderMarkIsRefusedAtItsFirstLine() {
        SpectrumFileException e = assertThrows(SpectrumFileException.class,
                () -> SpectrumFiles.read("wide.csv", CSV.getBytes(StandardCharsets.UTF_16LE)));
        assertEquals(1, e.lineNumber());
        assertTrue(e.problem().contains("UTF-16"), e.getMessage());
    }

    @Test
    void latin1MicroSignIsRefusedWithItsLine() {
        // RFC 3629, section 3: a lone byte 0xB5 is not a UTF-8 sequence
        byte[] bytes = "# note\nWavelength (µm);Counts\n1.5;2\n1.6;3\n".getBytes(StandardCharsets.ISO_8859_1);
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> SpectrumFiles.read("l1.csv", bytes));
        // a header line names the unit: it is not guessed at in another code, unlike a # comment
        assertEquals("l1.csv:2: byte 0xB5 at byte offset 19 is not UTF-8 text (only comment and ##record lines may "
                + "be in another 8-bit code: save the spectrum as UTF-8)", e.getMessage());
    }

    @Test
    void fileLargerThanTheLimitIsRefusedWithoutReadingIt(@TempDir Path dir) throws Exception {
        // contract of SpectrumFiles (class Javadoc): 64 MiB limit, checked from the size before reading
        Path huge = dir.resolve("disk.img");
        try (RandomAccessFile f = new RandomAccessFile(huge.toFile(), "rw")) {
            f.setLength(SpectrumFiles.MAX_FILE_BYTES + 1); // sparse: no 64 MiB written
        }
        SpectrumFileException e = assertThrows(SpectrumFileException.class, () -> SpectrumFiles.read(huge));
        assertEquals("disk.img:0: the file has 67108865 bytes, more than the 67108864 bytes (64 MiB) a spectrum "
                + "file may have", e.getMessage());
    }

    @Test
    void missingFileIsASpectrumFileExceptionOnLineZero(@TempDir Path dir) {
        // contract of SpectrumFileException (class Javadoc): line 0 when no single line is at fault
        SpectrumFileException e = assertThrows(SpectrumFileException.class,
                () -> SpectrumFiles.read(dir.resolve("gone.csv")));
        assertEquals(0, e.lineNumber());
        assertTrue(e.getMessage().startsWith("gone.csv:0: cannot read the file"), e.getMessage());
    }

    @Test
    void spectrumFileCopiesItsArrays() throws Exception {
        // contract of SpectrumFile (record Javadoc): arrays are copied on the way in and out
        SpectrumFile s = SpectrumFiles.read("c.csv", CSV.getBytes(StandardCharsets.UTF_8));
        s.values()[0] = 99;
        s.wavelengthsNm()[0] = 1;
        assertArrayEquals(new double[] {5, 6}, s.values());
        assertArrayEquals(new double[] {1000, 1001}, s.wavelengthsNm());
    }

    private static byte[] concat(byte[] a, byte[] b) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        out.writeBytes(a);
        out.writeBytes(b);
        return out.toByteArray();
    }
}
