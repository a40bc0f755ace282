package org.strandbook.evaluation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.WavelengthBand;

/**
 * Band acceptance under the coverage-interval rule (ILAC-G8:09/2019, decision rule with a guard
 * band; JCGM 106:2012, 8.3): the mean measured − predicted loss of the band, and of its worst
 * sub-band of at most {@link SubBands#MAX_WIDTH_NM} nm, is compared with the prediction's coverage
 * interval widened by the measurement's own expanded uncertainty.
 *
 * <ul>
 * <li>Widening: the interval's half-widths and the measurement's expanded uncertainty U = k·u are
 *     those of independent quantities, so they add in quadrature, √(h² + U²) — exact for normal
 *     distributions (the variances add) and a fair approximation for the rectangular-dominated
 *     predictions of short loops (a design choice; a linear sum would accept more).</li>
 * <li>PASS inside the widened interval; FAIL when above it by more than the guard band; REVIEW
 *     above it within the guard band (the result can be shown neither conforming nor not), or
 *     below it (less loss than predicted: a reference or record problem, never a pass or fail of
 *     the path).</li>
 * <li>Unchanged from the fixed rule: no light is FAIL, a measured loss above the analyzer's
 *     allowed loss is FAIL, a band less than half measured is REVIEW; a margin smaller than the
 *     measurement's expanded uncertainty plus the guard band is REVIEW (guarded acceptance against
 *     the allowed loss).</li>
 * </ul>
 */
public final class IntervalAcceptance {

    private IntervalAcceptance() {
    }

    /** A verdict and the limits it was reached with. */
    public record Judged(BandVerdict verdict, BandInterval interval) {
    }

    /**
     * @param grid the common grid
     * @param measuredLossDb measured loss, NaN where masked
     * @param lossSigmaDb the measured loss's noise, dB, NaN where masked
     * @param predictedLossDb predicted loss of the same path
     * @param band the band
     * @param prediction the prediction's uncertainty in this band
     * @param repeatability the reference repeatability to use (its noise part is replaced per range)
     * @param rule the site's rule (coverage and guard band)
     * @param toleranceDb the point's tolerance, used only for the figures the fixed rule also reports
     * @param allowedLossDb the analyzer's allowed loss, dB
     */
    public static Judged judge(WavelengthGrid grid, double[] measuredLossDb, double[] lossSigmaDb,
            double[] predictedLossDb, WavelengthBand band, BandUncertainty prediction,
            MeasurementUncertainty repeatability, DecisionRule rule, double toleranceDb, double allowedLossDb) {
        BandVerdict figures = Acceptance.judge(grid, measuredLossDb, predictedLossDb, band, toleranceDb, allowedLossDb);
        double coverage = rule.coverage();
        double guard = rule.guardBandDb();
        double highHalf = Math.max(0, prediction.atCentre().highOffsetDb());
        double lowHalf = Math.max(0, -prediction.atCentre().lowOffsetDb());
        double bandNoise = MeasurementUncertainty.meanNoiseDb(grid, lossSigmaDb, band.fromNm(), band.toNm());
        MeasurementUncertainty measurement = repeatability.withNoiseDb(Double.isNaN(bandNoise) ? 0 : bandNoise);
        double u = measurement.expandedDb(coverage);
        double upper = Math.hypot(highHalf, u);
        double lower = -Math.hypot(lowHalf, u);
        BandInterval limits = new BandInterval(prediction, measurement, coverage, guard, lower, upper);
        if (figures.measuredFraction() == 0) {
            return new Judged(figures, limits);
        }
        String pct = rule.percent();
        List<String> fails = new ArrayList<>();
        List<String> reviews = new ArrayList<>();
        double meanDev = figures.meanDeviationDb();
        double margin = figures.marginDb();
        if (margin < 0) {
            fails.add(f("measured loss %.2f dB exceeds the analyzer's allowed %.2f dB by %.2f dB",
                    figures.worstMeasuredLossDb(), allowedLossDb, -margin));
        } else if (margin < u + guard) {
            reviews.add(f("margin only %.2f dB against the allowed %.2f dB, within the measurement's ±%.2f dB and the"
                    + " guard band of %.2f dB", margin, allowedLossDb, u, guard));
        }
        String widened = f("the prediction's %s %% interval (%+.2f … %+.2f dB) widened by the measurement's ±%.2f dB"
                + " to %+.2f … %+.2f dB", pct, -lowHalf, highHalf, u, lower, upper);
        if (meanDev > upper + guard) {
            fails.add(f("loses %.2f dB more than predicted on average, beyond %s by %.2f dB, more than the guard band"
                    + " of %.2f dB", meanDev, widened, meanDev - upper, guard));
        } else if (meanDev > upper) {
            reviews.add(f("loses %.2f dB more than predicted on average, beyond %s by %.2f dB, within the guard band"
                    + " of %.2f dB", meanDev, widened, meanDev - upper, guard));
        } else if (meanDev < lower) {
            reviews.add(f("loses %.2f dB less than predicted, below %s: check the reference scan and the recorded"
                    + " path", -meanDev, widened));
        }
        SubBandExcess worst = worstSubBand(grid, measuredLossDb, lossSigmaDb, predictedLossDb, band, measurement,
                coverage, highHalf);
        if (worst != null && !(meanDev > upper)) {
            if (worst.beyondDb() > guard) {
                fails.add(f("sub-band %s loses %.2f dB more than predicted, beyond its widened interval (%+.2f dB)"
                        + " by %.2f dB, more than the guard band of %.2f dB", worst.range(), worst.deviationDb(),
                        worst.upperDb(), worst.beyondDb(), guard));
            } else if (worst.beyondDb() > 0) {
                reviews.add(f("sub-band %s loses %.2f dB more than predicted, beyond its widened interval (%+.2f dB)"
                        + " by %.2f dB, within the guard band of %.2f dB", worst.range(), worst.deviationDb(),
                        worst.upperDb(), worst.beyondDb(), guard));
            }
        }
        if (figures.measuredFraction() < Acceptance.MIN_MEASURED_FRACTION) {
            reviews.add(f("only %.0f %% of the band could be measured", 100 * figures.measuredFraction()));
        }
        Acceptance.Outcome outcome = Acceptance.Outcome.of(fails, reviews, f("inside %s (mean %+.2f dB%s), margin"
                + " %.2f dB", widened, meanDev, worst == null ? ""
                        : f(", worst sub-band %s %+.2f dB", worst.range(), worst.deviationDb()), margin));
        return new Judged(new BandVerdict(band, outcome.status(), meanDev, figures.worstDeviationDb(),
                figures.worstAtNm(), figures.predictedLossDb(), figures.worstMeasuredLossDb(), margin,
                figures.measuredFraction(), outcome.reason()), limits);
    }

    /** The sub-band that lies furthest above its own widened limit. */
    private record SubBandExcess(String range, double deviationDb, double upperDb) {
        double beyondDb() {
            return deviationDb - upperDb;
        }
    }

    private static SubBandExcess worstSubBand(WavelengthGrid grid, double[] measured, double[] sigma,
            double[] predicted, WavelengthBand band, MeasurementUncertainty measurement, double coverage,
            double highHalf) {
        SubBands subs = SubBands.of(band);
        if (subs.count() < 2) {
            return null;
        }
        double[] sum = new double[subs.count()];
        int[] n = new int[subs.count()];
        for (int i = 0; i < grid.size(); i++) {
            int k = subs.indexOf(grid.wavelengthNm(i));
            if (k >= 0 && !Double.isNaN(measured[i])) {
                sum[k] += measured[i] - predicted[i];
                n[k]++;
            }
        }
        SubBandExcess worst = null;
        for (int k = 0; k < subs.count(); k++) {
            if (n[k] == 0) {
                continue;
            }
            double noise = MeasurementUncertainty.meanNoiseDb(grid, sigma, subs.fromNm(k), subs.toNm(k));
            double u = measurement.withNoiseDb(Double.isNaN(noise) ? 0 : noise).expandedDb(coverage);
            SubBandExcess e = new SubBandExcess(subs.describe(k), sum[k] / n[k], Math.hypot(highHalf, u));
            if (worst == null || e.beyondDb() > worst.beyondDb()) {
                worst = e;
            }
        }
        return worst;
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
