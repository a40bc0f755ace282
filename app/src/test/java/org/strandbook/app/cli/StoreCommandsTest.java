package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.Instant;
import java.util.HexFormat;
import java.util.List;
import java.util.OptionalDouble;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.samplesite.DemoPlant;
import org.strandbook.samplesite.DemoSite;
import org.strandbook.schedule.CableScheduleWriter;
import org.strandbook.site.Analyzer;
import org.strandbook.site.DetectorType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.Site;
import org.strandbook.site.Spectrum;
import org.strandbook.site.WavelengthBand;
import org.strandbook.store.Workbook;

/** The workbook commands: init, scans, scan, audit verify; their output, errors and exit codes. */
class StoreCommandsTest {

    private static final Spectrum SPECTRUM = new Spectrum(new double[] {1100.0, 1100.5, 1550.25, 2199.875},
            new double[] {0.00001, 12345.678, -0.5, 1.0E7});

    @TempDir
    Path dir;

    private record Run(int exit, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = StrandbookCommand.newCommandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
        return new Run(exit, out.toString(), err.toString());
    }

    /** A workbook with one invented point and two scans (ids 1 and 2). */
    private Path siteWithScans() throws Exception {
        Path file = dir.resolve("site.sqlite");
        assertEquals(0, run("init", file.toString(), "--site-name", "Fennwick Basin Works", "--user", "r.inglenook").exit());
        try (Workbook wb = Workbook.open(file, "r.inglenook")) {
            wb.site().addAnalyzer(new Analyzer("QA-7", "", 1000, 2200, 4, 18, DetectorType.EXTENDED_INGAAS));
            wb.catalog().addProbeType(new ProbeType("TX-5", "", ProbeKind.TRANSMISSION, "SAPPHIRE", 4, 5, 0.8));
            wb.points().add(new MeasurementPoint("AT-101", "", "", "QA-7", 1, "TX-5",
                    List.of(new WavelengthBand("", 1650, 1800)), OptionalDouble.empty(), false, false, OptionalDouble.empty()));
            wb.scans().insert("AT-101", ScanKind.REFERENCE, Instant.parse("2024-03-05T14:07:00Z"),
                    ScanConditions.unknown("k.ashdown"), SPECTRUM, "ref \"bench\".csv", sha("ref"));
            wb.scans().insert("AT-101", ScanKind.LOOP, Instant.parse("2024-03-05T14:09:30.250Z"),
                    new ScanConditions("k.ashdown", 12.5, 32, OptionalDouble.of(24.0), OptionalDouble.empty()), SPECTRUM,
                    "loop.csv", sha("loop"));
        }
        return file;
    }

    @Test
    void initCreatesAWorkbookAndNeverOverwritesAFile() {
        Path file = dir.resolve("new.sqlite");
        Run first = run("init", file.toString(), "--site-name", "Fennwick Basin Works", "--plant-area", "Unit 3");
        assertEquals(0, first.exit(), first.err());
        assertTrue(first.out().startsWith("created workbook " + file + " for site Fennwick Basin Works"), first.out());
        try (Workbook wb = Workbook.open(file, "x")) {
            assertEquals(new Site("Fennwick Basin Works", "Unit 3", "A", Site.COMMON_PRACTICE_TOLERANCE_DB), wb.site().get());
        }
        Run again = run("init", file.toString(), "--site-name", "Other");
        assertEquals(1, again.exit());
        assertEquals("strandbook: a file already exists at " + file + "; Strandbook never overwrites a file\n",
                again.err());
    }

    @Test
    void initRefusesAWorkbookNamedLikeASpreadsheet() {
        // design choice: a workbook called plant.xlsx is one "export -o plant.xlsx --replace" away from
        // being lost
        Path file = dir.resolve("plant.XLSX");
        Run r = run("init", file.toString(), "--site-name", "Fennwick Basin Works");
        assertEquals(1, r.exit());
        assertEquals("strandbook: a workbook is not a spreadsheet: give " + file + " a name that does not end in .xlsx"
                + " (for example plant.strandbook)\n", r.err());
        assertTrue(Files.notExists(file));
    }

    @Test
    void aRejectedScheduleListsItsProblemsOnStandardErrorAndWritesNothing() throws Exception {
        // README, Exit status: errors go to standard error, the output stays for results
        Path file = dir.resolve("site.sqlite");
        assertEquals(0, run("init", file.toString(), "--site-name", "Saltmarsh Ridge Works").exit());
        Path schedule = dir.resolve("schedule.xlsx");
        CableScheduleWriter.write(DemoSite.schedule(new DemoPlant()), schedule);
        XSSFWorkbook edited;
        try (InputStream in = Files.newInputStream(schedule)) {
            edited = new XSSFWorkbook(in);
        }
        edited.getSheet("Segments").getRow(1).getCell(5).setCellValue("twelve");
        try (OutputStream out = Files.newOutputStream(schedule)) {
            edited.write(out);
        }
        edited.close();
        Run r = run("import-schedule", file.toString(), schedule.toString());
        assertEquals(1, r.exit());
        assertEquals("", r.out());
        assertEquals(List.of("schedule.xlsx: Segments!F2: length must be a number of metres, was 'twelve'",
                "1 problem; nothing was written"), r.err().lines().toList());
    }

    @Test
    void aDamagedPartOfAScheduleGivesOurLineAndNoLibraryLogOnStandardError() throws Exception {
        // the launcher in a process of its own, as a user runs it: the spreadsheet library logs
        // through log4j-api straight to the process's standard error, past the command line's writers
        Path file = dir.resolve("site.sqlite");
        assertEquals(0, run("init", file.toString(), "--site-name", "Saltmarsh Ridge Works").exit());
        Path schedule = dir.resolve("broken.xlsx");
        try (ZipOutputStream zip = new ZipOutputStream(Files.newOutputStream(schedule))) {
            // 0xC3 0x28 is no UTF-8 sequence (RFC 3629, section 3): the XML parser fails at once
            zip.putNextEntry(new ZipEntry("[Content_Types].xml"));
            zip.write(new byte[] {(byte) 0xC3, 0x28, '<', 'T', '/', '>'});
            zip.closeEntry();
        }
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "org.strandbook.app.Launcher",
                "import-schedule", file.toString(), schedule.toString())
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(1, p.waitFor());
        List<String> lines = err.lines().toList();
        assertEquals(2, lines.size(), err);
        assertTrue(lines.get(0).startsWith("broken.xlsx: 'broken.xlsx' could not be read as an XLSX workbook"), err);
        assertEquals("1 problem; nothing was written", lines.get(1));
    }

    @Test
    void theAuditTrailRecordsTheLoginNameWhenNoUserIsGiven() {
        Path file = dir.resolve("who.sqlite");
        assertEquals(0, run("init", file.toString(), "--site-name", "Fennwick Basin Works").exit());
        try (Workbook wb = Workbook.open(file, "x")) {
            assertEquals(System.getProperty("user.name"), wb.audit().entries(0, 1).get(0).user());
        }
    }

    @Test
    void initWithoutASiteNameIsWrongUsage() {
        Run r = run("init", dir.resolve("x.sqlite").toString());
        assertEquals(2, r.exit());
        assertTrue(r.err().contains("--site-name"), r.err());
    }

    @Test
    void scansAsJsonGiveOneObjectPerScanWithEveryListedField() throws Exception {
        Path file = siteWithScans();
        Run r = run("scans", file.toString(), "--json");
        assertEquals(0, r.exit(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("[", lines.get(0));
        assertEquals("]", lines.get(lines.size() - 1));
        assertEquals(4, lines.size());
        String loop = lines.get(2).strip();
        assertEquals("{\"id\":2,\"point\":\"AT-101\",\"kind\":\"loop\",\"taken_at\":\"2024-03-05T14:09:30.250Z\","
                + "\"operator\":\"k.ashdown\",\"integration_ms\":12.5,\"co_added\":32,\"ambient_temperature_c\":24.0,"
                + "\"process_temperature_c\":null,\"n_points\":4,\"min_nm\":1100.0,\"max_nm\":2199.875,"
                + "\"y_unit\":\"\",\"source_file\":\"loop.csv\",\"sha256\":\"" + sha("loop") + "\"}", loop);
        assertTrue(lines.get(1).contains("\"source_file\":\"ref \\\"bench\\\".csv\""), lines.get(1));
    }

    @Test
    void aWrongImportIsRemovedByItsIdAndTheRemovalIsInTheAuditTrail() throws Exception {
        Path file = siteWithScans();
        Run r = run("scans", file.toString(), "--remove", "2");
        assertEquals(0, r.exit(), r.err());
        assertTrue(r.out().contains("removed the loop scan of AT-101"), r.out());
        assertEquals(1, run("scans", file.toString(), "--json").out().lines().filter(l -> l.contains("\"id\"")).count());
        Run verify = run("audit", "verify", file.toString());
        assertEquals(0, verify.exit(), "an audited deletion keeps the trail intact: " + verify.err());
        Run again = run("scans", file.toString(), "--remove", "2");
        assertEquals(1, again.exit());
        assertTrue(again.err().contains("no scan with id 2"), again.err());
    }

    @Test
    void scansAsTextAreAnAlignedTableWithUnitsInTheHeaders() throws Exception {
        Path file = siteWithScans();
        Run r = run("scans", file.toString(), "--point", "at-101");
        assertEquals(0, r.exit(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals(3, lines.size());
        assertTrue(lines.get(0).matches("id\\s+point\\s+kind\\s+taken at \\(UTC\\)\\s+points\\s+min \\(nm\\)\\s+"
                + "max \\(nm\\)\\s+values in\\s+source file\\s+SHA-256 \\(start\\)"), lines.get(0));
        int kindColumn = lines.get(0).indexOf("kind");
        assertEquals("reference", lines.get(1).substring(kindColumn, kindColumn + 9));
        assertEquals("loop", lines.get(2).substring(kindColumn, kindColumn + 4));
        int maxEnd = lines.get(0).indexOf("max (nm)") + "max (nm)".length();
        assertEquals("2199.9", lines.get(2).substring(maxEnd - 6, maxEnd));
    }

    @Test
    void importScansPrintsStoredFilesOnOutputAndRefusalsOnErrorWithNamesEscaped() throws Exception {
        // Strandbook command-line rule: problems go to standard error; ECMA-48 ESC and a newline in a
        // file name must not reach the terminal raw
        Path file = siteWithScans();
        String jcamp = "##TITLE= t\n##JCAMP-DX= 5.01\n##DATA TYPE= INFRARED SPECTRUM\n##XUNITS= NANOMETERS\n"
                + "##YUNITS= COUNTS\n##LONGDATE= 2026/03/01 09:30:00\n##FIRSTX= 1000\n##LASTX= 1009\n##NPOINTS= 10\n"
                + "##XYDATA= (X++(Y..Y))\n1000AJT%jX\n1009c\n##END=\n\u001A";
        Path good = dir.resolve("good\u001B[2J.jdx");
        java.nio.file.Files.writeString(good, jcamp);
        Path bad = dir.resolve("bad\nstored as scan 9.jdx");
        java.nio.file.Files.writeString(bad, jcamp.replace("COUNTS", "ABSORBANCE"));
        Run r = run("import-scans", file.toString(), "--point", "AT-101", "--kind", "loop", good.toString(), bad.toString());
        assertEquals(1, r.exit(), r.err());
        assertTrue(r.out().contains("good\\e[2J.jdx as scan 3") && r.out().contains("tolerated: a DOS end-of-file byte"),
                r.out());
        assertTrue(r.out().lines().noneMatch(l -> l.startsWith("rejected")) && !r.out().contains("\u001B"), r.out());
        assertTrue(r.err().contains("rejected bad\\nstored as scan 9.jdx:5: the values are an absorbance"), r.err());
        Run listing = run("scans", file.toString(), "--point", "AT-101");
        assertTrue(listing.out().lines().anyMatch(l -> l.contains("COUNTS") && l.contains("good\\e[2J.jdx")),
                listing.out());
    }

    @Test
    void importScansRefusesATimeBefore1980AsWrongUsage() throws Exception {
        // design choice (TakenAtRange): a 1970 time is an unset clock
        Path file = siteWithScans();
        Run r = run("import-scans", file.toString(), "--point", "AT-101", "--kind", "loop", "--taken-at",
                "1970-01-01T00:00:00Z", dir.resolve("x.jdx").toString());
        assertEquals(2, r.exit(), r.err());
        assertTrue(r.err().contains("before 1980"), r.err());
    }

    @Test
    void scansOfAnUnknownPointAreRejectedByTag() throws Exception {
        Run r = run("scans", siteWithScans().toString(), "--point", "AT-404");
        assertEquals(1, r.exit());
        assertEquals("strandbook: unknown point tag 'AT-404'\n", r.err());
    }

    @Test
    void scanPrintsTheStoredSpectrumAsCsvThatReadsBackExactly() throws Exception {
        Run r = run("scan", siteWithScans().toString(), "2");
        assertEquals(0, r.exit(), r.err());
        assertEquals("wavelength_nm,value\n1100,0.00001\n1100.5,12345.678\n1550.25,-0.5\n2199.875,10000000\n", r.out());
        List<String> data = r.out().lines().skip(1).toList();
        for (int i = 0; i < data.size(); i++) {
            String[] f = data.get(i).split(",");
            assertEquals(SPECTRUM.wavelengthsNm()[i], Double.parseDouble(f[0]));
            assertEquals(SPECTRUM.values()[i], Double.parseDouble(f[1]));
        }
    }

    @Test
    void scanOfAnUnknownIdIsRejectedAndANonNumericIdIsWrongUsage() throws Exception {
        Path file = siteWithScans();
        Run unknown = run("scan", file.toString(), "99");
        assertEquals(1, unknown.exit());
        assertEquals("strandbook: no scan with id 99 in workbook " + file + "\n", unknown.err());
        assertEquals(2, run("scan", file.toString(), "two").exit());
    }

    @Test
    void aMissingWorkbookIsRejectedWithItsPath() {
        Path file = dir.resolve("nowhere.sqlite");
        for (String[] args : List.of(new String[] {"scans", file.toString()}, new String[] {"scan", file.toString(), "1"},
                new String[] {"audit", "verify", file.toString()})) {
            Run r = run(args);
            assertEquals(1, r.exit(), String.join(" ", args));
            assertEquals("strandbook: no workbook at " + file + "\n", r.err());
        }
        assertTrue(Files.notExists(file));
    }

    @Test
    void aForeignFileIsRejectedAsNoWorkbook() throws Exception {
        Path file = dir.resolve("notes.sqlite");
        Files.writeString(file, "not a database");
        Run r = run("scans", file.toString());
        assertEquals(1, r.exit());
        assertEquals("strandbook: not a Strandbook workbook: " + file + " is not an SQLite database\n", r.err());
    }

    @Test
    void auditVerifyReportsRowsAndHeadWhenWhole() throws Exception {
        Run r = run("audit", "verify", siteWithScans().toString());
        assertEquals(0, r.exit(), r.err());
        assertTrue(r.out().matches("audit trail OK: \\d+ rows, head [0-9a-f]{64}\\n"), r.out());
    }

    @Test
    void auditVerifyNamesTheFirstBrokenRowAndExitsOne() throws Exception {
        Path file = siteWithScans();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            st.execute("DROP TRIGGER audit_entry_append_only_delete");
            st.execute("DELETE FROM audit_entry WHERE id = 3");
        }
        Run r = run("audit", "verify", file.toString());
        assertEquals(1, r.exit());
        assertTrue(r.out().startsWith("audit row 4 breaks the chain: row ids jump from 2 to 4"), r.out());
        assertTrue(r.err().startsWith("strandbook: audit trail of " + file + " is broken"), r.err());
    }

    @Test
    void auditWithoutASubcommandIsWrongUsage() {
        assertEquals(2, run("audit").exit());
    }

    private static String sha(String text) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8)));
    }
}
