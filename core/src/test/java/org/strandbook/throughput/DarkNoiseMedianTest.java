package org.strandbook.throughput;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.apache.commons.math3.stat.descriptive.rank.Median;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

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

    @ParameterizedTest(name = "{0}")
    @EnumSource(LongScan.class)
    void sampledSelectionMatchesCommonsMathOnScanLengthArrays(LongScan shape) {
        // reference: Apache Commons Math 3.6.1, Median (Percentile estimation type LEGACY, p = 50);
        // lengths from just above the sampling threshold to a long scan, odd and even
        Random rnd = new Random(7);
        for (int n : new int[] {MedianSelection.SAMPLED_FROM, MedianSelection.SAMPLED_FROM + 1, 1400, 1501, 4001}) {
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                v[i] = shape.value(i, n, rnd);
            }
            double expected = new Median().evaluate(v.clone());
            assertEquals(expected, DarkNoise.median(v.clone()), 0.0, shape + ", n = " + n);
        }
    }

    /** Arrays that reach the bucketed path, its end buckets, its fallback and ties. */
    enum LongScan {
        GAUSSIAN_NOISE {
            double value(int i, int n, Random rnd) {
                return 5 * rnd.nextGaussian();
            }
        },
        WHOLE_COUNTS_WITH_TIES {
            double value(int i, int n, Random rnd) {
                return Math.rint(2 * rnd.nextGaussian());
            }
        },
        ASCENDING {
            double value(int i, int n, Random rnd) {
                return i;
            }
        },
        DESCENDING {
            double value(int i, int n, Random rnd) {
                return n - i;
            }
        },
        CONSTANT {
            double value(int i, int n, Random rnd) {
                return 3.5;
            }
        },
        SPREAD_BEYOND_THE_DOUBLE_RANGE {
            // the sample's spread overflows, so the whole array is selected from
            double value(int i, int n, Random rnd) {
                return (i % 2 == 0 ? 1e308 : -1e308) * rnd.nextDouble();
            }
        },
        SAMPLE_POSITIONS_MISLEADING {
            // every sampled index holds a large value, so the median lies in the bucket below the sample
            double value(int i, int n, Random rnd) {
                return isSampledIndex(i, n) ? 1e6 + i : rnd.nextGaussian();
            }
        },
        SPIKES_AND_INFINITIES {
            double value(int i, int n, Random rnd) {
                return i % 97 == 0 ? Double.POSITIVE_INFINITY : i % 89 == 0 ? -5000 : rnd.nextGaussian();
            }
        };

        abstract double value(int i, int n, Random rnd);

        private static boolean isSampledIndex(int i, int n) {
            for (int s = 0; s < MedianSelection.SAMPLE_SIZE; s++) {
                if ((int) ((long) s * n / MedianSelection.SAMPLE_SIZE) == i) {
                    return true;
                }
            }
            return false;
        }
    }
}
