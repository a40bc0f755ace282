package org.strandbook.optics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class FiberGeometryTest {

    @Test
    void naPointTwoTwoAcceptsATwentyFiveDegreeCone() {
        // NA 0.22 fibers accept a ~25° full cone (common practice): arcsin 0.22 = 12.7°
        assertEquals(12.7, FiberGeometry.acceptanceHalfAngleDeg(0.22, 1.0), 0.05);
        assertEquals(25.4, FiberGeometry.acceptanceFullConeDeg(0.22, 1.0), 0.1);
    }

    @Test
    void textbookSilicaFiberHasNaPointTwoFourAndFourteenDegrees() {
        // n1 = 1.48, n2 = 1.46: NA = 0.242, θa = 14.0° (from memory: G. Keiser, Optical Fiber Communications, worked example)
        double na = FiberGeometry.numericalAperture(1.48, 1.46);
        assertEquals(0.242, na, 0.0005);
        assertEquals(14.0, FiberGeometry.acceptanceHalfAngleDeg(na, 1.0), 0.05);
        // critical angle arcsin(1.46/1.48) = 80.6° from the interface normal (Snell's law)
        assertEquals(80.6, FiberGeometry.criticalAngleDeg(1.48, 1.46), 0.05);
    }

    @Test
    void claddingIndexFollowsFromCoreIndexAndNa() {
        // NA² = n1² − n2² (definition of NA for a step-index fiber)
        double n2 = FiberGeometry.claddingIndex(1.4504, 0.22);
        assertEquals(0.22, FiberGeometry.numericalAperture(1.4504, n2), 1e-12);
    }

    @Test
    void naOfOneOrMoreIsRefused() {
        // an NA ≥ 1 has no acceptance angle in air (arcsin undefined)
        assertThrows(IllegalArgumentException.class, () -> FiberGeometry.acceptanceHalfAngleDeg(1.0, 1.0));
    }
}
