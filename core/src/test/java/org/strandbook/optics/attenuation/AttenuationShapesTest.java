package org.strandbook.optics.attenuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.strandbook.optics.WavelengthGrid;

class AttenuationShapesTest {

    // OH band positions: about 2.7 and 1.38 µm (Humbach et al., J. Non-Cryst. Solids 203, 19 (1996),
    // abstract), 945, 1240 and 2210 nm (from memory): each is a local maximum of the per-ppm shape.
    @ParameterizedTest
    @CsvSource(textBlock = """
            945
            1240
            1383
            2210
            2720
            """)
    void ohShapePeaksAtTheBandPositions(double centerNm) {
        double peak = AttenuationShapes.ohAbsorptionDbPerKmPerPpm(centerNm);
        assertTrue(peak > AttenuationShapes.ohAbsorptionDbPerKmPerPpm(centerNm - 8));
        assertTrue(peak > AttenuationShapes.ohAbsorptionDbPerKmPerPpm(centerNm + 8));
    }

    @Test
    void ohShapeOnAGridMatchesPointEvaluation() {
        // the grid form is the point form evaluated index by index (contract of the grid overloads)
        WavelengthGrid grid = WavelengthGrid.uniformNm(900, 2800, 96);
        double[] shape = AttenuationShapes.ohAbsorptionDbPerKmPerPpm(grid);
        for (int i = 0; i < grid.size(); i++) {
            assertEquals(AttenuationShapes.ohAbsorptionDbPerKmPerPpm(grid.wavelengthNm(i)), shape[i], 0);
        }
    }

    @Test
    void hydrogenShapePeaksNear1240And2420Nanometres() {
        // molecular hydrogen: fundamental at 2.42 µm ("Increased attenuation in optical fibres caused by
        // diffusion of molecular hydrogen at room temperature", Electron. Lett. 1983; authors K. J.
        // Beales, D. M. Cooper and J. D. Rush, vol. 19, p. 917, from memory), first overtone at 1.24 µm
        // ("Loss increase for optical fibers exposed to hydrogen atmosphere", 1985, from its abstract;
        // journal, authors and pages not at hand)
        WavelengthGrid grid = WavelengthGrid.uniformNm(1100, 2700, 1601);
        double[] s = AttenuationShapes.hydrogenBandShape(grid, 1.0);
        assertEquals(1240, grid.wavelengthNm(argMax(s, grid, 1100, 1800)), 2);
        assertEquals(2420, grid.wavelengthNm(argMax(s, grid, 1800, 2700)), 2);
    }

    @Test
    void radiationDarkeningRisesTowardShortWavelengths() {
        // radiation-induced attenuation is largest in the UV/visible and falls into the NIR
        // (from memory: Girard et al., IEEE Trans. Nucl. Sci. 60 (2013))
        double[] nm = {400, 500, 800, 1000, 1300, 1550};
        for (int i = 1; i < nm.length; i++) {
            assertTrue(AttenuationShapes.radiationDarkeningShape(nm[i - 1])
                    > AttenuationShapes.radiationDarkeningShape(nm[i]), "at " + nm[i] + " nm");
        }
    }

    @Test
    void radiationDarkeningShowsTheNbohcBandAtOnePointNineSevenElectronvolts() {
        // NBOHC band at 1.97 eV ≈ 629 nm (from memory: Girard et al. 2013); hc = 1239.84 eV·nm (CODATA 2018)
        assertEquals(629.4, AttenuationShapes.RADIATION_REFERENCE_NM, 0.1);
        assertEquals(1.0, AttenuationShapes.radiationDarkeningShape(AttenuationShapes.RADIATION_REFERENCE_NM), 1e-12);
        assertTrue(AttenuationShapes.radiationDarkeningShape(629.4) > AttenuationShapes.radiationDarkeningShape(600));
        assertTrue(AttenuationShapes.radiationDarkeningShape(629.4) > AttenuationShapes.radiationDarkeningShape(660));
    }

    @Test
    void photonEnergyOfOneMicronIsOnePointTwoFourElectronvolts() {
        // E = hc/λ, hc = 1239.841984 eV·nm (CODATA 2018)
        assertEquals(1.239842, AttenuationShapes.photonEnergyEv(1000), 1e-6);
    }

    private static int argMax(double[] s, WavelengthGrid grid, double fromNm, double toNm) {
        int best = -1;
        for (int i = 0; i < s.length; i++) {
            double w = grid.wavelengthNm(i);
            if (w >= fromNm && w <= toNm && (best < 0 || s[i] > s[best])) {
                best = i;
            }
        }
        return best;
    }
}
