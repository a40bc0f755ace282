package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.input.KeyCode;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.app.ui.sheet.CellRange;
import org.strandbook.app.ui.sheet.SheetView;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ProbeType;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.store.Workbook;
import org.testfx.api.FxRobot;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The sheets a user types into (points, joints, the three catalogs) and the scan import dialog, on a
 * copy of the sample site, headless: each takes a valid entry and saves it to the workbook, and
 * refuses a bad one naming why, with nothing changed. The limits are the sheets' own (design
 * choice), except the numerical aperture, which is below 1 for any fiber in air (NA = n·sin θ).
 */
@ExtendWith(SampleSite.Resolver.class)
class SheetsFxTest {

    private static final String POINT = "AT-4102";
    private static SampleSite sample;
    private static HeadlessWindow shown;
    private static WorkbookViewModel vm;
    private static WorkbookWindow window;

    private final FxRobot robot = new FxRobot();
    @TempDir
    Path dir;
    private Path copy;

    @BeforeAll
    static void window(SampleSite built) throws Exception {
        sample = built;
        shown = HeadlessWindow.show(built, "technician G");
        vm = shown.vm();
        window = shown.window();
    }

    @BeforeEach
    void openCopy() {
        copy = sample.workbookCopy(dir);
        robot.interact(() -> {
            vm.open(copy);
            vm.selectPoint(POINT);
        });
    }

    @AfterEach
    void closeDialogsAndWorkbook() {
        shown.closeDialogsAndWorkbook(robot);
    }

    @AfterAll
    static void hide() throws Exception {
        FxToolkit.hideStage();
    }

    private void showTab(String id) {
        robot.interact(() -> {
            for (Tab t : window.tabs().getTabs()) {
                if (id.equals(t.getId())) {
                    window.tabs().getSelectionModel().select(t);
                }
                if (t.getContent() instanceof javafx.scene.layout.VBox box) {
                    box.getChildren().stream().filter(TabPane.class::isInstance).map(TabPane.class::cast)
                            .forEach(inner -> inner.getTabs().stream().filter(i -> id.equals(i.getId()))
                                    .forEach(i -> inner.getSelectionModel().select(i)));
                }
                if (t.getContent() instanceof TabPane inner) {
                    inner.getTabs().stream().filter(i -> id.equals(i.getId())).forEach(i -> {
                        window.tabs().getSelectionModel().select(t);
                        inner.getSelectionModel().select(i);
                    });
                }
            }
        });
        // a tab shown for the first time builds its table's cells on the next layout pass
        robot.interact(() -> {
            window.scene().getRoot().applyCss();
            window.scene().getRoot().layout();
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Types {@code text} into one cell as a user would: focus it, type, Enter. */
    private <R> void type(SheetView<R> view, int row, String columnKey, String text) {
        robot.interact(() -> {
            int column = view.model().columnIndex(columnKey);
            view.select(new CellRange(row, column, row, column));
            view.table().scrollTo(row);
            view.table().scrollToColumn(view.table().getColumns().get(column + 1));
            view.table().requestFocus();
        });
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(view.table().isFocused(), "the sheet has the keyboard");
        robot.write(text);
        robot.push(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private String status(String sheetId) {
        return robot.lookup("#" + sheetId + "-status").queryAs(Label.class).getText();
    }

    private static int rowOf(List<String> keys, String key) {
        int row = keys.indexOf(key);
        assertTrue(row >= 0, key + " not in " + keys);
        return row;
    }

    private Workbook stored() {
        return Workbook.openForReading(copy, "auditor");
    }

    @Test
    void aPointsToleranceTypedInIsSaved() {
        showTab("tab-points");
        int row = rowOf(vm.points().records().stream().map(MeasurementPoint::tag).toList(), POINT);
        type(window.pointsView(), row, "tolerance", "1,5");
        try (Workbook wb = stored()) {
            assertEquals(OptionalDouble.of(1.5), wb.points().get(POINT).orElseThrow().toleranceDb());
        }
    }

    @Test
    void aProbeTypeNotInTheCatalogIsRefused() {
        showTab("tab-points");
        int row = rowOf(vm.points().records().stream().map(MeasurementPoint::tag).toList(), POINT);
        type(window.pointsView(), row, "probe", "PT-ZZ");
        assertTrue(status("points-sheet").contains("probe catalog"), status("points-sheet"));
        try (Workbook wb = stored()) {
            assertEquals("PT-TX5", wb.points().get(POINT).orElseThrow().probeTypeCode());
        }
    }

    @Test
    void aJointsMeasuredLossIsSaved() {
        showTab("tab-joints");
        type(window.jointsView(), 0, "loss", "0,45");
        try (Workbook wb = stored()) {
            assertEquals(OptionalDouble.of(0.45), wb.paths().legs(POINT).get(0).joints().get(0).lossDb());
        }
    }

    @Test
    void aNegativeJointLossIsRefused() {
        showTab("tab-joints");
        OptionalDouble before = vm.point().joints().records().get(0).joint().lossDb();
        type(window.jointsView(), 0, "loss", "-1");
        assertTrue(status("joints-sheet").contains("-1"), status("joints-sheet"));
        assertEquals(before, vm.point().joints().records().get(0).joint().lossDb());
    }

    @Test
    void aFibersNumericalApertureIsSavedAndOneAboveOneIsRefused() {
        showTab("tab-fibers");
        SheetView<FiberType> fibers = window.fibersView();
        int row = rowOf(fibers.model().records().stream().map(FiberType::code).toList(), "LOH-600");
        type(fibers, row, "na", "0,26");
        assertEquals(0.26, fibers.model().records().get(row).na(), 1e-12, () -> status("fibers-sheet") + " | row "
                + row + " of " + fibers.model().records().stream().map(f -> f.code() + "=" + f.na()).toList()
                + " focused " + fibers.table().getFocusModel().getFocusedCell());
        try (Workbook wb = stored()) {
            assertEquals(0.26, wb.catalog().fiberTypes().stream().filter(f -> f.code().equals("LOH-600"))
                    .findFirst().orElseThrow().na(), 1e-12);
        }
        type(fibers, row, "na", "1,2");
        assertTrue(status("fibers-sheet").contains("0.99"), status("fibers-sheet"));
        assertEquals(0.26, fibers.model().records().get(row).na(), 1e-12);
    }

    @Test
    void aConnectorsAirGapIsSavedAndAWordThatIsNotYesOrNoIsRefused() {
        showTab("tab-connectors");
        SheetView<ConnectorType> connectors = window.connectorsView();
        int row = rowOf(connectors.model().records().stream().map(ConnectorType::code).toList(), "FC-X");
        type(connectors, row, "airGap", "yes");
        try (Workbook wb = stored()) {
            assertTrue(wb.catalog().connectorTypes().stream().filter(c -> c.code().equals("FC-X")).findFirst()
                    .orElseThrow().airGap());
        }
        type(connectors, row, "airGap", "maybe");
        assertTrue(connectors.model().records().get(row).airGap());
        assertTrue(status("connectors-sheet").contains("maybe"), status("connectors-sheet"));
    }

    @Test
    void aConnectorsLossSpreadIsSavedAndOneInMetresIsRefused() {
        // design choice: a mated pair's spread is stated in dB, as ± a range or u a standard uncertainty
        showTab("tab-connectors");
        SheetView<ConnectorType> connectors = window.connectorsView();
        int row = rowOf(connectors.model().records().stream().map(ConnectorType::code).toList(), "FC-X");
        type(connectors, row, "lossSpread", "+/-0,2 dB");
        StatedSpread typed = StatedSpread.plusMinus(0.2, "dB");
        try (Workbook wb = stored()) {
            assertEquals(Optional.of(typed), wb.catalog().connectorType("FC-X").orElseThrow().spreads()
                    .of(SpreadInput.CONNECTOR_LOSS));
        }
        type(connectors, row, "lossSpread", "+/-3 m");
        assertTrue(status("connectors-sheet").contains("unit 'm'"), status("connectors-sheet"));
        assertEquals(Optional.of(typed), connectors.model().records().get(row).spreads().of(SpreadInput.CONNECTOR_LOSS));
    }

    @Test
    void aJointsOwnLossSpreadIsSaved() {
        // JCGM 100:2008, 4.3.3: a reading's stated standard uncertainty is taken as it is
        showTab("tab-joints");
        type(window.jointsView(), 0, "lossSpread", "u 0,05 dB");
        try (Workbook wb = stored()) {
            assertEquals(Optional.of(StatedSpread.standardUncertainty(0.05, "dB")),
                    wb.paths().legs(POINT).get(0).joints().get(0).spreads().of(SpreadInput.JOINT_LOSS));
        }
    }

    @Test
    void aProbesWindowFacesAreSavedAndANegativeCountIsRefused() {
        showTab("tab-probes");
        SheetView<ProbeType> probes = window.probesView();
        int row = rowOf(probes.model().records().stream().map(ProbeType::code).toList(), "PT-DR");
        type(probes, row, "faces", "2");
        try (Workbook wb = stored()) {
            assertEquals(2, wb.catalog().probeTypes().stream().filter(p -> p.code().equals("PT-DR")).findFirst()
                    .orElseThrow().windowFaces());
        }
        type(probes, row, "faces", "-1");
        assertEquals(2, probes.model().records().get(row).windowFaces());
        assertTrue(status("probes-sheet").contains("-1"), status("probes-sheet"));
    }

    @Test
    void aScanFileThatIsNotASpectrumIsRefusedInTheImportDialogWithItsLine() throws Exception {
        Path bad = dir.resolve("AT-4102_bad.csv");
        Files.writeString(bad, "Wavelength (nm);Counts\n1000;12\n1002;abc\n");
        int before = vm.point().scans().rowCount();
        ScanImportViewModel importer = WaitForAsyncUtils.asyncFx(() -> window.recordMeasurement().orElseThrow()).get();
        robot.interact(() -> importer.addFiles(List.of(bad)));
        robot.interact(() -> robot.lookup("#scan-import-start").queryButton().fire());
        WaitForAsyncUtils.waitForFxEvents();

        @SuppressWarnings("unchecked")
        List<String> refused = robot.lookup("#scan-import-refused").queryAs(ListView.class).getItems();
        assertTrue(refused.stream().anyMatch(r -> r.contains("AT-4102_bad.csv:3:")), refused.toString());
        assertEquals(before, vm.point().scans().rowCount());
    }
}
