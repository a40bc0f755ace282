package org.strandbook.diagnosis;

import java.util.Arrays;

/**
 * How a loop's loss falls short of the prediction across the measured range: the shortfall near
 * each end and whether it follows the predicted loss itself. A reference taken wrongly moves the
 * loss by one amount at every wavelength; records that list more fiber than the light went through
 * make the loop fall short where the fiber's attenuation is high, which one flat number hides.
 *
 * @param shortNm          wavelength of the short end, nm
 * @param shortDb          measured − predicted there, dB (median of the end's wavelengths)
 * @param longNm           wavelength of the long end, nm
 * @param longDb           measured − predicted there, dB
 * @param followsPredicted the shortfall grows where the predicted loss grows (correlation below
 *                         {@link #FOLLOWS_CORRELATION})
 */
record Shortfall(double shortNm, double shortDb, double longNm, double longDb, boolean followsPredicted) {

    /** Share of the measured wavelengths whose median gives each end (design choice). */
    static final double END_SHARE = 0.1;
    /** Below this Pearson correlation of deviation with predicted loss, the shortfall follows the prediction (design choice). */
    static final double FOLLOWS_CORRELATION = -0.8;
    /** dB: ends differing by less than this (or a quarter of the fitted amount) are one amount (design choice). */
    static final double FLAT_WITHIN_DB = 1.0;

    /**
     * @param nm          wavelength of each measured row, ascending
     * @param deviationDb measured − predicted loss of each row
     * @param predictedDb predicted loss of each row
     */
    static Shortfall of(double[] nm, double[] deviationDb, double[] predictedDb) {
        int n = nm.length;
        int end = Math.max(5, (int) Math.round(END_SHARE * n));
        end = Math.min(end, n);
        return new Shortfall(median(nm, 0, end), median(deviationDb, 0, end), median(nm, n - end, n),
                median(deviationDb, n - end, n), correlation(deviationDb, predictedDb) < FOLLOWS_CORRELATION);
    }

    /** Whether one amount describes the shortfall everywhere, beside a fitted flat amount. */
    boolean flat(double fittedDb) {
        return Math.abs(longDb - shortDb) < Math.max(FLAT_WITHIN_DB, 0.25 * Math.abs(fittedDb));
    }

    /** The end that falls furthest short. */
    double worstDb() {
        return Math.min(shortDb, longDb);
    }

    double worstNm() {
        return shortDb <= longDb ? shortNm : longNm;
    }

    private static double median(double[] v, int from, int to) {
        double[] part = Arrays.copyOfRange(v, from, to);
        Arrays.sort(part);
        int m = part.length / 2;
        return part.length % 2 == 1 ? part[m] : (part[m - 1] + part[m]) / 2;
    }

    private static double correlation(double[] x, double[] y) {
        int n = x.length;
        double mx = 0;
        double my = 0;
        for (int i = 0; i < n; i++) {
            mx += x[i] / n;
            my += y[i] / n;
        }
        double sxy = 0;
        double sxx = 0;
        double syy = 0;
        for (int i = 0; i < n; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
            syy += (y[i] - my) * (y[i] - my);
        }
        return sxx > 0 && syy > 0 ? sxy / Math.sqrt(sxx * syy) : 0;
    }
}
