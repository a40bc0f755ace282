package org.strandbook.store;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;

import org.strandbook.site.Analyzer;
import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
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
import org.strandbook.site.Site;
import org.strandbook.site.Spectrum;
import org.strandbook.site.WavelengthBand;

/** An invented little site for the store tests: one analyzer, two points, one catalog entry of each kind. */
public final class DemoSite {

    public static final String USER = "r.inglenook";
    public static final String ANALYZER = "QA-7";
    public static final String FIBER = "LOH-400";
    public static final String CONNECTOR = "SMA-A";
    public static final String PROBE = "TX-5";
    public static final String POINT_A = "AT-101";
    public static final String POINT_B = "AT-102";

    private DemoSite() {
    }

    public static Site site() {
        return new Site("Fennwick Basin Works", "Unit 3 aromatics", "A", 1.0);
    }

    public static Analyzer analyzer() {
        return new Analyzer(ANALYZER, "process NIR, 4 channels", 1000, 2200, 4, 18.0, DetectorType.EXTENDED_INGAAS);
    }

    public static FiberType fiber() {
        return new FiberType(FIBER, "400 um low-OH silica/silica", 400, 440, 480, 0.22, "FUSED_SILICA", OhGrade.LOW_OH,
                0.5, List.of(new AttenuationPoint(1000, 8.0), new AttenuationPoint(1550, 4.5)));
    }

    public static ConnectorType connector() {
        return new ConnectorType(CONNECTOR, "SMA 905 bulkhead pair", "SMA 905", 1.0, true);
    }

    public static ProbeType probe() {
        return new ProbeType(PROBE, "transmission cell, 5 mm gap", ProbeKind.TRANSMISSION, "SAPPHIRE", 4, 5.0, 0.8);
    }

    public static MeasurementPoint point(String tag, int channel) {
        return new MeasurementPoint(tag, "reactor feed", "pipe rack 3, el. 12 m", ANALYZER, channel, PROBE,
                List.of(new WavelengthBand("C-H 1st overtone", 1650, 1800), new WavelengthBand("", 1100, 1250)),
                OptionalDouble.of(1.5), true, false, OptionalDouble.of(180.0));
    }

    public static List<PathLeg> legs(String tag, String cablePrefix) {
        PathLeg send = new PathLeg(tag, PathDirection.SEND, List.of(
                new CableSegment(cablePrefix + "-S1", FIBER, 2.0, List.of()),
                new Joint("J1", CONNECTOR, null, InspectionGrade.CLEAN, OptionalDouble.empty(), LossBasis.ASSUMED),
                new CableSegment(cablePrefix + "-S2", FIBER, 85.0, List.of(new Bend(60, 3), new Bend(150, 2)))));
        PathLeg back = new PathLeg(tag, PathDirection.RETURN, List.of(
                new CableSegment(cablePrefix + "-R1", FIBER, 85.5, List.of(new Bend(60, 2))),
                new Joint("J2", CONNECTOR, CONNECTOR, InspectionGrade.ACCEPTABLE, OptionalDouble.of(0.7),
                        LossBasis.MEASURED),
                new CableSegment(cablePrefix + "-R2", FIBER, 2.0, List.of())));
        return List.of(send, back);
    }

    /** Fills a fresh workbook with the catalog, the analyzer and both points with their legs. */
    public static void populate(Workbook wb) {
        wb.inTransaction(() -> {
            wb.site().addAnalyzer(analyzer());
            wb.catalog().addFiberType(fiber());
            wb.catalog().addConnectorType(connector());
            wb.catalog().addProbeType(probe());
            wb.points().add(point(POINT_A, 1));
            wb.points().add(point(POINT_B, 2));
            wb.paths().replaceLegs(POINT_A, legs(POINT_A, "C101"));
            wb.paths().replaceLegs(POINT_B, legs(POINT_B, "C102"));
        });
    }

    /** A smooth invented lamp-like spectrum with a little noise, on an even grid. */
    public static Spectrum spectrum(int points, long seed) {
        Random random = new Random(seed);
        double[] wl = new double[points];
        double[] v = new double[points];
        for (int i = 0; i < points; i++) {
            wl[i] = 1000 + 1200.0 * i / (points - 1);
            double x = (wl[i] - 1600) / 400;
            v[i] = 30000 * Math.exp(-x * x) + 50 * random.nextGaussian();
        }
        return new Spectrum(wl, v);
    }

    public static String sha256Of(String text) {
        return Sha256.hex(text.getBytes(StandardCharsets.UTF_8));
    }

    public static long insertScan(Workbook wb, String tag, int seq, Instant takenAt) {
        return wb.scans().insert(tag, ScanKind.LOOP, takenAt, ScanConditions.unknown("k.ashdown"),
                spectrum(256, seq), "loop-" + seq + ".csv", sha256Of(tag + "/" + seq));
    }
}
