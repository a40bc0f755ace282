package org.strandbook.uncertainty;

import org.apache.commons.math3.random.RandomGenerator;

/**
 * The probability distribution assigned to one input quantity (JCGM 101:2008, clause 6): what is
 * known about it, not a single number. Losses in dB are the usual quantity here.
 */
public sealed interface InputDistribution
        permits InputDistribution.Normal, InputDistribution.Rectangular, InputDistribution.Triangular {

    /** Expectation, the estimate the law of propagation uses (JCGM 100:2008, 4.1.4). */
    double expectation();

    /** Standard deviation of the distribution: the standard uncertainty (JCGM 100:2008, 2.3.1). */
    double standardUncertainty();

    /** One draw, for Monte Carlo (JCGM 101:2008, 6.4 and annex C). */
    double sample(RandomGenerator random);

    /** In a technician's words, e.g. "rectangular 0.40 … 1.20". */
    String describe();

    /**
     * Gaussian N(mean, sd²) (JCGM 101:2008, 6.4.7).
     *
     * @param mean expectation
     * @param standardDeviation ≥ 0
     */
    record Normal(double mean, double standardDeviation) implements InputDistribution {
        public Normal {
            finite(mean, "mean");
            if (!(standardDeviation >= 0) || !Double.isFinite(standardDeviation)) {
                throw new IllegalArgumentException("standard deviation must be a finite number ≥ 0, was "
                        + standardDeviation);
            }
        }

        @Override
        public double expectation() {
            return mean;
        }

        @Override
        public double standardUncertainty() {
            return standardDeviation;
        }

        @Override
        public double sample(RandomGenerator random) {
            return mean + standardDeviation * random.nextGaussian();
        }

        @Override
        public String describe() {
            return String.format(java.util.Locale.ROOT, "normal %.3g ± %.3g (1 s.d.)", mean, standardDeviation);
        }
    }

    /**
     * Rectangular R(a, b) (JCGM 100:2008, 4.3.7; JCGM 101:2008, 6.4.2): every value between the
     * bounds equally likely. The bounds need not be symmetric about a stated nominal value, which
     * is how an asymmetric range ("0.3 dB better, 0.8 dB worse") is entered.
     *
     * @param lower a
     * @param upper b ≥ a
     */
    record Rectangular(double lower, double upper) implements InputDistribution {
        public Rectangular {
            finite(lower, "lower bound");
            finite(upper, "upper bound");
            if (upper < lower) {
                throw new IllegalArgumentException("rectangular bounds reversed: lower " + lower + " > upper " + upper);
            }
        }

        /** Centred on {@code centre} with half-width {@code halfWidth}. */
        public static Rectangular around(double centre, double halfWidth) {
            return new Rectangular(centre - halfWidth, centre + halfWidth);
        }

        @Override
        public double expectation() {
            return 0.5 * (lower + upper);
        }

        @Override
        public double standardUncertainty() {
            return (upper - lower) / Math.sqrt(12.0);
        }

        @Override
        public double sample(RandomGenerator random) {
            return lower + (upper - lower) * random.nextDouble();
        }

        @Override
        public String describe() {
            return String.format(java.util.Locale.ROOT, "rectangular %.3g … %.3g", lower, upper);
        }
    }

    /**
     * Triangular with bounds a, b and mode c (JCGM 100:2008, 4.3.9 for the symmetric case;
     * JCGM 101:2008, 6.4.5). Variance (a² + b² + c² − ab − ac − bc)/18, the general triangular
     * formula (Evans, Hastings &amp; Peacock, Statistical Distributions, 3rd ed., 2000, ch. 40).
     */
    record Triangular(double lower, double mode, double upper) implements InputDistribution {
        public Triangular {
            finite(lower, "lower bound");
            finite(mode, "mode");
            finite(upper, "upper bound");
            if (!(lower <= mode && mode <= upper)) {
                throw new IllegalArgumentException("triangular needs lower ≤ mode ≤ upper, was " + lower + ", "
                        + mode + ", " + upper);
            }
        }

        @Override
        public double expectation() {
            return (lower + mode + upper) / 3.0;
        }

        @Override
        public double standardUncertainty() {
            double a = lower;
            double b = upper;
            double c = mode;
            return Math.sqrt(Math.max(0.0, (a * a + b * b + c * c - a * b - a * c - b * c) / 18.0));
        }

        @Override
        public double sample(RandomGenerator random) {
            // Inverse of the distribution function, piecewise quadratic either side of the mode.
            double width = upper - lower;
            if (width == 0) {
                return mode;
            }
            double u = random.nextDouble();
            double split = (mode - lower) / width;
            return u < split
                    ? lower + Math.sqrt(u * width * (mode - lower))
                    : upper - Math.sqrt((1 - u) * width * (upper - mode));
        }

        @Override
        public String describe() {
            return String.format(java.util.Locale.ROOT, "triangular %.3g … %.3g, mode %.3g", lower, upper, mode);
        }
    }

    private static void finite(double value, String what) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " must be a finite number, was " + value);
        }
    }
}
