package org.strandbook.optics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class DecibelTest {

    private static final double TOLERANCE = 1e-12;

    // Power level in decibels, L = 10·log10(P1/P2): IEC 60027-3 (logarithmic quantities and units).
    @ParameterizedTest
    @CsvSource(textBlock = """
            0,  1.0
            10, 0.1
            20, 0.01
            30, 0.001
            """)
    void decadesOfLossAreDecadesOfTransmittance(double lossDb, double transmittance) {
        assertEquals(transmittance, Decibel.transmittanceFromLossDb(lossDb), TOLERANCE);
        assertEquals(lossDb, Decibel.lossDbFromTransmittance(transmittance), 1e-9);
    }

    @Test
    void threeDecibelsLeaveAboutHalfTheLight() {
        // 3 dB ≈ 50 %: 10^(−0.3) = 0.501 (definition of the decibel)
        assertEquals(0.50, Decibel.transmittanceFromLossDb(3.0), 0.005);
    }

    @Test
    void attenuationConvertsBetweenPerKilometreAndPerMetre() {
        // 1 km = 1000 m (SI), so 1000 dB/km = 1 dB/m
        assertEquals(1.0, Decibel.dbPerMFromDbPerKm(1000), TOLERANCE);
        assertEquals(850, Decibel.dbPerKmFromDbPerM(0.85), TOLERANCE);
    }
}
