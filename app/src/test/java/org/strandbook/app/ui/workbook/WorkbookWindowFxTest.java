package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.ExecutionException;

import javafx.scene.chart.XYChart;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TableCell;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.app.ui.path.LegSegment;
import org.strandbook.app.ui.path.SegmentSheet;
import org.strandbook.app.ui.sheet.CellAddress;
import org.strandbook.app.ui.sheet.CellRange;
import org.strandbook.app.ui.sheet.SheetModel;
import org.testfx.api.FxRobot;
import org.testfx.api.FxToolkit;
import org.testfx.robot.Motion;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The real window on a copy of the sample site, headless on Monocle, driven by keys, clicks and
 * the system clipboard as a technician drives it; background jobs run synchronously. Spreadsheet
 * behaviour that users know from spreadsheet programs (a paste is all or nothing, fill down copies
 * the top cell, Ctrl+Z/Ctrl+Y) is a design choice.
 */
@ExtendWith(SampleSite.Resolver.class)
class WorkbookWindowFxTest {

    private static final int SEGMENTS_TAB = 1;
    private static SampleSite sample;
    private static HeadlessWindow shown;
    private static WorkbookViewModel vm;
    private static WorkbookWindow window;
    private static Stage stage;

    private final FxRobot robot = new FxRobot();
    @TempDir
    Path dir;
    private SheetModel<LegSegment> segments;

    /** One window for the class: building and showing it is most of what a test would otherwise cost. */
    @BeforeAll
    static void window(SampleSite built) throws Exception {
        sample = built;
        shown = HeadlessWindow.show(built, "technician C");
        stage = shown.stage();
        vm = shown.vm();
        window = shown.window();
    }

    /** Each test works on its own copy of the sample workbook, with AT-4102's segments in front. */
    @BeforeEach
    void openCopy() {
        Path copy = sample.workbookCopy(dir);
        robot.interact(() -> {
            vm.open(copy);
            vm.selectPoint("AT-4102");
            window.tabs().getSelectionModel().select(SEGMENTS_TAB);
        });
        segments = vm.point().segments();
    }

    /** Closes what a test left open (the record dialog) and the workbook, so the temporary folder can go. */
    @AfterEach
    void closeDialogsAndWorkbook() {
        shown.closeDialogsAndWorkbook(robot);
    }

    @AfterAll
    static void hide() throws Exception {
        FxToolkit.hideStage();
    }

    private TableCell<?, ?> cell(String sheet, int row, String columnKey) {
        return robot.lookup("#" + sheet + " .table-cell").queryAll().stream()
                .map(n -> (TableCell<?, ?>) n)
                .filter(c -> c.getIndex() == row && c.getTableColumn() != null && columnKey.equals(c.getTableColumn().getId()))
                .findFirst().orElseThrow(() -> new AssertionError("no cell " + columnKey + " in row " + row));
    }

    /** Puts the keyboard on one cell as a click would, without walking the mouse across the window. */
    private void focusCell(int row, String columnKey) {
        robot.interact(() -> {
            int column = segments.columnIndex(columnKey);
            window.segmentsView().select(new CellRange(row, column, row, column));
            window.segmentsView().table().requestFocus();
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    private static void putOnClipboard(String text) throws ExecutionException, InterruptedException {
        WaitForAsyncUtils.asyncFx(() -> {
            ClipboardContent content = new ClipboardContent();
            content.putString(text);
            Clipboard.getSystemClipboard().setContent(content);
        }).get();
    }

    private void shortcut(KeyCode... keys) {
        KeyCode[] all = new KeyCode[keys.length + 1];
        all[0] = KeyCode.CONTROL;
        System.arraycopy(keys, 0, all, 1, keys.length);
        robot.push(all);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private double lengthM(int row) {
        return segments.records().get(row).segment().lengthM();
    }

    private String status() {
        return robot.lookup("#segments-sheet-status").queryAs(Label.class).getText();
    }

    /** The drawn predicted round trip (the plot's first line) at its first point, dB. */
    private double plottedLossDb() {
        XYChart.Series<Number, Number> total = window.budgetPlot().chart().getData().get(0);
        return total.getData().get(0).getYValue().doubleValue();
    }

    private String pointsCell(String columnKey) {
        int row = vm.points().records().stream().map(p -> p.tag()).toList().indexOf("AT-4102");
        return vm.points().text(new CellAddress(row, vm.points().columnIndex(columnKey)));
    }

    @Test
    void typingALengthUpdatesTheComputedLossesAndThePlot() {
        String segmentLoss = cell("segments-sheet", 1, SegmentSheet.LOSS).getText();
        String pointLoss = pointsCell(PointSheet.PREDICTED);
        double plotted = plottedLossDb();

        robot.clickOn(cell("segments-sheet", 1, "length"), Motion.DIRECT);
        robot.write("2500");
        robot.push(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();

        assertEquals(2500.0, lengthM(1));
        assertNotEquals(segmentLoss, cell("segments-sheet", 1, SegmentSheet.LOSS).getText());
        assertNotEquals(pointLoss, pointsCell(PointSheet.PREDICTED));
        // more fiber loses more light at every wavelength, the first one plotted included
        assertTrue(plottedLossDb() > plotted, plotted + " then " + plottedLossDb());
        assertEquals(2, window.segmentsView().table().getFocusModel().getFocusedCell().getRow());
    }

    @Test
    void threeByTwoBlockPastesFromTheClipboard() throws Exception {
        putOnClipboard("LOH-400\t120\nLOH-400\t80,5\nLOH-600\t40\r\n");
        focusCell(0, "fiber");
        shortcut(KeyCode.V);

        List<String> fibers = segments.records().subList(0, 3).stream().map(s -> s.segment().fiberTypeCode()).toList();
        assertEquals(List.of("LOH-400", "LOH-400", "LOH-600"), fibers);
        assertEquals(List.of(120.0, 80.5, 40.0), List.of(lengthM(0), lengthM(1), lengthM(2)));
    }

    @Test
    void blockWithOneBadCellPastesNothingAndShowsTheReason() throws Exception {
        List<LegSegment> before = segments.records();
        putOnClipboard("120\n-5\n30\n");
        focusCell(0, "length");
        shortcut(KeyCode.V);

        assertEquals(before, segments.records());
        assertEquals("Nothing pasted: D2 Length (m): must be more than 0 m, was -5", status());
        assertTrue(cell("segments-sheet", 1, "length").getText().startsWith("\u26A0"), "the refused cell carries a marker");
    }

    @Test
    void undoAndRedoFollowCtrlZAndCtrlY() {
        double original = lengthM(0);
        focusCell(0, "length");
        robot.write("7");
        robot.push(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(7.0, lengthM(0));

        shortcut(KeyCode.Z);
        assertEquals(original, lengthM(0));
        shortcut(KeyCode.Y);
        assertEquals(7.0, lengthM(0));
        shortcut(KeyCode.Z);
        shortcut(KeyCode.SHIFT, KeyCode.Z);
        assertEquals(7.0, lengthM(0));
    }

    @Test
    void fillDownCopiesTheTopCellIntoTheCellsBelow() {
        double top = lengthM(0);
        focusCell(0, "length");
        robot.press(KeyCode.SHIFT).type(KeyCode.DOWN, 2).release(KeyCode.SHIFT);
        shortcut(KeyCode.D);

        assertEquals(List.of(top, top, top), List.of(lengthM(0), lengthM(1), lengthM(2)));
        assertTrue(status().startsWith("Fill down D1:D3"), status());
    }

    @Test
    void scanImportedThroughTheDialogFillsTheProgressBar() throws Exception {
        Path scan = sample.newLoopScan("AT-4202", dir, 11);
        robot.interact(() -> vm.selectPoint("AT-4202"));
        int before = vm.point().scans().rowCount();
        ScanImportViewModel importer = WaitForAsyncUtils.asyncFx(() -> window.recordMeasurement().orElseThrow()).get();
        robot.interact(() -> importer.addFiles(List.of(scan)));

        robot.clickOn("#scan-import-start", Motion.DIRECT);
        WaitForAsyncUtils.waitForFxEvents();

        assertEquals(1.0, robot.lookup("#scan-import-progress").queryAs(ProgressBar.class).getProgress());
        assertEquals("Stored 1 of 1 file for AT-4202", robot.lookup("#scan-import-message").queryAs(Label.class).getText());
        assertEquals(before + 1, vm.point().scans().rowCount());
    }

    @Test
    void wavenumberToggleRelabelsAndRescalesThePlots() {
        robot.clickOn("#plot-axis-cm", Motion.DIRECT);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Wavenumber (cm\u207B\u00B9)", window.budgetPlot().chart().getXAxis().getLabel());
        assertEquals("Wavenumber (cm\u207B\u00B9)", window.measuredPlot().chart().getXAxis().getLabel());
        // the analyzer's 1000–2500 nm is 4000–10 000 cm⁻¹ (ISO 80000-7: wavenumber = 1/λ)
        double firstX = window.budgetPlot().chart().getData().get(0).getData().get(0).getXValue().doubleValue();
        assertEquals(4000, firstX, 1e-6);

        robot.clickOn("#plot-axis-nm", Motion.DIRECT);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Wavelength (nm)", window.budgetPlot().chart().getXAxis().getLabel());
    }
}
