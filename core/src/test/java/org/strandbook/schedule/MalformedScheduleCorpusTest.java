package org.strandbook.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.Consumer;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;

import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.poifs.crypt.EncryptionInfo;
import org.apache.poi.poifs.crypt.EncryptionMode;
import org.apache.poi.poifs.crypt.Encryptor;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.ThrowingSupplier;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A generated corpus of broken inputs, each read through {@link CableScheduleReader#read}: none may
 * throw (the test catches Throwable to prove it), each gives problems. Damage to the file itself
 * gives exactly one file-level problem; damage to content gives located problems. Random cases use
 * fixed seeds, so every run reads the same bytes.
 *
 * <p>Formats the cases break: ZIP per PKWARE APPNOTE.TXT (the end-of-central-directory record ends
 * the file, so any truncation loses it); Open Packaging Conventions, ECMA-376 Part 2 (a package
 * holds [Content_Types].xml; XML parts carry no DTD); encrypted OOXML per [MS-OFFCRYPTO], stored in
 * a compound file whose signature [MS-CFB] fixes as D0 CF 11 E0 A1 B1 1A E1; CSV per RFC 4180;
 * entity expansion per W3C XML 1.0 §4; ZIP bombs as described by D. Fifield, "A better zip bomb",
 * USENIX WOOT 2019; the Strict namespace of ECMA-376 Part 1.
 */
class MalformedScheduleCorpusTest {

    private static final String SEGMENTS_PART = "xl/worksheets/sheet5.xml";

    @TempDir
    Path folder;

    private final CableScheduleReader reader = new CableScheduleReader();

    // --- the file is no usable workbook: one problem without a cell ----------------------
    // (a package that lacks a sheet's part still opens: POI drops the sheet, so that case reports
    // the missing sheet rather than the file)

    static Stream<Arguments> brokenFiles() {
        return Stream.of(
                file("empty file", () -> new byte[0], "is empty"),
                file("truncated to 1 byte", () -> truncated(1), "only 1 bytes, too short"),
                file("truncated to 2 bytes", () -> truncated(2), "only 2 bytes, too short"),
                file("truncated to 3 bytes", () -> truncated(3), "only 3 bytes, too short"),
                file("truncated to 4 bytes", () -> truncated(4), "only 4 bytes, too short"),
                file("truncated to 30 bytes", () -> truncated(30), "damaged or truncated"),
                file("truncated to 100 bytes", () -> truncated(100), "damaged or truncated"),
                file("truncated to 1000 bytes", () -> truncated(1000), "damaged or truncated"),
                file("truncated to half", () -> truncated(valid().length / 2), "damaged or truncated"),
                file("end record cut off", () -> truncated(valid().length - 22), "damaged or truncated"),
                file("last byte missing", () -> truncated(valid().length - 1), "damaged or truncated"),
                file("10 random bytes", () -> random(1, 10), "too short"),
                file("100 random bytes", () -> random(2, 100), "is not an XLSX workbook"),
                file("1000 random bytes", () -> random(3, 1000), "is not an XLSX workbook"),
                file("10000 random bytes", () -> random(4, 10_000), "is not an XLSX workbook"),
                file("100000 random bytes", () -> random(5, 100_000), "is not an XLSX workbook"),
                file("ZIP signature then 50 random bytes", () -> zipSignatureThen(6, 50), "damaged or truncated"),
                file("ZIP signature then 5000 random bytes", () -> zipSignatureThen(7, 5000), "damaged or truncated"),
                file("ZIP signature then 50000 random bytes", () -> zipSignatureThen(8, 50_000), "damaged or truncated"),
                file("empty ZIP archive", () -> zip(Map.of()), "empty ZIP archive"),
                file("ZIP of junk entries", () -> zip(junkEntries(9, false)), "no [Content_Types].xml"),
                file("ZIP of junk entries with junk content types", () -> zip(junkEntries(10, true)),
                        "could not be read as an XLSX workbook"),
                file("workbook part replaced by random bytes", () -> replaced("xl/workbook.xml", random(11, 2000)),
                        "could not be read as an XLSX workbook"),
                file("sheet part cut mid-element", () -> replaced(SEGMENTS_PART,
                        "<worksheet xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\"><sheetData><row"
                                .getBytes(StandardCharsets.UTF_8)), "could not be read as an XLSX workbook"),
                file("workbook part missing", () -> without("xl/workbook.xml"), "could not be read as an XLSX workbook"),
                file("sheet part missing", () -> without(SEGMENTS_PART), "sheet 'Segments' is missing"),
                file("content types empty", () -> replaced("[Content_Types].xml",
                        "<Types xmlns=\"http://schemas.openxmlformats.org/package/2006/content-types\"/>"
                                .getBytes(StandardCharsets.UTF_8)), "could not be read as an XLSX workbook"),
                file("entity expansion in shared strings", () -> replaced("xl/sharedStrings.xml", billionLaughs()),
                        "could not be read as an XLSX workbook"),
                file("external entity in workbook part", () -> replaced("xl/workbook.xml", externalEntity()),
                        "could not be read as an XLSX workbook"),
                file("Strict namespace workbook", () -> strictNamespace(), "could not be read as an XLSX workbook"),
                file("CSV saved as .xlsx", () -> ascii("Point tag,Direction,Position\nP-101,SEND,1\n"), "text file"),
                file("CSV with byte order mark", () -> withBom("Cable ID;Length (m)\nC-1;12,5\n"), "text file"),
                file("web page saved as .xlsx", () -> ascii("<!DOCTYPE html><html><body><table></table></body></html>"),
                        "web page or XML"),
                file("JSON saved as .xlsx", () -> ascii("{\"points\": [\"P-101\", \"P-102\"], \"segments\": []}"), "text file"),
                file("PDF saved as .xlsx", () -> ascii("%PDF-1.7\n%\u00e2\u00e3\n1 0 obj\n"), "is a PDF document"),
                file("PNG saved as .xlsx", () -> png(), "is an image"),
                file("password-protected workbook", MalformedScheduleCorpusTest::encrypted, "encrypted"),
                file("old binary .xls workbook", MalformedScheduleCorpusTest::oldXls, "old binary spreadsheet"),
                file("OLE2 signature then random bytes", () -> ole2Garbage(12), "damaged OLE2"),
                file("ZIP bomb beyond the unpack limit", MalformedScheduleCorpusTest::zipBomb, "unpacks to more than"),
                // POI's own ZIP-bomb guard (minimum inflate ratio, default left in force) catches this one
                file("highly compressed sheet under the unpack limit", MalformedScheduleCorpusTest::denseSheet,
                        "Zip bomb detected"),
                file("more parts than any schedule", MalformedScheduleCorpusTest::manyParts, "more than 1000 parts"),
                file("path-traversal entry names", () -> zip(Map.of("../../evil.txt", ascii("x"),
                        "/abs/evil.txt", ascii("y"))), "no [Content_Types].xml"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("brokenFiles")
    void brokenFileGivesOneFileLevelProblem(String name, ThrowingSupplier<byte[]> bytes, String expected)
            throws Throwable {
        List<ScheduleProblem> problems = readCatchingEverything(bytes.get());

        assertEquals(1, problems.size(), problems::toString);
        ScheduleProblem p = problems.get(0);
        assertEquals("", p.location(), "a file-level problem has no cell");
        if (p.sheet().isEmpty()) {
            assertTrue(p.message().startsWith("'case.xlsx' "), p.message());
        }
        assertTrue(p.message().contains(expected), () -> "expected '" + expected + "' in: " + p.message());
    }

    // --- a readable workbook with broken content: located problems ------------------------

    static Stream<Arguments> brokenContent() {
        return Stream.of(
                content("text in every numeric column of a segment", wb -> {
                    for (String col : List.of("C", "F")) {
                        ScheduleFixture.cell(wb, "Segments", col + "2").setCellValue("abc");
                    }
                }, "Segments!F2: length must be a number of metres, was 'abc'"),
                content("1e308 in every numeric analyzer column", wb -> {
                    for (String col : List.of("C", "D", "E", "F")) {
                        ScheduleFixture.cell(wb, "Analyzers", col + "2").setCellValue(1e308);
                    }
                }, "Analyzers!C2: wavelength must be at most 100000 nm, was 1E+308"),
                content("NaN typed as text", ScheduleFixture.set("Segments", "F3", "NaN"),
                        "Segments!F3: length must be a number of metres, was 'NaN'"),
                content("Infinity typed as text", ScheduleFixture.set("Segments", "F3", "Infinity"),
                        "Segments!F3: length must be a number of metres, was 'Infinity'"),
                content("1e400 typed as text", ScheduleFixture.set("Segments", "F3", "1e400"),
                        "Segments!F3: length must be a number of metres, was '1e400'"),
                content("-1e308 as a number", ScheduleFixture.set("Segments", "F3", -1e308),
                        "Segments!F3: length must be a positive number of metres, was -1E+308"),
                content("logical value in a numeric column", wb -> ScheduleFixture.cell(wb, "Segments", "F3")
                        .setCellValue(true), "Segments!F3: length must be a number of metres, was 'TRUE'"),
                content("error values across a joint row", wb -> {
                    for (String col : List.of("A", "B", "C", "D", "E", "F", "G", "H", "I")) {
                        ScheduleFixture.cell(wb, "Joints", col + "2").setCellErrorValue(FormulaError.NA.getCode());
                    }
                }, "Joints!A2: the cell holds the error value #N/A"),
                content("identifier of 5000 characters", ScheduleFixture.set("Segments", "D3", "C".repeat(5000)),
                        "Segments!D3: cable ID must be at most 64 characters, was 5000 characters"),
                content("every data sheet deleted", wb -> {
                    for (ScheduleSheet s : ScheduleSheet.values()) {
                        wb.removeSheetAt(wb.getSheetIndex(s.title()));
                    }
                }, "sheet 'Analyzers' is missing"),
                content("headers shuffled", wb -> {
                    ScheduleFixture.cell(wb, "Segments", "A1").setCellValue("Length (m)");
                    ScheduleFixture.cell(wb, "Segments", "F1").setCellValue("Point tag");
                }, "Segments!A1: expected header 'Point tag', was 'Length (m)'"),
                content("sheet renamed", wb -> wb.setSheetName(wb.getSheetIndex("Joints"), "Joint list"),
                        "sheet 'Joints' is missing"),
                content("more rows than any schedule", wb -> {
                    for (int r = 2; r <= SheetTable.MAX_ROWS + 2; r++) {
                        ScheduleFixture.cell(wb, "Bends", "A" + r).setCellValue("C-101S-1");
                    }
                }, "sheet 'Bends' has 10002 rows; a schedule holds at most 10000 rows per sheet"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("brokenContent")
    void brokenContentGivesLocatedProblems(String name, Consumer<XSSFWorkbook> edit, String expected)
            throws Throwable {
        Path file = folder.resolve("case.xlsx");
        Files.write(file, valid());
        ScheduleFixture.edit(file, edit);

        List<String> problems = readCatchingEverything(Files.readAllBytes(file)).stream()
                .map(ScheduleProblem::toString).toList();

        assertFalse(problems.isEmpty());
        assertTrue(problems.contains(expected), () -> "expected '" + expected + "' among " + problems);
    }

    // --- random damage: whatever it gives, it gives it without an exception ---------------

    static Stream<Long> flipSeeds() {
        return Stream.iterate(101L, s -> s + 1).limit(20);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("flipSeeds")
    void randomByteDamageNeverThrows(long seed) throws Throwable {
        byte[] bytes = valid();
        Random random = new Random(seed);
        for (int i = 0, n = 1 + random.nextInt(8); i < n; i++) {
            bytes[random.nextInt(bytes.length)] ^= (byte) (1 + random.nextInt(255));
        }
        Path file = folder.resolve("case.xlsx");
        Files.write(file, bytes);
        ScheduleReadResult result = null;
        try {
            result = reader.read(file);
        } catch (Throwable t) {
            fail("read threw " + t, t);
        }
        assertNotNull(result);
    }

    // --- limits the caller sets -----------------------------------------------------------

    @Test
    void fileLargerThanTheLimitIsRefusedBeforeOpening() throws IOException {
        Path file = folder.resolve("case.xlsx");
        Files.write(file, valid());

        List<ScheduleProblem> problems = reader.withLimits(1024, 1024).read(file).problems();

        assertEquals(1, problems.size());
        assertTrue(problems.get(0).message().matches("'case.xlsx' is \\d+\\.\\d MiB; a cable schedule may be at most"
                + " 0\\.0 MiB"), problems.get(0).message());
    }

    @Test
    void folderInsteadOfFileIsRefused() {
        List<ScheduleProblem> problems = reader.read(folder).problems();

        assertEquals(1, problems.size());
        assertTrue(problems.get(0).message().endsWith("does not exist or is not a file"), problems.get(0).message());
    }

    private List<ScheduleProblem> readCatchingEverything(byte[] bytes) throws IOException {
        Path file = folder.resolve("case.xlsx");
        Files.write(file, bytes);
        try {
            return reader.read(file).problems();
        } catch (Throwable t) {
            return fail("read threw " + t, t);
        }
    }

    // --- case builders --------------------------------------------------------------------

    private static Arguments file(String name, ThrowingSupplier<byte[]> bytes, String expected) {
        return Arguments.of(name, bytes, expected);
    }

    private static Arguments content(String name, Consumer<XSSFWorkbook> edit, String expected) {
        return Arguments.of(name, edit, expected);
    }

    private static byte[] valid() throws IOException {
        return ScheduleFixture.plantBytes();
    }

    private static byte[] truncated(int length) throws IOException {
        return Arrays.copyOf(valid(), length);
    }

    private static byte[] random(long seed, int length) {
        byte[] b = new byte[length];
        new Random(seed).nextBytes(b);
        // keep clear of the signatures the reader recognises, so the case stays "unknown content"
        b[0] = (byte) 0x9C;
        return b;
    }

    private static byte[] zipSignatureThen(long seed, int length) {
        byte[] b = random(seed, length + 4);
        b[0] = 'P';
        b[1] = 'K';
        b[2] = 3;
        b[3] = 4;
        return b;
    }

    private static byte[] ascii(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] withBom(String s) {
        byte[] text = ascii(s);
        byte[] b = new byte[text.length + 3];
        b[0] = (byte) 0xEF;
        b[1] = (byte) 0xBB;
        b[2] = (byte) 0xBF;
        System.arraycopy(text, 0, b, 3, text.length);
        return b;
    }

    private static byte[] png() {
        byte[] b = random(13, 200);
        byte[] signature = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n'};
        System.arraycopy(signature, 0, b, 0, signature.length);
        return b;
    }

    private static byte[] ole2Garbage(long seed) {
        byte[] b = random(seed, 4096);
        byte[] signature = {(byte) 0xD0, (byte) 0xCF, 0x11, (byte) 0xE0, (byte) 0xA1, (byte) 0xB1, 0x1A, (byte) 0xE1};
        System.arraycopy(signature, 0, b, 0, signature.length);
        return b;
    }

    private static Map<String, byte[]> junkEntries(long seed, boolean withContentTypes) {
        Random random = new Random(seed);
        Map<String, byte[]> parts = new LinkedHashMap<>();
        if (withContentTypes) {
            byte[] junk = new byte[300];
            random.nextBytes(junk);
            parts.put("[Content_Types].xml", junk);
        }
        for (int i = 0; i < 5; i++) {
            byte[] junk = new byte[1 + random.nextInt(5000)];
            random.nextBytes(junk);
            parts.put("junk/" + i + ".bin", junk);
        }
        return parts;
    }

    private static Map<String, byte[]> parts() throws IOException {
        Map<String, byte[]> parts = new LinkedHashMap<>();
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(valid()))) {
            for (ZipEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                parts.put(e.getName(), in.readAllBytes());
            }
        }
        if (!parts.containsKey(SEGMENTS_PART) || !parts.containsKey("xl/sharedStrings.xml")) {
            throw new IllegalStateException("the fixture's part names changed: " + parts.keySet());
        }
        return parts;
    }

    private static byte[] replaced(String part, byte[] content) throws IOException {
        Map<String, byte[]> parts = parts();
        parts.put(part, content);
        return zip(parts);
    }

    private static byte[] without(String part) throws IOException {
        Map<String, byte[]> parts = parts();
        parts.remove(part);
        return zip(parts);
    }

    private static byte[] billionLaughs() {
        StringBuilder xml = new StringBuilder("<?xml version=\"1.0\"?><!DOCTYPE sst [<!ENTITY l0 \"lol\">");
        for (int i = 1; i <= 9; i++) {
            xml.append("<!ENTITY l").append(i).append(" \"");
            xml.append(("&l" + (i - 1) + ";").repeat(10)).append("\">");
        }
        xml.append("]><sst xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\"><si><t>&l9;</t></si></sst>");
        return ascii(xml.toString());
    }

    private static byte[] externalEntity() {
        return ascii("<?xml version=\"1.0\"?><!DOCTYPE workbook [<!ENTITY x SYSTEM \"file:///etc/passwd\">]>"
                + "<workbook xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\"><sheets>"
                + "<sheet name=\"&x;\" sheetId=\"1\"/></sheets></workbook>");
    }

    private static byte[] strictNamespace() throws IOException {
        Map<String, byte[]> parts = parts();
        String workbook = new String(parts.get("xl/workbook.xml"), StandardCharsets.UTF_8)
                .replace("http://schemas.openxmlformats.org/spreadsheetml/2006/main",
                        "http://purl.oclc.org/ooxml/spreadsheetml/main");
        parts.put("xl/workbook.xml", ascii(workbook));
        return zip(parts);
    }

    private static byte[] encrypted() throws Exception {
        try (POIFSFileSystem fs = new POIFSFileSystem()) {
            EncryptionInfo info = new EncryptionInfo(EncryptionMode.standard);
            Encryptor encryptor = info.getEncryptor();
            encryptor.confirmPassword("not-the-real-one");
            try (OutputStream out = encryptor.getDataStream(fs)) {
                out.write(valid());
            }
            ByteArrayOutputStream bytes = new ByteArrayOutputStream();
            fs.writeFilesystem(bytes);
            return bytes.toByteArray();
        }
    }

    private static byte[] oldXls() throws IOException {
        try (HSSFWorkbook wb = new HSSFWorkbook()) {
            wb.createSheet("Segments").createRow(0).createCell(0).setCellValue("Point tag");
            ByteArrayOutputStream bytes = new ByteArrayOutputStream();
            wb.write(bytes);
            return bytes.toByteArray();
        }
    }

    /** One part of 70 MiB of zeros: a few tens of kilobytes on disk. */
    private static byte[] zipBomb() throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ZipOutputStream zip = new ZipOutputStream(bytes)) {
            zip.putNextEntry(new ZipEntry("[Content_Types].xml"));
            zip.write(ascii("<Types xmlns=\"http://schemas.openxmlformats.org/package/2006/content-types\"/>"));
            zip.putNextEntry(new ZipEntry("xl/worksheets/sheet1.xml"));
            byte[] zeros = new byte[1 << 20];
            for (int i = 0; i < 70; i++) {
                zip.write(zeros);
            }
        }
        return bytes.toByteArray();
    }

    /**
     * The Segments sheet padded with 20 MiB of spaces: under the reader's own unpack limit, but
     * compressed far beyond POI's minimum inflate ratio, which must stay in force.
     */
    private static byte[] denseSheet() throws IOException {
        Map<String, byte[]> parts = parts();
        String sheet = new String(parts.get(SEGMENTS_PART), StandardCharsets.UTF_8);
        parts.put(SEGMENTS_PART, ascii(sheet.replace("</worksheet>", " ".repeat(20 << 20) + "</worksheet>")));
        return zip(parts);
    }

    private static byte[] manyParts() throws IOException {
        Map<String, byte[]> parts = parts();
        for (int i = 0; i < CableScheduleReader.MAX_PARTS; i++) {
            parts.put("extra/" + i + ".xml", ascii("<x/>"));
        }
        return zip(parts);
    }

    private static byte[] zip(Map<String, byte[]> parts) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ZipOutputStream zip = new ZipOutputStream(bytes)) {
            for (Map.Entry<String, byte[]> part : parts.entrySet()) {
                zip.putNextEntry(new ZipEntry(part.getKey()));
                zip.write(part.getValue());
            }
        }
        return bytes.toByteArray();
    }
}
