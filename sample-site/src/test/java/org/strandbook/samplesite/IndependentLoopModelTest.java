package org.strandbook.samplesite;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The test-only forward model against the laws it claims, worked by hand beside each check. */
class IndependentLoopModelTest {

    // Wien's displacement law: λ_max·T = 2897.77 µm·K (CODATA 2018 b); at 3000 K the peak is at 965.9 nm
    @Test
    void lampPeaksWhereWiensDisplacementLawSays() {
        double bestNm = 0;
        double best = 0;
        for (double nm = 500; nm <= 1500; nm += 0.1) {
            double b = IndependentLoopModel.planck(nm, 3000);
            if (b > best) {
                best = b;
                bestNm = nm;
            }
        }
        assertEquals(2897.77 / 3000 * 1000, bestNm, 0.2);
    }

    // Airy (Born & Wolf, Principles of Optics, §7.6.1): T_max/T_min = ((1 + R)/(1 − R))²; with
    // R = ((1.447 − 1)/(1.447 + 1))² = 0.03337 (Fresnel) that is 0.580 dB peak to peak
    @Test
    void fullyCoherentGapRipplesByTheAiryContrast() {
        assertEquals(0.580, IndependentLoopModel.airyPeakToPeakDb(1.0), 0.001);
    }

    // Fabry–Pérot maxima repeat every Δν̃ = 1/(2d) (Born & Wolf §7.6): a 50 µm gap, 100 cm⁻¹
    @Test
    void gapRipplesWithThePeriodOneOverTwiceTheGap() {
        double gapUm = 50;
        double atPeakNm = 1.0e7 / 6000;           // δ = 4π·d·ν̃ = 2π·60 there: a transmission maximum
        double nextPeakNm = 1.0e7 / 6100;
        double halfwayNm = 1.0e7 / 6050;
        assertEquals(IndependentLoopModel.airyGapLossDb(atPeakNm, gapUm, 1),
                IndependentLoopModel.airyGapLossDb(nextPeakNm, gapUm, 1), 1e-9);
        assertEquals(0.580, IndependentLoopModel.airyGapLossDb(halfwayNm, gapUm, 1)
                - IndependentLoopModel.airyGapLossDb(atPeakNm, gapUm, 1), 0.001);
    }

    // Gloge, Appl. Opt. 11, 2506 (1972), step index: kept = 1 − (1/2Δ)[2a/R + (3/(2n₂kR))^(2/3)].
    // 400 µm core, NA 0.22, R = 50 mm, 1500 nm, n₁ = 1.447: Δ = 0.011558, 2a/R = 0.008,
    // (3/(2·1.43028·4.18879 µm⁻¹·50,000 µm))^(2/3) = 2.93e-4, kept = 0.6412: 1.930 dB
    @Test
    void bendLossFollowsGlogesStepIndexFormula() {
        assertEquals(1.930, IndependentLoopModel.glogeBendLossDb(1500, 400, 0.22, 50), 0.001);
    }
}
