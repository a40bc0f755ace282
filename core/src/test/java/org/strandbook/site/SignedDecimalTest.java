package org.strandbook.site;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class SignedDecimalTest {

    @Test
    void aSmallNegativeChangeThatRoundsToZeroPrintsAsPlusZero() {
        // ISO 80000-1:2009 writes zero without a sign; "-0.00 dB/yr" would read as a loss
        assertEquals("+0.00", SignedDecimal.of(-0.001, 2));
    }

    @Test
    void negativeZeroPrintsAsPlusZero() {
        // IEEE 754-2019 §6.3: −0 compares equal to +0; a report shows one zero
        assertEquals("+0.0", SignedDecimal.of(-0.0, 1));
    }

    @Test
    void aNegativeChangeKeepsItsSign() {
        // half-up rounding of the decimal value, as java.util.Formatter documents for %f
        assertEquals("-0.40", SignedDecimal.of(-0.4, 2));
        assertEquals("-0.01", SignedDecimal.of(-0.006, 2));
    }

    @Test
    void aPositiveChangeCarriesItsPlus() {
        // java.util.Formatter: the '+' flag always includes a sign
        assertEquals("+1.250", SignedDecimal.of(1.25, 3));
    }
}
