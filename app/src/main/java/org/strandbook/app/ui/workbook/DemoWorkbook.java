package org.strandbook.app.ui.workbook;

import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;

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
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;
import org.strandbook.site.WavelengthBand;

/**
 * A small invented site so the window is usable before the workbook store is wired in. Every
 * name, tag and number here is made up for the demo (attenuation values are plausible in shape
 * only) and must not be used as reference data.
 */
public final class DemoWorkbook {

    private DemoWorkbook() {
    }

    /** The demo content, fresh each call. */
    public static InMemoryWorkbookService.Content create() {
        Site site = new Site("Ostwick Bay Solvents", "Unit 3 aromatics recovery", "B", 1.0);
        List<Analyzer> analyzers = List.of(
                new Analyzer("AN-301", "FT-NIR, reactor train", 1000, 2500, 4, 16.0, DetectorType.EXTENDED_INGAAS),
                new Analyzer("AN-302", "Diode-array NIR, rundown", 900, 1700, 2, 12.0, DetectorType.INGAAS));
        WavelengthBand overtone = new WavelengthBand("C-H 1st overtone", 1650, 1750);
        WavelengthBand combination = new WavelengthBand("C-H combination", 2050, 2150);
        WavelengthBand second = new WavelengthBand("C-H 2nd overtone", 1100, 1250);
        List<MeasurementPoint> points = List.of(
                new MeasurementPoint("RX-101-A", "Reactor R-101 feed, aromatics", "Unit 3, R-101 inlet, EL +6.5 m",
                        "AN-301", 1, "PB-TX-05", List.of(overtone), OptionalDouble.empty(), true, false, OptionalDouble.of(145)),
                new MeasurementPoint("RX-101-B", "Reactor R-101 outlet, conversion", "Unit 3, R-101 outlet, EL +2.0 m",
                        "AN-301", 2, "PB-TX-05", List.of(overtone), OptionalDouble.of(0.8), true, false, OptionalDouble.of(160)),
                new MeasurementPoint("DC-205-T", "Column C-205 top product", "Unit 3, C-205 overhead, EL +31 m",
                        "AN-301", 3, "PB-TF-02", List.of(combination), OptionalDouble.empty(), false, false, OptionalDouble.of(92)),
                new MeasurementPoint("ST-310-R", "Tank T-310 rundown, water", "Tank farm, T-310 line, grade",
                        "AN-302", 1, "PB-DR-00", List.of(second), OptionalDouble.empty(), false, true, OptionalDouble.empty()));

        Catalog catalog = new Catalog(
                List.of(fiber("SB-LOH-600", "600 \u00B5m low-OH silica, NA 0.22", 600, 660, 0.22, OhGrade.LOW_OH, 0.5,
                                new double[][] {{800, 9}, {1000, 5}, {1200, 4}, {1383, 25}, {1550, 3.5}, {1700, 6},
                                        {1900, 12}, {2100, 25}, {2300, 60}, {2500, 180}}),
                        fiber("SB-LOH-400", "400 \u00B5m low-OH silica, NA 0.22", 400, 440, 0.22, OhGrade.LOW_OH, 0.5,
                                new double[][] {{800, 8}, {1000, 4.5}, {1200, 3.5}, {1383, 22}, {1550, 3}, {1700, 5.5},
                                        {1900, 11}, {2100, 23}, {2300, 55}, {2500, 170}}),
                        fiber("SB-HOH-600", "600 \u00B5m high-OH silica, UV-visible grade", 600, 660, 0.22, OhGrade.HIGH_OH, 700,
                                new double[][] {{300, 150}, {400, 40}, {600, 12}, {800, 10}, {1000, 20}})),
                List.of(new ConnectorType("CX-SMA-01", "SMA 905, standard ferrule", "SMA 905", 1.0, true),
                        new ConnectorType("CX-SMA-02", "SMA 905, precision ferrule", "SMA 905", 0.6, true)),
                List.of(new ProbeType("PB-TX-05", "Transmission probe, 5 mm gap", ProbeKind.TRANSMISSION, "SAPPHIRE", 2, 5, 2.5),
                        new ProbeType("PB-TF-02", "Transflectance probe, 2 mm gap", ProbeKind.TRANSFLECTANCE, "SAPPHIRE", 2, 4, 3.0),
                        new ProbeType("PB-DR-00", "Diffuse reflectance probe", ProbeKind.DIFFUSE_REFLECTANCE, "SAPPHIRE", 1, 0, 6.0)));

        Map<String, List<LegSegment>> segments = new LinkedHashMap<>();
        Map<String, List<LegJoint>> joints = new LinkedHashMap<>();
        path(segments, joints, "RX-101-A", "C-101A", "SB-LOH-600", "CX-SMA-01", new double[] {4, 86}, new double[] {4, 86.5}, -1);
        path(segments, joints, "RX-101-B", "C-101B", "SB-LOH-600", "CX-SMA-01", new double[] {4, 92}, new double[] {4, 93}, 2.8);
        path(segments, joints, "DC-205-T", "C-205T", "SB-LOH-600", "CX-SMA-01", new double[] {5, 120}, new double[] {5, 120}, -1);
        path(segments, joints, "ST-310-R", "C-310R", "SB-LOH-400", "CX-SMA-02", new double[] {3, 60}, new double[] {3, 60}, -1);

        Instant day = Instant.parse("2026-03-17T08:40:00Z");
        List<ScanRecord> scans = new ArrayList<>(List.of(
                new ScanRecord(1, "RX-101-A", ScanKind.DARK, day, ScanConditions.unknown("shift A"), 1557, 1000, 2500,
                        "rx101a-dark-0317.jdx", "0".repeat(64)),
                new ScanRecord(2, "RX-101-A", ScanKind.REFERENCE, day.plusSeconds(240), ScanConditions.unknown("shift A"), 1557,
                        1000, 2500, "rx101a-ref-0317.jdx", "1".repeat(64)),
                new ScanRecord(3, "RX-101-A", ScanKind.LOOP, day.plusSeconds(900), ScanConditions.unknown("shift A"), 1557,
                        1000, 2500, "rx101a-loop-0317.jdx", "2".repeat(64))));
        return new InMemoryWorkbookService.Content(site, analyzers, points, catalog, segments, joints, scans);
    }

    private static FiberType fiber(String code, String description, double coreUm, double claddingUm, double na,
                                   OhGrade oh, double ohPpm, double[][] sheet) {
        List<AttenuationPoint> points = new ArrayList<>();
        for (double[] p : sheet) {
            points.add(new AttenuationPoint(p[0], p[1]));
        }
        return new FiberType(code, description, coreUm, claddingUm, claddingUm + 50, na, "FUSED_SILICA", oh, ohPpm, points);
    }

    /** Each leg: patch cord, junction-box joint, trunk, probe joint; joint J1 at the analyzer. */
    private static void path(Map<String, List<LegSegment>> segments, Map<String, List<LegJoint>> joints, String tag,
                             String cablePrefix, String fiber, String connector, double[] sendM, double[] returnM,
                             double dirtyJointMeasuredDb) {
        List<LegSegment> s = new ArrayList<>();
        List<LegJoint> j = new ArrayList<>();
        int n = 1;
        for (PathDirection d : PathDirection.values()) {
            double[] lengths = d == PathDirection.SEND ? sendM : returnM;
            for (double lengthM : lengths) {
                List<Bend> bends = lengthM > 50 ? List.of(new Bend(150, 4), new Bend(80, 1)) : List.of();
                s.add(new LegSegment(d, new CableSegment(String.format(Locale.ROOT, "%s-%02d", cablePrefix, n++),
                        fiber, lengthM, bends)));
            }
            for (int k = 1; k <= 3; k++) {
                boolean dirty = dirtyJointMeasuredDb > 0 && d == PathDirection.SEND && k == 2;
                j.add(new LegJoint(d, new Joint("J" + k, connector, connector,
                        dirty ? InspectionGrade.DIRTY : InspectionGrade.CLEAN,
                        dirty ? OptionalDouble.of(dirtyJointMeasuredDb) : OptionalDouble.empty(),
                        dirty ? LossBasis.MEASURED : LossBasis.ASSUMED)));
            }
        }
        segments.put(tag, s);
        joints.put(tag, j);
    }
}
