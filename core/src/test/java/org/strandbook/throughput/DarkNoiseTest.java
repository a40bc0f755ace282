package org.strandbook.throughput;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.junit.jupiter.api.Test;

class DarkNoiseTest {

    // Hampel (J. Am. Stat. Assoc. 69, 383, 1974): 1.4826·MAD is a consistent estimate of σ for
    // Gaussian data; on point-to-point differences (von Neumann et al. 1941) divided by √2 it
    // recovers the σ of one reading while a smooth baseline and a few spikes leave it alone.
    @Test
    void recoversGaussianSigmaDespiteBaselineAndSpikes() {
        Random random = new Random(42);
        double[] dark = new double[4000];
        for (int i = 0; i < dark.length; i++) {
            dark[i] = 800 + 40 * Math.sin(i / 600.0) + 4 * random.nextGaussian();
        }
        for (int i = 100; i < dark.length; i += 400) {
            dark[i] += 5000;
        }

        assertEquals(4.0, DarkNoise.sigmaCounts(dark), 0.2);
    }

    @Test
    void flatDarkHasNoNoise() {
        assertEquals(0.0, DarkNoise.sigmaCounts(new double[] {5, 5, 5, 5, 5, 5, 5, 5, 5, 5}), 0);
    }
}
