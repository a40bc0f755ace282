package org.strandbook.evaluation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.WavelengthBand;

/**
 * Band-by-band acceptance of a measured loss spectrum against its prediction and the analyzer's
 * allowed loss. The rules, in the order they are applied (the worst outcome wins):
 *
 * <ul>
 *   <li>FAIL when nothing in the band could be measured (no light), when the highest measured loss
 *       exceeds the analyzer's allowed loss (negative margin), or when the mean deviation exceeds
 *       the tolerance: the path loses more than physics says it should, which is the acceptance
 *       criterion of installed-loss testing (measured within the calculated budget), or when a
 *       local excess exceeds {@link #LOCAL_FAIL_FACTOR} tolerances;</li>
 *   <li>REVIEW when less than {@link #MIN_MEASURED_FRACTION} of the band could be measured, when a
 *       local deviation exceeds twice the tolerance while the mean is within it, when the path loses
 *       less than predicted by more than the tolerance (a bad reference or wrong records), or when
 *       the margin is smaller than the tolerance;</li>
 *   <li>PASS otherwise.</li>
 * </ul>
 */
public final class Acceptance {

    /** Common practice: judge a band on at least half of it. */
    public static final double MIN_MEASURED_FRACTION = 0.5;
    /** Common practice: a local excess of three tolerances distorts the band the analyzer's model reads. */
    public static final double LOCAL_FAIL_FACTOR = 3.0;

    private Acceptance() {
    }

    /**
     * @param grid            the common grid of both spectra
     * @param measuredLossDb  measured loss, NaN where masked
     * @param predictedLossDb predicted loss of the same path
     * @param band            the band of interest
     * @param toleranceDb     the point's acceptance tolerance, dB
     * @param allowedLossDb   the analyzer's allowed round-trip loss, dB
     */
    public static BandVerdict judge(WavelengthGrid grid, double[] measuredLossDb, double[] predictedLossDb,
                                    WavelengthBand band, double toleranceDb, double allowedLossDb) {
        grid.requireSameLength(measuredLossDb);
        grid.requireSameLength(predictedLossDb);
        int inBand = 0;
        int measured = 0;
        double sumDev = 0;
        double sumPred = 0;
        double worstDev = Double.NEGATIVE_INFINITY;
        double worstAt = band.centreNm();
        double worstLoss = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < grid.size(); i++) {
            double w = grid.wavelengthNm(i);
            if (!band.contains(w)) {
                continue;
            }
            inBand++;
            sumPred += predictedLossDb[i];
            if (Double.isNaN(measuredLossDb[i])) {
                continue;
            }
            measured++;
            double dev = measuredLossDb[i] - predictedLossDb[i];
            sumDev += dev;
            if (dev > worstDev) {
                worstDev = dev;
                worstAt = w;
            }
            worstLoss = Math.max(worstLoss, measuredLossDb[i]);
        }
        if (inBand == 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "band %s (%.0f–%.0f nm) lies outside the evaluation grid %.0f–%.0f nm",
                    band.name(), band.fromNm(), band.toNm(), grid.firstNm(), grid.lastNm()));
        }
        double predicted = sumPred / inBand;
        double fraction = (double) measured / inBand;
        if (measured == 0) {
            return new BandVerdict(band, Status.FAIL, Double.NaN, Double.NaN, Double.NaN, predicted,
                    Double.NaN, Double.NaN, 0, "no light measured anywhere in the band: the loop signal is at the"
                    + " dark level");
        }
        double meanDev = sumDev / measured;
        double margin = allowedLossDb - worstLoss;
        List<String> fails = new ArrayList<>();
        List<String> reviews = new ArrayList<>();
        if (margin < 0) {
            fails.add(f("measured loss %.2f dB exceeds the analyzer's allowed %.2f dB by %.2f dB",
                    worstLoss, allowedLossDb, -margin));
        }
        if (meanDev > toleranceDb) {
            fails.add(f("loses %.2f dB more than predicted on average (tolerance %.2f dB)", meanDev, toleranceDb));
        } else if (worstDev > LOCAL_FAIL_FACTOR * toleranceDb) {
            fails.add(f("local excess of %.2f dB at %.0f nm, more than %.0f× the tolerance of %.2f dB",
                    worstDev, worstAt, LOCAL_FAIL_FACTOR, toleranceDb));
        }
        if (fraction < MIN_MEASURED_FRACTION) {
            reviews.add(f("only %.0f %% of the band could be measured", 100 * fraction));
        }
        if (meanDev <= toleranceDb && worstDev > 2 * toleranceDb && worstDev <= LOCAL_FAIL_FACTOR * toleranceDb) {
            reviews.add(f("local excess of %.2f dB at %.0f nm (mean deviation %.2f dB)", worstDev, worstAt, meanDev));
        }
        if (meanDev < -toleranceDb) {
            reviews.add(f("loses %.2f dB less than predicted: check the reference scan and the recorded path",
                    -meanDev));
        }
        if (margin >= 0 && margin < toleranceDb) {
            reviews.add(f("margin only %.2f dB against the allowed %.2f dB", margin, allowedLossDb));
        }
        Outcome outcome = Outcome.of(fails, reviews,
                f("within %.2f dB of prediction (mean %+.2f dB), margin %.2f dB", toleranceDb, meanDev, margin));
        return new BandVerdict(band, outcome.status(), meanDev, worstDev, worstAt, predicted, worstLoss, margin,
                fraction, outcome.reason());
    }

    /** The worst outcome of a band's checks: any failure, else any review, else the pass in words. */
    record Outcome(Status status, String reason) {

        static Outcome of(List<String> fails, List<String> reviews, String passReason) {
            if (!fails.isEmpty()) {
                return new Outcome(Status.FAIL, String.join("; ", fails));
            }
            if (!reviews.isEmpty()) {
                return new Outcome(Status.REVIEW, String.join("; ", reviews));
            }
            return new Outcome(Status.PASS, passReason);
        }
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
