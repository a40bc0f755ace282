package org.strandbook.optics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class FresnelTest {

    @Test
    void glassOfIndexOnePointFiveReflectsFourPercent() {
        // Fresnel normal incidence, R = ((n1 − n0)/(n1 + n0))² (Born & Wolf, Principles of Optics): (0.5/2.5)² = 0.04
        assertEquals(0.04, Fresnel.reflectance(1.5, 1.0), 1e-15);
    }

    @ParameterizedTest
    @ValueSource(doubles = {850, 1000, 1300})
    void silicaAirFaceReflectsAboutThreeAndAHalfPercentInTheNearInfrared(double nm) {
        // 3.3–3.5 % per silica/air face in the NIR (common practice), Malitson index + Fresnel
        double r = Fresnel.reflectance(SellmeierMaterial.FUSED_SILICA.refractiveIndex(nm), 1.0);
        assertTrue(r >= 0.033 && r <= 0.035, "R = " + r);
    }

    @Test
    void incoherentAndSinglePassGapsDifferByAboutFiveThousandthsOfADecibel() {
        // (1 − R)/(1 + R) divided by (1 − R)² is 1/(1 − R²): the two differ by −10·log10(1 − R²) ≈ 0.005 dB for R ≈ 0.034
        double n = SellmeierMaterial.FUSED_SILICA.refractiveIndex(1000);
        double diff = Fresnel.gapLossDbSinglePass(n, 1.0) - Fresnel.gapLossDb(n, 1.0);
        double r = Fresnel.reflectance(n, 1.0);
        assertEquals(-10 * Math.log10(1 - r * r), diff, 1e-12);
        assertEquals(0.005, diff, 0.001);
    }

    @Test
    void anIncoherentFacePairTransmitsTheSumOfItsMultipleReflections() {
        // derived here: light crossing two parallel faces leaves after 0, 2, 4, … internal reflections,
        // T = (1−R)²·(1 + R² + R⁴ + …); summed term by term, not by the closed form (1−R)/(1+R)
        double n = SellmeierMaterial.SAPPHIRE_ORDINARY.refractiveIndex(1300);
        double r = Fresnel.reflectance(n, 1.0);
        double transmitted = 0;
        double bounce = (1 - r) * (1 - r);
        for (int k = 0; k < 60; k++) {
            transmitted += bounce;
            bounce *= r * r;
        }
        assertEquals(-10 * Math.log10(transmitted), Fresnel.gapLossDb(n, 1.0), 1e-12);
    }

    @Test
    void indexMatchingGelRemovesNearlyAllGapLoss() {
        // Fresnel: n1 = 1.450, n0 = 1.46 gives R ≈ 1.2e-5, far below an air gap's 0.29 dB
        double n = SellmeierMaterial.FUSED_SILICA.refractiveIndex(1000);
        assertTrue(Fresnel.gapLossDb(n, 1.46) < 0.001);
        assertTrue(Fresnel.gapLossDb(n, 1.0) > 0.28);
    }

    @Test
    void fiftyMicronAirGapFringesEveryHundredWavenumbers() {
        // Fabry–Pérot free spectral range Δν̃ = 1/(2nd) (Born & Wolf): 1/(2·1·50e-4 cm) = 100 cm⁻¹
        assertEquals(100.0, Fresnel.etalonFringeSpacingCm(1.0, 50), 1e-9);
        // Δλ = λ²/(2nd): 1550²/(2·50 000) nm = 24.025 nm
        assertEquals(24.025, Fresnel.etalonFringeSpacingNm(1550, 1.0, 50), 1e-9);
    }

    @Test
    void oddFaceCountAddsOneSingleFace() {
        // three faces = one incoherent pair + one single face, per the documented grouping
        double n = 1.76;
        assertEquals(Fresnel.gapLossDb(n, 1.0) + Fresnel.faceLossDb(n, 1.0), Fresnel.facesLossDb(n, 1.0, 3), 1e-12);
    }
}
