package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.server.LocalPostgres;
import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/**
 * `strandbook fleet` over two sites on one real PostgreSQL server: the demo plant's points as the
 * laptop evaluated them at its sync, and a second site with nothing evaluable yet.
 */
class FleetCommandTest {

    private static final String TECH = "fleet_tech";

    @TempDir
    static Path dir;

    private static String url;
    private static CliRun demoSync;

    @BeforeAll
    static void twoSitesSynced() {
        url = LocalPostgres.shared().newPlantServer(TECH);
        Path demo = DemoWorkbook.create(dir.resolve("saltmarsh.strandbook"), List.of("AT-4101", "AT-4103"), 2);
        demoSync = CliRun.of("sync", demo.toString(), "--server", url, "--server-user", TECH);
        Path other = dir.resolve("fennwick.strandbook");
        try (Workbook wb = Workbook.create(other, DemoSite.site(), "k.ashdown")) {
            DemoSite.populate(wb);
        }
        CliRun second = CliRun.of("sync", other.toString(), "--server", url, "--server-user", TECH);
        assertEquals(0, second.exitCode(), second.err());
    }

    @Test
    void aSyncReportsEachPointsStatusOnceAndNotAgainWhenNothingChanged() {
        assertEquals(0, demoSync.exitCode(), demoSync.err());
        assertTrue(demoSync.out().contains("reported the status of 2 point(s)"), demoSync.out());
        CliRun again = CliRun.of("sync", dir.resolve("saltmarsh.strandbook").toString(), "--server", url,
                "--server-user", TECH, "--json");
        assertTrue(again.out().contains("\"statuses_reported\":0"), again.out());
    }

    @Test
    void fleetCountsEachSitesPointsAndRanksEveryPoint() {
        CliRun run = CliRun.of("fleet", "--server", url, "--server-user", TECH, "--json", "--since", "2000-01-01");
        assertEquals(0, run.exitCode(), run.err());
        String json = run.out();
        // the second site's points have no scans yet: the evaluation says REVIEW, not measured
        assertTrue(json.contains("{\"site\":\"Fennwick Basin Works\",\"pass\":0,\"review\":2,\"fail\":0,"
                + "\"not_evaluated\":0,"), json);
        assertTrue(json.contains("\"site\":\"Saltmarsh Ridge Works\""), json);
        // four points in all, the failed one first (the workbook's own urgency order, Urgency.rank)
        assertEquals(4, json.split("\"evaluated_at\"").length - 1, json);
        assertTrue(json.contains("\"ranking\":[{\"site\":\"Saltmarsh Ridge Works\",\"point\":\"AT-4103\","
                + "\"status\":\"FAIL\""), json);
        assertTrue(json.contains("\"before\":null"), "no point had a status in 2000: " + json);
    }

    @Test
    void aServerWithNoSiteTheLoginMayReadSaysSoRatherThanPrintingAnEmptyTable() {
        // design choice: an empty answer says why, as every refusal does
        String empty = LocalPostgres.shared().newPlantServer(TECH);
        CliRun run = CliRun.of("fleet", "--server", empty, "--server-user", TECH);
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().startsWith("no site on this server that your login may read"), run.out());
    }

    @Test
    void theLastSyncReadsToTheMinuteInUtc() {
        CliRun run = CliRun.of("fleet", "--server", url, "--server-user", TECH);
        assertTrue(run.out().matches("(?s).*Saltmarsh Ridge Works +\\d+ +\\d+ +\\d+ +\\d+ +\\d{4}-\\d{2}-\\d{2}"
                + " \\d{2}:\\d{2}\\n.*"), run.out());
    }

    @Test
    void aDateAloneAfterSinceMeansFromTheStartOfThatDayInUtc() {
        // design choice: "changed since 2000-01-01" includes the whole of that day, unlike a record's
        // date alone, which is noon so that it falls on the same day in every time zone
        CliRun run = CliRun.of("fleet", "--server", url, "--server-user", TECH, "--since", "2000-01-01");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("status changed since 2000-01-01T00:00:00Z: 4 point(s)"), run.out());
        assertTrue(run.out().contains(": first reported FAIL ("), run.out());
    }

    @Test
    void fleetExportWritesTheSameViewAsASpreadsheet() throws Exception {
        Path xlsx = dir.resolve("fleet.xlsx");
        CliRun run = CliRun.of("fleet", "export", "--server", url, "--server-user", TECH, "-o", xlsx.toString());
        assertEquals(0, run.exitCode(), run.err());
        try (InputStream in = Files.newInputStream(xlsx); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            Sheet sites = wb.getSheet("Sites");
            assertEquals("Not evaluated (points)", sites.getRow(0).getCell(4).getStringCellValue());
            assertEquals(2, sites.getLastRowNum());
            Sheet ranking = wb.getSheet("Urgency");
            assertEquals("Margin (dB)", ranking.getRow(0).getCell(5).getStringCellValue());
            assertEquals(4, ranking.getLastRowNum());
            assertEquals(1.0, ranking.getRow(1).getCell(0).getNumericCellValue());
            // printed as the dossier is (design choice): a ranking row is never cut over two pages
            for (Sheet s : wb) {
                assertTrue(s.getPrintSetup().getLandscape() && s.getFitToPage(), s.getSheetName());
                assertEquals(1, s.getPrintSetup().getFitWidth(), s.getSheetName());
            }
        }
        CliRun onWorkbook = CliRun.of("fleet", "export", "--server", url, "--server-user", TECH, "-o",
                dir.resolve("saltmarsh.strandbook").toString(), "--replace");
        assertEquals(1, onWorkbook.exitCode());
        assertTrue(onWorkbook.err().contains("SQLite database"), onWorkbook.err());
    }
}
