package org.strandbook.throughput;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Saturation and clipping of array-spectrometer scans. A 16-bit converter stops at 65 535 counts,
 * and references are kept below roughly 80–90 % of full scale because detectors turn non-linear
 * before it (common practice). The scans are a lamp peak (a Gaussian in wavelength, invented for
 * the test) with Gaussian read noise.
 */
class DetectorClippingTest {

    private static final int POINTS = 600;
    private static final double NOISE = 4;

    /** A lamp peak of {@code peakCounts} over an 800-count offset, limited at {@code limit}, then noise. */
    private static double[] peak(double peakCounts, double limit, long seed, boolean noiseAfterLimit) {
        Random r = new Random(seed);
        double[] c = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            double x = (i - 300) / 275.0;
            double v = 800 + peakCounts * Math.exp(-x * x);
            if (noiseAfterLimit) {
                c[i] = Math.min(v, limit) + NOISE * r.nextGaussian();
            } else {
                c[i] = Math.min(Math.rint(v + NOISE * r.nextGaussian()), limit);
            }
        }
        return c;
    }

    // Clipped at 65 535: the equal readings at full scale are found, widened by one reading.
    // Hand arithmetic: 800 + 80 000·exp(−x²) ≥ 65 535 for x² ≤ ln(80 000/64 735) = 0.2117, |x| ≤ 0.4601,
    // i.e. |i − 300| ≤ 126.5: readings 174–426, widened to 173–427 (noise moves the ends by one at most).
    @Test
    void readingsHeldAtFullScaleAreClipped() {
        List<DetectorClipping.Run> runs = DetectorClipping.find(peak(80_000, 65_535, 1, false), NOISE,
                OptionalDouble.empty());

        assertEquals(1, runs.size());
        assertEquals(173, runs.get(0).from(), 1);
        assertEquals(427, runs.get(0).to(), 1);
    }

    // A peak at 30 000 counts, well inside full scale, is never taken for a clipped one.
    @Test
    void anUnclippedPeakIsLeftAlone() {
        for (long seed = 1; seed <= 50; seed++) {
            assertEquals(List.of(), DetectorClipping.find(peak(30_000, Double.MAX_VALUE, seed, false), NOISE,
                    OptionalDouble.empty()), "seed " + seed);
        }
    }

    // Saturated at 40 000 counts with noise on top: no two readings are equal, but the flanks are
    // still climbing where the readings stop. 800 + 50 000·exp(−x²) ≥ 40 000 for
    // x² ≤ ln(50 000/39 200) = 0.2433, |x| ≤ 0.4933, |i − 300| ≤ 135.6: readings 165–435, widened to 164–436.
    @Test
    void aTopFlattenedBelowFullScaleIsFound() {
        List<DetectorClipping.Run> runs = DetectorClipping.find(peak(50_000, 40_000, 7, true), NOISE,
                OptionalDouble.empty());

        assertEquals(1, runs.size());
        assertEquals(164, runs.get(0).from(), 2);
        assertEquals(436, runs.get(0).to(), 2);
    }

    // A declared full scale marks a reading at it even when it is a single one.
    @Test
    void aDeclaredFullScaleMarksEveryReadingAtIt() {
        double[] c = peak(30_000, Double.MAX_VALUE, 3, false);
        c[100] = 32_767;

        List<DetectorClipping.Run> runs = DetectorClipping.find(c, NOISE, OptionalDouble.of(32_767));

        assertEquals(List.of(new DetectorClipping.Run(99, 101)), runs);
    }

    // A dark scan has no top: integer readings repeat its highest value without any limit.
    @Test
    void aDarkScanIsNeverClipped() {
        Random r = new Random(5);
        double[] dark = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            dark[i] = Math.rint(800 + 0.4 * r.nextGaussian());
        }
        assertTrue(DetectorClipping.find(dark, 0.4, OptionalDouble.empty()).isEmpty());
    }
}
