package org.strandbook.app.ui.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.strandbook.app.ui.sheet.SegmentSheetFixture.FIBER;
import static org.strandbook.app.ui.sheet.SegmentSheetFixture.LABEL;
import static org.strandbook.app.ui.sheet.SegmentSheetFixture.LENGTH;
import static org.strandbook.app.ui.sheet.SegmentSheetFixture.LOSS;
import static org.strandbook.app.ui.sheet.SegmentSheetFixture.fiber;
import static org.strandbook.app.ui.sheet.SegmentSheetFixture.lengthM;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.strandbook.app.ui.path.LegSegment;
import org.strandbook.app.ui.path.SegmentSheet;
import org.strandbook.site.PathDirection;

/**
 * The spreadsheet rules of every Strandbook table, on the cable-segment sheet. Behaviour that users
 * know from spreadsheet programs (one paste is one undo step, fill down copies the top cell) is a
 * design choice; the arithmetic of the computed loss is IEC 60793-1-40's attenuation
 * coefficient in dB/km times length in km.
 */
class SheetModelTest {

    private final SheetModel<LegSegment> sheet = SegmentSheetFixture.sheet();

    private static CellAddress at(int row, int column) {
        return new CellAddress(row, column);
    }

    @Test
    void pasteOfThreeByTwoBlockSetsEveryCellAsOneUndoStep() {
        List<LegSegment> before = sheet.records();

        SheetOutcome outcome = sheet.paste(CellRange.single(at(0, FIBER)), "F-B\t12.5\nF-A\t80\nF-B\t40\n");

        assertTrue(outcome.applied(), outcome.message());
        assertEquals(List.of("F-B", "F-A", "F-B"), List.of(fiber(sheet, 0), fiber(sheet, 1), fiber(sheet, 2)));
        assertEquals(List.of(12.5, 80.0, 40.0), List.of(lengthM(sheet, 0), lengthM(sheet, 1), lengthM(sheet, 2)));
        sheet.undo();
        assertEquals(before, sheet.records());
    }

    @Test
    void pasteWithOneBadCellChangesNothingAndNamesTheCell() {
        List<LegSegment> before = sheet.records();

        SheetOutcome outcome = sheet.paste(CellRange.single(at(0, LENGTH)), "20\n-5\n30");

        assertFalse(outcome.applied());
        assertEquals(before, sheet.records());
        assertEquals(List.of(at(1, LENGTH)), outcome.problems().stream().map(CellProblem::address).toList());
        assertEquals("Nothing pasted: D2 Length (m): must be more than 0 m, was -5", sheet.statusProperty().get());
        assertTrue(sheet.problemAt(at(1, LENGTH)).isPresent());
    }

    @Test
    void pasteTakesDecimalCommaAndWindowsLineBreaks() {
        // ISO 80000-1: the decimal sign is a comma or a point on the line; spreadsheet programs on
        // Windows end clipboard rows with CR LF
        sheet.paste(CellRange.single(at(0, LENGTH)), "80,5\r\n12,25\r\n");

        assertEquals(80.5, lengthM(sheet, 0));
        assertEquals(12.25, lengthM(sheet, 1));
        assertEquals(50.0, lengthM(sheet, 2));
    }

    @Test
    void pasteReachingBelowTheLastRowAddsRowsDerivedFromTheRowAbove() {
        sheet.paste(CellRange.single(at(2, LENGTH)), "60\n70");

        assertEquals(4, sheet.rowCount());
        LegSegment added = sheet.records().get(3);
        assertEquals("C-04", added.segment().label());
        assertEquals(PathDirection.RETURN, added.direction());
        assertEquals(70.0, added.segment().lengthM());
    }

    @Test
    void pasteWiderThanTheSheetChangesNothing() {
        SheetOutcome outcome = sheet.paste(CellRange.single(at(0, sheet.columnCount() - 1)), "1\t2");

        assertFalse(outcome.applied());
        assertTrue(outcome.message().contains("2 columns wide"), outcome.message());
    }

    @Test
    void singleValuePastedOntoASelectionFillsEverySelectedCell() {
        sheet.paste(new CellRange(0, LENGTH, 2, LENGTH), "42");

        assertEquals(List.of(42.0, 42.0, 42.0), List.of(lengthM(sheet, 0), lengthM(sheet, 1), lengthM(sheet, 2)));
    }

    @Test
    void raggedBlockIsRefusedWithTheRowThatDiffers() {
        SheetOutcome outcome = sheet.paste(CellRange.single(at(0, FIBER)), "F-A\t10\nF-B");

        assertFalse(outcome.applied());
        assertEquals("Nothing pasted: row 2 of the copied block has 1 cells but row 1 has 2", outcome.message());
    }

    @Test
    void fillDownCopiesTheTopCellIntoTheSelectedCellsBelow() {
        sheet.fillDown(new CellRange(0, FIBER, 2, LENGTH));

        assertEquals(List.of(10.0, 10.0, 10.0), List.of(lengthM(sheet, 0), lengthM(sheet, 1), lengthM(sheet, 2)));
        assertEquals("F-A", fiber(sheet, 2));
    }

    @Test
    void fillDownOfCableIdsIsRefusedBecauseIdsMustStayUnique() {
        List<LegSegment> before = sheet.records();

        SheetOutcome outcome = sheet.fillDown(new CellRange(0, LABEL, 1, LABEL));

        assertFalse(outcome.applied());
        assertEquals(before, sheet.records());
        assertEquals("Nothing changed: B2 Cable ID: 'C-01' is already used in row 1", outcome.message());
    }

    @Test
    void fillDownNeedsMoreThanOneRow() {
        assertFalse(sheet.fillDown(CellRange.single(at(0, LENGTH))).applied());
    }

    @Test
    void undoAndRedoWalkBackAndForthAcrossAnEditAndAPaste() {
        List<LegSegment> original = sheet.records();
        sheet.edit(at(0, LENGTH), "11");
        List<LegSegment> edited = sheet.records();
        sheet.paste(CellRange.single(at(1, LENGTH)), "21\n31");
        List<LegSegment> pasted = sheet.records();

        sheet.undo();
        assertEquals(edited, sheet.records());
        sheet.undo();
        assertEquals(original, sheet.records());
        assertFalse(sheet.canUndoProperty().get());
        sheet.redo();
        sheet.redo();
        assertEquals(pasted, sheet.records());
        assertFalse(sheet.canRedoProperty().get());
    }

    @Test
    void newChangeAfterUndoDropsTheRedoStep() {
        sheet.edit(at(0, LENGTH), "11");
        sheet.undo();
        sheet.edit(at(0, LENGTH), "12");

        assertFalse(sheet.canRedoProperty().get());
    }

    @Test
    void textThatIsNotANumberLeavesTheRowAndSaysWhyUntilCorrected() {
        SheetOutcome refused = sheet.edit(at(1, LENGTH), "ten");

        assertFalse(refused.applied());
        assertEquals(100.0, lengthM(sheet, 1));
        assertEquals("D2 Length (m): 'ten' is not a number in m", sheet.statusProperty().get());
        assertTrue(sheet.rows().get(1).cell(LENGTH).hasProblem());

        sheet.edit(at(1, LENGTH), "110");
        assertFalse(sheet.rows().get(1).cell(LENGTH).hasProblem());
    }

    @Test
    void fiberTypeOutsideTheCatalogIsRefusedWithTheCatalogCodes() {
        SheetOutcome refused = sheet.edit(at(0, FIBER), "F-Z");

        assertEquals("C1 Fiber type: 'F-Z' is not in the fiber catalog (F-A, F-B)", refused.message());
    }

    @Test
    void computedLossFollowsALengthEditAtOnce() {
        // IEC 60793-1-40: attenuation coefficient in dB/km; loss = α·L = 5 dB/km × 0.250 km = 1.25 dB
        sheet.edit(at(1, LENGTH), "250");

        assertEquals("1.250", sheet.text(at(1, LOSS)));
    }

    @Test
    void computedLossFollowsAFiberTypeEdit() {
        // IEC 60793-1-40: 8 dB/km × 0.100 km = 0.80 dB
        sheet.edit(at(1, FIBER), "f-b");

        assertEquals("F-B", fiber(sheet, 1));
        assertEquals("0.800", sheet.text(at(1, LOSS)));
    }

    @Test
    void evaluatorHookReplacesTheComputedFiguresAtOnce() {
        sheet.setEvaluator(rows -> rows.stream()
                .map(r -> new RowFigures(Map.of(SegmentSheet.LOSS, Figure.of(Verdict.REVIEW)))).toList());

        assertEquals("\u25B2 REVIEW", sheet.text(at(0, LOSS)));
        assertEquals(Verdict.REVIEW, sheet.rows().get(0).cell(LOSS).verdict());
    }

    @Test
    void typingIntoAComputedCellIsRefused() {
        SheetOutcome refused = sheet.edit(at(0, LOSS), "3");

        assertFalse(refused.applied());
        assertTrue(refused.message().startsWith("F1 Loss at 1st band centre (dB) is computed"), refused.message());
    }

    @Test
    void copyWritesTheSelectedCellsAsTabSeparatedText() {
        assertEquals("C-01\tF-A\t10.0\nC-02\tF-A\t100.0", sheet.copy(new CellRange(0, LABEL, 1, LENGTH)));
    }

    @Test
    void clearOfARequiredCellIsRefused() {
        SheetOutcome refused = sheet.clear(CellRange.single(at(0, LENGTH)));

        assertFalse(refused.applied());
        assertEquals("Nothing cleared: D1 Length (m): enter a number in m", refused.message());
    }

    @Test
    void insertAndDeleteRowsAreUndoable() {
        sheet.insertRowBelow(0);
        assertEquals("C-04", sheet.records().get(1).segment().label());
        sheet.deleteRows(0, 1);
        assertEquals(2, sheet.rowCount());

        sheet.undo();
        sheet.undo();
        assertEquals(3, sheet.rowCount());
        assertEquals("C-02", sheet.records().get(1).segment().label());
    }

    @Test
    void listenersHearAppliedChangesOnly() {
        List<Integer> heard = new ArrayList<>();
        sheet.addChangeListener(rows -> heard.add(rows.size()));

        sheet.paste(CellRange.single(at(0, LENGTH)), "-1");
        sheet.edit(at(0, LENGTH), "12");
        sheet.undo();

        assertEquals(List.of(3, 3), heard);
    }
}
