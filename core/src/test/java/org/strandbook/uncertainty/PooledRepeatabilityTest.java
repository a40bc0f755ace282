package org.strandbook.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The pooled repeatability of repeated readings against certified reference data. */
class PooledRepeatabilityTest {

    /**
     * NIST Statistical Reference Datasets, one-way ANOVA "SiRstv" (silicon resistivity, 5
     * instruments × 5 readings, lower difficulty): certified within-instrument residual standard
     * deviation 1.04076068334656E-01 with 20 degrees of freedom. Its readings share three leading
     * digits, which a one-pass sum of squares would lose.
     */
    private static final List<double[]> SI_RSTV = List.of(
            new double[] {196.3052, 196.1240, 196.1890, 196.2569, 196.3403},
            new double[] {196.3042, 196.3825, 196.1669, 196.3257, 196.0422},
            new double[] {196.1303, 196.2005, 196.2889, 196.0343, 196.1811},
            new double[] {196.2795, 196.1748, 196.1494, 196.1485, 195.9885},
            new double[] {196.2119, 196.1051, 196.1850, 196.0052, 196.2090});

    @Test
    void reproducesTheCertifiedResidualStandardDeviationOfSiRstv() {
        PooledRepeatability p = PooledRepeatability.of(SI_RSTV);
        assertEquals(0.104076068334656, p.standardDeviation(), 1e-12);
        assertEquals(20, p.degreesOfFreedom());
        assertEquals(5, p.groups());
    }

    @Test
    void aLevelThatMovesBetweenGroupsIsNoPartOfTheRepeatability() {
        // JCGM 100:2008, 4.2.4: only the spread within each group is pooled
        List<double[]> shifted = SI_RSTV.stream().map(g -> {
            double[] s = g.clone();
            for (int i = 0; i < s.length; i++) {
                s[i] += 1000 * g.length;
            }
            return s;
        }).toList();
        assertEquals(0.104076068334656, PooledRepeatability.of(shifted).standardDeviation(), 1e-9);
    }

    @Test
    void singleReadingsAndUnmeasuredOnesCarryNoDegreeOfFreedom() {
        assertNull(PooledRepeatability.of(List.of(new double[] {0.0}, new double[] {0.1, Double.NaN})));
        PooledRepeatability pair = PooledRepeatability.of(List.of(new double[] {0.0, 0.2}, new double[] {0.5}));
        // two readings a apart: s = a/√2 (the sample standard deviation of two values)
        assertEquals(0.2 / Math.sqrt(2), pair.standardDeviation(), 1e-15);
        assertEquals(1, pair.degreesOfFreedom());
    }
}
