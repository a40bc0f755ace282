package org.strandbook.samplesite;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.strandbook.site.Analyzer;
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
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.Site;
import org.strandbook.site.WavelengthBand;

/**
 * The invented demo plant: "Saltmarsh Ridge Works", a polyol and solvent plant that exists nowhere.
 * Every name, tag and number here is made up for the demonstration.
 *
 * <p>Twelve measurement points on two analyzers, 0.75 m to 300 m of fiber each way, with the faults
 * the generator injects: {@link Fault}. AT-4109 and AT-4203 show why a site may judge on the
 * prediction's coverage interval rather than a fixed tolerance.
 */
public final class DemoPlant {

    public static final String SITE_NAME = "Saltmarsh Ridge Works";

    /** What the generator does to a point's scans. */
    public enum Fault {
        NONE,
        DIRTY_CONNECTOR,
        TIGHT_BEND,
        HIGH_OH_FIBER,
        HYDROGEN_DARKENING,
        BROKEN_FIBER
    }

    /**
     * One demo point: its record, its two legs, and the fault its scans carry.
     *
     * @param cleaning a joint found dirty at commissioning and cleaned later, if any
     * @param faultSizeDb the fault's size where the demo fixes it (dB); NaN: drawn from the seed
     * @param jointExcessDb how much more each joint truly loses than its record says (dB), within the
     *        connector type's normal spread: a healthy loop at the lossy end of its parts
     */
    public record DemoPoint(MeasurementPoint point, PathLeg send, PathLeg ret, Fault fault, String faultyElement,
                            Optional<JointCleaning> cleaning, double faultSizeDb, double jointExcessDb) {

        public DemoPoint {
            cleaning = cleaning == null ? Optional.empty() : cleaning;
        }

        public DemoPoint(MeasurementPoint point, PathLeg send, PathLeg ret, Fault fault, String faultyElement,
                         Optional<JointCleaning> cleaning) {
            this(point, send, ret, fault, faultyElement, cleaning, Double.NaN, 0);
        }
    }

    /**
     * A joint found dirty at commissioning and cleaned later: its scans carry the dirty-connector excess
     * until {@code cleanedAt}, and none after, so the trend shows the step the cleaning made.
     */
    public record JointCleaning(String jointLabel, Instant cleanedAt) {
    }

    /** When the crew cleaned AT-4104's junction-box joint J5 (an invented event). */
    public static final Instant J5_CLEANED = Instant.parse("2026-01-12T10:30:00Z");

    private final Site site = new Site(SITE_NAME, "Unit 40 – Polyols and solvent recovery", "A", 1.0);
    private final List<Analyzer> analyzers = List.of(
            new Analyzer("AZ-41", "Fourier-transform NIR analyzer, shelter S1", 1000, 2500, 10, 20.0,
                    DetectorType.EXTENDED_INGAAS),
            new Analyzer("AZ-42", "Short-wave NIR diode-array analyzer, shelter S1", 600, 1100, 4, 18.0,
                    DetectorType.SILICON));

    private final List<FiberType> fiberTypes = List.of(
            new FiberType("LOH-200", "200/220 µm step-index silica, low OH", 200, 220, 245, 0.22,
                    "FUSED_SILICA", OhGrade.LOW_OH, 0.5, List.of()),
            new FiberType("LOH-400", "400/440 µm step-index silica, low OH", 400, 440, 480, 0.22,
                    "FUSED_SILICA", OhGrade.LOW_OH, 0.5, List.of()),
            new FiberType("LOH-600", "600/660 µm step-index silica, low OH", 600, 660, 710, 0.22,
                    "FUSED_SILICA", OhGrade.LOW_OH, 0.5, List.of()),
            new FiberType("HOH-200", "200/220 µm step-index silica, high OH (UV-visible grade)", 200, 220, 245,
                    0.22, "FUSED_SILICA", OhGrade.HIGH_OH, 700, List.of()));

    private final List<ConnectorType> connectorTypes = List.of(
            new ConnectorType("SMA-A", "SMA 905 stainless ferrule, air gap", "SMA 905", 1.0, true),
            new ConnectorType("SMA-B", "SMA 905 ceramic ferrule, air gap", "SMA 905", 0.8, true),
            new ConnectorType("FC-X", "FC/PC ceramic ferrule", "FC", 0.5, false));

    private final List<ProbeType> probeTypes = List.of(
            new ProbeType("PT-TX5", "Transmission probe, 5 mm gap, sapphire windows", ProbeKind.TRANSMISSION,
                    "SAPPHIRE", 4, 5.0, 3.0),
            new ProbeType("PT-TF2", "Transflectance probe, 2 mm path, sapphire window and mirror",
                    ProbeKind.TRANSFLECTANCE, "SAPPHIRE", 4, 4.0, 4.5),
            new ProbeType("PT-DR", "Diffuse reflectance probe, sapphire window", ProbeKind.DIFFUSE_REFLECTANCE,
                    "SAPPHIRE", 4, 0.0, 9.0),
            new ProbeType("PT-FC1", "Flow cell, 1 mm path, sapphire windows", ProbeKind.TRANSMISSION,
                    "SAPPHIRE", 4, 1.0, 1.0));

    private final List<DemoPoint> points = new ArrayList<>();

    public DemoPlant() {
        WavelengthBand ch2 = new WavelengthBand("C-H 1st overtone", 1650, 1780);
        WavelengthBand comb = new WavelengthBand("C-H combination", 2250, 2380);
        WavelengthBand ch3 = new WavelengthBand("C-H 2nd overtone", 1150, 1230);
        WavelengthBand oh1 = new WavelengthBand("O-H 1st overtone", 1420, 1520);
        WavelengthBand sw = new WavelengthBand("C-H 3rd overtone", 860, 940);
        WavelengthBand ch3Wide = new WavelengthBand("C-H 2nd overtone, CH2", 1190, 1250);

        // Tags read as analysis transmitters (ISA-5.1: first letter A = analysis), as an instrument
        // engineer names an analyzer's measurement points.
        add(point("AT-4101", "Reactor R-410 feed", "R-410 inlet, level 2", "AZ-41", 1, "PT-TX5",
                List.of(ch3, ch2), false, false, 40), 25, 25, "LOH-200", Fault.NONE);
        add(point("AT-4102", "Reactor R-410 outlet", "R-410 outlet, level 1", "AZ-41", 2, "PT-TX5",
                List.of(ch3, ch2), false, false, 85), 60, 60, "LOH-200", Fault.DIRTY_CONNECTOR);
        add(point("AT-4103", "Column C-420 overhead", "C-420 top platform", "AZ-41", 3, "PT-TF2",
                List.of(ch3, oh1), true, false, 95), 120, 120, "LOH-400", Fault.TIGHT_BEND);
        add(point("AT-4104", "Blender M-430 discharge", "Shelter S1 wall, sample loop", "AZ-41", 4, "PT-TX5",
                List.of(ch2, comb), false, false, 30), 2, 2, "LOH-200", Fault.NONE,
                Optional.of(new JointCleaning("J5", J5_CLEANED)));
        add(point("AT-4105", "Hydrogenator R-440", "R-440 bottom nozzle", "AZ-41", 5, "PT-TX5",
                List.of(ch3Wide, ch2), true, true, 165), 45, 45, "LOH-200", Fault.HYDROGEN_DARKENING);
        add(point("AT-4106", "Tank T-450 rundown", "T-450 roof", "AZ-41", 6, "PT-TF2",
                List.of(ch3, oh1, ch2), false, false, 25), 35, 35, "LOH-200", Fault.HIGH_OH_FIBER);
        add(point("AT-4107", "Stripper C-460 bottoms", "C-460 skirt", "AZ-41", 7, "PT-TX5",
                List.of(ch3, ch2), true, false, 140), 150, 150, "LOH-400", Fault.NONE);
        add(point("AT-4108", "Dryer D-470 product", "D-470 discharge chute", "AZ-41", 8, "PT-DR",
                List.of(ch3, oh1), false, false, 60), 80, 80, "LOH-600", Fault.BROKEN_FIBER);
        add(point("AT-4201", "Solvent recovery tank T-480", "T-480 pipe rack, far end", "AZ-42", 1, "PT-TX5",
                List.of(sw), true, false, 30), 300, 300, "LOH-200", Fault.NONE);
        add(point("AT-4202", "Crystalliser K-490 slurry", "K-490 side wall", "AZ-42", 2, "PT-DR",
                List.of(sw), false, false, 20), 70, 70, "LOH-600", Fault.NONE);
        addShortLoop(point("AT-4109", "Solvent make-up, sample panel flow cell", "Shelter S1, sample panel P2",
                "AZ-41", 9, "PT-FC1", List.of(ch3, ch2), false, false, 25));
        addLongLoop(point("AT-4203", "Effluent sump S-495", "S-495 far bank, pipe rack end", "AZ-42", 3,
                "PT-TX5", List.of(sw), true, false, 20));
    }

    /**
     * A 1.5 m loop on the sample panel beside the analyzer: a 0.75 m cord to the flow cell and one
     * back, each joint's loss measured at commissioning. Its prediction is known to a few tenths of a
     * dB, so a fixed 1 dB tolerance hides what the coverage interval catches: J2 has picked up dirt
     * worth 0.8 dB.
     */
    private void addShortLoop(MeasurementPoint p) {
        PathLeg send = new PathLeg(p.tag(), PathDirection.SEND, List.of(
                new CableSegment("C4109-S1", "LOH-200", 0.75, List.of()),
                new Joint("J1", "SMA-B", "SMA-B", InspectionGrade.CLEAN, OptionalDouble.of(0.75), LossBasis.MEASURED)));
        PathLeg ret = new PathLeg(p.tag(), PathDirection.RETURN, List.of(
                new Joint("J2", "SMA-B", "SMA-B", InspectionGrade.DIRTY, OptionalDouble.of(0.85), LossBasis.MEASURED),
                new CableSegment("C4109-R1", "LOH-200", 0.75, List.of())));
        points.add(new DemoPoint(p, send, ret, Fault.DIRTY_CONNECTOR, "J2", Optional.empty(), 0.8, 0));
    }

    /**
     * A 300 m loop each way through two junction boxes: eight unmeasured air-gap pairs whose normal
     * spread (0.5–1.5 dB a pair) makes the prediction uncertain by well over a dB. Its pairs all sit a
     * little above the typical 1 dB, 0.13 dB each: healthy, yet more than 1 dB over the predicted
     * line, so the fixed tolerance raises a false FAIL that the coverage interval clears.
     */
    private void addLongLoop(MeasurementPoint p) {
        String fiber = "LOH-200";
        PathLeg send = new PathLeg(p.tag(), PathDirection.SEND, List.of(
                new CableSegment("C4203-S1", fiber, 2.0, List.of()), joint("J1", ""),
                new CableSegment("C4203-S2", fiber, 150.0, List.of()), joint("J2", ""),
                new CableSegment("C4203-S3", fiber, 145.0, List.of()), joint("J3", ""),
                new CableSegment("C4203-S4", fiber, 3.0, List.of()), joint("J4", "")));
        PathLeg ret = new PathLeg(p.tag(), PathDirection.RETURN, List.of(
                joint("J5", ""), new CableSegment("C4203-R1", fiber, 3.0, List.of()),
                joint("J6", ""), new CableSegment("C4203-R2", fiber, 145.0, List.of()),
                joint("J7", ""), new CableSegment("C4203-R3", fiber, 150.0, List.of()),
                joint("J8", ""), new CableSegment("C4203-R4", fiber, 2.0, List.of())));
        points.add(new DemoPoint(p, send, ret, Fault.NONE, "", Optional.empty(), Double.NaN, 0.13));
    }

    private static MeasurementPoint point(String tag, String service, String location, String analyzer, int channel,
                                          String probe, List<WavelengthBand> bands, boolean hazardous,
                                          boolean hydrogen, double processC) {
        return new MeasurementPoint(tag, service, location, analyzer, channel, probe, bands, OptionalDouble.empty(),
                hazardous, hydrogen, OptionalDouble.of(processC));
    }

    /**
     * The legs as the workbook records them. Each leg: a patch cord from the analyzer port to the
     * shelter panel, the field trunk to a junction box, and a short tail to the probe, with SMA joints
     * between; the return leg lists them in the order light meets them, from the probe back. The
     * analyzer's own ports are not listed: the reference patch cord plugs into them too. The records are what the
     * installer believed: the generator spoils the truth, not the records (a high-OH cord still reads
     * "LOH-200", an unnoticed crush has no bend entry), except for the dirty joint, which the
     * inspection caught.
     */
    private void add(MeasurementPoint p, double sendM, double returnM, String fiber, Fault fault) {
        add(p, sendM, returnM, fiber, fault, Optional.empty());
    }

    private void add(MeasurementPoint p, double sendM, double returnM, String fiber, Fault fault,
                     Optional<JointCleaning> cleaning) {
        String t = p.tag().substring(p.tag().indexOf('-') + 1);
        String faulty = switch (fault) {
            case DIRTY_CONNECTOR -> "J2";
            case TIGHT_BEND -> "C" + t + "-R2";
            case HIGH_OH_FIBER -> "C" + t + "-S1";
            case HYDROGEN_DARKENING -> "C" + t + "-S3";
            case BROKEN_FIBER -> "C" + t + "-R2";
            case NONE -> "";
        };
        // the records carry the grade of the commissioning inspection: dirty for the faulty joint and
        // for a joint that is cleaned later
        String dirty = cleaning.map(JointCleaning::jointLabel).orElse(faulty);
        PathLeg send = leg(p.tag(), PathDirection.SEND, "C" + t + "-S", sendM, fiber, dirty, 1);
        PathLeg ret = leg(p.tag(), PathDirection.RETURN, "C" + t + "-R", returnM, fiber, dirty, 4);
        points.add(new DemoPoint(p, send, ret, fault, faulty, cleaning));
    }

    private static PathLeg leg(String tag, PathDirection dir, String cable, double lengthM, String fiber,
                               String dirtyJoint, int firstJoint) {
        double patchM = Math.min(2.0, lengthM / 4);
        double tailM = Math.min(3.0, lengthM / 4);
        double trunkM = lengthM - patchM - tailM;
        boolean send = dir == PathDirection.SEND;
        List<PathElement> e = new ArrayList<>();
        if (send) {
            // analyzer port → patch cord → panel J1 → trunk → junction box J2 → tail → probe J3
            e.add(new CableSegment(cable + "1", fiber, patchM, List.of()));
            e.add(joint("J" + firstJoint, dirtyJoint));
            e.add(new CableSegment(cable + "2", fiber, trunkM, List.of()));
            e.add(joint("J" + (firstJoint + 1), dirtyJoint));
            e.add(new CableSegment(cable + "3", fiber, tailM, List.of()));
            e.add(joint("J" + (firstJoint + 2), dirtyJoint));
        } else {
            // probe J4 → tail → junction box J5 → trunk → panel J6 → patch cord → detector port
            e.add(joint("J" + firstJoint, dirtyJoint));
            e.add(new CableSegment(cable + "1", fiber, tailM, List.of()));
            e.add(joint("J" + (firstJoint + 1), dirtyJoint));
            e.add(new CableSegment(cable + "2", fiber, trunkM, List.of()));
            e.add(joint("J" + (firstJoint + 2), dirtyJoint));
            e.add(new CableSegment(cable + "3", fiber, patchM, List.of()));
        }
        return new PathLeg(tag, dir, e);
    }

    private static Joint joint(String label, String dirtyJoint) {
        InspectionGrade grade = label.equals(dirtyJoint) ? InspectionGrade.DIRTY : InspectionGrade.CLEAN;
        return new Joint(label, "SMA-A", "SMA-A", grade, OptionalDouble.empty(), LossBasis.ASSUMED);
    }

    public Site site() {
        return site;
    }

    public List<Analyzer> analyzers() {
        return analyzers;
    }

    public List<FiberType> fiberTypes() {
        return fiberTypes;
    }

    public List<ConnectorType> connectorTypes() {
        return connectorTypes;
    }

    public List<ProbeType> probeTypes() {
        return probeTypes;
    }

    public List<DemoPoint> points() {
        return List.copyOf(points);
    }
}
