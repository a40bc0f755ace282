package org.strandbook.diagnosis;

import java.util.Optional;

import org.strandbook.optics.WavelengthGrid;

/**
 * Looks for a sinusoid in wavenumber in a fit residual: the fringes of a thin air gap or crack, an
 * etalon whose period is Δν̃ = 1/(2·n·d) (Fabry–Pérot; Born &amp; Wolf, "Principles of Optics", §7.6).
 * A least-squares periodogram over unevenly spaced points (Lomb 1976; Scargle 1982), evaluated by
 * a direct fit of cos, sin and a constant at each trial period.
 */
final class FringeSearch {

    /** Design choice: fringes must explain this share of the residual variance to be reported. */
    static final double MIN_VARIANCE_SHARE = 0.3;
    /** dB: fringes smaller than this are left unreported (a design choice, below connector scatter). */
    static final double MIN_AMPLITUDE_DB = 0.05;

    private FringeSearch() {
    }

    static Optional<FringeReport> search(WavelengthGrid grid, int[] rows, double[] residualDb, double noiseDb) {
        int n = rows.length;
        double[] k = new double[n];
        for (int r = 0; r < n; r++) {
            k[r] = 1.0e7 / grid.wavelengthNm(rows[r]);
        }
        double kMin = Double.POSITIVE_INFINITY;
        double kMax = Double.NEGATIVE_INFINITY;
        double spacing = Double.POSITIVE_INFINITY;
        for (int r = 0; r < n; r++) {
            kMin = Math.min(kMin, k[r]);
            kMax = Math.max(kMax, k[r]);
            if (r > 0) {
                spacing = Math.min(spacing, Math.abs(k[r] - k[r - 1]));
            }
        }
        double span = kMax - kMin;
        if (!(span > 0) || !(spacing > 0)) {
            return Optional.empty();
        }
        double mean = 0;
        for (double v : residualDb) {
            mean += v;
        }
        mean /= n;
        double total = 0;
        for (double v : residualDb) {
            total += (v - mean) * (v - mean);
        }
        if (total <= 0) {
            return Optional.empty();
        }
        // periods from a third of the range down to four samples of the finest spacing
        double fMin = 3.0 / span;
        double fMax = 1.0 / (4.0 * spacing);
        int steps = (int) Math.min(4000, Math.ceil(4 * span * (fMax - fMin)));
        double bestShare = 0;
        double bestF = Double.NaN;
        double bestAmp = 0;
        for (int s = 0; s <= steps; s++) {
            double f = fMin + (fMax - fMin) * s / Math.max(steps, 1);
            double[] fit = sinusoid(k, residualDb, mean, f);
            double share = fit[1] / total;
            if (share > bestShare) {
                bestShare = share;
                bestF = f;
                bestAmp = fit[0];
            }
        }
        double detectable = Math.max(MIN_AMPLITUDE_DB, 4 * noiseDb * Math.sqrt(2.0 / n));
        if (bestShare < MIN_VARIANCE_SHARE || bestAmp < detectable) {
            return Optional.empty();
        }
        double periodCm = 1.0 / bestF;
        double gapUm = 1.0e4 / (2.0 * periodCm);
        return Optional.of(new FringeReport(periodCm, bestAmp, gapUm, bestShare));
    }

    /** Least-squares a·cos + b·sin at frequency f (cycles per cm⁻¹): {amplitude, explained sum of squares}. */
    private static double[] sinusoid(double[] k, double[] y, double mean, double f) {
        double cc = 0;
        double ss = 0;
        double cs = 0;
        double yc = 0;
        double ys = 0;
        double w = 2 * Math.PI * f;
        for (int i = 0; i < k.length; i++) {
            double c = Math.cos(w * k[i]);
            double s = Math.sin(w * k[i]);
            double v = y[i] - mean;
            cc += c * c;
            ss += s * s;
            cs += c * s;
            yc += v * c;
            ys += v * s;
        }
        double det = cc * ss - cs * cs;
        if (Math.abs(det) < 1e-12) {
            return new double[] {0, 0};
        }
        double a = (yc * ss - ys * cs) / det;
        double b = (ys * cc - yc * cs) / det;
        return new double[] {Math.hypot(a, b), a * yc + b * ys};
    }
}
