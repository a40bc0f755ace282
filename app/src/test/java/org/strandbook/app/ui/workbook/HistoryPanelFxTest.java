package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;

import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.handover.PointEvent;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.store.Workbook;
import org.testfx.api.FxRobot;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The History tab and its four record dialogs on a copy of the sample site, headless: each dialog's
 * main path and one refusal. What a record must hold (who, when, what, why) is common practice for
 * maintenance logs; a signature needs a name (21 CFR Part 11, §11.50: signed records show the
 * signer's printed name).
 */
@ExtendWith(SampleSite.Resolver.class)
class HistoryPanelFxTest {

    private static final String POINT = "AT-4102";
    private static SampleSite sample;
    private static HeadlessWindow shown;
    private static WorkbookViewModel vm;
    private static Stage stage;

    private final FxRobot robot = new FxRobot();
    @TempDir
    Path dir;

    @BeforeAll
    static void window(SampleSite built) throws Exception {
        sample = built;
        shown = HeadlessWindow.show(built, "technician D");
        stage = shown.stage();
        vm = shown.vm();
        WorkbookWindow window = shown.window();
        FxToolkit.setupStage(s -> window.tabs().getSelectionModel().select(window.tabs().getTabs().stream()
                .filter(t -> "tab-history".equals(t.getId())).findFirst().orElseThrow()));
    }

    private Path copy;

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

    private PointHistoryViewModel history() {
        return vm.point().history();
    }

    private void open(String buttonId) {
        robot.interact(() -> robot.lookup("#" + buttonId).queryAs(Button.class).fire());
        WaitForAsyncUtils.waitForFxEvents();
    }

    private void type(String fieldId, String text) {
        robot.interact(() -> robot.lookup("#" + fieldId).queryAs(TextField.class).setText(text));
    }

    @SuppressWarnings("unchecked")
    private <T> void pick(String comboId, T value) {
        robot.interact(() -> ((ComboBox<T>) robot.lookup("#" + comboId).queryAs(ComboBox.class)).setValue(value));
    }

    private void ok(String dialogId) {
        robot.interact(() -> robot.lookup("#" + dialogId + "-ok").queryAs(Button.class).fire());
        WaitForAsyncUtils.waitForFxEvents();
    }

    private String problem(String dialogId) {
        return robot.lookup("#" + dialogId + "-problem").queryAs(Label.class).getText();
    }

    private boolean showing(String dialogId) {
        return robot.lookup("#" + dialogId).tryQuery().map(Node::isVisible).orElse(false);
    }

    private long count(PointEvent.Kind kind) {
        return history().events().stream().filter(e -> e.kind() == kind).count();
    }

    @Test
    void anInspectionIsRecordedAndListed() {
        long before = count(PointEvent.Kind.INSPECTION);
        open("history-inspect");
        pick("inspection-joint", "J2");
        pick("inspection-grade", InspectionGrade.CLEAN);
        type("inspection-by", "k.ashdown");
        type("inspection-remark", "after cleaning");
        ok("inspection-dialog");
        assertEquals(before + 1, count(PointEvent.Kind.INSPECTION));
        assertTrue(history().messageProperty().get().startsWith("recorded: inspection of J2"),
                history().messageProperty().get());
    }

    @Test
    void anInspectionDatedNextYearIsRefusedAndNotListed() {
        long before = count(PointEvent.Kind.INSPECTION);
        open("history-inspect");
        type("inspection-by", "k.ashdown");
        type("inspection-at", Instant.now().plus(Duration.ofDays(366)).toString().substring(0, 10));
        ok("inspection-dialog");
        assertTrue(history().messageProperty().get().contains("in the future"), history().messageProperty().get());
        assertEquals(before, count(PointEvent.Kind.INSPECTION));
    }

    @Test
    void aCleaningIsRecorded() {
        open("history-maintain");
        pick("maintenance-kind", MaintenanceKind.CLEAN_JOINT);
        type("maintenance-element", "J2");
        type("maintenance-by", "t.okonjo");
        type("maintenance-why", "graded dirty");
        ok("maintenance-dialog");
        assertEquals(1, count(PointEvent.Kind.ACTION));
        // the loss-over-time plot marks it at its date (a listener on the history, kept alive)
        System.gc();
        assertTrue(vm.point().trendPlot().linesProperty().get().stream()
                .anyMatch(l -> l.detail().startsWith("action J2: clean joint")));
    }

    @Test
    void aSegmentReplacementWithoutItsLengthStaysOpenSayingSo() {
        open("history-maintain");
        pick("maintenance-kind", MaintenanceKind.REPLACE_SEGMENT);
        type("maintenance-element", "C4102-R2");
        type("maintenance-by", "t.okonjo");
        ok("maintenance-dialog");
        assertEquals("the new segment's length (m) is missing", problem("maintenance-dialog"));
        assertTrue(showing("maintenance-dialog"));
        assertEquals(0, count(PointEvent.Kind.ACTION));
    }

    @Test
    void aNoteOnAJointIsRecorded() {
        open("history-note");
        type("note-element", "J2");
        type("note-by", "k.ashdown");
        type("note-text", "dust cap refitted");
        ok("note-dialog");
        assertTrue(history().events().stream().anyMatch(e -> e.kind() == PointEvent.Kind.NOTE
                && e.subject().equals("J2") && e.text().equals("dust cap refitted")));
    }

    @Test
    void aNoteWithoutTextStaysOpenSayingSo() {
        open("history-note");
        type("note-by", "k.ashdown");
        ok("note-dialog");
        assertEquals("the note's text is missing", problem("note-dialog"));
        assertTrue(showing("note-dialog"));
    }

    @Test
    void anEvaluatedPointIsSigned() {
        open("history-sign");
        type("sign-off-name", "M. Okonedo");
        type("sign-off-title", "commissioning lead");
        ok("sign-off-dialog");
        assertEquals(1, count(PointEvent.Kind.SIGN_OFF), history().messageProperty().get());
    }

    @Test
    void signingWithoutANameStaysOpenSayingSo() {
        open("history-sign");
        ok("sign-off-dialog");
        assertEquals("a sign-off needs the signer's name", problem("sign-off-dialog"));
        assertEquals(0, count(PointEvent.Kind.SIGN_OFF));
    }

    @Test
    void aNoteJustWrittenIsWithdrawnAndTheTrailStillVerifies() {
        open("history-note");
        type("note-by", "k.ashdown");
        type("note-text", "wrong point: this was meant for AT-4103");
        ok("note-dialog");
        long notes = count(PointEvent.Kind.NOTE);

        open("history-withdraw");
        ok("withdraw-dialog");

        assertEquals(notes - 1, count(PointEvent.Kind.NOTE));
        assertTrue(history().messageProperty().get().startsWith("withdrawn: note of "), history().messageProperty().get());
        try (Workbook wb = Workbook.openForReading(copy, "auditor")) {
            assertTrue(wb.audit().verify().intact(), () -> wb.audit().verify().toString());
        }
    }

    @Test
    void aRecordTheSignedRevisionCoversIsNotWithdrawn() {
        // the demo's AT-4102 records all predate its signed commissioning revision A
        long before = history().events().size();
        open("history-withdraw");
        ok("withdraw-dialog");

        assertTrue(history().messageProperty().get().startsWith("not withdrawn: the note of "),
                history().messageProperty().get());
        assertTrue(history().messageProperty().get().contains("signature of"), history().messageProperty().get());
        assertEquals(before, history().events().size());
    }
}
