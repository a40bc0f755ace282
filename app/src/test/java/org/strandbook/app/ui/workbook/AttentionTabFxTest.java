package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import javafx.scene.control.Label;
import javafx.scene.control.Tab;
import javafx.scene.control.TableView;
import javafx.scene.input.KeyCode;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The Attention tab on a copy of the sample site, headless: shown, it ranks the site; Enter or a
 * double-click opens a point in the History tab. The ranking itself is checked against the trend
 * command in {@link AttentionViewModelTest}; what the tab does with a key or a click is the window's
 * own behaviour (design choice).
 */
@ExtendWith(SampleSite.Resolver.class)
class AttentionTabFxTest {

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
        shown = HeadlessWindow.show(built, "technician F");
        vm = shown.vm();
        window = shown.window();
    }

    @BeforeEach
    void openCopy() {
        Path copy = sample.workbookCopy(dir);
        robot.interact(() -> {
            vm.open(copy);
            vm.selectPoint("AT-4101");
            window.tabs().getSelectionModel().select(tab("tab-attention"));
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    @AfterEach
    void closeDialogsAndWorkbook() {
        shown.closeDialogsAndWorkbook(robot);
    }

    @AfterAll
    static void hide() throws Exception {
        FxToolkit.hideStage();
    }

    private static Tab tab(String id) {
        return window.tabs().getTabs().stream().filter(t -> id.equals(t.getId())).findFirst().orElseThrow();
    }

    @SuppressWarnings("unchecked")
    private TableView<AttentionRow> table(String id) {
        return robot.lookup("#" + id).queryAs(TableView.class);
    }

    @Test
    void showingTheTabRanksTheSite() {
        int points = vm.points().rowCount();
        TableView<AttentionRow> ranking = table("attention-ranking");
        assertEquals(points, ranking.getItems().size());
        long needing = ranking.getItems().stream().filter(AttentionRow::needsAttention).count();
        assertEquals(needing, table("attention-needing").getItems().size());
        String summary = robot.lookup("#attention-summary").queryAs(Label.class).getText();
        assertTrue(summary.startsWith(points + " points: " + needing + " need attention"), summary);
    }

    @Test
    void enterOnAFailingPointOpensItsHistory() {
        TableView<AttentionRow> needing = table("attention-needing");
        int row = needing.getItems().stream().map(AttentionRow::pointTag).toList().indexOf("AT-4102");
        robot.interact(() -> {
            needing.getSelectionModel().select(row);
            needing.requestFocus();
        });
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();

        assertEquals("AT-4102", vm.selectedTagProperty().get());
        assertEquals("tab-history", window.tabs().getSelectionModel().getSelectedItem().getId());
    }

    @Test
    void enterWithNoRowChosenOpensNothing() {
        TableView<AttentionRow> ranking = table("attention-ranking");
        robot.interact(() -> {
            ranking.getSelectionModel().clearSelection();
            ranking.requestFocus();
        });
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();

        assertEquals("AT-4101", vm.selectedTagProperty().get());
        assertEquals("tab-attention", window.tabs().getSelectionModel().getSelectedItem().getId());
    }
}
