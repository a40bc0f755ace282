package org.strandbook.schedule;

import java.util.Arrays;
import java.util.List;

import org.apache.poi.ss.util.CellReference;
import org.strandbook.site.DetectorType;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.LossBasis;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathDirection;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.SpreadInput;

/**
 * Every column of every schedule sheet: its header (with the unit in brackets), what a contractor
 * enters there, and for list columns the allowed values. Constants of one sheet appear in column
 * order, so a column's letter follows from its place among its sheet's constants.
 */
public enum ScheduleColumn {
    ANALYZER_TAG(ScheduleSheet.ANALYZERS, "Analyzer tag", Kind.TEXT,
            "The analyzer's tag on site, e.g. AN-01; unique in the schedule."),
    ANALYZER_DESCRIPTION(ScheduleSheet.ANALYZERS, "Description", Kind.TEXT,
            "Free text, e.g. the shelter it stands in."),
    ANALYZER_MIN_NM(ScheduleSheet.ANALYZERS, "Shortest wavelength (nm)", Kind.NUMBER,
            "Shortest wavelength the analyzer uses, in nm."),
    ANALYZER_MAX_NM(ScheduleSheet.ANALYZERS, "Longest wavelength (nm)", Kind.NUMBER,
            "Longest wavelength the analyzer uses, in nm; more than the shortest."),
    ANALYZER_CHANNELS(ScheduleSheet.ANALYZERS, "Channels (count)", Kind.WHOLE,
            "Number of fiber channels (multiplexer positions), a whole number from 1."),
    ANALYZER_ALLOWED_LOSS_DB(ScheduleSheet.ANALYZERS, "Allowed loss (dB)", Kind.NUMBER,
            "Round-trip loss the analyzer tolerates for the job (its usable dynamic range), in dB."),
    ANALYZER_DETECTOR(ScheduleSheet.ANALYZERS, "Detector (list)", names(DetectorType.values()),
            "Detector family; blank means OTHER."),

    POINT_TAG(ScheduleSheet.POINTS, "Point tag", Kind.TEXT,
            "The measurement point's tag on site, e.g. P-101; unique in the schedule."),
    POINT_SERVICE(ScheduleSheet.POINTS, "Service", Kind.TEXT,
            "Process service, free text."),
    POINT_LOCATION(ScheduleSheet.POINTS, "Location", Kind.TEXT,
            "Where the probe sits: unit, line, elevation."),
    POINT_ANALYZER(ScheduleSheet.POINTS, "Analyzer tag", Kind.TEXT,
            "Tag of the analyzer on sheet 'Analyzers' that serves this point."),
    POINT_CHANNEL(ScheduleSheet.POINTS, "Channel (no.)", Kind.WHOLE,
            "Analyzer channel counted from 1, at most the analyzer's channel count; one point per channel."),
    POINT_PROBE_TYPE(ScheduleSheet.POINTS, "Probe type code", Kind.TEXT,
            "Probe type code: a shipped one or one on sheet 'Probe types'."),
    POINT_TOLERANCE_DB(ScheduleSheet.POINTS, "Tolerance (dB)", Kind.NUMBER,
            "Acceptance tolerance in dB; blank uses the site default."),
    POINT_HAZARDOUS_AREA(ScheduleSheet.POINTS, "Hazardous area (YES/NO)", List.of("YES", "NO"),
            "YES when the probe or any junction box on its path sits in a classified hazardous area."),
    POINT_HYDROGEN_SERVICE(ScheduleSheet.POINTS, "Hydrogen service (YES/NO)", List.of("YES", "NO"),
            "YES when the fiber runs near a hydrogen-bearing process (risk of fiber darkening)."),
    POINT_PROCESS_TEMPERATURE_C(ScheduleSheet.POINTS, "Process temperature (°C)", Kind.NUMBER,
            "Process temperature at the probe in °C; blank when unknown."),

    BAND_POINT(ScheduleSheet.BANDS, "Point tag", Kind.TEXT,
            "Tag of the point on sheet 'Points'."),
    BAND_NAME(ScheduleSheet.BANDS, "Band name", Kind.TEXT,
            "Short label, e.g. C-H first overtone; blank gives 'from-to nm'."),
    BAND_FROM_NM(ScheduleSheet.BANDS, "From (nm)", Kind.NUMBER,
            "Lower edge in nm, within the analyzer's wavelength range."),
    BAND_TO_NM(ScheduleSheet.BANDS, "To (nm)", Kind.NUMBER,
            "Upper edge in nm, more than the lower edge and within the analyzer's range."),

    SEGMENT_POINT(ScheduleSheet.SEGMENTS, "Point tag", Kind.TEXT,
            "Tag of the point whose leg the segment belongs to."),
    SEGMENT_DIRECTION(ScheduleSheet.SEGMENTS, "Direction (SEND/RETURN)", names(PathDirection.values()),
            "SEND carries light from the analyzer to the probe, RETURN from the probe back."),
    SEGMENT_POSITION(ScheduleSheet.SEGMENTS, "Position (no.)", Kind.WHOLE,
            "Place in the leg counted from 1 in the order light meets it; shared with the leg's joints."),
    SEGMENT_CABLE_ID(ScheduleSheet.SEGMENTS, "Cable ID", Kind.TEXT,
            "The cable's ID on site, one row per fiber; unique in the schedule."),
    SEGMENT_FIBER_TYPE(ScheduleSheet.SEGMENTS, "Fiber type code", Kind.TEXT,
            "Fiber type code: a shipped one or one on sheet 'Fiber types'."),
    SEGMENT_LENGTH_M(ScheduleSheet.SEGMENTS, "Length (m)", Kind.NUMBER,
            "Fiber length in metres, more than 0."),
    SEGMENT_LENGTH_SPREAD(ScheduleSheet.SEGMENTS, "Length tolerance (±m or ±%)", SpreadInput.LENGTH,
            "Tolerance of this run's length, e.g. ±0.5 m or ±2 %; blank uses the shipped default."),
    SEGMENT_BEND_SPREAD(ScheduleSheet.SEGMENTS, "Bend radius spread (±mm or ±%)", SpreadInput.BEND_RADIUS,
            "Spread of the recorded bend radius, e.g. ±5 mm or ±20 %; blank uses the shipped default."),
    SEGMENT_SPREAD_BASIS(ScheduleSheet.SEGMENTS, "Spread basis", "Where the spreads on this row come from, in your words (datasheet, certificate); optional."),

    BEND_CABLE_ID(ScheduleSheet.BENDS, "Cable ID", Kind.TEXT,
            "Cable ID from sheet 'Segments'."),
    BEND_RADIUS_MM(ScheduleSheet.BENDS, "Bend radius (mm)", Kind.NUMBER,
            "Bend radius of the fiber axis in mm."),
    BEND_COUNT(ScheduleSheet.BENDS, "Bends (count)", Kind.WHOLE,
            "How many bends of this radius, each a turn of 90° or more."),

    JOINT_POINT(ScheduleSheet.JOINTS, "Point tag", Kind.TEXT,
            "Tag of the point whose leg the joint belongs to."),
    JOINT_DIRECTION(ScheduleSheet.JOINTS, "Direction (SEND/RETURN)", names(PathDirection.values()),
            "SEND carries light from the analyzer to the probe, RETURN from the probe back."),
    JOINT_POSITION(ScheduleSheet.JOINTS, "Position (no.)", Kind.WHOLE,
            "Place in the leg counted from 1 in the order light meets it; shared with the leg's segments."),
    JOINT_LABEL(ScheduleSheet.JOINTS, "Joint label", Kind.TEXT,
            "Joint label on site, e.g. J1; unique within the point."),
    JOINT_UPSTREAM_CONNECTOR(ScheduleSheet.JOINTS, "Upstream connector (code)", Kind.TEXT,
            "Connector type code on the side light comes from."),
    JOINT_DOWNSTREAM_CONNECTOR(ScheduleSheet.JOINTS, "Downstream connector (code)", Kind.TEXT,
            "Connector type code on the far side, of the same mating family; blank when the same as upstream."),
    JOINT_GRADE(ScheduleSheet.JOINTS, "Inspection grade (list)", names(InspectionGrade.values()),
            "End-face inspection grade (IEC 61300-3-35 zones); blank means NOT_INSPECTED."),
    JOINT_LOSS_DB(ScheduleSheet.JOINTS, "Loss (dB)", Kind.NUMBER,
            "Loss of the joint in dB, zero or more; blank uses the connector type's typical loss."),
    JOINT_LOSS_BASIS(ScheduleSheet.JOINTS, "Loss basis (ASSUMED/MEASURED)", names(LossBasis.values()),
            "MEASURED when the loss was measured on site (then a loss is required); blank means ASSUMED."),
    JOINT_LOSS_SPREAD(ScheduleSheet.JOINTS, "Loss spread (±dB or u dB)", SpreadInput.JOINT_LOSS,
            "This joint's loss spread: ±0.3 dB (range) or u 0.05 dB (a reading's standard uncertainty);"
                    + " blank uses the connector type's or the shipped default."),
    JOINT_SPREAD_BASIS(ScheduleSheet.JOINTS, "Spread basis", "Where the spreads on this row come from, in your words (datasheet, certificate); optional."),

    FIBER_CODE(ScheduleSheet.FIBER_TYPES, "Fiber type code", Kind.TEXT,
            "A code of your own, not one of the shipped codes."),
    FIBER_DESCRIPTION(ScheduleSheet.FIBER_TYPES, "Description", Kind.TEXT,
            "Free text."),
    FIBER_CORE_UM(ScheduleSheet.FIBER_TYPES, "Core (µm)", Kind.NUMBER,
            "Core diameter in µm."),
    FIBER_CLADDING_UM(ScheduleSheet.FIBER_TYPES, "Cladding (µm)", Kind.NUMBER,
            "Cladding diameter in µm, at least the core diameter."),
    FIBER_BUFFER_UM(ScheduleSheet.FIBER_TYPES, "Buffer (µm)", Kind.NUMBER,
            "Buffer (coating) diameter in µm; blank means 0 (unknown)."),
    FIBER_NA(ScheduleSheet.FIBER_TYPES, "NA (0 to 1)", Kind.NUMBER,
            "Numerical aperture, between 0 and 1."),
    FIBER_CORE_MATERIAL(ScheduleSheet.FIBER_TYPES, "Core material", Kind.TEXT,
            "Core glass, e.g. FUSED_SILICA; blank means FUSED_SILICA."),
    FIBER_OH_GRADE(ScheduleSheet.FIBER_TYPES, "OH grade (list)", names(OhGrade.values()),
            "LOW_OH (dry) for the near infrared, HIGH_OH (wet) for the UV and visible."),
    FIBER_OH_PPM(ScheduleSheet.FIBER_TYPES, "OH content (ppm)", Kind.NUMBER,
            "OH content in ppm by weight, from the datasheet."),
    FIBER_OH_SPREAD(ScheduleSheet.FIBER_TYPES, "OH spread (ppm range or ±%)", SpreadInput.OH_CONTENT,
            "Range of the OH content, e.g. 400..1000 ppm, or ±50 %; blank uses the shipped default."),
    FIBER_ATTENUATION_SPREAD(ScheduleSheet.FIBER_TYPES, "Attenuation spread (±%)", SpreadInput.ATTENUATION,
            "Spread of the attenuation curve, e.g. ±10 %; blank uses the shipped default."),
    FIBER_SPREAD_BASIS(ScheduleSheet.FIBER_TYPES, "Spread basis", "Where the spreads on this row come from, in your words (datasheet, certificate); optional."),

    ATTENUATION_FIBER(ScheduleSheet.FIBER_ATTENUATION, "Fiber type code", Kind.TEXT,
            "Code of a fiber type on sheet 'Fiber types'."),
    ATTENUATION_WAVELENGTH_NM(ScheduleSheet.FIBER_ATTENUATION, "Wavelength (nm)", Kind.NUMBER,
            "Datasheet wavelength in nm; one row per datasheet point."),
    ATTENUATION_DB_PER_KM(ScheduleSheet.FIBER_ATTENUATION, "Attenuation (dB/km)", Kind.NUMBER,
            "Datasheet attenuation at that wavelength in dB/km."),

    CONNECTOR_CODE(ScheduleSheet.CONNECTOR_TYPES, "Connector type code", Kind.TEXT,
            "A code of your own, not one of the shipped codes."),
    CONNECTOR_DESCRIPTION(ScheduleSheet.CONNECTOR_TYPES, "Description", Kind.TEXT,
            "Free text."),
    CONNECTOR_FAMILY(ScheduleSheet.CONNECTOR_TYPES, "Mating family", Kind.TEXT,
            "Connectors mate directly only within one family, e.g. SMA 905."),
    CONNECTOR_TYPICAL_LOSS_DB(ScheduleSheet.CONNECTOR_TYPES, "Typical loss (dB)", Kind.NUMBER,
            "Loss of a clean mated pair in dB, zero or more."),
    CONNECTOR_AIR_GAP(ScheduleSheet.CONNECTOR_TYPES, "Air gap (YES/NO)", List.of("YES", "NO"),
            "YES when the mated faces meet across an air gap."),
    CONNECTOR_LOSS_SPREAD(ScheduleSheet.CONNECTOR_TYPES, "Loss spread (±dB or u dB)", SpreadInput.CONNECTOR_LOSS,
            "Spread of a mated pair's loss: ±0.3 dB (range) or u 0.1 dB (standard uncertainty);"
                    + " blank uses the shipped default."),
    CONNECTOR_SPREAD_BASIS(ScheduleSheet.CONNECTOR_TYPES, "Spread basis", "Where the spreads on this row come from, in your words (datasheet, certificate); optional."),

    PROBE_CODE(ScheduleSheet.PROBE_TYPES, "Probe type code", Kind.TEXT,
            "A code of your own, not one of the shipped codes."),
    PROBE_DESCRIPTION(ScheduleSheet.PROBE_TYPES, "Description", Kind.TEXT,
            "Free text."),
    PROBE_KIND(ScheduleSheet.PROBE_TYPES, "Probe kind (list)", names(ProbeKind.values()),
            "How light crosses the process at the probe."),
    PROBE_WINDOW_MATERIAL(ScheduleSheet.PROBE_TYPES, "Window material", Kind.TEXT,
            "Window material, e.g. SAPPHIRE or FUSED_SILICA."),
    PROBE_WINDOW_FACES(ScheduleSheet.PROBE_TYPES, "Window faces (count)", Kind.WHOLE,
            "Uncoated window faces light crosses between send and return fiber."),
    PROBE_OPTICAL_PATH_MM(ScheduleSheet.PROBE_TYPES, "Optical path (mm)", Kind.NUMBER,
            "Optical path through the process medium in mm; 0 for none."),
    PROBE_FIXED_LOSS_DB(ScheduleSheet.PROBE_TYPES, "Fixed loss (dB)", Kind.NUMBER,
            "Lumped loss of the probe's own optics in dB, zero or more."),
    PROBE_FIXED_LOSS_SPREAD(ScheduleSheet.PROBE_TYPES, "Fixed loss spread (±dB or ±%)", SpreadInput.PROBE_FIXED_LOSS,
            "Spread of the fixed loss, e.g. ±0.2 dB or ±20 %; blank uses the shipped default."),
    PROBE_SPREAD_BASIS(ScheduleSheet.PROBE_TYPES, "Spread basis", "Where the spreads on this row come from, in your words (datasheet, certificate); optional.");

    /** What a column holds. */
    public enum Kind {
        /** Text (tags, codes, free text); the template formats these cells as text. */
        TEXT,
        /** A decimal number in the unit of the header. */
        NUMBER,
        /** A whole number. */
        WHOLE,
        /** One of a fixed list of words, offered as a drop-down. */
        CHOICE
    }

    private static final int[] INDEX_IN_SHEET = new int[values().length];

    static {
        int[] next = new int[ScheduleSheet.values().length];
        for (ScheduleColumn c : values()) {
            INDEX_IN_SHEET[c.ordinal()] = next[c.sheet.ordinal()]++;
        }
    }

    private final ScheduleSheet sheet;
    private final String header;
    private final Kind kind;
    private final List<String> choices;
    private final String hint;
    private final boolean optional;
    private final SpreadInput spread;

    ScheduleColumn(ScheduleSheet sheet, String header, Kind kind, String hint) {
        this.sheet = sheet;
        this.header = header;
        this.kind = kind;
        this.choices = List.of();
        this.hint = hint;
        this.optional = false;
        this.spread = null;
    }

    /** The optional spread basis column of a sheet with spread columns (schema 8). */
    ScheduleColumn(ScheduleSheet sheet, String header, String hint) {
        this(sheet, header, (SpreadInput) null, hint);
    }

    /**
     * An optional column of schema 8 at the end of its sheet: a spread of {@code spread}, or the row's
     * spread basis when that is null. A schedule written before it has no such column and still reads.
     */
    ScheduleColumn(ScheduleSheet sheet, String header, SpreadInput spread, String hint) {
        this.sheet = sheet;
        this.header = header;
        this.kind = Kind.TEXT;
        this.choices = List.of();
        this.hint = hint;
        this.optional = true;
        this.spread = spread;
    }

    ScheduleColumn(ScheduleSheet sheet, String header, List<String> choices, String hint) {
        this.sheet = sheet;
        this.header = header;
        this.kind = Kind.CHOICE;
        this.choices = List.copyOf(choices);
        this.hint = hint;
        this.optional = false;
        this.spread = null;
    }

    /** True for a column an older schedule may lack: its header may be absent and its cells blank. */
    public boolean optional() {
        return optional;
    }

    /** The input whose spread the column holds; null for other columns (the spread basis included). */
    public SpreadInput spread() {
        return spread;
    }

    /** True for the column that says where a row's spreads come from. */
    public boolean spreadBasis() {
        return optional && spread == null;
    }

    public ScheduleSheet sheet() {
        return sheet;
    }

    /** The header text of row 1, unit in brackets. */
    public String header() {
        return header;
    }

    public Kind kind() {
        return kind;
    }

    /** The allowed words of a {@link Kind#CHOICE} column, empty for other kinds. */
    public List<String> choices() {
        return choices;
    }

    /** One sentence telling the contractor what to enter. */
    public String hint() {
        return hint;
    }

    /** Zero-based column index within the sheet. */
    public int index() {
        return INDEX_IN_SHEET[ordinal()];
    }

    /** Column letter as a spreadsheet shows it: A, B, ... */
    public String letter() {
        return CellReference.convertNumToColString(index());
    }

    /** Width of the column in characters: room for the header, wider for free text. */
    public int widthChars() {
        int room = switch (this) {
            case ANALYZER_DESCRIPTION, POINT_SERVICE, POINT_LOCATION, FIBER_DESCRIPTION, CONNECTOR_DESCRIPTION,
                    PROBE_DESCRIPTION, SEGMENT_SPREAD_BASIS, JOINT_SPREAD_BASIS, FIBER_SPREAD_BASIS,
                    CONNECTOR_SPREAD_BASIS, PROBE_SPREAD_BASIS -> 40;
            default -> 12;
        };
        return Math.max(room, header.length() + 3);
    }

    private static List<String> names(Enum<?>[] values) {
        return Arrays.stream(values).map(Enum::name).toList();
    }
}
