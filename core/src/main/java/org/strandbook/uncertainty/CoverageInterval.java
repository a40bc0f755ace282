package org.strandbook.uncertainty;

/**
 * An interval containing the output quantity with a stated probability (JCGM 101:2008, 3.12).
 *
 * @param low lower end
 * @param high upper end ≥ low
 * @param probability coverage probability, 0–1
 * @param method how the interval was found
 */
public record CoverageInterval(double low, double high, double probability, Method method) {

    /** How an interval was chosen. */
    public enum Method {
        /** y ± k·u with the normal coverage factor (JCGM 100:2008, G.6.4 / 6.2). */
        NORMAL_COVERAGE_FACTOR,
        /** Equal tail probabilities (JCGM 101:2008, 7.7.1). */
        PROBABILISTICALLY_SYMMETRIC,
        /** The shortest of all intervals with that probability (JCGM 101:2008, 7.7.2). */
        SHORTEST
    }

    public CoverageInterval {
        if (!(high >= low)) {
            throw new IllegalArgumentException("coverage interval reversed: " + low + " > " + high);
        }
        if (!(probability > 0 && probability < 1)) {
            throw new IllegalArgumentException("coverage probability must lie in (0, 1), was " + probability);
        }
    }

    public double width() {
        return high - low;
    }

    public boolean contains(double value) {
        return value >= low && value <= high;
    }
}
