package org.strandbook.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * How a problem is shown. The address follows spreadsheet formula syntax (ECMA-376 Part 1,
 * SpreadsheetML formulas, from memory): Sheet!A1, a sheet name with spaces in apostrophes and an
 * apostrophe in the name doubled.
 */
class ScheduleProblemTest {

    @Test
    void cellProblemLeadsWithItsAddress() {
        assertEquals("Segments!D7: length must be a positive number of metres, was -3",
                new ScheduleProblem("Segments", 7, "D", "length must be a positive number of metres, was -3").toString());
    }

    @Test
    void sheetNameWithSpaceIsQuoted() {
        assertEquals("'Fiber types'!F2: NA must lie between 0 and 1 (both excluded), was 1.2",
                new ScheduleProblem("Fiber types", 2, "F", "NA must lie between 0 and 1 (both excluded), was 1.2")
                        .toString());
    }

    @Test
    void apostropheInSheetNameIsDoubled() {
        assertEquals("'Joe''s list'!A2", new ScheduleProblem("Joe's list", 2, "A", "x").location());
    }

    @Test
    void sheetAndFileProblemsShowTheirMessageAlone() {
        assertEquals("sheet 'Segments' is missing",
                ScheduleProblem.ofSheet("Segments", "sheet 'Segments' is missing").toString());
        assertEquals("'a.xlsx' is encrypted", ScheduleProblem.ofFile("'a.xlsx' is encrypted").toString());
    }
}
