package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.shape.Polygon;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.app.ui.uncertainty.UncertaintyRow;
import org.strandbook.evaluation.PredictionSpread;
import org.testfx.api.FxRobot;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The Uncertainty tab on a copy of the sample site, headless: the budget per band, the shaded
 * coverage band in the predicted-loss plot, and the design question with one refusal.
 */
@ExtendWith(SampleSite.Resolver.class)
class UncertaintyPanelFxTest {

    private static final String POINT = "AT-4102";
    private static SampleSite sample;
    private static HeadlessWindow shown;
    private static WorkbookViewModel vm;
    private static WorkbookWindow window;

    private final FxRobot robot = new FxRobot();
    @TempDir
    Path dir;

    @BeforeAll
    static void window(SampleSite built) throws Exception {
        sample = built;
        shown = HeadlessWindow.show(built, "technician D");
        vm = shown.vm();
        window = shown.window();
        FxToolkit.setupStage(s -> window.tabs().getSelectionModel().select(window.tabs().getTabs().stream()
                .filter(t -> "tab-uncertainty".equals(t.getId())).findFirst().orElseThrow()));
    }

    @BeforeEach
    void openCopy() {
        Path copy = sample.workbookCopy(dir);
        robot.interact(() -> {
            vm.open(copy);
            vm.selectPoint(POINT);
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    @AfterEach
    void closeWorkbook() {
        shown.closeDialogsAndWorkbook(robot);
    }

    @AfterAll
    static void hide() throws Exception {
        FxToolkit.hideStage();
    }

    @SuppressWarnings("unchecked")
    private List<UncertaintyRow> tableRows() {
        return List.copyOf(robot.lookup("#uncertainty-table").queryAs(TableView.class).getItems());
    }

    private String ask(String allowedDb, String atNm) {
        robot.interact(() -> {
            robot.lookup("#uncertainty-allowed-db").queryAs(TextField.class).setText(allowedDb);
            robot.lookup("#uncertainty-question-nm").queryAs(TextField.class).setText(atNm);
            robot.lookup("#uncertainty-ask").queryAs(Button.class).fire();
        });
        WaitForAsyncUtils.waitForFxEvents();
        return robot.lookup("#uncertainty-answer").queryAs(Label.class).getText();
    }

    @Test
    void everyBandShowsABudgetWhoseSharesMakeUpTheCombinedVariance() {
        // JCGM 100:2008, 5.1.2: u_c²(y) = Σ uᵢ²(y) for independent inputs, so the shares of one band sum to 1.
        List<UncertaintyRow> rows = tableRows();
        assertFalse(rows.isEmpty(), robot.lookup("#uncertainty-message").queryAs(Label.class).getText());
        Map<String, Double> shareByBand = rows.stream().collect(Collectors.groupingBy(UncertaintyRow::band,
                Collectors.summingDouble(UncertaintyRow::share)));
        assertEquals(vm.point().point().orElseThrow().bands().size(), shareByBand.size());
        shareByBand.forEach((band, sum) -> assertEquals(1.0, sum, 1e-9, band));
        assertTrue(rows.stream().allMatch(r -> !r.basis().isBlank() && !r.unit().isBlank()));
    }

    @Test
    void predictedPlotShadesTheCoverageBandAroundThePrediction() {
        // JCGM 101:2008, 7.7: the interval of a loss whose inputs spread both ways holds the estimate.
        PredictionSpread spread = vm.point().uncertainty().spreadProperty().get();
        double[] y = spread.predictedLossDb();
        for (int i = 0; i < y.length; i++) {
            assertTrue(spread.lowDb()[i] < y[i] && y[i] < spread.highDb()[i], spread.grid().wavelengthNm(i) + " nm");
        }
        List<Polygon> shapes = window.budgetPlot().bandShapes();
        assertEquals(1, shapes.size());
        assertTrue(shapes.get(0).getPoints().size() > 100, "the band is drawn as a polygon along the curve");
        assertTrue(window.budgetPlot().legend().getChildren().stream().anyMatch(n -> n.toString().contains("coverage")
                || n.lookupAll(".label").stream().anyMatch(l -> ((Label) l).getText().contains("coverage interval"))));
    }

    @Test
    void designQuestionGivesAChanceAndRefusesAWavelengthOutsideTheAnalyzer() {
        // Design choice: a question about light the analyzer never measures is refused, not extrapolated.
        String answer = ask("40", "1600");
        assertTrue(answer.startsWith("chance the loop stays within 40 dB at 1600 nm: "), answer);
        String refused = ask("40", "9999");
        assertTrue(refused.startsWith("Not asked: '9999' is not a wavelength in the analyzer's range"), refused);
    }
}
