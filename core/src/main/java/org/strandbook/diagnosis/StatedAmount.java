package org.strandbook.diagnosis;

import java.util.List;
import java.util.Optional;

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
 * @param atLeast       true when a preferred band was dark or masked
 * @param unmeasuredNm  the first preferred band that was not measured, nm; NaN when none
 */
record StatedAmount(double atNm, double shapeValue, boolean atLeast, double unmeasuredNm) {

    static StatedAmount of(MeasuredRange range, double[] shapeOnGrid, List<Double> candidatesNm) {
        Optional<Double> unmeasured = Optional.empty();
        for (double c : candidatesNm) {
            if (range.measuredAt(c)) {
                boolean partial = unmeasured.isPresent();
                return new StatedAmount(c, range.grid().interpolate(shapeOnGrid, c), partial,
                        unmeasured.orElse(Double.NaN));
            }
            if (unmeasured.isEmpty() && range.grid().covers(c)) {
                unmeasured = Optional.of(c);
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
        return new StatedAmount(at, shapeOnGrid[best], unmeasured.isPresent(), unmeasured.orElse(Double.NaN));
    }
}
