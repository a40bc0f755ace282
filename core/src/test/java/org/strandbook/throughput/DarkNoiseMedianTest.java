package org.strandbook.throughput;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.apache.commons.math3.stat.descriptive.rank.Median;
import org.junit.jupiter.api.Test;

/** The hand-written selection agrees with a general-purpose reference library's median. */
class DarkNoiseMedianTest {

    @Test
    void selectionMedianMatchesCommonsMathOnRandomArrays() {
        // reference: Apache Commons Math 3.6.1, Median (Percentile estimation type LEGACY, p = 50)
        Random rnd = new Random(42);
        for (int trial = 0; trial < 500; trial++) {
            int n = 1 + rnd.nextInt(60);
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                v[i] = rnd.nextInt(5) == 0 ? rnd.nextInt(4) : rnd.nextGaussian();
            }
            double expected = new Median().evaluate(v.clone());
            assertEquals(expected, DarkNoise.median(v.clone()), 0.0, "trial " + trial);
        }
    }
}
