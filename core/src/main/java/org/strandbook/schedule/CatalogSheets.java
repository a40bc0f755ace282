package org.strandbook.schedule;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.apache.poi.ss.usermodel.Workbook;
import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.OhGrade;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.StatedSpreads;

/**
 * The four catalog sheets, where a contractor adds fiber, connector and probe types of their own.
 * A new code must not repeat a known one (shipped or already in the site's catalog): a silently
 * different part under a familiar code would corrupt every loss budget that uses it.
 */
final class CatalogSheets {

    private static final Quantity CORE_UM = Quantity.positive("core diameter", "µm", 10_000);
    private static final Quantity CLADDING_UM = Quantity.positive("cladding diameter", "µm", 10_000);
    private static final Quantity BUFFER_UM = Quantity.zeroOrMore("buffer diameter", "µm", 10_000);
    private static final Quantity NA = Quantity.strictlyBetween("NA", "", 0, 1);
    private static final Quantity OH_PPM = Quantity.zeroOrMore("OH content", "ppm", 10_000);
    private static final Quantity DATASHEET_NM = Quantity.positive("wavelength", "nm", 100_000);
    private static final Quantity DATASHEET_DB_PER_KM = Quantity.positive("attenuation", "dB/km", 1_000_000);
    private static final Quantity TYPICAL_LOSS_DB = Quantity.zeroOrMore("typical loss", "dB", 100);
    private static final WholeRange WINDOW_FACES = new WholeRange("window faces", 0, 100);
    private static final Quantity OPTICAL_PATH_MM = Quantity.zeroOrMore("optical path", "mm", 10_000);
    private static final Quantity FIXED_LOSS_DB = Quantity.zeroOrMore("fixed loss", "dB", 100);

    /**
     * @param added          the types added on the sheets (rows without problems)
     * @param available      the known catalog plus {@code added}: what references resolve against
     * @param fiberCodes     known and added fiber type codes
     * @param connectorCodes known and added connector type codes
     * @param probeCodes     known and added probe type codes
     */
    record Result(ComponentCatalog added, ComponentCatalog available, KeyIndex fiberCodes,
                  KeyIndex connectorCodes, KeyIndex probeCodes) {
    }

    private final Workbook workbook;
    private final ComponentCatalog known;
    private final ProblemLog log;

    private CatalogSheets(Workbook workbook, ComponentCatalog known, ProblemLog log) {
        this.workbook = workbook;
        this.known = known;
        this.log = log;
    }

    static Result read(Workbook workbook, ComponentCatalog known, ProblemLog log) {
        return new CatalogSheets(workbook, known, log).read();
    }

    private Result read() {
        KeyIndex fiberCodes = new KeyIndex();
        known.fiberTypes().forEach(t -> fiberCodes.addKnown(t.code()));
        KeyIndex connectorCodes = new KeyIndex();
        known.connectorTypes().forEach(t -> connectorCodes.addKnown(t.code()));
        KeyIndex probeCodes = new KeyIndex();
        known.probeTypes().forEach(t -> probeCodes.addKnown(t.code()));

        Map<String, FiberType> fibers = fiberTypes(fiberCodes);
        Map<String, List<AttenuationPoint>> datasheets = datasheets(fiberCodes, fibers);
        List<FiberType> fiberList = new ArrayList<>();
        for (FiberType f : fibers.values()) {
            List<AttenuationPoint> points = datasheets.getOrDefault(f.code(), List.of());
            fiberList.add(f.withDatasheet(points));
        }
        List<ConnectorType> connectors = connectorTypes(connectorCodes);
        List<ProbeType> probes = probeTypes(probeCodes);
        ComponentCatalog added = new ComponentCatalog(fiberList, connectors, probes);
        return new Result(added, known.plus(added), fiberCodes, connectorCodes, probeCodes);
    }

    private Map<String, FiberType> fiberTypes(KeyIndex codes) {
        Map<String, FiberType> fibers = new LinkedHashMap<>();
        Optional<List<SheetRow>> rows = SheetTable.rows(workbook, ScheduleSheet.FIBER_TYPES, log);
        if (rows.isEmpty()) {
            codes.markIncomplete();
            return fibers;
        }
        for (SheetRow row : rows.get()) {
            String code = newCode(row, ScheduleColumn.FIBER_CODE, codes, "fiber type");
            String description = row.text(ScheduleColumn.FIBER_DESCRIPTION);
            double coreUm = row.number(ScheduleColumn.FIBER_CORE_UM, CORE_UM);
            double claddingUm = row.number(ScheduleColumn.FIBER_CLADDING_UM, CLADDING_UM);
            if (claddingUm < coreUm) {
                row.problem(ScheduleColumn.FIBER_CLADDING_UM, "cladding diameter must be at least the core diameter "
                        + DecimalText.display(coreUm) + " µm, was " + DecimalText.display(claddingUm));
            }
            double bufferUm = row.optionalNumber(ScheduleColumn.FIBER_BUFFER_UM, BUFFER_UM).orElse(0);
            double na = row.number(ScheduleColumn.FIBER_NA, NA);
            String coreMaterial = row.text(ScheduleColumn.FIBER_CORE_MATERIAL);
            OhGrade ohGrade = row.choice(ScheduleColumn.FIBER_OH_GRADE, OhGrade.class, null, "OH grade");
            double ohPpm = row.number(ScheduleColumn.FIBER_OH_PPM, OH_PPM);
            StatedSpreads spreads = row.spreads();
            if (!row.faulty()) {
                FiberType fiber = row.guard(ScheduleColumn.FIBER_CODE, () -> new FiberType(code, description,
                        coreUm, claddingUm, bufferUm, na, coreMaterial, ohGrade, ohPpm, List.of(), spreads));
                if (fiber != null) {
                    fibers.put(code, fiber);
                }
            }
        }
        return fibers;
    }

    private Map<String, List<AttenuationPoint>> datasheets(KeyIndex codes, Map<String, FiberType> fibers) {
        Map<String, List<AttenuationPoint>> datasheets = new HashMap<>();
        Optional<List<SheetRow>> rows = SheetTable.rows(workbook, ScheduleSheet.FIBER_ATTENUATION, log);
        if (rows.isEmpty()) {
            return datasheets;
        }
        Map<String, Map<Double, Integer>> rowOfWavelength = new HashMap<>();
        for (SheetRow row : rows.get()) {
            String code = row.identifier(ScheduleColumn.ATTENUATION_FIBER, "fiber type code");
            if (code != null && codes.isComplete()) {
                if (codes.isKnownElsewhere(code)) {
                    row.problem(ScheduleColumn.ATTENUATION_FIBER, "fiber type '" + code + "' is in the catalog already;"
                            + " datasheet points belong to fiber types on sheet 'Fiber types'");
                } else {
                    String unknown = codes.unknownReference(code, "fiber type", "on sheet 'Fiber types'");
                    if (unknown != null) {
                        row.problem(ScheduleColumn.ATTENUATION_FIBER, unknown);
                    }
                }
            }
            double wavelengthNm = row.number(ScheduleColumn.ATTENUATION_WAVELENGTH_NM, DATASHEET_NM);
            double dbPerKm = row.number(ScheduleColumn.ATTENUATION_DB_PER_KM, DATASHEET_DB_PER_KM);
            if (code != null && !Double.isNaN(wavelengthNm)) {
                Integer earlier = rowOfWavelength.computeIfAbsent(code, k -> new HashMap<>())
                        .putIfAbsent(wavelengthNm, row.number());
                if (earlier != null) {
                    row.problem(ScheduleColumn.ATTENUATION_WAVELENGTH_NM, "fiber type " + code
                            + " already has a datasheet point at " + DecimalText.display(wavelengthNm)
                            + " nm (row " + earlier + ")");
                }
            }
            if (!row.faulty() && fibers.containsKey(code)) {
                AttenuationPoint point = row.guard(ScheduleColumn.ATTENUATION_WAVELENGTH_NM,
                        () -> new AttenuationPoint(wavelengthNm, dbPerKm));
                if (point != null) {
                    datasheets.computeIfAbsent(code, k -> new ArrayList<>()).add(point);
                }
            }
        }
        return datasheets;
    }

    private List<ConnectorType> connectorTypes(KeyIndex codes) {
        List<ConnectorType> connectors = new ArrayList<>();
        Optional<List<SheetRow>> rows = SheetTable.rows(workbook, ScheduleSheet.CONNECTOR_TYPES, log);
        if (rows.isEmpty()) {
            codes.markIncomplete();
            return connectors;
        }
        for (SheetRow row : rows.get()) {
            String code = newCode(row, ScheduleColumn.CONNECTOR_CODE, codes, "connector type");
            String description = row.text(ScheduleColumn.CONNECTOR_DESCRIPTION);
            String family = row.requiredText(ScheduleColumn.CONNECTOR_FAMILY, "mating family");
            double lossDb = row.number(ScheduleColumn.CONNECTOR_TYPICAL_LOSS_DB, TYPICAL_LOSS_DB);
            Boolean airGap = row.yesNo(ScheduleColumn.CONNECTOR_AIR_GAP, "air gap");
            StatedSpreads spreads = row.spreads();
            if (!row.faulty()) {
                ConnectorType connector = row.guard(ScheduleColumn.CONNECTOR_CODE,
                        () -> new ConnectorType(code, description, family, lossDb, airGap, spreads));
                if (connector != null) {
                    connectors.add(connector);
                }
            }
        }
        return connectors;
    }

    private List<ProbeType> probeTypes(KeyIndex codes) {
        List<ProbeType> probes = new ArrayList<>();
        Optional<List<SheetRow>> rows = SheetTable.rows(workbook, ScheduleSheet.PROBE_TYPES, log);
        if (rows.isEmpty()) {
            codes.markIncomplete();
            return probes;
        }
        for (SheetRow row : rows.get()) {
            String code = newCode(row, ScheduleColumn.PROBE_CODE, codes, "probe type");
            String description = row.text(ScheduleColumn.PROBE_DESCRIPTION);
            ProbeKind kind = row.choice(ScheduleColumn.PROBE_KIND, ProbeKind.class, null, "probe kind");
            String window = row.requiredText(ScheduleColumn.PROBE_WINDOW_MATERIAL, "window material");
            int faces = row.whole(ScheduleColumn.PROBE_WINDOW_FACES, WINDOW_FACES);
            double pathMm = row.number(ScheduleColumn.PROBE_OPTICAL_PATH_MM, OPTICAL_PATH_MM);
            double fixedLossDb = row.number(ScheduleColumn.PROBE_FIXED_LOSS_DB, FIXED_LOSS_DB);
            StatedSpreads spreads = row.spreads();
            if (!row.faulty()) {
                ProbeType probe = row.guard(ScheduleColumn.PROBE_CODE,
                        () -> new ProbeType(code, description, kind, window, faces, pathMm, fixedLossDb, spreads));
                if (probe != null) {
                    probes.add(probe);
                }
            }
        }
        return probes;
    }

    /** Reads a new type's code; reports a clash with a known code or an earlier row. */
    private static String newCode(SheetRow row, ScheduleColumn column, KeyIndex codes, String what) {
        String code = row.identifier(column, what + " code");
        if (code == null) {
            return null;
        }
        if (codes.isKnownElsewhere(code)) {
            row.problem(column, what + " code '" + code + "' is in the catalog already;"
                    + " give the new " + what + " a code of its own");
            return null;
        }
        Optional<ScheduleCell> earlier = codes.define(code, row.place(column));
        if (earlier.isPresent()) {
            row.problem(column, "duplicate " + what + " code '" + code + "' (first on row " + earlier.get().row() + ")");
            return null;
        }
        return code;
    }
}
