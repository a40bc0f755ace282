package org.strandbook.diagnosis;

import java.util.ArrayList;
import java.util.List;

/**
 * Where a fitted shape's amount is stated, and whether it is only a lower bound.
 *
 * <p>A shape is stated at its first candidate band that was measured (candidates in order of
 * preference: for OH the strongest band first). When a preferred band lies inside the grid but was
 * dark or masked, the fit saw only the shape's weaker part: a stronger band that went dark is what a
 * large amount looks like, so the amount is reported as "at least" and names that band.
 *
 * @param atNm          the wavelength the amount is stated at, nm
 * @param shapeValue    the shape's value there (the amount is coefficient × shape value)
 * @param unmeasuredNm  the preferred bands inside the grid that were not measured, nm; empty when none
 */
record StatedAmount(double atNm, double shapeValue, List<Double> unmeasuredNm) {

    StatedAmount {
        unmeasuredNm = List.copyOf(unmeasuredNm);
    }

    /** True when a preferred band was dark or masked: the amount is only a lower bound. */
    boolean atLeast() {
        return !unmeasuredNm.isEmpty();
    }

    static StatedAmount of(MeasuredRange range, double[] shapeOnGrid, List<Double> candidatesNm) {
        List<Double> unmeasured = new ArrayList<>();
        for (double c : candidatesNm) {
            if (range.measuredAt(c)) {
                return new StatedAmount(c, range.grid().interpolate(shapeOnGrid, c), unmeasured);
            }
            if (range.grid().covers(c)) {
                unmeasured.add(c);
            }
        }
        // no candidate measured: the strongest point of the shape that was
        int best = -1;
        for (int i = 0; i < shapeOnGrid.length; i++) {
            if (range.usable(i) && (best < 0 || Math.abs(shapeOnGrid[i]) > Math.abs(shapeOnGrid[best]))) {
                best = i;
            }
        }
        double at = range.grid().wavelengthNm(best);
        return new StatedAmount(at, shapeOnGrid[best], unmeasured);
    }
}
