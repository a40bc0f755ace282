package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.Tab;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.stage.Stage;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.app.ui.sheet.CellAddress;
import org.strandbook.server.LocalPostgres;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;
import org.testfx.api.FxRobot;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window against a real PostgreSQL plant server (started by {@link LocalPostgres}, never a
 * mock), headless: a site opened from the server through the dialog, a refused one that leaves no
 * file, and a conflict made by two workbooks and settled from the window, after which both audit
 * trails verify. What the sync itself merges is checked in core's SiteSyncTest; the conflict rule
 * (two edits of one field since the last sync) is the issue's, the window's wording a design choice.
 */
class PlantServerWindowFxTest {

    private static final String TECH = "window_crew";
    private static HeadlessWindow shown;

    private final FxRobot robot = new FxRobot();
    @TempDir
    Path dir;
    private String url;

    @BeforeAll
    static void window(@TempDir Path folder) throws Exception {
        shown = HeadlessWindow.show(folder.resolve("sample"), "window user");
    }

    @BeforeEach
    void server() {
        url = LocalPostgres.shared().newPlantServer(TECH);
    }

    @AfterEach
    void closeDialogsAndWorkbook() {
        shown.closeDialogsAndWorkbook(robot);
    }

    @AfterAll
    static void hide() throws Exception {
        FxToolkit.hideStage();
    }

    private Workbook firstLaptop() {
        return new PlantServerFixture(url, TECH).firstLaptop(dir);
    }

    private void sync(Workbook wb) {
        new PlantServerFixture(url, TECH).sync(wb);
    }

    private Stage openDialog(String site, Path target) {
        Stage[] dialog = new Stage[1];
        robot.interact(() -> {
            dialog[0] = shown.window().openFromServer();
            text("#server-url").setText(url);
            text("#server-user").setText(TECH);
            text("#server-target").setText(target == null ? "" : target.toString());
            if (site != null) {
                combo().setValue(site);
            }
        });
        return dialog[0];
    }

    @Test
    void aSiteOpenedFromTheServerThroughTheDialogIsANewWorkbookThatKnowsItsServer() {
        try (Workbook a = firstLaptop()) {
            Path target = dir.resolve("laptop.strandbook");
            Stage first = openDialog(null, null);
            robot.interact(() -> button("#server-list-sites").fire());
            robot.interact(first::close);
            Stage dialog = openDialog(null, null);
            robot.interact(() -> button("#server-list-sites").fire());
            assertEquals(DemoSite.site().name(), combo().getValue(),
                    "the server offers the one site " + TECH + " has, each time it is asked");
            robot.interact(() -> text("#server-target").setText(target.toString()));
            robot.interact(() -> button("#server-open").fire());
            WaitForAsyncUtils.waitForFxEvents();

            assertFalse(dialog.isShowing(), "the dialog closes once the clone is open");
            assertTrue(Files.isRegularFile(target));
            assertEquals(target, shown.vm().file().orElseThrow());
            assertEquals(a.points().list(), shown.vm().points().records());
            assertTrue(label("#sync-state").getText().startsWith("Plant server: synced "), label("#sync-state").getText());
            assertTrue(label("#sync-state").getText().contains(" with " + url), label("#sync-state").getText());
        }
    }

    @Test
    void aRefusedCloneSaysWhyInOneLineAndLeavesNoFile() throws Exception {
        try (Workbook a = firstLaptop()) {
            Path target = dir.resolve("nowhere.strandbook");
            Stage dialog = openDialog("A site nobody started", target);
            robot.interact(() -> button("#server-open").fire());
            WaitForAsyncUtils.waitForFxEvents();
            String why = label("#server-problem").getText();
            assertTrue(dialog.isShowing(), "the dialog stays open for a correction");
            assertTrue(why.contains("holds no site \"A site nobody started\""), why);
            assertFalse(why.contains("\n"), why);
            try (Stream<Path> left = Files.list(dir)) {
                assertEquals(java.util.List.of(), left.map(p -> p.getFileName().toString())
                        .filter(n -> n.contains("nowhere")).toList(), "neither the file nor a part of it");
            }

            robot.interact(() -> {
                text("#server-target").setText(a.file().toString());
                combo().setValue(DemoSite.site().name());
                button("#server-open").fire();
            });
            assertTrue(label("#server-problem").getText().endsWith("exists; a clone never overwrites a file: choose a"
                    + " new name"), label("#server-problem").getText());
        }
    }

    @Test
    void aConflictMadeByTwoWorkbooksIsSettledFromTheWindowAndBothTrailsVerify() {
        try (Workbook a = firstLaptop()) {
            Path laptop = dir.resolve("laptop.strandbook");
            openDialog(DemoSite.site().name(), laptop);
            robot.interact(() -> button("#server-open").fire());
            rename(a, "feed one");
            sync(a);
            robot.interact(() -> {
                WorkbookViewModel vm = shown.vm();
                int row = vm.points().records().stream().map(MeasurementPoint::tag).toList().indexOf(DemoSite.POINT_A);
                vm.points().edit(new CellAddress(row, vm.points().columnIndex("service")), "feed two");
                shown.window().tabs().getSelectionModel().select(tab("tab-conflicts"));
            });
            robot.interact(() -> button("#conflicts-sync").fire());
            WaitForAsyncUtils.waitForFxEvents();

            TableView<ConflictRow> table = conflicts();
            assertEquals(1, table.getItems().size());
            ConflictRow row = table.getItems().get(0);
            assertEquals("point " + DemoSite.POINT_A, row.record());
            assertEquals("service", row.field());
            assertEquals("feed two", row.mine());
            assertEquals("feed one", row.theirs());
            assertEquals(TECH, row.theirsBy());
            assertEquals("Edits to settle (1)", tab("tab-conflicts").getText());
            assertTrue(label("#conflicts-last-sync").getText().endsWith("; 1 edit(s) to settle"),
                    label("#conflicts-last-sync").getText());
            assertTrue(label("#sync-state").getText().contains("1 conflict(s) wait in Edits to settle"),
                    label("#sync-state").getText());

            robot.interact(() -> robot.lookup(".keep-theirs").queryAs(Button.class).fire());
            WaitForAsyncUtils.waitForFxEvents();
            assertEquals(0, conflicts().getItems().size());
            assertEquals("Edits to settle", tab("tab-conflicts").getText());
            assertFalse(label("#sync-state").getText().contains("conflict"), label("#sync-state").getText());
            assertEquals("feed one", service(shown.vm().points().records()));

            robot.interact(() -> button("#conflicts-sync").fire());
            sync(a);
            assertEquals("feed one", a.points().get(DemoSite.POINT_A).orElseThrow().service());
            assertTrue(a.audit().verify().intact(), "the first laptop's trail verifies");
            try (Workbook reread = Workbook.openForReading(laptop, "auditor")) {
                assertTrue(reread.audit().verify().intact(), "the settled workbook's trail verifies");
                assertEquals("feed one", reread.points().get(DemoSite.POINT_A).orElseThrow().service());
            }
        }
    }

    @Test
    void aWorkbookThatNeverSyncedIsGivenItsServerOnceAndThenSyncsWithIt() {
        Path file = dir.resolve("never.strandbook");
        Workbook.create(file, DemoSite.site(), "k.ashdown").close();
        robot.interact(() -> shown.vm().open(file));
        assertEquals("Plant server: never synced", label("#sync-state").getText());
        assertTrue(button("#conflicts-sync").isDisabled(), "no server to sync with yet");

        Stage[] dialog = new Stage[1];
        robot.interact(() -> {
            dialog[0] = shown.window().syncWithServerAs();
            text("#server-url").setText("postgresql://no-jdbc-prefix/plant");
            text("#server-user").setText(TECH);
            button("#server-sync").fire();
        });
        assertTrue(dialog[0].isShowing(), "an address the driver cannot take is refused before anything is reached");
        assertTrue(label("#server-problem").getText().contains("is not a PostgreSQL address"),
                label("#server-problem").getText());
        robot.interact(() -> {
            text("#server-url").setText(url);
            button("#server-sync").fire();
        });
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(dialog[0].isShowing());
        assertTrue(label("#sync-state").getText().endsWith(" with " + url), label("#sync-state").getText());
        assertTrue(label("#conflicts-last-sync").getText().startsWith("Synced with " + url + ": "),
                label("#conflicts-last-sync").getText());
        assertFalse(button("#conflicts-sync").isDisabled(), "from now on one click syncs");
    }

    private static String service(java.util.List<MeasurementPoint> points) {
        return points.stream().filter(p -> p.tag().equals(DemoSite.POINT_A)).findFirst().orElseThrow().service();
    }

    private static void rename(Workbook wb, String service) {
        PlantServerFixture.rename(wb, service);
    }

    private TextField text(String id) {
        return robot.lookup(id).queryAs(TextField.class);
    }

    private Button button(String id) {
        return robot.lookup(id).queryAs(Button.class);
    }

    private Label label(String id) {
        return robot.lookup(id).queryAs(Label.class);
    }

    @SuppressWarnings("unchecked")
    private ComboBox<String> combo() {
        return robot.lookup("#server-site").queryAs(ComboBox.class);
    }

    @SuppressWarnings("unchecked")
    private TableView<ConflictRow> conflicts() {
        return robot.lookup("#conflicts-table").queryAs(TableView.class);
    }

    private static Tab tab(String id) {
        return shown.window().tabs().getTabs().stream().filter(t -> id.equals(t.getId())).findFirst().orElseThrow();
    }
}
