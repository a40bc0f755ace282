package org.strandbook.optics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class WavenumberTest {

    // Wavenumber is the reciprocal of the vacuum wavelength: ISO 80000-7:2019 (light and radiation);
    // 1 cm = 10^7 nm.
    @ParameterizedTest
    @CsvSource(textBlock = """
            1000, 10000
            2500,  4000
            1250,  8000
             800, 12500
            """)
    void wavenumberIsTheReciprocalWavelength(double nm, double cm) {
        assertEquals(cm, Wavenumber.wavenumberCmFromNm(nm), 1e-9);
        assertEquals(nm, Wavenumber.nmFromWavenumberCm(cm), 1e-9);
    }

    @Test
    void gridEvenInWavenumberKeepsItsEndsAndAscendsInWavelength() {
        // ends 4000 and 12500 cm-1 are 2500 and 800 nm by ISO 80000-7's ν̃ = 1/λ
        WavelengthGrid grid = WavelengthGrid.uniformWavenumberCm(4000, 12500, 171);
        assertEquals(800, grid.firstNm(), 1e-9);
        assertEquals(2500, grid.lastNm(), 1e-9);
        double[] k = grid.wavenumbersCm();
        for (int i = 1; i < k.length; i++) {
            assertEquals(50.0, k[i - 1] - k[i], 1e-6);
            assertTrue(grid.wavelengthNm(i) > grid.wavelengthNm(i - 1));
        }
    }
}
