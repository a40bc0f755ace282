package org.strandbook.optics.bend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.ConstantIndexMaterial;
import org.strandbook.optics.SellmeierMaterial;
import org.strandbook.optics.WavelengthGrid;

class GlogeBendTest {

    @Test
    void workedExampleTwoHundredMicronCoreAtFiftyMillimetres() {
        // Gloge, Appl. Opt. 11, 2506 (1972) (formula from memory), step index: M_eff/M∞ = 1 − [2a/R + (3/(2 n2 k R))^(2/3)]/(2Δ).
        // By hand: n1 = 1.4502, NA = 0.22, a = 100 µm, R = 50 mm, λ = 1000 nm
        //   n2 = √(1.4502² − 0.22²) = 1.433416;  Δ = 0.22²/(2·1.4502²) = 0.0115069
        //   2a/R = 200e-6/0.05 = 0.004;  k = 2π/1e-6 m = 6.283185e6 /m
        //   2·n2·k·R = 900 642 → 3/900 642 = 3.33096e-6 → ^(2/3) = 2.2304e-4
        //   bracket = 0.0042230 → /(2Δ) = 0.183500 → ratio 0.816500 → loss = −10·log10(0.8165) = 0.8804 dB
        BendLoss b = GlogeBend.lossPerBend(200, 0.22, 1.4502, 50, 1000);
        assertEquals(0.8165, b.guidedFraction(), 1e-4);
        assertEquals(0.8804, b.lossDb(), 1e-3);
        assertFalse(b.clamped());
    }

    @Test
    void lossRisesAsTheRadiusShrinks() {
        // Gloge 1972: both bracket terms grow as R falls
        double previous = 0;
        for (double r = 500; r >= 10; r *= 0.8) {
            double loss = GlogeBend.lossPerBend(200, 0.22, 1.45, r, 1000).lossDb();
            assertTrue(loss > previous, "R = " + r);
            previous = loss;
        }
    }

    @Test
    void lossRisesWithWavelength() {
        // Gloge 1972: the (3/(2 n2 k R))^(2/3) term grows with λ = 2π/k (index held fixed to isolate the formula's
        // own wavelength dependence; silica dispersion changes Δ slightly the other way)
        WavelengthGrid grid = WavelengthGrid.uniformNm(400, 2400, 201);
        BendLossSpectrum s = GlogeBend.lossPerBend(50, 0.22, new ConstantIndexMaterial("core", 1.45), 20, grid);
        for (int i = 1; i < grid.size(); i++) {
            assertTrue(s.lossDbAt(i) > s.lossDbAt(i - 1), "at " + grid.wavelengthNm(i) + " nm");
        }
    }

    @Test
    void silicaCoreLossRisesAcrossTheNearInfrared() {
        // same Gloge term with Malitson's silica index: across 800–2400 nm the k term dominates dispersion
        WavelengthGrid grid = WavelengthGrid.uniformNm(800, 2400, 161);
        BendLossSpectrum s = GlogeBend.lossPerBend(50, 0.22, SellmeierMaterial.FUSED_SILICA, 20, grid);
        for (int i = 1; i < grid.size(); i++) {
            assertTrue(s.lossDbAt(i) > s.lossDbAt(i - 1), "at " + grid.wavelengthNm(i) + " nm");
        }
    }

    @Test
    void radiusBeyondTheFormulasRangeIsClampedAndFlagged() {
        // at R = 5 mm the bracket exceeds 2Δ for a 200 µm NA 0.22 core: ratio ≤ 0 leaves the formula's range;
        // reporting it as 30 dB and flagging it is a design choice
        BendLoss b = GlogeBend.lossPerBend(200, 0.22, 1.45, 5, 1000);
        assertTrue(b.clamped());
        assertEquals(30.0, b.lossDb(), 1e-9);
    }

    @Test
    void minimumBendRadiusIsHundredAndTwoHundredTimesTheCladdingRadius() {
        // short-term ≥ 100×, long-term ≥ 200× cladding radius (common practice): 220 µm cladding → 11 mm, 22 mm
        assertEquals(11.0, MinimumBendRadius.shortTermMm(220), 1e-12);
        assertEquals(22.0, MinimumBendRadius.longTermMm(220), 1e-12);
        assertEquals(BendRadiusCheck.Verdict.BELOW_SHORT_TERM, MinimumBendRadius.check(220, 10).verdict());
        assertEquals(BendRadiusCheck.Verdict.BELOW_LONG_TERM, MinimumBendRadius.check(220, 15).verdict());
        assertTrue(MinimumBendRadius.check(220, 22).ok());
        assertTrue(MinimumBendRadius.check(220, 15).message().contains("22.0 mm"));
    }
}
