package org.strandbook.optics.path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.attenuation.SilicaAttenuation;
import org.strandbook.optics.attenuation.SilicaFiberGrade;

class ReachTest {

    @Test
    void reachIsTheRemainingAllowanceOverTheAttenuation() {
        // by hand: (3 dB − 1 dB) / (1000 dB/km = 1 dB/m) = 2 m; nothing left when the rest uses the allowance
        double[] reach = Reach.maxLengthM(new double[] {1000, 10, 1000}, 3.0, new double[] {1.0, 1.0, 3.5});
        assertEquals(2.0, reach[0], 1e-12);
        assertEquals(200.0, reach[1], 1e-9);
        assertEquals(0.0, reach[2], 0);
    }

    @Test
    void fiberUsedToItsReachMeetsTheAllowanceExactly() {
        // α·L/1000 + other = allowed at L = reach (inverse of the fiber-loss formula)
        FiberSpec fiber = FiberSpec.silicaCore(200, 220, 0.22, SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 5));
        WavelengthGrid grid = WavelengthGrid.uniformNm(900, 2300, 15);
        OpticsCache cache = new OpticsCache(grid);
        double[] other = new double[grid.size()];
        java.util.Arrays.fill(other, 0.5);
        double[] reach = Reach.maxLengthM(fiber, cache, 3.0, other);
        double[] att = cache.attenuationDbPerKm(fiber.attenuation());
        for (int i = 0; i < reach.length; i++) {
            assertEquals(3.0, att[i] * reach[i] / 1000 + 0.5, 1e-9);
        }
    }

    @Test
    void windowsAreTheStretchesWithinTheAllowanceWithInterpolatedEdges() {
        // by hand: loss 4,2,2,4,4,1,5 dB at 100..700 nm against 3 dB: crossings at 100 + 100·(4−3)/(4−2) = 150,
        // 300 + 100·(3−2)/(4−2) = 350, 500 + 100·(3−4)/(1−4) = 533.3 and 600 + 100·(3−1)/(5−1) = 650 nm
        WavelengthGrid grid = WavelengthGrid.uniformNm(100, 700, 7);
        List<SpectralWindow> w = Reach.usableWindows(grid, new double[] {4, 2, 2, 4, 4, 1, 5}, 3.0);
        assertEquals(2, w.size());
        assertEquals(150, w.get(0).startNm(), 1e-9);
        assertEquals(350, w.get(0).endNm(), 1e-9);
        assertEquals(533.333333, w.get(1).startNm(), 1e-6);
        assertEquals(650, w.get(1).endNm(), 1e-9);
    }

    @Test
    void windowTouchingTheGridEndStopsThere() {
        // the grid says nothing beyond its ends
        WavelengthGrid grid = WavelengthGrid.uniformNm(100, 400, 4);
        List<SpectralWindow> w = Reach.usableWindows(grid, new double[] {1, 1, 5, 1}, 3.0);
        assertEquals(100, w.get(0).startNm(), 0);
        assertEquals(400, w.get(1).endNm(), 0);
        assertTrue(w.get(0).endNm() > 200 && w.get(0).endNm() < 300);
    }
}
