package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.samplesite.ScanGenerator;

/**
 * {@code strandbook export}: the dossier of a demo-plant workbook (two points, four visits), its
 * scope options, and the refusals: exit 1 for input the workbook rejects, 2 for wrong usage.
 */
class ExportCommandTest {

    static final List<String> POINTS = List.of("AT-4101", "AT-4102");

    @TempDir
    static Path shared;

    @TempDir
    Path dir;

    private static Path site;

    @BeforeAll
    static void demo() {
        site = DemoWorkbook.create(shared.resolve("saltmarsh.sqlite"), POINTS, 4);
    }

    @Test
    void exportWritesTheDossierAndSaysWhatItHolds() throws IOException {
        Path out = dir.resolve("dossier.xlsx");
        CliRun run = CliRun.of("export", site.toString(), "-o", out.toString(), "--user", "k.lindqvist");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().startsWith("wrote dossier " + out + ": 2 point(s): "), run.out());
        assertTrue(run.out().contains("13 sheets, 4 charts; revision A, audit head "), run.out());
        try (XSSFWorkbook wb = open(out)) {
            assertEquals(13, wb.getNumberOfSheets());
            assertEquals(POINTS, column(wb.getSheet("Point register"), 0));
            assertEquals("FINAL", wb.getProperties().getCoreProperties().getContentStatus());
            // the generator dirties AT-4102's junction-box joint J2 by 1.5 to 3 dB, over the 1 dB tolerance
            assertTrue(rowsOf(wb.getSheet("Acceptance"), "AT-4102").stream().allMatch(r -> r.contains("✖ FAIL")),
                    rowsOf(wb.getSheet("Acceptance"), "AT-4102").toString());
            assertTrue(rowsOf(wb.getSheet("Findings and actions"), "AT-4102").get(0).contains("\tJ2\t"),
                    "the first finding sends the crew to J2");
        }
    }

    @Test
    void pointsAndDatesNarrowTheScope() throws IOException {
        Path out = dir.resolve("dossier.xlsx");
        String firstVisit = ScanGenerator.COMMISSIONING.toString().substring(0, 10);
        CliRun run = CliRun.of("export", site.toString(), "-o", out.toString(), "--points", "AT-4102",
                "--to", firstVisit);
        assertEquals(0, run.exitCode(), run.err());
        try (XSSFWorkbook wb = open(out)) {
            assertEquals(List.of("AT-4102"), column(wb.getSheet("Point register"), 0));
            assertEquals(2, column(wb.getSheet("Trend history"), 0).size(), "one reading for each of its two bands");
            assertTrue(cover(wb).contains("scans taken up to " + firstVisit), cover(wb));
        }
    }

    @Test
    void anExistingFileIsKeptUnlessReplaceIsGiven() throws IOException {
        Path out = dir.resolve("dossier.xlsx");
        Files.writeString(out, "revision 0", StandardCharsets.UTF_8);
        CliRun refused = CliRun.of("export", site.toString(), "-o", out.toString());
        assertEquals(1, refused.exitCode());
        assertEquals("strandbook: a file already exists at " + out + "; add --replace to replace it\n", refused.err());
        assertEquals("revision 0", Files.readString(out, StandardCharsets.UTF_8));
        CliRun replaced = CliRun.of("export", site.toString(), "-o", out.toString(), "--replace");
        assertEquals(0, replaced.exitCode(), replaced.err());
        try (XSSFWorkbook wb = open(out)) {
            assertEquals(13, wb.getNumberOfSheets());
        }
    }

    @Test
    void anExportNeverReplacesAWorkbookWhateverItIsCalled() throws IOException {
        // a workbook copied under a dossier's name: its content, not its name, keeps it; a workbook is
        // an SQLite file, known by its header string (sqlite.org/fileformat.html, section 1.3)
        Path workbookCopy = dir.resolve("plant.xlsx");
        Files.copy(site, workbookCopy);
        byte[] before = Files.readAllBytes(workbookCopy);
        CliRun run = CliRun.of("export", site.toString(), "-o", workbookCopy.toString(), "--replace");
        assertEquals(1, run.exitCode());
        assertEquals("strandbook: " + workbookCopy + " is an SQLite database, perhaps a Strandbook workbook; a dossier"
                + " never replaces one, so it was left as it is\n", run.err());
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(workbookCopy)), "the workbook is untouched");
    }

    @Test
    void anUnknownPointIsRejectedByNameAndNothingIsWritten() {
        Path out = dir.resolve("dossier.xlsx");
        CliRun run = CliRun.of("export", site.toString(), "-o", out.toString(), "--points", "AT-4101,XX-9");
        assertEquals(1, run.exitCode());
        assertEquals("strandbook: no point tagged 'XX-9' in this workbook\n", run.err());
        assertTrue(Files.notExists(out));
    }

    @Test
    void aMissingWorkbookIsRejected() {
        CliRun run = CliRun.of("export", dir.resolve("none.sqlite").toString(), "-o", dir.resolve("d.xlsx").toString());
        assertEquals(1, run.exitCode());
        assertTrue(run.err().startsWith("strandbook: "), run.err());
        assertEquals(1, run.err().lines().count(), "one line, no stack trace");
    }

    @Test
    void wrongUsageExitsWithTwo() {
        String out = dir.resolve("d.xlsx").toString();
        assertEquals(2, CliRun.of("export", site.toString()).exitCode(), "-o is required");
        assertEquals(2, CliRun.of("export", site.toString(), "-o", dir.resolve("d.pdf").toString()).exitCode());
        assertEquals(2, CliRun.of("export", site.toString(), "-o", out, "--from", "2025-13-01").exitCode());
        CliRun backwards = CliRun.of("export", site.toString(), "-o", out, "--from", "2025-02-01", "--to", "2025-01-01");
        assertEquals(2, backwards.exitCode());
        assertEquals("strandbook: --from 2025-02-01 is after --to 2025-01-01\n", backwards.err());
    }

    private static XSSFWorkbook open(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return new XSSFWorkbook(in);
        }
    }

    /** The texts of one column below the template's three rows. */
    private static List<String> column(XSSFSheet sheet, int column) {
        List<String> out = new ArrayList<>();
        for (Row row : sheet) {
            Cell c = row.getCell(column);
            if (row.getRowNum() >= 3 && c != null && c.getCellType() == CellType.STRING) {
                out.add(c.getStringCellValue());
            }
        }
        return out;
    }

    /** The rows of a point as tab-separated texts. */
    private static List<String> rowsOf(XSSFSheet sheet, String tag) {
        List<String> out = new ArrayList<>();
        for (Row row : sheet) {
            Cell first = row.getCell(0);
            if (row.getRowNum() >= 3 && first != null && first.toString().equals(tag)) {
                StringBuilder b = new StringBuilder();
                row.forEach(c -> b.append(c).append('\t'));
                out.add(b.toString());
            }
        }
        return out;
    }

    private static String cover(XSSFWorkbook wb) {
        StringBuilder b = new StringBuilder();
        wb.getSheet("Cover").forEach(r -> r.forEach(c -> b.append(c).append('\t')));
        return b.toString();
    }
}
