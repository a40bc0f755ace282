package org.strandbook.optics.attenuation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The lamp-drift shape against Planck's law itself and its Wien limit. */
class PlanckBrighteningTest {

    /** Planck's spectral radiance up to a constant, B ∝ λ⁻⁵/(e^(c₂/λT) − 1) (Planck, Ann. Phys. 4, 553 (1901)). */
    private static double planck(double wavelengthNm, double temperatureK) {
        double um = wavelengthNm * 1e-3;
        // c₂ = 1.438776877e-2 m·K (CODATA 2018), written here independently of the code under test
        return Math.pow(um, -5) / Math.expm1(1.438776877e4 / (um * temperatureK));
    }

    // Planck's law differentiated numerically: 10·log₁₀(B(T + 1 K)/B(T − 1 K))/2 K
    @ParameterizedTest
    @CsvSource(textBlock = """
            600, 2850
            1000, 3000
            1700, 3000
            2500, 2700
            """)
    void isTheLogDerivativeOfPlancksLaw(double wavelengthNm, double temperatureK) {
        double expected = 10 * Math.log10(planck(wavelengthNm, temperatureK + 1) / planck(wavelengthNm, temperatureK - 1))
                / 2;

        assertEquals(expected, AttenuationShapes.planckBrighteningDbPerK(wavelengthNm, temperatureK), 1e-6 * expected);
    }

    // Wien's approximation B ∝ λ⁻⁵e^(−c₂/λT) gives ∂lnB/∂T = c₂/(λT²): at 1000 nm and 3000 K,
    // x = c₂/λT = 4.80, where Planck exceeds Wien by 1/(1 − e⁻ˣ) = 1.0083 (at 2000 nm, x = 2.40: 1.1000)
    @ParameterizedTest
    @CsvSource(textBlock = """
            1000, 3000, 1.0083
            2000, 3000, 1.1000
            """)
    void approachesWiensLinearInverseWavelengthForm(double wavelengthNm, double temperatureK, double planckOverWien) {
        double wienDbPerK = 10 / Math.log(10) * 14387.76877 / (wavelengthNm * 1e-3 * temperatureK * temperatureK);

        assertEquals(planckOverWien, AttenuationShapes.planckBrighteningDbPerK(wavelengthNm, temperatureK) / wienDbPerK,
                5e-4);
    }
}
