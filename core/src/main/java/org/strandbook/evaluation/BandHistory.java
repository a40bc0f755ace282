package org.strandbook.evaluation;

import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.WavelengthBand;
import org.strandbook.trend.LossReading;
import org.strandbook.trend.LossTrend;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.StepDetector;
import org.strandbook.trend.StepEvent;
import org.strandbook.trend.TheilSenTrend;

/**
 * The loss history of one band, gathered scan by scan in time order, and its forecast: each
 * sub-band's worst loss is trended (Theil–Sen), each sub-band's margin is extended along its own
 * slope, and the sub-band whose margin reaches zero first drives the band's date. Not
 * thread-safe; one per band and evaluation.
 */
final class BandHistory {

    private final SubBands subBands;
    private final List<List<LossReading>> perSubBand = new ArrayList<>();
    private final List<Instant> noLight = new ArrayList<>();
    /** Band-mean loss per lit scan: what steps are found in. */
    private final List<LossReading> bandMeans = new ArrayList<>();
    /** Worst loss per sub-band at the latest scan; NaN where it measured nothing. */
    private double[] latestWorst;
    /** Worst loss per sub-band at the latest scan that returned light in the band. */
    private double[] lastLitWorst;

    BandHistory(WavelengthBand band) {
        this.subBands = SubBands.of(band);
        for (int k = 0; k < subBands.count(); k++) {
            perSubBand.add(new ArrayList<>());
        }
        latestWorst = new double[subBands.count()];
        Arrays.fill(latestWorst, Double.NaN);
        lastLitWorst = latestWorst.clone();
    }

    /** Adds the measured loss of one loop scan; scans come in time order. */
    void add(Instant takenAt, WavelengthGrid grid, double[] lossDb) {
        double[] worst = subBands.worstLossDb(grid, lossDb);
        boolean lit = false;
        for (int k = 0; k < worst.length; k++) {
            if (!Double.isNaN(worst[k])) {
                perSubBand.get(k).add(new LossReading(takenAt, worst[k]));
                lit = true;
            }
        }
        latestWorst = worst;
        if (lit) {
            lastLitWorst = worst;
            bandMeans.add(new LossReading(takenAt, bandMean(grid, lossDb)));
        } else {
            noLight.add(takenAt);
        }
    }

    /**
     * The band's trend and forecast as of {@code asOf} (the latest scan's time).
     *
     * @param allowedLossDb the analyzer's allowed loss, dB
     * @param repaired      the latest repair up to {@code asOf}: after it the loss follows a new
     *                      course, fitted and forecast alone once it has two readings
     */
    BandTrend trend(double allowedLossDb, Instant asOf, Optional<Instant> repaired, TheilSenTrend theilSen,
                    StepDetector steps, MarginForecast forecast) {
        int driving = 0;
        double drivingYears = Double.POSITIVE_INFINITY;
        double drivingMargin = Double.POSITIVE_INFINITY;
        Optional<LossTrend> drivingTrend = Optional.empty();
        Optional<MarginForecast.Outlook> drivingOutlook = Optional.empty();
        for (int k = 0; k < subBands.count(); k++) {
            if (Double.isNaN(lastLitWorst[k])) {
                continue;
            }
            double margin = allowedLossDb - lastLitWorst[k];
            List<LossReading> readings = perSubBand.get(k);
            List<LossReading> regime = repaired.map(r -> readings.stream().filter(x -> x.time().isAfter(r)).toList())
                    .filter(after -> after.size() >= 2).orElse(readings);
            Optional<LossTrend> trend = readings.size() >= 2 ? Optional.of(theilSen.fit(regime)) : Optional.empty();
            double years = yearsToZero(margin, trend);
            if (years < drivingYears || (years == drivingYears && margin < drivingMargin)) {
                driving = k;
                drivingYears = years;
                drivingMargin = margin;
                drivingTrend = trend;
                // a margin is forecast only from the latest scan: after a dark scan there is none
                drivingOutlook = trend.isPresent() && !Double.isNaN(latestWorst[k])
                        ? Optional.of(forecast.forecast(margin, asOf, trend.get(), ZoneOffset.UTC)) : Optional.empty();
            }
        }
        List<LossReading> readings = perSubBand.get(driving);
        // Steps are sought in the band mean, not in a sub-band's worst point: a connector, bend or
        // repair moves the whole band at once, and the mean of many points is far less noisy than
        // the highest of a few, which made false steps on healthy demo points.
        List<StepEvent> events = bandMeans.size() >= 3 ? steps.detect(bandMeans).events() : List.of();
        return new BandTrend(subBands.band(), readings, noLight, drivingTrend, events, drivingOutlook,
                subBands.fromNm(driving), subBands.toNm(driving));
    }

    private double bandMean(WavelengthGrid grid, double[] lossDb) {
        return bandMean(subBands.band(), grid, lossDb);
    }

    /** The mean loss over the measured points of {@code band}; NaN where none was measured. */
    static double bandMean(WavelengthBand band, WavelengthGrid grid, double[] lossDb) {
        double sum = 0;
        int n = 0;
        for (int i = 0; i < grid.size(); i++) {
            if (band.contains(grid.wavelengthNm(i)) && !Double.isNaN(lossDb[i])) {
                sum += lossDb[i];
                n++;
            }
        }
        return n == 0 ? Double.NaN : sum / n;
    }

    /** Years until the margin is used up along the trend; +∞ when it is not shrinking or unknown. */
    private static double yearsToZero(double marginDb, Optional<LossTrend> trend) {
        if (marginDb <= 0) {
            return 0;
        }
        if (trend.isEmpty() || !(trend.get().slopeDbPerYear() > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        return marginDb / trend.get().slopeDbPerYear();
    }
}
