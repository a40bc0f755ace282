package org.strandbook.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Numbers typed as text, and numbers shown back to the user. */
class DecimalTextTest {

    // ISO 80000-1:2009 (numbers): the decimal sign is a comma or a point on the line; digits may be
    // grouped in threes separated by a small space, never by a point or a comma.
    @ParameterizedTest(name = "''{0}'' reads as {1}")
    @CsvSource(delimiter = '|', textBlock = """
            12,5        | 12.5
            12.5        | 12.5
            0,125       | 0.125
            ,5          | 0.5
            1 234,5     | 1234.5
            1\u2009234.5 | 1234.5
            \u22123     | -3
            +7          | 7
            1.5e3       | 1500
            1234        | 1234
            """)
    void textNumberIsRead(String text, double expected) {
        DecimalText.Parsed p = assertInstanceOf(DecimalText.Parsed.class, DecimalText.read(text));
        assertEquals(expected, p.value());
    }

    @ParameterizedTest(name = "''{0}'' is ambiguous")
    @CsvSource({"'1,234'", "'12.500'", "'-999,000'"})
    void groupedLookingNumberIsAmbiguous(String text) {
        assertInstanceOf(DecimalText.Ambiguous.class, DecimalText.read(text));
    }

    @ParameterizedTest(name = "''{0}'' is not a number")
    @CsvSource({"NaN", "Infinity", "'12.5 m'", "1e400", "'1,2,3'", "abc", "'-'", "'1 234 m'", "0x10"})
    void otherTextIsNotANumber(String text) {
        assertInstanceOf(DecimalText.NotANumber.class, DecimalText.read(text));
    }

    @ParameterizedTest(name = "{0} shows as {1}")
    @CsvSource({"-3, -3", "3.0, 3", "12.5, 12.5", "1e308, 1E+308", "0.000123, 0.000123", "1e-7, 1E-7",
            "2147483648, 2147483648"})
    void numberIsShownAsTyped(double value, String shown) {
        assertEquals(shown, DecimalText.display(value));
    }
}
