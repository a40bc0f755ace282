package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Chart caches write each value as decimal text that reads back to the same double; Java's own
 * {@link Double#parseDouble} (IEEE 754 round to nearest) is the reference reader.
 */
class ChartCacheStreamTest {

    // value, text written: four-decimal values from their scaled integer, others as Double.toString
    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource(textBlock = """
            4.4123,      4.4123
            4.41,        4.41
            -0.0001,     -0.0001
            1000.75,     1000.75
            12.0,        12
            0.0,         0
            38.5006,     38.5006
            2.5E-5,      2.5E-5
            45599.33403, 45599.33403
            1.0E20,      1.0E20
            """)
    void writesTheShortestDecimalThatReadsBackExactly(double value, String text) {
        StringBuilder b = new StringBuilder();
        ChartCacheStream.appendNumber(b, value);
        assertEquals(text, b.toString());
        assertEquals(value, Double.parseDouble(b.toString()), 0.0);
    }
}
