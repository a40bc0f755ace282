package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * A sheet holds 1,048,576 rows (ECMA-376 / the XLSX row limit); a point's rows stay on one sheet,
 * so blocks are packed in order and a block that does not fit starts the next sheet.
 */
class ContinuationSheetsTest {

    // blocks (rows per point), capacity of a sheet, sheets needed: worked by hand
    @ParameterizedTest(name = "{0} into sheets of {1} rows: {2}")
    @CsvSource(textBlock = """
            '2000',                 1000000, 1
            '600 400',              1000,    1
            '600 401',              1000,    2
            '600 600 600',          1000,    3
            '400 400 400',          1000,    2
            '1000 1 1000',          1000,    3
            '',                     1000,    1
            """)
    void blocksArePackedInOrderAndKeptWhole(String blocks, int capacity, int sheets) {
        List<Integer> sizes = blocks.isBlank() ? List.of()
                : Arrays.stream(blocks.trim().split(" +")).map(Integer::valueOf).toList();
        assertEquals(sheets, ContinuationSheets.partsFor(sizes, capacity, "Spectra"));
    }

    @Test
    void aBlockLongerThanASheetIsRefusedWithItsSize() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ContinuationSheets.partsFor(List.of(5, 1001), 1000, "Spectra"));
        assertEquals("one point needs 1001 rows on sheet 'Spectra', more than a sheet holds (1000)", e.getMessage());
    }

    @Test
    void aSheetOfTheShippedTemplateHoldsTheFormatsRowsLessItsOwnThree() {
        // 2^20 rows per worksheet (ECMA-376 Part 1, row index limit; from memory)
        assertEquals((1 << 20) - 3, TableSheet.capacity(3));
    }
}
