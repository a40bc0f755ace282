package org.strandbook.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class InputDistributionTest {

    @Test
    void rectangularHalfWidthOverRootThree() {
        // JCGM 100:2008, 4.3.7: u = a/√3 for half-width a; expectation the midpoint.
        InputDistribution.Rectangular r = new InputDistribution.Rectangular(0.2, 1.2);
        assertEquals(0.5 / Math.sqrt(3), r.standardUncertainty(), 1e-12);
        assertEquals(0.7, r.expectation(), 1e-12);
    }

    @Test
    void symmetricTriangularHalfWidthOverRootSix() {
        // JCGM 100:2008, 4.3.9: u = a/√6 for a symmetric triangle of half-width a.
        InputDistribution.Triangular t = new InputDistribution.Triangular(-2, 0, 2);
        assertEquals(2 / Math.sqrt(6), t.standardUncertainty(), 1e-12);
    }

    @Test
    void asymmetricTriangularMeanAndVariance() {
        // Evans, Hastings & Peacock, Statistical Distributions (3rd ed., 2000), triangular:
        // mean (a+b+c)/3, variance (a²+b²+c²−ab−ac−bc)/18. For a=0, c=0, b=1: 1/3 and 1/18.
        InputDistribution.Triangular t = new InputDistribution.Triangular(0, 0, 1);
        assertEquals(1.0 / 3, t.expectation(), 1e-12);
        assertEquals(Math.sqrt(1.0 / 18), t.standardUncertainty(), 1e-12);
    }

    @Test
    void reversedBoundsAreRejected() {
        // Design choice: a range entered the wrong way round is an input error, not a silent swap.
        assertThrows(IllegalArgumentException.class, () -> new InputDistribution.Rectangular(1.2, 0.2));
    }
}
