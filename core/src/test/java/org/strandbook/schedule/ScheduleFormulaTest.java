package org.strandbook.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.strandbook.schedule.ScheduleFixture.cell;
import static org.strandbook.schedule.ScheduleFixture.set;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;

import org.apache.poi.xssf.usermodel.XSSFCell;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Formula cells of a schedule. In SpreadsheetML a formula cell holds its formula in {@code <f>}
 * and its last calculated value in {@code <v>}, which a writer may leave out (ECMA-376 Part 1,
 * 18.3.1.4 c (Cell), 18.3.1.40 f (Formula), 18.3.1.96 v (Cell Value)); scripts often do. Arithmetic
 * is checked against the values the formulas plainly have.
 */
class ScheduleFormulaTest {

    @TempDir
    Path folder;

    private final CableScheduleReader reader = new CableScheduleReader();

    @Test
    void aFormulaWithoutASavedValueIsCalculatedNotReadAsZero() throws IOException {
        // =40+5 is 45 m; read as its missing value it was 0 m, a length no segment can have
        ScheduleReadResult typed = read("typed", set("Segments", "F3", 45));
        ScheduleReadResult calculated = read("calculated", unsavedFormula("Segments", "F3", "40+5"));
        ScheduleReadResult.Accepted accepted = assertInstanceOf(ScheduleReadResult.Accepted.class, calculated,
                () -> ScheduleFixture.lines(calculated).toString());
        assertEquals(((ScheduleReadResult.Accepted) typed).schedule(), accepted.schedule());
    }

    @Test
    void aCalculatedValueMeetsTheSameRulesAsATypedOne() throws IOException {
        assertEquals(List.of("Segments!F3: length must be a positive number of metres, was -3"),
                lines(unsavedFormula("Segments", "F3", "2-5")));
    }

    @Test
    void aDivisionByZeroWithoutASavedValueIsAnErrorInTheCell() throws IOException {
        assertEquals(List.of("Segments!F3: the cell holds the error value #DIV/0!"),
                lines(unsavedFormula("Segments", "F3", "1/0")));
    }

    @Test
    void aFormulaThatCannotBeCalculatedIsRefusedByName() throws IOException {
        assertEquals(List.of("Segments!F3: a formula with no saved value (=NOSUCHFUNCTION(1)) that Strandbook cannot"
                        + " calculate; open and save the file in a spreadsheet program, or type the value"),
                lines(rawFormula("Segments", "F3", "NOSUCHFUNCTION(1)", null)));
    }

    @Test
    void aFormulaTakingItsValueFromAnotherFileIsRefusedEvenWithASavedValue() throws IOException {
        // [1] is the first external workbook the file links to (ECMA-376 Part 1, 18.14 External links)
        assertEquals(List.of("Segments!F3: a formula that takes its value from another file (=[1]Lengths!B7); type"
                        + " the value itself, since that file may have changed since this one was saved"),
                lines(rawFormula("Segments", "F3", "[1]Lengths!B7", "45")));
    }

    private List<String> lines(Consumer<XSSFWorkbook> edit) throws IOException {
        return ScheduleFixture.lines(read("edited", edit));
    }

    private ScheduleReadResult read(String name, Consumer<XSSFWorkbook> edit) throws IOException {
        Path sub = Files.createDirectories(folder.resolve(name));
        return reader.read(ScheduleFixture.writeEdited(sub, edit));
    }

    /** A formula as the spreadsheet library writes it, with any saved value removed. */
    private static Consumer<XSSFWorkbook> unsavedFormula(String sheet, String address, String formula) {
        return wb -> {
            XSSFCell c = (XSSFCell) cell(wb, sheet, address);
            c.setCellFormula(formula);
            if (c.getCTCell().isSetV()) {
                c.getCTCell().unsetV();
            }
        };
    }

    /** A formula written straight into the cell's XML, past the library's parser, with or without a value. */
    private static Consumer<XSSFWorkbook> rawFormula(String sheet, String address, String formula, String saved) {
        return wb -> {
            XSSFCell c = (XSSFCell) cell(wb, sheet, address);
            c.setBlank();
            c.getCTCell().addNewF().setStringValue(formula);
            if (saved != null) {
                c.getCTCell().setV(saved);
            }
        };
    }
}
