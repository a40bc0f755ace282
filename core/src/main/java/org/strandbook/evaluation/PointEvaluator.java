package org.strandbook.evaluation;

import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import org.strandbook.diagnosis.DeviationDiagnoser;
import org.strandbook.diagnosis.Diagnosis;
import org.strandbook.diagnosis.PathEvidence;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Spectrum;
import org.strandbook.site.WavelengthBand;
import org.strandbook.site.ScanKind;
import org.strandbook.throughput.DarkNoise;
import org.strandbook.throughput.OneCordThroughput;
import org.strandbook.throughput.MaskedRange;
import org.strandbook.throughput.RawSpectrum;
import org.strandbook.throughput.ScanRegridder;
import org.strandbook.throughput.ThroughputResult;
import org.strandbook.throughput.ThroughputScans;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.StepDetector;
import org.strandbook.trend.TheilSenTrend;
import org.strandbook.uncertainty.PathUncertainty;
import org.strandbook.uncertainty.PooledRepeatability;

/**
 * Evaluates one measurement point end to end: prediction, pairing, measured throughput of every
 * paired loop scan, acceptance and diagnosis of the latest, and the loss trend per band.
 * Thread-safe: the optics cache is shared per grid, everything else is per call.
 */
public final class PointEvaluator {

    /**
     * Design choice: a measurement whose scans are clipped over at least this share of their
     * common range is refused; the rest is too little, and too near the clipped parts, to judge.
     */
    public static final double REFUSED_SATURATED_FRACTION = 0.8;

    private final ScanPairing pairing;
    private final OneCordThroughput throughput;
    private final DeviationDiagnoser diagnoser;
    private final TheilSenTrend theilSen = TheilSenTrend.withDefaults();
    private final StepDetector steps = StepDetector.withDefaults();
    private final MarginForecast forecast = MarginForecast.withDefaults();
    private final Map<WavelengthGrid, OpticsCache> caches = new ConcurrentHashMap<>();
    private final PathUncertainty engine = PathUncertainty.standard();

    public PointEvaluator(ScanPairing pairing, OneCordThroughput throughput, DeviationDiagnoser diagnoser) {
        this.pairing = pairing;
        this.throughput = throughput;
        this.diagnoser = diagnoser;
    }

    public static PointEvaluator withDefaults() {
        return new PointEvaluator(ScanPairing.withDefaults(), OneCordThroughput.withDefaults(),
                DeviationDiagnoser.withDefaults());
    }

    public ScanPairing pairing() {
        return pairing;
    }

    /** The point judged by the fixed tolerance. */
    public PointEvaluation evaluate(PointInputs in) {
        return evaluate(in, DecisionRule.FIXED);
    }

    /** The point judged by {@code rule}. */
    public PointEvaluation evaluate(PointInputs in, DecisionRule rule) {
        WavelengthGrid grid = EvaluationGrid.forAnalyzer(in.analyzer());
        OpticsCache cache = caches.computeIfAbsent(grid, OpticsCache::new);
        PredictedBudget predictedToday = predict(in, in.point(), in.send(), in.ret(), cache);
        List<WavelengthBand> bands = in.point().bands();
        for (WavelengthBand band : bands) {
            if (band.fromNm() < grid.firstNm() || band.toNm() > grid.lastNm()) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "point %s: band %s (%.0f–%.0f nm) lies outside analyzer %s's range %.0f–%.0f nm",
                        in.point().tag(), band.name(), band.fromNm(), band.toNm(), in.analyzer().tag(),
                        grid.firstNm(), grid.lastNm()));
            }
        }
        ScanPairing.Pairings pairs = pairing.pair(in.scans());
        List<String> problems = new ArrayList<>();
        pairs.unpaired().forEach(u -> problems.add(u.reason()));

        ScanRegridder regridder = new ScanRegridder(grid);
        Map<ScaledScan, RawSpectrum> fetched = new HashMap<>();
        List<BandHistory> histories = bands.stream().map(BandHistory::new).toList();
        ThroughputResult latest = null;
        ScanPair latestPair = null;
        Instant lastJudged = null;
        int unjudged = 0;
        for (ScanPair pair : pairs.paired()) {
            ScanExposure exposure = pair.exposure();
            ThroughputResult result = measure(pair, in.spectra(), fetched, regridder);
            if (exposure.judgeable() && !clippedNearlyEverywhere(result)) {
                double[] loss = result.lossDb();
                for (BandHistory history : histories) {
                    history.add(pair.loop().takenAt(), grid, loss);
                }
                lastJudged = pair.loop().takenAt();
            } else {
                unjudged++;
            }
            latest = result;
            latestPair = pair;
            // spectra of earlier visits are not needed again
            Set<Long> keep = new HashSet<>(List.of(pair.loopDark().id(), pair.referenceDark().id(),
                    pair.reference().id()));
            fetched.keySet().removeIf(k -> !keep.contains(k.id()));
        }
        if (latest == null) {
            problems.add(0, pairs.paired().isEmpty() && pairs.unpaired().isEmpty()
                    ? "no loop scan recorded yet" : "no loop scan could be paired with a reference and dark");
            return new PointEvaluation(in.point(), Status.REVIEW, predictedToday, Optional.empty(), Optional.empty(),
                    List.of(), Optional.empty(), List.of(), problems);
        }
        // the latest scan is judged against the path it went through, graded as inspected by then
        PathTimeline.Legs then = in.history().at(latestPair.loop().takenAt());
        MeasurementPoint pointThen = then.probeTypeCode().map(in.point()::withProbeTypeCode).orElse(in.point());
        PredictedBudget predicted = then.send().equals(in.send()) && then.ret().equals(in.ret())
                && pointThen.equals(in.point()) ? predictedToday : predict(in, pointThen, then.send(), then.ret(), cache);
        double[] predictedLoss = predicted.totalLossDb();
        double tolerance = in.point().effectiveToleranceDb(in.site());
        double allowed = in.analyzer().allowedLossDb();
        ScanExposure exposure = latestPair.exposure();
        Optional<String> refusal = exposure.problem();
        if (refusal.isEmpty() && clippedNearlyEverywhere(latest)) {
            refusal = Optional.of(String.format(Locale.ROOT, "not judged: %.0f %% of the range is clipped: %s",
                    100 * latest.saturatedFraction(), String.join("; ", latest.saturationReasons())));
        }
        List<BandVerdict> verdicts = new ArrayList<>();
        List<BandInterval> intervals = new ArrayList<>();
        Status status = Status.PASS;
        List<BandUncertainty> spreads = List.of();
        List<PooledRepeatability> repeats = List.of();
        boolean onInterval = rule.onInterval();
        if (onInterval) {
            try {
                spreads = BandUncertainty.of(predicted, bands, engine.withCoverage(rule.coverage()));
            } catch (IllegalArgumentException e) {
                onInterval = false;
                problems.add("no coverage interval for this point's prediction (" + e.getMessage()
                        + "): its bands are judged by the fixed tolerance");
            }
        }
        if (onInterval) {
            Map<ScaledScan, RawSpectrum> repeatScans = new HashMap<>();
            repeats = ReferenceRepeats.of(in.scans(), pairing, pair -> measure(pair, in.spectra(), repeatScans,
                    regridder), grid, bands);
        }
        double[] measuredLoss = latest.lossDb();
        double[] lossSigma = latest.sigmaDb();
        for (int b = 0; b < bands.size(); b++) {
            WavelengthBand band = bands.get(b);
            BandVerdict v;
            if (onInterval) {
                PooledRepeatability pooled = repeats.get(b);
                MeasurementUncertainty repeatability = pooled == null
                        ? MeasurementUncertainty.withDefaultRepeatability(0)
                        : MeasurementUncertainty.withPooledRepeatability(0, pooled);
                IntervalAcceptance.Judged judged = IntervalAcceptance.judge(grid, measuredLoss, lossSigma,
                        predictedLoss, band, spreads.get(b), repeatability, rule, tolerance, allowed);
                v = judged.verdict();
                intervals.add(judged.interval());
            } else {
                v = Acceptance.judge(grid, measuredLoss, predictedLoss, band, tolerance, allowed);
            }
            if (refusal.isPresent()) {
                v = notJudged(v, refusal.get());
            } else if (v.measuredFraction() < Acceptance.MIN_MEASURED_FRACTION) {
                double clipped = saturatedShare(latest, grid, band);
                if (2 * clipped > 1 - v.measuredFraction()) {
                    // most of what could not be measured was clipped: that, not the light, is the finding
                    v = notJudged(v, String.format(Locale.ROOT, "not judged: %.0f %% of the band is clipped: %s",
                            100 * clipped, String.join("; ", latest.saturationReasons())));
                }
            }
            verdicts.add(v);
            status = status.worse(v.status());
        }
        Optional<Diagnosis> diagnosis = Optional.empty();
        if (refusal.isEmpty()) {
            diagnosis = Optional.of(diagnoser.diagnose(latest, predictedLoss,
                    PathEvidence.of(pointThen, then.send(), then.ret(), in.catalog())));
        } else {
            problems.add(0, refusal.get());
        }
        int earlierUnjudged = unjudged - (refusal.isPresent() ? 1 : 0);
        if (earlierUnjudged > 0) {
            problems.add(earlierUnjudged + " earlier loop scan(s) left out of the trend: clipped nearly everywhere,"
                    + " or their integration times do not show that loop and reference are on one scale");
        }
        Instant asOf = lastJudged == null ? latestPair.loop().takenAt() : lastJudged;
        Optional<Instant> repaired = latestRepair(in.actions(), asOf);
        List<BandTrend> trends = new ArrayList<>();
        for (BandHistory history : histories) {
            trends.add(history.trend(allowed, asOf, repaired, theilSen, steps, forecast));
        }
        return new PointEvaluation(in.point(), status, predicted, Optional.of(latestPair), Optional.of(latest),
                verdicts, diagnosis, trends, problems, intervals);
    }

    private ThroughputResult measure(ScanPair pair, SpectrumSource spectra, Map<ScaledScan, RawSpectrum> fetched,
                                     ScanRegridder regridder) {
        ScanExposure exposure = pair.exposure();
        return throughput.measure(new ThroughputScans(
                raw(pair.loop(), exposure, spectra, fetched, regridder),
                raw(pair.loopDark(), exposure, spectra, fetched, regridder),
                raw(pair.reference(), exposure, spectra, fetched, regridder),
                raw(pair.referenceDark(), exposure, spectra, fetched, regridder)),
                regridder);
    }

    private static PredictedBudget predict(PointInputs in, MeasurementPoint point, PathLeg send, PathLeg ret,
                                           OpticsCache cache) {
        try {
            return new PointBudgetBuilder(in.catalog()).build(point, send, ret, cache);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("point " + in.point().tag() + ": cannot predict its loss: "
                    + e.getMessage(), e);
        }
    }

    /**
     * The latest repair up to {@code asOf}: any action but a re-taken reference, which changes the
     * baseline of no loop (design choice).
     */
    private static Optional<Instant> latestRepair(List<MaintenanceAction> actions, Instant asOf) {
        return actions.stream().filter(a -> a.kind() != MaintenanceKind.RETAKE_REFERENCE)
                .map(MaintenanceAction::performedAt).filter(t -> !t.isAfter(asOf)).max(Instant::compareTo);
    }

    /** Share of the band's grid points masked because a detector was saturated or clipped. */
    private static double saturatedShare(ThroughputResult result, WavelengthGrid grid, WavelengthBand band) {
        int inBand = 0;
        int saturated = 0;
        for (int i = 0; i < grid.size(); i++) {
            double nm = grid.wavelengthNm(i);
            if (!band.contains(nm)) {
                continue;
            }
            inBand++;
            for (MaskedRange r : result.maskedRanges()) {
                if (r.reason().isSaturation() && nm >= r.fromNm() && nm <= r.toNm()) {
                    saturated++;
                    break;
                }
            }
        }
        return inBand == 0 ? 0 : (double) saturated / inBand;
    }

    private static boolean clippedNearlyEverywhere(ThroughputResult result) {
        return result.saturatedFraction() >= REFUSED_SATURATED_FRACTION;
    }

    /**
     * A band the evaluation refuses to judge: REVIEW, the reason first and the figures as measured
     * after it (they are shown, not trusted).
     */
    private static BandVerdict notJudged(BandVerdict v, String why) {
        return new BandVerdict(v.band(), Status.REVIEW, v.meanDeviationDb(), v.worstDeviationDb(), v.worstAtNm(),
                v.predictedLossDb(), v.worstMeasuredLossDb(), v.marginDb(), v.measuredFraction(),
                v.measuredFraction() == 0 ? why : why + "; as measured: " + v.reason());
    }

    /** A stored scan with the divisor its counts were put on the pair's common scale by. */
    private record ScaledScan(long id, double divisor) {
    }

    private static RawSpectrum raw(ScanRecord scan, ScanExposure exposure, SpectrumSource source,
                                   Map<ScaledScan, RawSpectrum> fetched, ScanRegridder regridder) {
        double divisor = exposure.divisor(scan.conditions());
        return fetched.computeIfAbsent(new ScaledScan(scan.id(), divisor), key -> {
            Spectrum s = source.spectrum(key.id());
            double[] counts = s.values();
            if (divisor != 1) {
                for (int i = 0; i < counts.length; i++) {
                    counts[i] /= divisor;
                }
            }
            // a dark's noise is estimated once, however many scans it serves
            OptionalDouble noise = scan.kind() == ScanKind.DARK
                    ? OptionalDouble.of(DarkNoise.sigmaCounts(counts)) : OptionalDouble.empty();
            return new RawSpectrum(regridder.axisOf(s), counts, noise);
        });
    }
}
