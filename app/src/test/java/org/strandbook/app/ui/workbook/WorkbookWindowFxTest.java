package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.ExecutionException;

import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.strandbook.app.ui.MemoryPreferences;
import org.strandbook.app.ui.plot.SpectrumPlotModel;
import org.strandbook.app.ui.sheet.CellRange;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.app.ui.task.DirectTaskExecutor;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.robot.Motion;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The real window, headless on Monocle, driven by keys and the system clipboard as a technician
 * drives it. The in-memory workbook stands behind it and jobs run synchronously.
 */
@ExtendWith(ApplicationExtension.class)
class WorkbookWindowFxTest {

    private static final int SEGMENTS_TAB = 1;

    private WorkbookWindow window;
    private SheetModel<LegSegment> segments;

    @Start
    void start(Stage stage) {
        MemoryPreferences preferences = new MemoryPreferences();
        WorkbookViewModel vm = new WorkbookViewModel(new InMemoryWorkbookService(DemoWorkbook.create()),
                new DirectTaskExecutor(), new SpectrumPlotModel(preferences), new RecentFiles(preferences));
        window = new WorkbookWindow(stage, vm);
        window.plotView().chart().setAnimated(false);
        // a small stage renders fast in software; the window's own minimum size still applies
        stage.setWidth(960);
        stage.setHeight(600);
        stage.show();
        vm.start();
        window.tabs().getSelectionModel().select(SEGMENTS_TAB);
        segments = vm.segments();
    }

    private TableCell<?, ?> cell(FxRobot robot, int row, String columnKey) {
        return robot.lookup("#segments-sheet .table-cell").queryAll().stream()
                .map(n -> (TableCell<?, ?>) n)
                .filter(c -> c.getIndex() == row && c.getTableColumn() != null && columnKey.equals(c.getTableColumn().getId()))
                .findFirst().orElseThrow(() -> new AssertionError("no cell " + columnKey + " in row " + row));
    }

    /** Puts the keyboard on one cell as a click would, without walking the mouse across the window. */
    private void focusCell(FxRobot robot, int row, String columnKey) {
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

    private static void shortcut(FxRobot robot, KeyCode... keys) {
        KeyCode[] all = new KeyCode[keys.length + 1];
        all[0] = KeyCode.CONTROL;
        System.arraycopy(keys, 0, all, 1, keys.length);
        robot.push(all);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private double lengthM(int row) {
        return segments.records().get(row).segment().lengthM();
    }

    private String status(FxRobot robot) {
        return robot.lookup("#segments-sheet-status").queryAs(Label.class).getText();
    }

    @Test
    void typingALengthAndEnterUpdatesTheComputedLoss(FxRobot robot) {
        // the demo fiber's datasheet gives 6 dB/km at the 1700 nm band centre; IEC 60793-1-40
        // attenuation coefficient × length: 6 dB/km × 0.250 km = 1.50 dB
        robot.clickOn(cell(robot, 1, "length"), Motion.DIRECT);
        robot.write("250");
        robot.push(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();

        assertEquals(250.0, lengthM(1));
        assertEquals("1.50", cell(robot, 1, "fiberLossDb").getText());
        assertEquals(2, window.segmentsView().table().getFocusModel().getFocusedCell().getRow());
    }

    @Test
    void threeByTwoBlockPastesFromTheClipboard(FxRobot robot) throws Exception {
        putOnClipboard("SB-LOH-400\t120\nSB-LOH-400\t80,5\nSB-LOH-600\t40\r\n");
        focusCell(robot, 0, "fiber");
        shortcut(robot, KeyCode.V);

        List<String> fibers = segments.records().subList(0, 3).stream().map(s -> s.segment().fiberTypeCode()).toList();
        assertEquals(List.of("SB-LOH-400", "SB-LOH-400", "SB-LOH-600"), fibers);
        assertEquals(List.of(120.0, 80.5, 40.0), List.of(lengthM(0), lengthM(1), lengthM(2)));
    }

    @Test
    void blockWithOneBadCellPastesNothingAndShowsTheReason(FxRobot robot) throws Exception {
        List<LegSegment> before = segments.records();
        putOnClipboard("120\n-5\n30\n");
        focusCell(robot, 0, "length");
        shortcut(robot, KeyCode.V);

        assertEquals(before, segments.records());
        assertEquals("Nothing pasted: D2 Length (m): must be more than 0 m, was -5", status(robot));
        assertTrue(cell(robot, 1, "length").getText().startsWith("\u26A0"), "the refused cell carries a marker");
    }

    @Test
    void undoAndRedoFollowCtrlZAndCtrlY(FxRobot robot) {
        double original = lengthM(0);
        focusCell(robot, 0, "length");
        robot.write("7");
        robot.push(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(7.0, lengthM(0));

        shortcut(robot, KeyCode.Z);
        assertEquals(original, lengthM(0));
        shortcut(robot, KeyCode.Y);
        assertEquals(7.0, lengthM(0));
        shortcut(robot, KeyCode.Z);
        shortcut(robot, KeyCode.SHIFT, KeyCode.Z);
        assertEquals(7.0, lengthM(0));
    }

    @Test
    void fillDownCopiesTheTopCellIntoTheCellsBelow(FxRobot robot) {
        double top = lengthM(0);
        focusCell(robot, 0, "length");
        robot.press(KeyCode.SHIFT).type(KeyCode.DOWN, 2).release(KeyCode.SHIFT);
        shortcut(robot, KeyCode.D);

        assertEquals(List.of(top, top, top), List.of(lengthM(0), lengthM(1), lengthM(2)));
        assertTrue(status(robot).startsWith("Fill down D1:D3"), status(robot));
    }

    @Test
    void wavenumberToggleRelabelsTheAxis(FxRobot robot) {
        robot.clickOn("#plot-axis-cm", Motion.DIRECT);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Wavenumber (cm\u207B\u00B9)", window.plotView().chart().getXAxis().getLabel());

        robot.clickOn("#plot-axis-nm", Motion.DIRECT);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Wavelength (nm)", window.plotView().chart().getXAxis().getLabel());
    }
}
