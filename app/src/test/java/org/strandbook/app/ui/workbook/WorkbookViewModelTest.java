package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.app.ui.MemoryPreferences;
import org.strandbook.app.ui.plot.SpectrumPlotModel;
import org.strandbook.app.ui.sheet.CellAddress;
import org.strandbook.app.ui.task.DirectTaskExecutor;
import org.strandbook.site.ScanRecord;

/** The window's view model over the in-memory workbook, with jobs run synchronously. */
class WorkbookViewModelTest {

    private static final int LENGTH = 3;

    private InMemoryWorkbookService service;
    private WorkbookViewModel vm;

    @BeforeEach
    void open() {
        service = new InMemoryWorkbookService(DemoWorkbook.create());
        MemoryPreferences preferences = new MemoryPreferences();
        vm = new WorkbookViewModel(service, new DirectTaskExecutor(), new SpectrumPlotModel(preferences),
                new RecentFiles(preferences));
        vm.start();
    }

    @Test
    void startShowsTheFirstPointWithItsRows() {
        assertEquals("RX-101-A", vm.selectedTagProperty().get());
        assertEquals(4, vm.segments().rowCount());
        assertEquals(6, vm.joints().rowCount());
        assertEquals(4, vm.points().rowCount());
    }

    @Test
    void selectingAPointLoadsItsRows() {
        vm.selectPoint("ST-310-R");

        assertEquals("C-310R-01", vm.segments().records().get(0).segment().label());
        assertTrue(vm.pointContextProperty().get().startsWith("ST-310-R"));
    }

    @Test
    void segmentEditIsSavedAndThePointReEvaluated() {
        double before = service.evaluate("RX-101-A", null).predictedLossDb();

        vm.segments().edit(new CellAddress(1, LENGTH), "186");

        assertEquals(186.0, service.loadPoint("RX-101-A").segments().get(1).segment().lengthM());
        // IEC 60793-1-40 attenuation coefficient: +100 m of a fiber whose datasheet gives 6 dB/km
        // at the 1700 nm band centre adds 0.60 dB
        double alpha = service.loadCatalog().fiber("SB-LOH-600").orElseThrow().datasheet().stream()
                .filter(p -> p.wavelengthNm() == 1700).findFirst().orElseThrow().attenuationDbPerKm();
        double after = service.evaluate("RX-101-A", null).predictedLossDb();
        assertEquals(alpha * 0.100, after - before, 1e-9);
        assertTrue(vm.budgetSummaryProperty().get().contains(String.format(Locale.ROOT, "predicted %.2f dB", after)));
    }

    @Test
    void toleranceEditChangesThePointStatusAtOnce() {
        int status = vm.points().columnIndex(PointSheet.STATUS);
        String pass = vm.points().text(new CellAddress(0, status));
        // a tolerance larger than the margin asks for review (Strandbook design choice, MarginVerdict)
        vm.points().edit(new CellAddress(0, vm.points().columnIndex("tolerance")), "9");

        assertEquals("\u2714 PASS", pass);
        assertEquals("\u25B2 REVIEW", vm.points().text(new CellAddress(0, status)));
    }

    @Test
    void hazardousPointAsksForTheSafetyCautionOncePerSession() {
        assertTrue(vm.cautionBeforeRecording().isPresent());
        vm.caution().acknowledge();
        assertTrue(vm.cautionBeforeRecording().isEmpty());
        assertTrue(vm.cautionBeforeLightSource().isEmpty());
    }

    @Test
    void nonHazardousPointRecordsWithoutCaution() {
        vm.selectPoint("DC-205-T");

        assertTrue(vm.cautionBeforeRecording().isEmpty());
        assertTrue(vm.cautionBeforeLightSource().isPresent());
    }

    @Test
    void recordedFileIsListedWithItsSha256(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("loop.jdx");
        Files.writeString(file, "abc", StandardCharsets.US_ASCII);

        vm.recordMeasurement(List.of(file));

        ScanRecord added = service.loadPoint("RX-101-A").scans().get(3);
        // FIPS 180-4 example: SHA-256("abc")
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", added.sha256());
        assertEquals(4, vm.scans().rowCount());
    }

    @Test
    void openingAFileThisBuildCannotReadSaysSo(@TempDir Path dir) {
        vm.open(dir.resolve("elsewhere.strandbook"));

        assertTrue(vm.noticeProperty().get().startsWith("Cannot open elsewhere.strandbook"), vm.noticeProperty().get());
    }

    @Test
    void savedWorkbookIsRememberedAmongRecentFiles(@TempDir Path dir) {
        Path file = dir.resolve("unit3.strandbook");
        vm.saveAs(file);

        assertEquals(List.of(file.toAbsolutePath().normalize()), vm.recentFilesProperty().get());
        assertTrue(vm.titleProperty().get().endsWith("unit3.strandbook"));
    }
}
