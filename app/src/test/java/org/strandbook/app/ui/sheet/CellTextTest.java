package org.strandbook.app.ui.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** How cell text is read and written: numbers, addresses and tab-separated blocks. */
class CellTextTest {

    private static final DecimalParser LENGTH = DecimalParser.in("m").above(0).withDecimalComma();

    // Decimal sign comma or point: ISO 80000-1:2009, 7.3.2. A grouping comma before three digits is
    // ambiguous between the two conventions and must not be guessed (Strandbook design choice).
    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            12.5      | 12.5
            12,5      | 12.5
            0,125     | 0.125
            12.5 m    | 12.5
            1e3       | 1000
            .5        | 0.5
            """)
    void lengthTextReadsAsNumber(String text, double expected) {
        assertEquals(ParseResult.accepted(expected), LENGTH.parse(text));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            1,250     | '1,250' is ambiguous: write 1250 or 1.250
            1.250,5   | '1.250,5': write one decimal separator and no thousands separator
            NaN       | 'NaN' is not a number in m
            1d        | '1d' is not a number in m
            0         | must be more than 0 m, was 0
            \u22123   | must be more than 0 m, was -3
            """)
    void badLengthTextIsRefusedWithReason(String text, String reason) {
        assertEquals(ParseResult.rejected(reason), LENGTH.parse(text));
    }

    @Test
    void decimalCommaIsRefusedWhereTheColumnDoesNotAllowIt() {
        assertEquals(ParseResult.rejected("'2,5': use a decimal point"), DecimalParser.in("dB").parse("2,5"));
    }

    // Column letters of the A1 reference style, ECMA-376 Part 1 (SpreadsheetML cell references).
    @ParameterizedTest
    @CsvSource(textBlock = """
            0, A
            25, Z
            26, AA
            27, AB
            701, ZZ
            702, AAA
            """)
    void columnLettersFollowTheA1Style(int column, String letters) {
        assertEquals(letters, CellAddress.columnName(column));
    }

    // Tab-separated values: IANA media type text/tab-separated-values; quoting of cells holding a
    // tab, line break or quote as RFC 4180 section 2 rules 5-7 describe for CSV, which spreadsheet
    // programs also apply to tab-separated clipboard text.
    @Test
    void quotedCellsKeepTabsLineBreaksAndQuotes() {
        List<List<String>> rows = TabularText.parse("\"a\tb\"\t\"say \"\"hi\"\"\"\r\n\"two\nlines\"\tx\r\n");

        assertEquals(List.of(List.of("a\tb", "say \"hi\""), List.of("two\nlines", "x")), rows);
    }

    @Test
    void oneTrailingLineBreakIsNotARow() {
        assertEquals(List.of(List.of("1", "2")), TabularText.parse("1\t2\n"));
    }

    @Test
    void emptyCellsAtTheEndOfARowAreKept() {
        assertEquals(List.of(List.of("1", "", "")), TabularText.parse("1\t\t"));
    }

    @Test
    void formatQuotesOnlyWhereNeededAndReadsBack() {
        List<List<String>> block = List.of(List.of("plain", "with\ttab"), List.of("\"quoted\"", "2.5"));
        String text = TabularText.format(block);

        assertEquals("plain\t\"with\ttab\"\n\"\"\"quoted\"\"\"\t2.5", text);
        assertEquals(block, TabularText.parse(text));
    }

    @Test
    void raggedBlockIsNamed() {
        assertTrue(TabularText.notRectangular(TabularText.parse("1\t2\n3")).isPresent());
    }
}
