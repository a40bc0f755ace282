package org.strandbook.scanfile;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** YFACTOR scaling gives the double nearest the decimal a writer meant (IEEE 754-2019 rounding). */
class FactorScalingTest {

    @Test
    void aDecimalFactorReadsAsTheIntendedDecimal() {
        // 7998416 × 0.0001 multiplied in binary is 799.8416000000001; the file means 799.8416
        assertEquals(Double.parseDouble("799.8416"), JcampDxReader.scale(7998416, 0.0001), 0.0);
    }

    @Test
    void otherFactorsMultiply() {
        assertEquals(7.5, JcampDxReader.scale(3, 2.5), 0.0);
    }
}
