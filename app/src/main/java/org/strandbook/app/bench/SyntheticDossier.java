package org.strandbook.app.bench;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.SplittableRandom;

import org.strandbook.diagnosis.DeviationDiagnoser;
import org.strandbook.diagnosis.PathEvidence;
import org.strandbook.dossier.AuditAppendix;
import org.strandbook.dossier.DossierContent;
import org.strandbook.dossier.DossierPoint;
import org.strandbook.dossier.DossierScope;
import org.strandbook.dossier.PointUncertainty;
import org.strandbook.evaluation.Acceptance;
import org.strandbook.evaluation.BandTrend;
import org.strandbook.evaluation.BandVerdict;
import org.strandbook.evaluation.PointBudgetBuilder;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PredictedBudget;
import org.strandbook.evaluation.ScanPair;
import org.strandbook.evaluation.ScanPairing;
import org.strandbook.evaluation.Status;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.samplesite.DemoPlant;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;
import org.strandbook.site.WavelengthBand;
import org.strandbook.store.AuditEntry;
import org.strandbook.throughput.MaskReason;
import org.strandbook.throughput.MaskedRange;
import org.strandbook.throughput.ThroughputResult;
import org.strandbook.trend.LossReading;
import org.strandbook.trend.LossTrend;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.StepDetector;
import org.strandbook.trend.TheilSenTrend;

/**
 * A synthetic site of any size for the export benchmark, built without a workbook: the demo
 * plant's points on its Fourier-transform analyzer serve as templates, each evaluated once on a
 * fine grid (prediction, a measured spectrum with a masked range, acceptance, diagnosis, and a
 * history of weekly readings with trend and forecast); point i is template i mod k under a new tag,
 * sharing the template's spectra, so the input itself does not grow with the site. The audit trail
 * is generated page by page as the dossier asks for it, as many rows as such a site's workbook holds.
 */
final class SyntheticDossier {

    static final Instant FIRST_SCAN = Instant.parse("2024-01-08T08:00:00Z");
    /** Audit rows per point: its records, legs and catalog share, and three scans per visit. */
    static final int RECORD_AUDIT_ROWS = 10;

    private SyntheticDossier() {
    }

    /** One template point, evaluated. */
    private record Template(MeasurementPoint point, PathLeg send, PathLeg ret, PointEvaluation evaluation,
                            PointUncertainty uncertainty) {
    }

    static DossierContent build(int points, int scans, int gridPoints) {
        DemoPlant plant = new DemoPlant();
        Analyzer analyzer = plant.analyzers().get(0);
        Catalog catalog = Catalog.of(plant.fiberTypes(), plant.connectorTypes(), plant.probeTypes());
        WavelengthGrid grid = WavelengthGrid.uniformNm(analyzer.minNm(), analyzer.maxNm(), gridPoints);
        OpticsCache cache = new OpticsCache(grid);
        List<Template> templates = new ArrayList<>();
        SplittableRandom random = new SplittableRandom(20_251_201L);
        for (DemoPlant.DemoPoint dp : plant.points()) {
            if (dp.point().analyzerTag().equals(analyzer.tag())) {
                templates.add(template(dp, analyzer, catalog, grid, cache, scans, random));
            }
        }
        List<DossierPoint> site = new ArrayList<>(points);
        Map<String, PointUncertainty> uncertainties = new HashMap<>();
        for (int i = 0; i < points; i++) {
            Template t = templates.get(i % templates.size());
            String tag = String.format(java.util.Locale.ROOT, "BX-%04d", i + 1);
            MeasurementPoint m = t.point();
            MeasurementPoint renamed = new MeasurementPoint(tag, m.service(), m.location(), m.analyzerTag(),
                    1 + i % analyzer.channels(), m.probeTypeCode(), m.bands(), m.toleranceDb(), m.hazardousArea(),
                    m.hydrogenService(), m.processTemperatureC());
            PointEvaluation e = t.evaluation();
            PointEvaluation shared = new PointEvaluation(renamed, e.status(), e.predicted(), e.latest(), e.measured(),
                    e.verdicts(), e.diagnosis(), e.trends(), e.problems());
            // the copies share their template's path, so its uncertainty: the Monte Carlo runs once per template
            uncertainties.put(tag, t.uncertainty());
            site.add(new DossierPoint(renamed, List.of(new PathLeg(tag, t.send().direction(), t.send().elements()),
                    new PathLeg(tag, t.ret().direction(), t.ret().elements())), List.of(), List.of(), List.of(),
                    Optional.of(shared), List.of()));
        }
        long auditRows = (long) points * (RECORD_AUDIT_ROWS + 3L * scans);
        AuditAppendix audit = new AuditAppendix(auditRows, hash(auditRows), true, List.of(),
                (after, limit) -> auditPage(after, limit, auditRows));
        return new DossierContent(plant.site(), List.of(analyzer), catalog, DossierScope.everything(), site,
                ScanPairing.withDefaults().describe(), List.of(),
                List.of(new SignOff(SignOffRole.PREPARED, "I. Marsh", FIRST_SCAN, "", "")), audit,
                FIRST_SCAN.plus(Duration.ofDays(7L * scans)), "strandbook bench", "synthetic.sqlite", DecisionRule.FIXED,
                uncertainties);
    }

    private static Template template(DemoPlant.DemoPoint dp, Analyzer analyzer, Catalog catalog, WavelengthGrid grid,
                                     OpticsCache cache, int scans, SplittableRandom random) {
        MeasurementPoint point = dp.point();
        PredictedBudget predicted = new PointBudgetBuilder(catalog).build(point, dp.send(), dp.ret(), cache);
        double[] loss = predicted.totalLossDb();
        double excessDb = dp.fault() == DemoPlant.Fault.NONE ? 0 : 1.5;
        double[] sigma = new double[loss.length];
        boolean[] usable = new boolean[loss.length];
        for (int i = 0; i < loss.length; i++) {
            double w = grid.wavelengthNm(i);
            boolean masked = w >= 2440;
            loss[i] = masked ? Double.NaN : loss[i] + excessDb + 0.02 * random.nextGaussian();
            sigma[i] = masked ? Double.NaN : 0.02;
            usable[i] = !masked;
        }
        MaskedRange mask = new MaskedRange(2440, grid.lastNm(), MaskReason.LOOP_AT_DARK,
                "2440–" + (int) grid.lastNm() + " nm: " + MaskReason.LOOP_AT_DARK.describe("3"));
        ThroughputResult measured = new ThroughputResult(grid, loss, sigma, usable, List.of(mask), false, false,
                List.of(), List.of(), 4.0, 4.0, 3.0);
        double tolerance = point.effectiveToleranceDb(new DemoPlant().site());
        List<BandVerdict> verdicts = new ArrayList<>();
        Status status = Status.PASS;
        for (WavelengthBand band : point.bands()) {
            BandVerdict v = Acceptance.judge(grid, measured.lossDb(), predicted.totalLossDb(), band, tolerance,
                    analyzer.allowedLossDb());
            verdicts.add(v);
            status = status.worse(v.status());
        }
        Instant latest = FIRST_SCAN.plus(Duration.ofDays(7L * (scans - 1)));
        List<BandTrend> trends = new ArrayList<>();
        for (int b = 0; b < point.bands().size(); b++) {
            trends.add(trend(point.bands().get(b), verdicts.get(b), scans, latest, random));
        }
        ScanPair pair = pair(point.tag(), grid, latest);
        PointEvaluation evaluation = new PointEvaluation(point, status, predicted, Optional.of(pair),
                Optional.of(measured), verdicts, Optional.of(DeviationDiagnoser.withDefaults().diagnose(measured,
                predicted.totalLossDb(), PathEvidence.of(point, dp.send(), dp.ret(), catalog))), trends, List.of());
        return new Template(point, dp.send(), dp.ret(), evaluation,
                PointUncertainty.of(evaluation, PointUncertainty.engine(DecisionRule.DEFAULT_COVERAGE)));
    }

    private static BandTrend trend(WavelengthBand band, BandVerdict verdict, int scans, Instant latest,
                                   SplittableRandom random) {
        List<LossReading> readings = new ArrayList<>();
        double slopePerScan = 0.002 + 0.004 * random.nextDouble();
        for (int s = 0; s < scans; s++) {
            readings.add(new LossReading(FIRST_SCAN.plus(Duration.ofDays(7L * s)),
                    verdict.worstMeasuredLossDb() - slopePerScan * (scans - 1 - s) + 0.03 * random.nextGaussian()));
        }
        Optional<LossTrend> fit = scans >= 2 ? Optional.of(TheilSenTrend.withDefaults().fit(readings)) : Optional.empty();
        return new BandTrend(band, readings, List.of(), fit,
                scans >= 3 ? StepDetector.withDefaults().detect(readings).events() : List.of(),
                fit.filter(f -> Double.isFinite(verdict.marginDb())).map(f -> MarginForecast.withDefaults()
                        .forecast(verdict.marginDb(), latest, f, ZoneOffset.UTC)));
    }

    private static ScanPair pair(String tag, WavelengthGrid grid, Instant latest) {
        ScanConditions c = new ScanConditions("I. Marsh", 50, 1, OptionalDouble.empty(), OptionalDouble.empty());
        ScanRecord loop = record(1, tag, ScanKind.LOOP, latest, c, grid);
        ScanRecord ref = record(2, tag, ScanKind.REFERENCE, latest.minusSeconds(120), c, grid);
        ScanRecord dark = record(3, tag, ScanKind.DARK, latest.minusSeconds(240), c, grid);
        return new ScanPair(loop, ref, dark, dark, ScanPairing.withDefaults().describe());
    }

    private static ScanRecord record(long id, String tag, ScanKind kind, Instant t, ScanConditions c,
                                     WavelengthGrid grid) {
        return new ScanRecord(id, tag, kind, t, c, grid.size(), grid.firstNm(), grid.lastNm(), tag + "-" + id + ".csv",
                hash(id));
    }

    private static List<AuditEntry> auditPage(long after, int limit, long rows) {
        List<AuditEntry> page = new ArrayList<>();
        for (long id = after + 1; id <= Math.min(rows, after + limit); id++) {
            page.add(new AuditEntry(id, FIRST_SCAN.plusSeconds(id), "i.marsh", "INSERT", "scan", Long.toString(id),
                    null, "{\"id\":" + id + ",\"kind\":\"LOOP\",\"taken_at\":\"2024-01-08T08:00:00.000Z\","
                    + "\"operator\":\"I. Marsh\",\"n_points\":2000,\"spectrum\":{\"sha256\":\"" + hash(id * 7)
                    + "\",\"bytes\":16000}}", hash(id * 3), hash(id - 1), hash(id)));
        }
        return page;
    }

    /** A 64-digit hex string standing for a hash: the benchmark writes, it does not verify. */
    static String hash(long seed) {
        byte[] b = new byte[32];
        Arrays.fill(b, (byte) seed);
        b[0] = (byte) (seed >>> 8);
        b[1] = (byte) (seed >>> 16);
        return HexFormat.of().formatHex(b);
    }
}
