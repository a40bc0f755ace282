package org.strandbook.diagnosis;

import java.util.Optional;

import org.strandbook.optics.WavelengthGrid;

/**
 * Looks for a sinusoid in wavenumber in a fit residual: the fringes of a thin air gap or crack, an
 * etalon whose period is Δν̃ = 1/(2·n·d) (Fabry–Pérot; Born &amp; Wolf, "Principles of Optics", §7.6).
 * A noise-weighted least-squares periodogram over unevenly spaced points (Lomb, Astrophys. Space
 * Sci. 39, 447 (1976); Scargle, Astrophys. J. 263, 835 (1982)): at each trial period a direct fit
 * of cos and sin, the trial sinusoids stepped by rotation so that no trial calls the sine again.
 *
 * <p>What the basis leaves over a wide range (band-shape misfit, a slow tilt) is removed first by a
 * weighted polynomial in wavenumber, and only periods that fit at least {@link #MIN_CYCLES} times
 * into the measured range are tried, so slow misfit is never called a fringe. A ripple is reported
 * when it stands out of the residual's own scatter ({@link #MIN_SIGNIFICANCE}) and repeats, in
 * phase, in at least two of the three thirds of the range: an etalon rings everywhere, a local
 * misfit does not.
 */
final class FringeSearch {

    /** dB: half peak-to-peak ripples smaller than this are not reported (design choice: 0.08 dB p-p, under the 0.1 dB a chemometric model notices). */
    static final double MIN_AMPLITUDE_DB = 0.04;
    /**
     * Design choice: amplitude over its standard error. With ~10³ trial periods white noise alone
     * reaches 6 with odds below 10⁻⁴; band-shape misfit reached 6.3 on the independent test model,
     * a 0.1 dB peak-to-peak etalon 28 and more.
     */
    static final double MIN_SIGNIFICANCE = 10;
    /**
     * Design choice: the ripple must explain this share of the detrended residual (misfit reached
     * 0.07 on the independent test model, a 0.1 dB peak-to-peak etalon 0.59 and more).
     */
    static final double MIN_VARIANCE_SHARE = 0.15;
    /** Design choice: the longest period tried fits this many times into the range. */
    static final double MIN_CYCLES = 8;
    /** Design choice: the shortest period tried spans this many of the coarsest sample steps. */
    static final double MIN_SAMPLES_PER_PERIOD = 2.5;
    private static final int DETREND_DEGREE = 4;

    private FringeSearch() {
    }

    static Optional<FringeReport> search(WavelengthGrid grid, int[] rows, double[] residualDb, double[] sigmaDb) {
        int n = rows.length;
        double[] k = new double[n];
        double[] w = new double[n];
        double kMin = Double.POSITIVE_INFINITY;
        double kMax = Double.NEGATIVE_INFINITY;
        double coarsest = 0;
        for (int r = 0; r < n; r++) {
            k[r] = 1.0e7 / grid.wavelengthNm(rows[r]);
            w[r] = 1.0 / (sigmaDb[r] * sigmaDb[r]);
            kMin = Math.min(kMin, k[r]);
            kMax = Math.max(kMax, k[r]);
            if (r > 0) {
                coarsest = Math.max(coarsest, Math.abs(k[r] - k[r - 1]));
            }
        }
        double span = kMax - kMin;
        double fMin = MIN_CYCLES / span;
        double fMax = 1.0 / (MIN_SAMPLES_PER_PERIOD * coarsest);
        if (n < 30 || !(span > 0) || !(fMax > fMin)) {
            return Optional.empty();
        }
        double[] y = detrended(k, kMin, span, residualDb, w);
        double total = 0;
        double weightSum = 0;
        for (int r = 0; r < n; r++) {
            total += w[r] * y[r] * y[r];
            weightSum += w[r];
        }
        if (!(total > 0)) {
            return Optional.empty();
        }
        double bestF = coarseScan(k, y, w, fMin, fMax, span);
        double step = 1.0 / (4 * span);
        double[] best = sinusoid(k, y, w, bestF, 0, k.length);
        // refine the period to a small fraction of the scan step: the gap width is read from it
        for (int s = -20; s <= 20; s++) {
            double f = bestF + step * s / 20;
            double[] fit = sinusoid(k, y, w, f, 0, k.length);
            if (fit[2] > best[2]) {
                best = fit;
                best[3] = f;
            }
        }
        double f = best[3] > 0 ? best[3] : bestF;
        double amplitude = Math.hypot(best[0], best[1]);
        double share = best[2] / total;
        double scatter = (total - best[2]) / Math.max(1, n - 2 - DETREND_DEGREE - 1);
        double significance = amplitude / Math.sqrt(2 * scatter / weightSum);
        if (amplitude < MIN_AMPLITUDE_DB || significance < MIN_SIGNIFICANCE || share < MIN_VARIANCE_SHARE
                || !ringsThroughout(k, y, w, f, best[0], best[1])) {
            return Optional.empty();
        }
        double periodCm = 1.0 / f;
        double gapUm = 1.0e4 / (2.0 * periodCm);
        return Optional.of(new FringeReport(periodCm, amplitude, gapUm, share, best[0], best[1], significance));
    }

    /** The residual less a weighted polynomial in wavenumber: what the basis missed over wide ranges. */
    private static double[] detrended(double[] k, double kMin, double span, double[] y, double[] w) {
        int m = DETREND_DEGREE + 1;
        double[][] normal = new double[m][m];
        double[] rhs = new double[m];
        double[] p = new double[m];
        for (int r = 0; r < k.length; r++) {
            powers(2 * (k[r] - kMin) / span - 1, p);
            for (int a = 0; a < m; a++) {
                rhs[a] += w[r] * p[a] * y[r];
                for (int b = 0; b < m; b++) {
                    normal[a][b] += w[r] * p[a] * p[b];
                }
            }
        }
        double[] c = new org.apache.commons.math3.linear.LUDecomposition(
                new org.apache.commons.math3.linear.Array2DRowRealMatrix(normal, false)).getSolver()
                .solve(new org.apache.commons.math3.linear.ArrayRealVector(rhs, false)).toArray();
        double[] out = new double[k.length];
        for (int r = 0; r < k.length; r++) {
            powers(2 * (k[r] - kMin) / span - 1, p);
            double trend = 0;
            for (int a = 0; a < m; a++) {
                trend += c[a] * p[a];
            }
            out[r] = y[r] - trend;
        }
        return out;
    }

    private static void powers(double t, double[] p) {
        p[0] = 1;
        for (int a = 1; a < p.length; a++) {
            p[a] = p[a - 1] * t;
        }
    }

    /** The frequency (cycles per cm⁻¹) of the largest weighted explained sum of squares, stepped at a quarter of 1/span. */
    private static double coarseScan(double[] k, double[] y, double[] w, double fMin, double fMax, double span) {
        int n = k.length;
        double step = 1.0 / (4 * span);
        int steps = (int) Math.min(6000, Math.ceil((fMax - fMin) / step));
        double[] c = new double[n];
        double[] s = new double[n];
        double[] cd = new double[n];
        double[] sd = new double[n];
        for (int r = 0; r < n; r++) {
            c[r] = Math.cos(2 * Math.PI * fMin * k[r]);
            s[r] = Math.sin(2 * Math.PI * fMin * k[r]);
            cd[r] = Math.cos(2 * Math.PI * step * k[r]);
            sd[r] = Math.sin(2 * Math.PI * step * k[r]);
        }
        double bestExplained = -1;
        double bestF = fMin;
        for (int i = 0; i <= steps; i++) {
            double cc = 0;
            double ss = 0;
            double cs = 0;
            double yc = 0;
            double ys = 0;
            for (int r = 0; r < n; r++) {
                double wc = w[r] * c[r];
                double ws = w[r] * s[r];
                cc += wc * c[r];
                ss += ws * s[r];
                cs += wc * s[r];
                yc += wc * y[r];
                ys += ws * y[r];
                // advance this row's trial sinusoid by one frequency step (angle addition)
                double next = c[r] * cd[r] - s[r] * sd[r];
                s[r] = s[r] * cd[r] + c[r] * sd[r];
                c[r] = next;
            }
            double det = cc * ss - cs * cs;
            if (det > 1e-12 * cc * ss) {
                double a = (yc * ss - ys * cs) / det;
                double b = (ys * cc - yc * cs) / det;
                double explained = a * yc + b * ys;
                if (explained > bestExplained) {
                    bestExplained = explained;
                    bestF = fMin + i * step;
                }
            }
        }
        return bestF;
    }

    /** Weighted least-squares a·cos + b·sin at frequency f over rows [from, to): {a, b, explained, f}. */
    private static double[] sinusoid(double[] k, double[] y, double[] w, double f, int from, int to) {
        double cc = 0;
        double ss = 0;
        double cs = 0;
        double yc = 0;
        double ys = 0;
        double omega = 2 * Math.PI * f;
        for (int r = from; r < to; r++) {
            double c = Math.cos(omega * k[r]);
            double s = Math.sin(omega * k[r]);
            cc += w[r] * c * c;
            ss += w[r] * s * s;
            cs += w[r] * c * s;
            yc += w[r] * y[r] * c;
            ys += w[r] * y[r] * s;
        }
        double det = cc * ss - cs * cs;
        if (!(det > 1e-12 * cc * ss)) {
            return new double[] {0, 0, 0, f};
        }
        double a = (yc * ss - ys * cs) / det;
        double b = (ys * cc - yc * cs) / det;
        return new double[] {a, b, a * yc + b * ys, f};
    }

    /** True when at least two thirds of the range carry the ripple in phase at half its amplitude or more. */
    private static boolean ringsThroughout(double[] k, double[] y, double[] w, double f, double a, double b) {
        double amplitude = Math.hypot(a, b);
        int n = k.length;
        int agreeing = 0;
        for (int part = 0; part < 3; part++) {
            int from = part * n / 3;
            int to = (part + 1) * n / 3;
            double[] fit = sinusoid(k, y, w, f, from, to);
            double inPhase = (fit[0] * a + fit[1] * b) / amplitude;
            if (inPhase >= 0.5 * amplitude) {
                agreeing++;
            }
        }
        return agreeing >= 2;
    }
}
