package org.strandbook.evaluation;

import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.ConcurrentHashMap;

import org.strandbook.diagnosis.DeviationDiagnoser;
import org.strandbook.diagnosis.Diagnosis;
import org.strandbook.diagnosis.PathEvidence;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Spectrum;
import org.strandbook.site.WavelengthBand;
import org.strandbook.site.ScanKind;
import org.strandbook.throughput.DarkNoise;
import org.strandbook.throughput.OneCordThroughput;
import org.strandbook.throughput.RawSpectrum;
import org.strandbook.throughput.ScanRegridder;
import org.strandbook.throughput.ThroughputResult;
import org.strandbook.throughput.ThroughputScans;
import org.strandbook.trend.LossReading;
import org.strandbook.trend.LossTrend;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.StepDetector;
import org.strandbook.trend.StepReport;
import org.strandbook.trend.TheilSenTrend;

/**
 * Evaluates one measurement point end to end: prediction, pairing, measured throughput of every
 * paired loop scan, acceptance and diagnosis of the latest, and the loss trend per band.
 * Thread-safe: the optics cache is shared per grid, everything else is per call.
 */
public final class PointEvaluator {

    private final ScanPairing pairing;
    private final OneCordThroughput throughput;
    private final DeviationDiagnoser diagnoser;
    private final TheilSenTrend theilSen = TheilSenTrend.withDefaults();
    private final StepDetector steps = StepDetector.withDefaults();
    private final MarginForecast forecast = MarginForecast.withDefaults();
    private final Map<WavelengthGrid, OpticsCache> caches = new ConcurrentHashMap<>();

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

    public PointEvaluation evaluate(PointInputs in) {
        WavelengthGrid grid = EvaluationGrid.forAnalyzer(in.analyzer());
        OpticsCache cache = caches.computeIfAbsent(grid, OpticsCache::new);
        PredictedBudget predictedToday = predict(in, in.send(), in.ret(), cache);
        List<WavelengthBand> bands = in.point().bands();
        for (WavelengthBand band : bands) {
            if (band.fromNm() < grid.firstNm() || band.toNm() > grid.lastNm()) {
                throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                        "point %s: band %s (%.0f–%.0f nm) lies outside analyzer %s's range %.0f–%.0f nm",
                        in.point().tag(), band.name(), band.fromNm(), band.toNm(), in.analyzer().tag(),
                        grid.firstNm(), grid.lastNm()));
            }
        }
        ScanPairing.Pairings pairs = pairing.pair(in.scans());
        List<String> problems = new ArrayList<>();
        pairs.unpaired().forEach(u -> problems.add(u.reason()));

        ScanRegridder regridder = new ScanRegridder(grid);
        Map<Long, RawSpectrum> fetched = new HashMap<>();
        List<List<LossReading>> readings = new ArrayList<>();
        List<List<Instant>> dark = new ArrayList<>();
        for (int b = 0; b < bands.size(); b++) {
            readings.add(new ArrayList<>());
            dark.add(new ArrayList<>());
        }
        ThroughputResult latest = null;
        ScanPair latestPair = null;
        for (ScanPair pair : pairs.paired()) {
            ThroughputResult result = throughput.measure(new ThroughputScans(
                    raw(pair.loop(), in.spectra(), fetched, regridder),
                    raw(pair.loopDark(), in.spectra(), fetched, regridder),
                    raw(pair.reference(), in.spectra(), fetched, regridder),
                    raw(pair.referenceDark(), in.spectra(), fetched, regridder)),
                    regridder);
            double[] loss = result.lossDb();
            for (int b = 0; b < bands.size(); b++) {
                double mean = bandMean(grid, loss, bands.get(b));
                if (Double.isNaN(mean)) {
                    dark.get(b).add(pair.loop().takenAt());
                } else {
                    readings.get(b).add(new LossReading(pair.loop().takenAt(), mean));
                }
            }
            latest = result;
            latestPair = pair;
            // spectra of earlier visits are not needed again
            fetched.keySet().retainAll(List.of(pair.loopDark().id(), pair.referenceDark().id(),
                    pair.reference().id()));
        }
        if (latest == null) {
            problems.add(0, pairs.paired().isEmpty() && pairs.unpaired().isEmpty()
                    ? "no loop scan recorded yet" : "no loop scan could be paired with a reference and dark");
            return new PointEvaluation(in.point(), Status.REVIEW, predictedToday, Optional.empty(), Optional.empty(),
                    List.of(), Optional.empty(), List.of(), problems);
        }
        // the latest scan is judged against the path it went through, graded as inspected by then
        PathTimeline.Legs then = in.history().at(latestPair.loop().takenAt());
        PredictedBudget predicted = then.send().equals(in.send()) && then.ret().equals(in.ret())
                ? predictedToday : predict(in, then.send(), then.ret(), cache);
        double[] predictedLoss = predicted.totalLossDb();
        double tolerance = in.point().effectiveToleranceDb(in.site());
        double allowed = in.analyzer().allowedLossDb();
        List<BandVerdict> verdicts = new ArrayList<>();
        Status status = Status.PASS;
        for (WavelengthBand band : bands) {
            BandVerdict v = Acceptance.judge(grid, latest.lossDb(), predictedLoss, band, tolerance, allowed);
            verdicts.add(v);
            status = status.worse(v.status());
        }
        Diagnosis diagnosis = diagnoser.diagnose(latest, predictedLoss,
                PathEvidence.of(in.point(), then.send(), then.ret(), in.catalog()));
        Instant asOf = latestPair.loop().takenAt();
        List<BandTrend> trends = new ArrayList<>();
        for (int b = 0; b < bands.size(); b++) {
            trends.add(trend(bands.get(b), readings.get(b), dark.get(b), verdicts.get(b), asOf,
                    latestRepair(in.actions(), asOf)));
        }
        return new PointEvaluation(in.point(), status, predicted, Optional.of(latestPair), Optional.of(latest),
                verdicts, Optional.of(diagnosis), trends, problems);
    }

    private static PredictedBudget predict(PointInputs in, org.strandbook.site.PathLeg send,
                                           org.strandbook.site.PathLeg ret, OpticsCache cache) {
        try {
            return new PointBudgetBuilder(in.catalog()).build(in.point(), send, ret, cache);
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

    private BandTrend trend(WavelengthBand band, List<LossReading> readings, List<Instant> noLight,
                            BandVerdict latest, Instant asOf, Optional<Instant> repaired) {
        Optional<LossTrend> trend = Optional.empty();
        List<org.strandbook.trend.StepEvent> events = List.of();
        Optional<MarginForecast.Outlook> outlook = Optional.empty();
        // after a repair the loss follows a new course: fit and forecast it alone once it has two readings
        List<LossReading> regime = repaired.map(r -> readings.stream().filter(x -> x.time().isAfter(r)).toList())
                .filter(after -> after.size() >= 2).orElse(readings);
        if (readings.size() >= 2) {
            LossTrend t = theilSen.fit(regime);
            trend = Optional.of(t);
            if (readings.size() >= 3) {
                StepReport report = steps.detect(readings);
                events = report.events();
            }
            if (Double.isFinite(latest.marginDb())) {
                outlook = Optional.of(forecast.forecast(latest.marginDb(), asOf, t, ZoneOffset.UTC));
            }
        }
        return new BandTrend(band, readings, noLight, trend, events, outlook);
    }

    private static RawSpectrum raw(ScanRecord scan, SpectrumSource source, Map<Long, RawSpectrum> fetched,
                                   ScanRegridder regridder) {
        return fetched.computeIfAbsent(scan.id(), id -> {
            Spectrum s = source.spectrum(id);
            double[] counts = s.values();
            // a dark's noise is estimated once, however many scans it serves
            OptionalDouble noise = scan.kind() == ScanKind.DARK
                    ? OptionalDouble.of(DarkNoise.sigmaCounts(counts)) : OptionalDouble.empty();
            return new RawSpectrum(regridder.axisOf(s), counts, noise);
        });
    }

    /** Mean measured loss over the band's measured grid points; NaN when none was measured. */
    static double bandMean(WavelengthGrid grid, double[] lossDb, WavelengthBand band) {
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
}
