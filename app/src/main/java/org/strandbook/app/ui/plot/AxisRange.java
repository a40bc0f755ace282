package org.strandbook.app.ui.plot;

/**
 * The bounds and tick step of one plot axis. Steps are 1, 2 or 5 times a power of ten, the way
 * graph paper is ruled, so tick labels stay short and round.
 *
 * @param lower lower bound, in the axis unit
 * @param upper upper bound
 * @param tick  distance between ticks
 */
public record AxisRange(double lower, double upper, double tick) {

    public AxisRange {
        if (!(upper > lower) || !(tick > 0)) {
            throw new IllegalArgumentException("axis range " + lower + " to " + upper + " by " + tick + " is empty");
        }
    }

    /** The data's own bounds, with a round step giving about {@code ticks} ticks. */
    public static AxisRange exact(double lower, double upper, int ticks) {
        double hi = upper > lower ? upper : lower + 1;
        return new AxisRange(lower, hi, roundStep((hi - lower) / ticks));
    }

    /** Bounds widened to whole steps around the data, about {@code ticks} ticks. */
    public static AxisRange rounded(double lower, double upper, int ticks) {
        double hi = upper > lower ? upper : lower + 1;
        double step = roundStep((hi - lower) / ticks);
        return new AxisRange(Math.floor(lower / step) * step, Math.ceil(hi / step) * step, step);
    }

    /** The 1-2-5 step nearest above {@code raw}. */
    static double roundStep(double raw) {
        double power = Math.pow(10, Math.floor(Math.log10(raw)));
        double f = raw / power;
        double m = f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10;
        return m * power;
    }
}
