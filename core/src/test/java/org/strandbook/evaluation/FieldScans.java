package org.strandbook.evaluation;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Random;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.Analyzer;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.DetectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;
import org.strandbook.site.Spectrum;
import org.strandbook.site.WavelengthBand;

/**
 * Scans of one invented point taken the way field work goes, from a light model of their own (not
 * the diagnoser's shapes): a halogen lamp as a blackbody (Planck's law, second radiation constant
 * c₂ = 1.438777·10⁷ nm·K, CODATA 2018) seen by a detector whose response is a smooth bump, counts
 * proportional to integration time on top of a fixed offset plus dark current, Gaussian read noise,
 * and a 16-bit converter that stops at 65 535 counts. The loop carries the predicted loss plus a
 * chosen excess. All names are made up.
 */
final class FieldScans {

    static final double FULL_SCALE_COUNTS = 65_535;
    static final double OFFSET_COUNTS = 800;
    static final double DARK_COUNTS_PER_MS = 2;
    static final double READ_NOISE_COUNTS = 4;
    static final double LAMP_K = 3000;
    static final WavelengthBand BAND = new WavelengthBand("C-H 1st overtone", 1650, 1800);

    static final Site SITE = new Site("Ferncombe Test Works", "Unit 2", "A", 1.0);
    static final Analyzer ANALYZER = new Analyzer("QB-1", "process NIR", 1000, 2200, 4, 20.0,
            DetectorType.EXTENDED_INGAAS);
    static final Catalog CATALOG = Catalog.of(
            List.of(new FiberType("LOH-400", "400/440 µm low-OH silica", 400, 440, 480, 0.22, "FUSED_SILICA",
                    OhGrade.LOW_OH, 0.5, List.of())),
            List.of(new ConnectorType("SMA-A", "SMA 905 bulkhead pair", "SMA 905", 1.0, true)),
            List.of(new ProbeType("TX-5", "transmission cell, 5 mm gap", ProbeKind.TRANSMISSION, "SAPPHIRE", 4,
                    5.0, 0.8)));
    static final MeasurementPoint POINT = new MeasurementPoint("AT-301", "Column feed", "rack 2", "QB-1", 1, "TX-5",
            List.of(BAND), OptionalDouble.empty(), false, false, OptionalDouble.empty());
    static final PathLeg SEND = new PathLeg("AT-301", PathDirection.SEND, List.of(
            new CableSegment("C301-S1", "LOH-400", 80.0, List.of()),
            new Joint("J1", "SMA-A", null, InspectionGrade.CLEAN, OptionalDouble.empty(), LossBasis.ASSUMED)));
    static final PathLeg RETURN = new PathLeg("AT-301", PathDirection.RETURN, List.of(
            new CableSegment("C301-R1", "LOH-400", 80.0, List.of())));

    private final WavelengthGrid grid = EvaluationGrid.forAnalyzer(ANALYZER);
    private final double[] predictedDb;
    private final List<ScanRecord> records = new ArrayList<>();
    private final Map<Long, Spectrum> spectra = new HashMap<>();
    private final Random noise = new Random(20261204L);
    private Instant clock = Instant.parse("2026-03-02T08:00:00Z");
    /** Lamp counts per ms at the brightest wavelength, through the reference cord. */
    private double peakCountsPerMs = 600;

    FieldScans() {
        predictedDb = new PointBudgetBuilder(CATALOG).build(POINT, SEND, RETURN, new OpticsCache(grid)).totalLossDb();
    }

    WavelengthGrid grid() {
        return grid;
    }

    double[] predictedDb() {
        return predictedDb.clone();
    }

    /** The lamp brighter or dimmer: counts per ms at the brightest wavelength. */
    FieldScans lampPeakCountsPerMs(double countsPerMs) {
        this.peakCountsPerMs = countsPerMs;
        return this;
    }

    /** Lamp signal through the reference cord, counts per ms, per grid point. */
    double[] lampCountsPerMs() {
        double[] s = new double[grid.size()];
        double max = 0;
        for (int i = 0; i < s.length; i++) {
            double nm = grid.wavelengthNm(i);
            double planck = Math.pow(nm, -5) / Math.expm1(1.438777e7 / (nm * LAMP_K));
            double x = (nm - 1600) / 550;
            s[i] = planck * Math.exp(-x * x);
            max = Math.max(max, s[i]);
        }
        for (int i = 0; i < s.length; i++) {
            s[i] *= peakCountsPerMs / max;
        }
        return s;
    }

    /** A dark scan of {@code integrationMs} (0: not recorded in its file, taken at {@code takenMs}). */
    ScanRecord dark(double integrationMs, double takenMs) {
        return add(ScanKind.DARK, integrationMs, counts(takenMs, null, null));
    }

    /** A reference scan (lamp through the cord alone). */
    ScanRecord reference(double integrationMs, double takenMs) {
        return add(ScanKind.REFERENCE, integrationMs, counts(takenMs, lampCountsPerMs(), new double[grid.size()]));
    }

    /** A loop scan: the predicted loss plus {@code excessDb} everywhere. */
    ScanRecord loop(double integrationMs, double takenMs, double excessDb) {
        return add(ScanKind.LOOP, integrationMs, counts(takenMs, lampCountsPerMs(), loopLossDb(excessDb)));
    }

    /** Adds a scan with counts given directly, e.g. a clipped one. */
    ScanRecord add(ScanKind kind, double recordedIntegrationMs, double[] counts) {
        long id = records.size() + 1;
        clock = clock.plus(Duration.ofMinutes(2));
        records.add(new ScanRecord(id, POINT.tag(), kind, clock, new ScanConditions("t.field", recordedIntegrationMs, 1,
                OptionalDouble.empty(), OptionalDouble.empty()), grid.size(), grid.firstNm(), grid.lastNm(),
                kind.name().toLowerCase() + id + ".csv", ""));
        spectra.put(id, new Spectrum(grid.wavelengthsNm(), counts));
        return records.get(records.size() - 1);
    }

    /** The predicted loss plus {@code excessDb} everywhere. */
    double[] loopLossDb(double excessDb) {
        double[] loss = predictedDb.clone();
        for (int i = 0; i < loss.length; i++) {
            loss[i] += excessDb;
        }
        return loss;
    }

    /**
     * Detector counts after {@code takenMs} of integration: offset, dark current, lamp light through
     * {@code lossDb} (no lamp for a dark: both null), read noise, clipped at full scale.
     */
    double[] counts(double takenMs, double[] lampCountsPerMs, double[] lossDb) {
        double[] c = new double[grid.size()];
        for (int i = 0; i < c.length; i++) {
            double light = 0;
            if (lampCountsPerMs != null) {
                light = lampCountsPerMs[i] * takenMs * Math.pow(10, -lossDb[i] / 10);
            }
            double v = OFFSET_COUNTS + DARK_COUNTS_PER_MS * takenMs + light + READ_NOISE_COUNTS * noise.nextGaussian();
            c[i] = Math.min(Math.rint(v), FULL_SCALE_COUNTS);
        }
        return c;
    }

    PointInputs inputs() {
        return new PointInputs(SITE, POINT, ANALYZER, SEND, RETURN, CATALOG, records, spectra::get);
    }
}
