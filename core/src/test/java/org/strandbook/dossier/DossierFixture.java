package org.strandbook.dossier;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Duration;
import java.time.Instant;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Random;

import org.strandbook.evaluation.EvaluationGrid;
import org.strandbook.evaluation.PointBudgetBuilder;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.DetectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.Note;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;
import org.strandbook.site.Site;
import org.strandbook.site.Spectrum;
import org.strandbook.site.WavelengthBand;
import org.strandbook.store.Workbook;

/**
 * An invented little site for the dossier tests: one analyzer, three points, four visits of
 * dark, reference and loop scans made on the evaluation grid from the predicted loss itself plus a
 * known excess, so that the expected verdicts are plain: AT-201 matches its prediction (PASS),
 * AT-202 loses 3 dB more everywhere (FAIL: the mean deviation exceeds the 1 dB tolerance), AT-203
 * has never been measured (REVIEW). All names are made up.
 */
final class DossierFixture {

    static final String USER = "r.inglenook";
    static final String GOOD = "AT-201";
    static final String DIRTY = "AT-202";
    static final String UNMEASURED = "AT-203";
    static final double DIRTY_EXCESS_DB = 3.0;
    static final int VISITS = 4;
    static final Instant FIRST_VISIT = Instant.parse("2024-11-04T08:00:00Z");
    static final Instant ISSUED = Instant.parse("2025-12-01T09:30:00Z");

    private DossierFixture() {
    }

    static Site site() {
        return new Site("Ashcombe Lane Works", "Unit 7 – aromatics", "B", 1.0);
    }

    static Analyzer analyzer() {
        return new Analyzer("QA-9", "process NIR, shelter S2", 1000, 2200, 4, 18.0, DetectorType.EXTENDED_INGAAS);
    }

    static Catalog catalog() {
        return Catalog.of(
                List.of(new FiberType("LOH-400", "400/440 µm low-OH silica", 400, 440, 480, 0.22, "FUSED_SILICA",
                        OhGrade.LOW_OH, 0.5, List.of())),
                List.of(new ConnectorType("SMA-A", "SMA 905 bulkhead pair", "SMA 905", 1.0, true)),
                List.of(new ProbeType("TX-5", "transmission cell, 5 mm gap", ProbeKind.TRANSMISSION, "SAPPHIRE", 4,
                        5.0, 0.8)));
    }

    static MeasurementPoint point(String tag, int channel, String service) {
        return new MeasurementPoint(tag, service, "pipe rack 3, el. 12 m", "QA-9", channel, "TX-5",
                List.of(new WavelengthBand("C-H 1st overtone", 1650, 1800), new WavelengthBand("", 1100, 1250)),
                OptionalDouble.empty(), tag.equals(DIRTY), false, OptionalDouble.of(85.0));
    }

    static List<PathLeg> legs(String tag) {
        String c = "C" + tag.substring(3);
        return List.of(
                new PathLeg(tag, PathDirection.SEND, List.of(
                        new CableSegment(c + "-S1", "LOH-400", 2.0, List.of()),
                        new Joint("J1", "SMA-A", null, InspectionGrade.CLEAN, OptionalDouble.empty(), LossBasis.ASSUMED),
                        new CableSegment(c + "-S2", "LOH-400", 60.0, List.of(new Bend(150, 2))))),
                new PathLeg(tag, PathDirection.RETURN, List.of(
                        new CableSegment(c + "-R1", "LOH-400", 60.0, List.of()),
                        new Joint("J2", "SMA-A", "SMA-A", tag.equals(DIRTY) ? InspectionGrade.DIRTY : InspectionGrade.CLEAN,
                                OptionalDouble.of(0.7), LossBasis.MEASURED),
                        new CableSegment(c + "-R2", "LOH-400", 2.0, List.of()))));
    }

    /** Creates the workbook at {@code file} with every record, scan, inspection, note and sign-off. */
    static Workbook create(Path file, Map<String, String> extraNotes) {
        Workbook wb = Workbook.create(file, site(), USER);
        Catalog catalog = catalog();
        wb.inTransaction(() -> {
            wb.site().addAnalyzer(analyzer());
            catalog.fiberTypes().values().forEach(wb.catalog()::addFiberType);
            catalog.connectorTypes().values().forEach(wb.catalog()::addConnectorType);
            catalog.probeTypes().values().forEach(wb.catalog()::addProbeType);
            int channel = 1;
            for (String tag : List.of(GOOD, DIRTY, UNMEASURED)) {
                wb.points().add(point(tag, channel++, tag.equals(DIRTY) ? "Reactor outlet" : "Reactor feed"));
                wb.paths().replaceLegs(tag, legs(tag));
            }
        });
        scans(wb, GOOD, 0.0);
        scans(wb, DIRTY, DIRTY_EXCESS_DB);
        wb.inspections().add(new Inspection(DIRTY, "J2", FIRST_VISIT.plus(Duration.ofDays(300)), "T. Okonjo",
                InspectionGrade.DIRTY, "film on the ferrule"));
        wb.notes().add(new Note(DIRTY, FIRST_VISIT.plus(Duration.ofDays(301)), "T. Okonjo",
                "cleaned J2 with a click cleaner; re-measure at next visit"));
        extraNotes.forEach((tag, text) -> wb.notes().add(new Note(tag, FIRST_VISIT.plus(Duration.ofDays(302)),
                "k.ashdown", text)));
        wb.signOffs().add(new SignOff(SignOffRole.PREPARED, "R. Inglenook", ISSUED.minus(Duration.ofDays(1)), "", ""));
        return wb;
    }

    /** Dark, reference and loop scans at every visit; the loop carries the predicted loss plus {@code excessDb}. */
    private static void scans(Workbook wb, String tag, double excessDb) {
        double[] each = new double[VISITS];
        java.util.Arrays.fill(each, excessDb);
        scans(wb, tag, each);
    }

    /** As above with its own excess at each visit (91 days apart, as many as given), e.g. a repair between two. */
    static void scans(Workbook wb, String tag, double[] excessDbPerVisit) {
        WavelengthGrid grid = EvaluationGrid.forAnalyzer(analyzer());
        List<PathLeg> legs = legs(tag);
        double[] predicted = new PointBudgetBuilder(catalog()).build(point(tag, 1, ""), legs.get(0), legs.get(1),
                new OpticsCache(grid)).totalLossDb();
        double[] wl = grid.wavelengthsNm();
        Random noise = new Random(tag.hashCode());
        for (int v = 0; v < excessDbPerVisit.length; v++) {
            Instant t = FIRST_VISIT.plus(Duration.ofDays(91L * v));
            double[] dark = new double[wl.length];
            double[] ref = new double[wl.length];
            double[] loop = new double[wl.length];
            for (int i = 0; i < wl.length; i++) {
                double x = (wl[i] - 1600) / 600;
                double lamp = 30_000 * Math.exp(-x * x) + 3_000;
                dark[i] = 800 + 4 * noise.nextGaussian();
                ref[i] = 800 + lamp + 4 * noise.nextGaussian();
                loop[i] = 800 + lamp * Math.pow(10, -(predicted[i] + excessDbPerVisit[v]) / 10) + 4 * noise.nextGaussian();
            }
            ScanConditions c = new ScanConditions("I. Marsh", 50, 1, OptionalDouble.empty(), OptionalDouble.empty());
            wb.scans().insert(tag, ScanKind.DARK, t, c, new Spectrum(wl, dark), tag + "-dark-" + v + ".csv",
                    sha(tag + "dark" + v));
            wb.scans().insert(tag, ScanKind.REFERENCE, t.plusSeconds(60), c, new Spectrum(wl, ref),
                    tag + "-ref-" + v + ".csv", sha(tag + "ref" + v));
            wb.scans().insert(tag, ScanKind.LOOP, t.plusSeconds(180), c, new Spectrum(wl, loop),
                    tag + "-loop-" + v + ".csv", sha(tag + "loop" + v));
        }
    }

    static DossierContent content(Workbook wb, DossierScope scope) {
        return WorkbookDossier.read(wb, scope, PointEvaluator.withDefaults(), ISSUED, "strandbook test",
                DossierProgress.NONE);
    }

    static String sha(String text) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
