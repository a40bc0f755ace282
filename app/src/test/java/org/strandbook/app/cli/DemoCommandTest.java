package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.samplesite.DemoSite;

/**
 * The README's main command end to end: the demo builds the invented plant through the real import
 * paths, and its summary names every injected fault. Then the evaluate, trend and import commands on
 * the workbook it made.
 */
class DemoCommandTest {

    @TempDir
    static Path dir;

    private static CliRun demo;
    private static Path workbook;

    @BeforeAll
    static void runDemo() {
        demo = CliRun.of("demo", "--out", dir.resolve("demo").toString());
        workbook = dir.resolve("demo").resolve(DemoSite.WORKBOOK_NAME);
    }

    private static String lineOf(String out, String tag) {
        Matcher m = Pattern.compile("(?m)^" + Pattern.quote(tag) + " .*$").matcher(out);
        assertTrue(m.find(), () -> "no summary line for " + tag + " in\n" + out);
        return m.group();
    }

    @Test
    void demoSucceedsAndSaysWhereItsFilesAre() {
        assertEquals(0, demo.exitCode(), demo.err());
        assertTrue(Files.exists(workbook));
        assertTrue(demo.out().contains("324 files under"));
    }

    @Test
    void summaryNamesEachInjectedFault() {
        assertTrue(lineOf(demo.out(), "AT-4102").contains("dirty or misaligned connector"));
        assertTrue(lineOf(demo.out(), "AT-4102").contains("check J2"));
        assertTrue(lineOf(demo.out(), "AT-4103").contains("tight bend or crush"));
        assertTrue(lineOf(demo.out(), "AT-4105").contains("hydrogen darkening"));
        assertTrue(lineOf(demo.out(), "AT-4106").contains("high-OH fiber"));
        assertTrue(lineOf(demo.out(), "AT-4106").contains("check C4106-S1"));
        assertTrue(lineOf(demo.out(), "AT-4108").contains("broken fiber or open connector"));
    }

    @Test
    void healthyPointsPassAsPredicted() {
        for (String tag : new String[] {"AT-4101", "AT-4104", "AT-4107", "AT-4201", "AT-4202"}) {
            String line = lineOf(demo.out(), tag);
            assertTrue(line.contains("✔ PASS") && line.contains("as predicted"), line);
        }
    }

    @Test
    void evaluateJsonCarriesTheDocumentedFields() {
        CliRun r = CliRun.of("evaluate", workbook.toString(), "--point", "AT-4102", "--json");
        assertEquals(0, r.exitCode(), r.err());
        for (String field : new String[] {"\"point\":\"AT-4102\"", "\"status\":\"FAIL\"", "\"worst_band\"",
            "\"margin_db\"", "\"finding\"", "\"loop_scan_id\"", "\"reference_scan_id\"", "\"bands\"",
            "\"mean_deviation_db\"", "\"findings\"", "\"cause\":\"DIRTY_CONNECTOR\"", "\"check_first\":\"J2\"",
            "\"pairing_rule\"", "\"masked\""}) {
            assertTrue(r.out().contains(field), field + " missing in " + r.out());
        }
    }

    @Test
    void evaluateJsonCarriesThePredictionsCoverageIntervalAroundThePrediction() {
        // JCGM 101:2008, 7.7: the interval holds the estimate; its budget names every input with its
        // basis (JCGM 100:2008, 5.1.3).
        CliRun r = CliRun.of("evaluate", workbook.toString(), "--point", "AT-4101", "--json");
        assertEquals(0, r.exitCode(), r.err());
        String band = r.out().substring(r.out().indexOf("\"bands\":[{"));
        double predicted = number(band, "predicted_loss_db");
        double low = number(band, "predicted_low_db");
        double high = number(band, "predicted_high_db");
        assertTrue(low < predicted && predicted < high, low + " < " + predicted + " < " + high);
        assertEquals(0.95, number(band, "coverage"), 1e-12);
        assertTrue(band.contains("\"uncertainty_budget\":[{\"input\":"), band);
        assertTrue(band.contains("connector pair loss") && band.contains("\"basis\":\"FROM_MEMORY\""), band);
    }

    private static double number(String json, String field) {
        int at = json.indexOf("\"" + field + "\":") + field.length() + 3;
        int end = at;
        while (end < json.length() && "-+.0123456789eE".indexOf(json.charAt(end)) >= 0) {
            end++;
        }
        return Double.parseDouble(json.substring(at, end));
    }

    @Test
    void trendRanksTheBrokenAndDarkeningPointsAmongTheFirst() {
        CliRun r = CliRun.of("trend", workbook.toString(), "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("\"slope_db_per_year\""));
        assertTrue(r.out().contains("\"no_light\":[\""), "the broken fiber's dark scans are listed");
        String ranking = r.out().substring(r.out().indexOf("\"ranking\":["), r.out().indexOf(']'));
        assertTrue(ranking.indexOf("AT-4101") > ranking.indexOf("AT-4108"), ranking);
    }

    @Test
    void aTrendRestartedByARepairSaysItsSlopeIsNotYetBounded() {
        // Sen (1968), J. Am. Stat. Assoc. 63, 1379: with two readings there is one pairwise slope and
        // no order statistic to bound it at 95 %; the demo replaces AT-4101's patch cord late in its history
        CliRun r = CliRun.of("trend", workbook.toString(), "--point", "AT-4101");
        assertEquals(0, r.exitCode(), r.err());
        assertFalse(r.out().contains("Infinity"), r.out());
        assertTrue(r.out().contains("too few scans"), r.out());
    }

    @Test
    void theDemosCleaningOfJ5IsTheCauseOfAT4104sStep() {
        // design choice of the demo: J5 dirty (+1.5 to 3 dB, seed-drawn) until the cleaning recorded on
        // 2026-01-12, between the fifth and sixth visits
        CliRun r = CliRun.of("trend", workbook.toString(), "--point", "AT-4104");
        assertEquals(0, r.exitCode(), r.err());
        Matcher step = Pattern.compile("step of -(\\d+\\.\\d+) dB between 2025-11-03\\S* and 2026-02-02\\S*; "
                + "\u2212\\d+\\.\\d dB after J5 was cleaned on 2026-01-12").matcher(r.out());
        assertTrue(step.find(), r.out());
        double stepDb = Double.parseDouble(step.group(1));
        assertTrue(stepDb >= 1.2 && stepDb <= 3.3, "the injected 1.5 to 3 dB, give or take re-mating scatter: "
                + stepDb);
    }

    @Test
    void aForecastRestartedByTheCleaningGivesNoDateBeforeTheLastScan() {
        // Sen (1968), J. Am. Stat. Assoc. 63, 1379: four readings since the cleaning do not bound the
        // slope at 95 %, so there is no earliest date; any date given lies after the last visit (2026-11-02)
        CliRun r = CliRun.of("trend", workbook.toString(), "--point", "AT-4104", "--json");
        assertEquals(0, r.exitCode(), r.err());
        Matcher dates = Pattern.compile("\"(expected|earliest|latest)_date\":\"(\\d{4}-\\d{2}-\\d{2})\"")
                .matcher(r.out());
        while (dates.find()) {
            assertTrue(dates.group(2).compareTo("2026-11-02") > 0, dates.group() + " in " + r.out());
        }
    }

    @Test
    void theDossierSaysWhatWasDoneAboutAT4104sDirtyJoint() throws Exception {
        Path dossier = dir.resolve("demo").resolve("saltmarsh-ridge-dossier.xlsx");
        try (org.apache.poi.xssf.usermodel.XSSFWorkbook x = new org.apache.poi.xssf.usermodel.XSSFWorkbook(
                Files.newInputStream(dossier))) {
            StringBuilder text = new StringBuilder();
            x.forEach(sheet -> sheet.forEach(row -> row.forEach(cell -> text.append(cell.toString()).append('\n'))));
            assertTrue(text.toString().contains("after J5 was cleaned on 2026-01-12"), "no attributed step in the dossier");
        }
    }

    @Test
    void importingTheSameScanFileTwiceIsRefused() throws Exception {
        Path file;
        try (var files = Files.list(dir.resolve("demo").resolve("scans").resolve("AT-4101"))) {
            file = files.filter(f -> f.toString().endsWith("loop.jdx")).findFirst().orElseThrow();
        }
        CliRun r = CliRun.of("import-scans", workbook.toString(), "--point", "AT-4101", "--kind", "loop", file.toString());
        assertEquals(1, r.exitCode());
        // refusals go to standard error (Strandbook command-line rule)
        assertTrue(r.err().contains("already stored as scan"), r.err());
    }

    @Test
    void aBadScanFileIsRejectedWithFileAndLine() throws Exception {
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "Wavelength (nm);Counts\n1000;12\n1002;abc\n");
        CliRun r = CliRun.of("import-scans", workbook.toString(), "--point", "AT-4101", "--kind", "dark", bad.toString());
        assertEquals(1, r.exitCode());
        assertTrue(r.err().contains("bad.csv:3:"), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void unknownKindIsWrongUsage() {
        CliRun r = CliRun.of("import-scans", workbook.toString(), "--point", "AT-4101", "--kind", "lamp", "x.jdx");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("use loop, reference or dark"), r.err());
    }

    @Test
    void unknownPointIsRejected() {
        CliRun r = CliRun.of("evaluate", workbook.toString(), "--point", "NOPE-1");
        assertEquals(1, r.exitCode());
        assertTrue(r.err().contains("no point tagged 'NOPE-1'"), r.err());
    }

    @Test
    void evaluateJsonSaysWhenAnAmountIsOnlyALowerBound() {
        // the demo's high-OH cord holds over 1 ppm·km of OH: ≥ 60 dB at 1383 nm (62.7 dB/km/ppm, Humbach et
        // al., J. Non-Cryst. Solids 203, 19 (1996)), beyond any lamp, so the band is dark and the amount a bound
        CliRun r = CliRun.of("evaluate", workbook.toString(), "--point", "AT-4106", "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("\"cause\":\"HIGH_OH_FIBER\""), r.out());
        assertTrue(r.out().contains("\"amount_at_least\":true"), r.out());
        assertTrue(r.out().contains("1383 nm is dark"), r.out());
    }
}
