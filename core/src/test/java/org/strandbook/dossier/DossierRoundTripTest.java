package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.ConditionalFormattingRule;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.SheetConditionalFormatting;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.PaneInformation;
import org.apache.poi.xddf.usermodel.chart.XDDFChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFScatterChartData;
import org.apache.poi.xssf.usermodel.XSSFChart;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openxmlformats.schemas.drawingml.x2006.chart.CTNumData;
import org.openxmlformats.schemas.drawingml.x2006.chart.CTNumVal;
import org.openxmlformats.schemas.drawingml.x2006.chart.CTValAx;
import org.strandbook.evaluation.BandTrend;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.Contribution;
import org.strandbook.site.WavelengthBand;
import org.strandbook.store.AuditReport;
import org.strandbook.store.Workbook;
import org.strandbook.trend.LossReading;

/**
 * Exports the fixture site once and reads the file back with POI, an independent reader of Office
 * Open XML (ECMA-376), checking every sheet against the workbook records and their evaluation.
 */
class DossierRoundTripTest {

    @TempDir
    static Path dir;

    private static Workbook workbook;
    private static DossierContent content;
    private static DossierSummary summary;
    private static DossierFile file;

    @BeforeAll
    static void export() throws IOException {
        workbook = DossierFixture.create(dir.resolve("site.sqlite"), Map.of());
        content = DossierFixture.content(workbook, DossierScope.everything());
        Path out = dir.resolve("dossier.xlsx");
        summary = DossierWriter.withShippedTemplate().write(content, out, false, DossierProgress.NONE);
        file = new DossierFile(out);
    }

    @AfterAll
    static void close() throws IOException {
        file.close();
        workbook.close();
    }

    private static PointEvaluation evaluation(String tag) {
        return content.points().stream().filter(p -> p.tag().equals(tag)).findFirst().orElseThrow().evaluation()
                .orElseThrow();
    }

    @Test
    void sheetsAppearInReadingOrderWithUnitsInEveryNumberHeader() {
        List<String> names = new ArrayList<>();
        file.workbook().forEach(s -> names.add(s.getSheetName()));
        // the layout as documented on the cover's contents list
        assertEquals(List.of("Cover", "Cautions and method", "Acceptance", "Findings and actions", "Point register",
                "Cable schedule", "Loss budget", "Uncertainty", "Measured vs predicted", "Trend", "Spectra", "Trend history",
                "Audit log"), names);
        for (DossierSheet s : DossierSheet.values()) {
            if (s.layout() != DossierSheet.Layout.TABLE) {
                continue;
            }
            assertEquals(s.columns().stream().map(DossierColumn::header).toList(), file.headers(s.title()), s.title());
            for (DossierColumn c : s.columns()) {
                boolean number = switch (c.format()) {
                    case WHOLE, DECIMAL_1, DECIMAL_2, DECIMAL_3, TIME, DATE -> true;
                    default -> false;
                };
                if (number) {
                    assertTrue(c.header().matches(".*\\(.+\\).*"), () -> s.title() + ": '" + c.header() + "' names no unit");
                }
            }
        }
    }

    @Test
    void coverSaysFinalAndThatNotEveryPointPassed() {
        String cover = file.text("Cover");
        assertAll(
                () -> assertTrue(cover.contains("Document status\tFINAL"), cover),
                // fixture: AT-201 passes, AT-202 fails (3 dB over), AT-203 was never measured (review)
                () -> assertTrue(cover.contains("✖ NOT ALL POINTS PASS: 1 FAIL, 1 REVIEW, 1 PASS of 3"), cover),
                () -> assertTrue(cover.contains("Ashcombe Lane Works")),
                () -> assertTrue(cover.contains("Dossier revision\tB")),
                () -> assertTrue(cover.contains("2025-12-01 09:30 UTC")),
                () -> assertTrue(cover.contains("all 3 points of the workbook")),
                () -> assertTrue(cover.contains("all scans in the workbook")),
                () -> assertTrue(cover.contains("strandbook test")),
                () -> assertFalse(cover.contains("{"), "every placeholder is filled"));
    }

    @Test
    void coverCarriesTheSignOffsAndTheAuditTrailHead() {
        AuditReport report = workbook.audit().verify();
        String cover = file.text("Cover");
        assertTrue(cover.contains("Prepared\tR. Inglenook\t2025-11-30"), cover);
        assertTrue(cover.contains("Checked\t\t\t"), "no checker signed yet: the cells stay empty for a pen");
        assertTrue(cover.contains(report.rows() + " rows; checked when issued: chain whole"), cover);
        assertTrue(cover.contains(report.headHash()), cover);
    }

    @Test
    void cautionsAndMethodStateThePairingRuleAndTheAcceptanceNumbersInForce() {
        String text = file.text("Cautions and method");
        assertAll(
                () -> assertTrue(text.contains("Pairing of scans: " + content.pairingRule() + "."), text),
                () -> assertTrue(text.contains("site default of 1.00 dB")),
                () -> assertTrue(text.contains("less than 50 % of the band")),
                () -> assertTrue(text.contains("exceeds 3 tolerances")),
                () -> assertTrue(text.contains("evaluated on a 2 nm wavelength grid")),
                () -> assertTrue(text.contains("IEC 60079-28")),
                () -> assertFalse(text.contains("{"), "every placeholder is filled"));
    }

    @Test
    void pointRegisterMatchesTheWorkbookRecords() {
        List<Map<String, Cell>> rows = file.rows("Point register");
        assertEquals(List.of("AT-201", "AT-202", "AT-203"), rows.stream().map(r -> DossierFile.string(r, "tag")).toList());
        Map<String, Cell> dirty = rows.get(1);
        assertAll(
                () -> assertEquals("Reactor outlet", DossierFile.string(dirty, "service")),
                () -> assertEquals("QA-9", DossierFile.string(dirty, "analyzer")),
                () -> assertEquals(2, DossierFile.number(dirty, "channel")),
                () -> assertEquals("TX-5", DossierFile.string(dirty, "probe_type")),
                () -> assertEquals("transmission", DossierFile.string(dirty, "probe_kind")),
                () -> assertEquals("C-H 1st overtone: 1650–1800\n1100-1250 nm: 1100–1250", DossierFile.string(dirty, "bands")),
                () -> assertEquals(1.0, DossierFile.number(dirty, "tolerance_db")),
                () -> assertEquals("YES", DossierFile.string(dirty, "hazardous_area")),
                () -> assertEquals("NO", DossierFile.string(dirty, "hydrogen_service")),
                () -> assertEquals(85.0, DossierFile.number(dirty, "process_c")),
                () -> assertEquals(62.0, DossierFile.number(dirty, "send_m")),
                () -> assertEquals(62.0, DossierFile.number(dirty, "return_m")),
                () -> assertEquals("✖ FAIL", DossierFile.string(dirty, "status")));
    }

    @Test
    void cableScheduleListsTheElementsInTheOrderLightMeetsThem() {
        List<Map<String, Cell>> rows = file.rowsOf("Cable schedule", "AT-202");
        assertEquals(List.of("SEND 1 C202-S1", "SEND 2 J1", "SEND 3 C202-S2", "RETURN 1 C202-R1", "RETURN 2 J2",
                "RETURN 3 C202-R2"), rows.stream().map(r -> DossierFile.string(r, "leg") + " "
                + (int) DossierFile.number(r, "position") + " " + DossierFile.string(r, "label")).toList());
        Map<String, Cell> trunk = rows.get(2);
        Map<String, Cell> j2 = rows.get(4);
        assertAll(
                () -> assertEquals(60.0, DossierFile.number(trunk, "length_m")),
                () -> assertEquals("150 mm × 2", DossierFile.string(trunk, "bends")),
                () -> assertEquals(150.0, DossierFile.number(trunk, "tightest_mm")),
                // 200 × the cladding radius of a 440 µm fiber (common practice for the long-term minimum)
                () -> assertEquals(44.0, DossierFile.number(trunk, "min_radius_mm"), 1e-9),
                () -> assertEquals("OK", DossierFile.string(trunk, "bend_check")),
                () -> assertEquals("DIRTY", DossierFile.string(j2, "grade")),
                () -> assertEquals("DIRTY", DossierFile.string(j2, "inspected_grade")),
                () -> assertEquals("T. Okonjo", DossierFile.string(j2, "inspector")),
                () -> assertEquals(0.7, DossierFile.number(j2, "loss_db")),
                () -> assertEquals("MEASURED", DossierFile.string(j2, "loss_basis")));
    }

    @Test
    void lossBudgetElementsAddUpToTheTotalAndTheMarginIsAllowedMinusTotal() {
        // losses in dB of elements in cascade add (the decibel's definition, IEC 60027-3)
        int band = file.keys("Loss budget").get("band_db");
        for (String tag : List.of("AT-201", "AT-202", "AT-203")) {
            XSSFSheet s = file.sheet("Loss budget");
            double[] sum = new double[2];
            double[] total = null;
            double[] allowed = null;
            double[] margin = null;
            int elements = 0;
            for (Row row : s) {
                Cell tagCell = row.getCell(0);
                Cell element = row.getCell(file.keys("Loss budget").get("element"));
                if (row.getRowNum() < DossierFile.FIRST_DATA_ROW || tagCell == null || element == null
                        || !tag.equals(tagCell.getStringCellValue()) || row.getCell(band) == null
                        || row.getCell(band).getCellType() != CellType.NUMERIC) {
                    continue;
                }
                double[] v = {row.getCell(band).getNumericCellValue(), row.getCell(band + 1).getNumericCellValue()};
                String what = element.getStringCellValue();
                if (what.equals(LossBudgetRows.TOTAL)) {
                    total = v;
                } else if (what.startsWith(LossBudgetRows.ALLOWED)) {
                    allowed = v;
                } else if (what.equals(LossBudgetRows.MARGIN)) {
                    margin = v;
                } else {
                    sum[0] += v[0];
                    sum[1] += v[1];
                    elements++;
                }
            }
            assertEquals(7, elements, tag + ": 3 send elements, the probe, 3 return elements");
            for (int b = 0; b < 2; b++) {
                assertEquals(total[b], sum[b], 1e-9, tag);
                assertEquals(18.0, allowed[b], tag);
                assertEquals(allowed[b] - total[b], margin[b], 1e-9, tag);
            }
        }
    }

    @Test
    void lossBudgetShowsEachContributionAtTheCentreOfEachBand() {
        PointEvaluation e = evaluation("AT-201");
        WavelengthGrid grid = e.predicted().grid();
        List<Contribution> parts = e.predicted().contributions();
        List<Map<String, Cell>> rows = file.rowsOf("Loss budget", "AT-201").stream()
                .filter(r -> r.containsKey("kind")).toList();
        assertEquals(parts.size(), rows.size());
        int band = file.keys("Loss budget").get("band_db");
        List<WavelengthBand> bands = DossierFixture.point("AT-201", 1, "").bands();
        for (int k = 0; k < parts.size(); k++) {
            Contribution c = parts.get(k);
            Map<String, Cell> row = rows.get(k);
            assertEquals(c.label(), DossierFile.string(row, "element"));
            assertEquals(c.kind().name(), DossierFile.string(row, "kind"));
            Row sheetRow = row.get("element").getRow();
            for (int b = 0; b < bands.size(); b++) {
                assertEquals(grid.interpolate(c.lossDb(), bands.get(b).centreNm()),
                        sheetRow.getCell(band + b).getNumericCellValue(), 1e-12, c.label());
            }
        }
        assertEquals("PROBE", DossierFile.string(rows.get(3), "leg"));
    }

    @Test
    void spectraHoldTheEvaluationAndShowTheExcessThatWasPutIntoTheScans() {
        PointEvaluation e = evaluation(DossierFixture.DIRTY);
        double[] wl = e.predicted().grid().wavelengthsNm();
        double[] predicted = e.predicted().totalLossDb();
        double[] measured = e.measured().orElseThrow().lossDb();
        List<Map<String, Cell>> rows = file.rowsOf("Spectra", DossierFixture.DIRTY);
        assertEquals(wl.length, rows.size());
        double deviationSum = 0;
        int inBand = 0;
        for (int i = 0; i < wl.length; i++) {
            Map<String, Cell> r = rows.get(i);
            assertEquals(wl[i], DossierFile.number(r, "wavelength_nm"));
            assertEquals(predicted[i], DossierFile.number(r, "predicted_db"), SpectrumColumns.LOSS_STEP_DB);
            if (Double.isNaN(measured[i])) {
                assertFalse(r.containsKey("measured_db"), "a masked wavelength stays empty");
                assertFalse(DossierFile.string(r, "masked").isEmpty(), "and says why");
                continue;
            }
            assertEquals(measured[i], DossierFile.number(r, "measured_db"), SpectrumColumns.LOSS_STEP_DB);
            assertEquals(DossierFile.number(r, "measured_db") - DossierFile.number(r, "predicted_db"),
                    DossierFile.number(r, "deviation_db"), 1.5 * SpectrumColumns.LOSS_STEP_DB);
            if (DossierFile.string(r, "band").equals("C-H 1st overtone")) {
                deviationSum += DossierFile.number(r, "deviation_db");
                inBand++;
            }
        }
        // the fixture made the loop scans with exactly 3 dB more than the prediction, plus detector noise
        assertEquals(DossierFixture.DIRTY_EXCESS_DB, deviationSum / inBand, 0.05);
    }

    @Test
    void spectraCarryThePredictionsCoverageIntervalAroundIt() {
        // JCGM 101:2008, 7.7: a 95 % interval of a loss whose inputs spread both ways holds the estimate
        List<Map<String, Cell>> rows = file.rowsOf("Spectra", DossierFixture.DIRTY);
        for (Map<String, Cell> r : rows) {
            double predicted = DossierFile.number(r, "predicted_db");
            assertTrue(DossierFile.number(r, "predicted_low_db") < predicted
                    && predicted < DossierFile.number(r, "predicted_high_db"), "at " + DossierFile.number(r,
                    "wavelength_nm") + " nm");
        }
    }

    @Test
    void uncertaintySheetListsEveryInputOfEveryBandWithSharesMakingUpTheVariance() {
        // JCGM 100:2008, 5.1.2: u_c²(y) = Σ (cᵢ·u(xᵢ))² for independent inputs, so contributions add in
        // squares to the combined standard uncertainty and the shares of one band sum to 100 %.
        PointEvaluation e = evaluation(DossierFixture.DIRTY);
        List<Map<String, Cell>> rows = file.rowsOf("Uncertainty", DossierFixture.DIRTY);
        for (WavelengthBand band : e.point().bands()) {
            List<Map<String, Cell>> ofBand = rows.stream().filter(r -> DossierFile.string(r, "band").equals(band.name()))
                    .toList();
            List<Map<String, Cell>> inputs = ofBand.stream().filter(r -> r.containsKey("sensitivity")).toList();
            assertFalse(inputs.isEmpty(), band.name());
            double squares = 0;
            double shares = 0;
            for (Map<String, Cell> r : inputs) {
                double contribution = DossierFile.number(r, "contribution_db");
                assertEquals(Math.abs(DossierFile.number(r, "sensitivity")) * DossierFile.number(r, "u"), contribution,
                        1e-9 * Math.max(1, contribution), DossierFile.string(r, "input"));
                assertFalse(DossierFile.string(r, "basis").isBlank());
                assertFalse(DossierFile.string(r, "unit").isBlank());
                squares += contribution * contribution;
                shares += DossierFile.number(r, "share_percent");
            }
            Map<String, Cell> combined = ofBand.stream().filter(r -> DossierFile.string(r, "input")
                    .equals(UncertaintyRows.COMBINED)).findFirst().orElseThrow();
            assertEquals(Math.sqrt(squares), DossierFile.number(combined, "contribution_db"), 1e-9, band.name());
            assertEquals(100, shares, 1e-6, band.name());
            assertTrue(ofBand.stream().anyMatch(r -> DossierFile.string(r, "input").equals(UncertaintyRows.INTERVAL)
                    && DossierFile.string(r, "basis").contains("95 % coverage interval")));
        }
    }

    @Test
    void eachPointHasANativeChartOfItsOwnRowsWithCachedValues() {
        List<XSSFChart> charts = file.sheet("Measured vs predicted").getDrawingPatriarch().getCharts();
        assertEquals(3, charts.size(), "one chart per evaluated point");
        XSSFChart chart = charts.get(1);
        assertEquals("AT-202: measured against predicted loop loss", chart.getTitleText().getString());
        List<CTValAx> axes = List.of(chart.getCTChart().getPlotArea().getValAxArray());
        assertEquals(List.of("Wavelength (nm)", "Loss (dB)"), axes.stream().map(a -> a.getTitle().getTx().getRich()
                .getPArray(0).getRArray(0).getT()).toList());
        XDDFChartData data = chart.getChartSeries().get(0);
        assertEquals(5, data.getSeriesCount());
        List<String> titles = new ArrayList<>();
        List<Map<String, Cell>> rows = file.rowsOf("Spectra", DossierFixture.DIRTY);
        Map<String, Integer> keys = file.keys("Spectra");
        String[] columns = {"predicted_db", "predicted_low_db", "predicted_high_db", "measured_db", "deviation_db"};
        for (int s = 0; s < columns.length; s++) {
            XDDFScatterChartData.Series series = (XDDFScatterChartData.Series) data.getSeries(s);
            titles.add(series.getCTScatterSer().getTx().getV());
            String range = series.getValuesData().getDataRangeReference();
            int[] span = rowsOf(range);
            assertEquals(rows.get(0).get("tag").getRowIndex() + 1, span[0], range);
            assertEquals(rows.get(rows.size() - 1).get("tag").getRowIndex() + 1, span[1], range);
            assertTrue(range.contains("$" + (char) ('A' + keys.get(columns[s])) + "$"), range);
            double[] cachedY = cached(series.getCTScatterSer().getYVal().getNumRef().getNumCache());
            double[] cachedX = cached(series.getCTScatterSer().getXVal().getNumRef().getNumCache());
            assertEquals(rows.size(), cachedY.length, "the cache holds every row");
            assertEquals(rows.size(), cachedX.length);
            for (int i = 0; i < rows.size(); i++) {
                assertEquals(DossierFile.number(rows.get(i), columns[s]), cachedY[i], 0.0, range + " point " + i);
                assertEquals(DossierFile.number(rows.get(i), "wavelength_nm"), cachedX[i], 0.0);
            }
        }
        assertEquals(List.of(DossierCharts.PREDICTED, "Predicted, 95 % coverage interval, low",
                "Predicted, 95 % coverage interval, high", DossierCharts.MEASURED, DossierCharts.DEVIATION), titles);
        assertTrue(summary.chartPoints() > 0);
    }

    /** A series cache by its points' indices; NaN where it holds no point (an empty cell). */
    private static double[] cached(CTNumData cache) {
        double[] out = new double[(int) cache.getPtCount().getVal()];
        java.util.Arrays.fill(out, Double.NaN);
        for (CTNumVal pt : cache.getPtArray()) {
            out[(int) pt.getIdx()] = Double.parseDouble(pt.getV());
        }
        return out;
    }

    private static int[] rowsOf(String range) {
        Matcher m = Pattern.compile("\\$[A-Z]+\\$(\\d+):\\$[A-Z]+\\$(\\d+)").matcher(range);
        assertTrue(m.find(), range);
        return new int[] {Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2))};
    }

    @Test
    void acceptanceWritesEveryStatusAsSymbolAndWordAndColoursItByRule() {
        List<Map<String, Cell>> rows = file.rows("Acceptance");
        assertEquals(List.of("AT-201 ✔ PASS", "AT-201 ✔ PASS", "AT-202 ✖ FAIL", "AT-202 ✖ FAIL", "AT-203 ▲ REVIEW",
                "AT-203 ▲ REVIEW"), rows.stream().map(r -> DossierFile.string(r, "tag") + " "
                + DossierFile.string(r, "band_status")).toList());
        Map<String, Cell> fail = rows.get(2);
        assertEquals(DossierFixture.DIRTY_EXCESS_DB, DossierFile.number(fail, "mean_deviation_db"), 0.05);
        assertTrue(DossierFile.string(fail, "reason").contains("more than predicted on average"));
        assertEquals(18.0, DossierFile.number(fail, "allowed_db"));

        SheetConditionalFormatting cf = file.sheet("Acceptance").getSheetConditionalFormatting();
        int status = file.keys("Acceptance").get("band_status");
        List<String> formulas = new ArrayList<>();
        boolean covered = false;
        for (int i = 0; i < cf.getNumConditionalFormattings(); i++) {
            var f = cf.getConditionalFormattingAt(i);
            for (CellRangeAddress r : f.getFormattingRanges()) {
                if (r.isInRange(fail.get("band_status").getRowIndex(), status)) {
                    covered = true;
                    for (int k = 0; k < f.getNumberOfRules(); k++) {
                        ConditionalFormattingRule rule = f.getRule(k);
                        formulas.add(rule.getFormula1());
                        assertNotNull(rule.getPatternFormatting(), "each rule fills the cell");
                    }
                }
            }
        }
        assertTrue(covered, "the band status column is conditionally formatted down to the written rows");
        assertTrue(formulas.stream().anyMatch(f -> f.contains("✔")) && formulas.stream().anyMatch(f -> f.contains("▲"))
                && formulas.stream().anyMatch(f -> f.contains("✖")), formulas.toString());
    }

    @Test
    void findingsNameTheDirtyJointAndCarryTheFixFromTheNotes() {
        List<Map<String, Cell>> rows = file.rowsOf("Findings and actions", DossierFixture.DIRTY);
        Map<String, Cell> diagnosis = rows.stream().filter(r -> DossierFile.string(r, "source").equals("Diagnosis"))
                .findFirst().orElseThrow();
        assertAll(
                () -> assertEquals("J2", DossierFile.string(diagnosis, "check_first"), "the joint graded dirty"),
                () -> assertEquals("dirty or misaligned connector", DossierFile.string(diagnosis, "cause")),
                () -> assertEquals(DossierFixture.DIRTY_EXCESS_DB, DossierFile.number(diagnosis, "amount_db"), 0.1),
                () -> assertEquals("✖ FAIL", DossierFile.string(diagnosis, "status")));
        assertTrue(rows.stream().anyMatch(r -> DossierFile.string(r, "source").equals("Inspection")
                && DossierFile.string(r, "finding").contains("J2 graded DIRTY")));
        Map<String, Cell> fix = rows.stream().filter(r -> r.containsKey("fix_recorded")).findFirst().orElseThrow();
        assertEquals("cleaned J2 with a click cleaner; re-measure at next visit", DossierFile.string(fix, "fix_recorded"));
        assertEquals("T. Okonjo", DossierFile.string(fix, "fix_by"));
        assertTrue(DossierFile.number(fix, "fix_when") > 45_000, "a date cell");
    }

    @Test
    void trendGivesSlopeForecastAndAChartOfTheHistoryItPlots() {
        PointEvaluation e = evaluation(DossierFixture.GOOD);
        List<Map<String, Cell>> trendRows = file.rowsOf("Trend", DossierFixture.GOOD).stream()
                .filter(r -> r.containsKey("readings")).toList();
        assertEquals(2, trendRows.size(), "one row per band");
        BandTrend first = e.trends().get(0);
        assertEquals(DossierFixture.VISITS, DossierFile.number(trendRows.get(0), "readings"));
        assertEquals(first.trend().orElseThrow().slopeDbPerYear(), DossierFile.number(trendRows.get(0), "slope"), 1e-12);
        assertEquals(100 * first.trend().orElseThrow().confidenceLevel(),
                DossierFile.number(trendRows.get(0), "confidence_percent"), 1e-9);
        assertFalse(DossierFile.string(trendRows.get(0), "outlook").isEmpty());

        List<Map<String, Cell>> history = file.rowsOf("Trend history", DossierFixture.GOOD);
        assertEquals(2 * DossierFixture.VISITS, history.size());
        for (int i = 0; i < DossierFixture.VISITS; i++) {
            LossReading reading = first.readings().get(i);
            assertEquals(reading.lossDb(), DossierFile.number(history.get(i), "loss_db"), SpectrumColumns.LOSS_STEP_DB);
            assertEquals(TableSheet.excelTime(reading.time()), DossierFile.number(history.get(i), "taken"), 1e-9);
        }
        List<XSSFChart> charts = file.sheet("Trend").getDrawingPatriarch().getCharts();
        assertEquals(2, charts.size(), "a chart for each point with readings");
        XDDFChartData data = charts.get(0).getChartSeries().get(0);
        assertEquals(4, data.getSeriesCount(), "readings and Theil–Sen line for each of two bands");
        assertEquals(DossierFixture.VISITS, data.getSeries(0).getValuesData().getPointCount());
        assertTrue(data.getSeries(0).getValuesData().getDataRangeReference().startsWith("'Trend history'!"));
    }

    @Test
    void auditAppendixLetsAnyoneRecomputeTheHashChainFromTheSheet() throws NoSuchAlgorithmException {
        // the chain rule printed on the Cautions and method sheet, with SHA-256 of FIPS 180-4 (JDK MessageDigest)
        List<Map<String, Cell>> rows = file.rows("Audit log");
        AuditReport report = workbook.audit().verify();
        assertEquals(report.rows(), rows.size());
        String previous = "0".repeat(64);
        for (Map<String, Cell> r : rows) {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            field(md, previous);
            field(md, Long.toString((long) DossierFile.number(r, "id")));
            for (String key : List.of("at", "user", "action", "table", "row_key", "old_values", "new_values",
                    "row_sha256")) {
                field(md, r.containsKey(key) ? DossierFile.string(r, key) : null);
            }
            String hash = HexFormat.of().formatHex(md.digest());
            assertEquals(previous, DossierFile.string(r, "prev_hash"));
            assertEquals(hash, DossierFile.string(r, "hash"), "row " + DossierFile.number(r, "id"));
            previous = hash;
        }
        assertEquals(report.headHash(), previous);
    }

    private static void field(MessageDigest md, String value) {
        if (value == null) {
            md.update((byte) '-');
            return;
        }
        byte[] bytes = value.getBytes(StandardCharsets.UTF_8);
        md.update((bytes.length + ":").getBytes(StandardCharsets.US_ASCII));
        md.update(bytes);
    }

    @Test
    void everyTableSheetPrintsLandscapeOnePageWideWithItsHeaderOnEachPage() {
        for (DossierSheet s : DossierSheet.values()) {
            XSSFSheet sheet = file.sheet(s.title());
            String name = s.title();
            assertAll(name,
                    () -> assertTrue(sheet.getFitToPage()),
                    () -> assertEquals(1, sheet.getPrintSetup().getFitWidth()),
                    () -> assertTrue(sheet.getHeader().getLeft().contains("Ashcombe Lane Works")),
                    () -> assertTrue(sheet.getHeader().getCenter().contains("revision B · FINAL")),
                    () -> assertEquals("Page &P of &N", sheet.getFooter().getRight()));
            if (s.layout() == DossierSheet.Layout.TABLE) {
                PaneInformation pane = sheet.getPaneInformation();
                assertAll(name,
                        () -> assertTrue(sheet.getPrintSetup().getLandscape()),
                        () -> assertEquals(0, sheet.getPrintSetup().getFitHeight(), "as many pages long as needed"),
                        () -> assertEquals(CellRangeAddress.valueOf("$1:$3"), sheet.getRepeatingRows()),
                        () -> assertTrue(pane != null && pane.isFreezePane()
                                && pane.getHorizontalSplitPosition() == DossierFile.FIRST_DATA_ROW),
                        () -> assertTrue(sheet.getRow(DossierFile.KEY_ROW).getZeroHeight(), "the key row is hidden"));
            }
        }
    }

    @Test
    void documentPropertiesNameTheDossierItsStatusAndItsMaker() {
        var core = file.workbook().getProperties().getCoreProperties();
        assertAll(
                () -> assertEquals("Commissioning dossier, Ashcombe Lane Works, revision B", core.getTitle()),
                () -> assertTrue(core.getSubject().contains("Fiber-optic light paths")),
                () -> assertEquals("Strandbook", core.getCreator()),
                () -> assertTrue(core.getKeywords().contains("commissioning dossier")),
                () -> assertEquals("FINAL", core.getContentStatus()),
                () -> assertEquals("Commissioning dossier", core.getCategory()));
    }

    @Test
    void noCellAnywhereIsAFormula() {
        XSSFWorkbook wb = file.workbook();
        for (int s = 0; s < wb.getNumberOfSheets(); s++) {
            for (Row row : wb.getSheetAt(s)) {
                for (Cell cell : row) {
                    assertFalse(cell.getCellType() == CellType.FORMULA, cell.getAddress() + " on " + wb.getSheetName(s));
                }
            }
        }
    }
}
