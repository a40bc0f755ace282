package org.strandbook.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.uncertainty.BasisKind;

/** The measurement's own uncertainty of a band's mean loss. */
class MeasurementUncertaintyTest {

    private static final WavelengthGrid GRID = WavelengthGrid.uniformNm(1000, 1100, 51);

    @Test
    void coverageFactorsAreThoseOfTheNormalDistribution() {
        // JCGM 100:2008, table G.1: p = 95 % gives k = 1.960, p = 99.73 % gives k = 3
        assertEquals(1.960, MeasurementUncertainty.coverageFactor(0.95), 5e-4);
        assertEquals(3.000, MeasurementUncertainty.coverageFactor(0.9973), 5e-3);
        assertEquals(1.000, MeasurementUncertainty.coverageFactor(0.6827), 5e-4);
    }

    @Test
    void theNoiseOfABandMeanFallsAsOneOverTheRootOfItsReadings() {
        // JCGM 100:2008, 4.2.3: the experimental standard deviation of the mean is s/√n
        double[] sigma = new double[GRID.size()];
        Arrays.fill(sigma, 0.3);
        // 1020–1060 nm holds 21 grid points
        assertEquals(0.3 / Math.sqrt(21), MeasurementUncertainty.meanNoiseDb(GRID, sigma, 1020, 1060), 1e-15);
    }

    @Test
    void maskedWavelengthsAreLeftOutAndAnUnmeasuredRangeHasNoNoise() {
        double[] sigma = new double[GRID.size()];
        Arrays.fill(sigma, Double.NaN);
        assertTrue(Double.isNaN(MeasurementUncertainty.meanNoiseDb(GRID, sigma, 1020, 1060)));
        sigma[15] = 0.2;
        sigma[16] = 0.2;
        assertEquals(0.2 / Math.sqrt(2), MeasurementUncertainty.meanNoiseDb(GRID, sigma, 1020, 1060), 1e-15);
    }

    @Test
    void noiseAndRepeatabilityAddInQuadratureAndTheDefaultSaysItIsOurs() {
        // JCGM 100:2008, 5.1.2: independent inputs with unit sensitivity
        MeasurementUncertainty m = MeasurementUncertainty.withDefaultRepeatability(0.05);
        assertEquals(Math.sqrt(0.05 * 0.05 + 0.1 * 0.1), m.standardUncertaintyDb(), 1e-15);
        assertEquals(BasisKind.DESIGN_CHOICE, m.repeatabilityBasis());
        assertEquals(1.0, m.rows().stream().mapToDouble(r -> r.share()).sum(), 1e-12);
    }
}
