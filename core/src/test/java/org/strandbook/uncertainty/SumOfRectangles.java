package org.strandbook.uncertainty;

/**
 * Test oracle independent of the engine: the exact distribution function of a sum of independent
 * rectangular variables Uᵢ on [−aᵢ, aᵢ],
 * F(s) = Σ_ε (Π εᵢ)·(s + Σ εᵢaᵢ)₊ⁿ / (n!·Π 2aᵢ) over all sign vectors ε
 * (Bradley &amp; Gupta, "On the distribution of the sum of n non-identically distributed uniform
 * random variables", Ann. Inst. Statist. Math. 54 (2002) 689–700), inverted by bisection.
 */
final class SumOfRectangles {

    private final double[] halfWidths;

    SumOfRectangles(double... halfWidths) {
        this.halfWidths = halfWidths.clone();
    }

    double cumulative(double s) {
        int n = halfWidths.length;
        double norm = 1;
        for (int i = 1; i <= n; i++) {
            norm *= i * 2 * halfWidths[i - 1];
        }
        double sum = 0;
        for (int mask = 0; mask < (1 << n); mask++) {
            double shift = s;
            int sign = 1;
            for (int i = 0; i < n; i++) {
                if ((mask & (1 << i)) != 0) {
                    shift -= halfWidths[i];
                    sign = -sign;
                } else {
                    shift += halfWidths[i];
                }
            }
            if (shift > 0) {
                sum += sign * Math.pow(shift, n);
            }
        }
        return sum / norm;
    }

    /** The s with F(s) = probability. */
    double quantile(double probability) {
        double lo = 0;
        double hi = 0;
        for (double a : halfWidths) {
            lo -= a;
            hi += a;
        }
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            if (cumulative(mid) < probability) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
