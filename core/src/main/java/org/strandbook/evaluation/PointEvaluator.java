package org.strandbook.evaluation;

import java.time.Instant;
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
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.StepDetector;
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
        PredictedBudget predicted;
        try {
            predicted = new PointBudgetBuilder(in.catalog()).build(in.point(), in.send(), in.ret(), cache);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("point " + in.point().tag() + ": cannot predict its loss: "
                    + e.getMessage(), e);
        }
        double[] predictedLoss = predicted.totalLossDb();
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
        List<BandHistory> histories = bands.stream().map(BandHistory::new).toList();
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
            for (BandHistory history : histories) {
                history.add(pair.loop().takenAt(), grid, loss);
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
            return new PointEvaluation(in.point(), Status.REVIEW, predicted, Optional.empty(), Optional.empty(),
                    List.of(), Optional.empty(), List.of(), problems);
        }
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
                PathEvidence.of(in.point(), in.send(), in.ret(), in.catalog()));
        Instant asOf = latestPair.loop().takenAt();
        List<BandTrend> trends = new ArrayList<>();
        for (BandHistory history : histories) {
            trends.add(history.trend(allowed, asOf, theilSen, steps, forecast));
        }
        return new PointEvaluation(in.point(), status, predicted, Optional.of(latestPair), Optional.of(latest),
                verdicts, Optional.of(diagnosis), trends, problems);
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
}
