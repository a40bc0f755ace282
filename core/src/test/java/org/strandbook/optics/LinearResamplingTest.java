package org.strandbook.optics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.junit.jupiter.api.Test;

class LinearResamplingTest {

    private static final double RELATIVE_TOLERANCE = 1e-12;

    @Test
    void scanOnAFourierAxisLandsOnTheEvenGridAsTheReferenceInterpolatorPutsIt() {
        // reference: Apache Commons Math 3.6.1, LinearInterpolator (piecewise-linear spline)
        WavelengthGrid axis = WavelengthGrid.uniformWavenumberCm(4000, 10000, 1501);
        WavelengthGrid grid = WavelengthGrid.uniformNm(1002, 2498, 749);
        Random rnd = new Random(11);
        double[] counts = new double[axis.size()];
        for (int i = 0; i < counts.length; i++) {
            counts[i] = 20000 * Math.exp(-Math.pow((axis.wavelengthNm(i) - 1600) / 400, 2)) + 5 * rnd.nextGaussian();
        }
        PolynomialSplineFunction reference = new LinearInterpolator().interpolate(axis.wavelengthsNm(), counts);

        double[] onGrid = axis.resamplingOnto(grid).apply(counts);

        for (int i = 0; i < grid.size(); i++) {
            double expected = reference.value(grid.wavelengthNm(i));
            assertEquals(expected, onGrid[i], RELATIVE_TOLERANCE * Math.abs(expected), "at " + grid.wavelengthNm(i) + " nm");
        }
    }

    @Test
    void straightLineIsReproducedInsideTheAxisAndItsEndsHeldOutside() {
        // linear interpolation is exact for a polynomial of degree one (R. L. Burden, J. D. Faires,
        // Numerical Analysis, 9th ed., 2011, Theorem 3.3: the error term holds f''); beyond the axis
        // the end values are held, as WavelengthGrid.resample documents
        WavelengthGrid axis = WavelengthGrid.ofNm(1000, 1010, 1020);
        WavelengthGrid grid = WavelengthGrid.ofNm(990, 1000, 1005, 1017.5, 1020, 1030);

        double[] onGrid = axis.resamplingOnto(grid).apply(new double[] {1, 3, 5});

        assertArrayEquals(new double[] {1, 1, 2, 4.5, 5, 5}, onGrid, 0.0);
    }
}
