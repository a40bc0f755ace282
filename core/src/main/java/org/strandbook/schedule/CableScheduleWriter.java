package org.strandbook.schedule;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.strandbook.files.FileReplacement;
import org.strandbook.files.WorkInProgressFiles;
import org.strandbook.site.StatedSpreads;
import org.strandbook.site.Analyzer;
import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.Joint;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeType;
import org.strandbook.site.WavelengthBand;
import org.strandbook.spreadsheet.FormulaText;
import org.strandbook.templates.Templates;

/**
 * Fills the cable schedule template from a {@link CableSchedule}, so that
 * {@link CableScheduleReader} reads back an equal schedule.
 *
 * <p>Formula injection: every text goes in with {@code Cell.setCellValue(String)}, which always
 * makes a string cell, never a formula, whatever the text starts with. Texts starting with one of
 * the characters a spreadsheet may take as the start of a formula ({@code = + - @}, tab, carriage
 * return: the list of the OWASP "CSV Injection" guidance) also get a quote-prefixed style, so a
 * spreadsheet program keeps them text even when someone edits the cell later.
 *
 * <p>Numbers are written as number cells in the header's unit; leg elements get positions 1, 2, 3
 * ... in leg order; a point's legs, bands and catalog types follow the schedule's order.
 */
public final class CableScheduleWriter {

    private CableScheduleWriter() {
    }

    /**
     * Writes the filled template to {@code target}, replacing it: through a temporary file in the
     * same folder, moved into place at the end, so a failed write never leaves a half-written file.
     */
    public static void write(CableSchedule schedule, Path target) throws IOException {
        Path partial = WorkInProgressFiles.partBeside(target);
        try {
            try (OutputStream out = Files.newOutputStream(partial)) {
                write(schedule, out);
            }
            FileReplacement.moveOver(partial, target);
        } finally {
            Files.deleteIfExists(partial);
        }
    }

    /** Writes the filled template to {@code out}, which the caller closes. */
    public static void write(CableSchedule schedule, OutputStream out) throws IOException {
        try (InputStream template = Templates.open(Templates.CABLE_SCHEDULE);
             XSSFWorkbook workbook = new XSSFWorkbook(template)) {
            new Filling(workbook).fill(schedule);
            workbook.write(out);
        }
    }

    /** One filling of one workbook; its two text styles are made once and shared by every cell. */
    private static final class Filling {

        private final XSSFWorkbook workbook;
        private final CellStyle textStyle;
        private final CellStyle quotedTextStyle;
        private final Map<ScheduleSheet, Integer> nextRow = new EnumMap<>(ScheduleSheet.class);

        Filling(XSSFWorkbook workbook) {
            this.workbook = workbook;
            this.textStyle = workbook.createCellStyle();
            textStyle.setDataFormat(workbook.createDataFormat().getFormat("@"));
            this.quotedTextStyle = workbook.createCellStyle();
            quotedTextStyle.cloneStyleFrom(textStyle);
            quotedTextStyle.setQuotePrefixed(true);
        }

        void fill(CableSchedule schedule) {
            for (Analyzer a : schedule.analyzers()) {
                Row r = newRow(ScheduleSheet.ANALYZERS);
                text(r, ScheduleColumn.ANALYZER_TAG, a.tag());
                text(r, ScheduleColumn.ANALYZER_DESCRIPTION, a.description());
                number(r, ScheduleColumn.ANALYZER_MIN_NM, a.minNm());
                number(r, ScheduleColumn.ANALYZER_MAX_NM, a.maxNm());
                number(r, ScheduleColumn.ANALYZER_CHANNELS, a.channels());
                number(r, ScheduleColumn.ANALYZER_ALLOWED_LOSS_DB, a.allowedLossDb());
                text(r, ScheduleColumn.ANALYZER_DETECTOR, a.detector().name());
            }
            for (MeasurementPoint p : schedule.points()) {
                Row r = newRow(ScheduleSheet.POINTS);
                text(r, ScheduleColumn.POINT_TAG, p.tag());
                text(r, ScheduleColumn.POINT_SERVICE, p.service());
                text(r, ScheduleColumn.POINT_LOCATION, p.location());
                text(r, ScheduleColumn.POINT_ANALYZER, p.analyzerTag());
                number(r, ScheduleColumn.POINT_CHANNEL, p.channel());
                text(r, ScheduleColumn.POINT_PROBE_TYPE, p.probeTypeCode());
                number(r, ScheduleColumn.POINT_TOLERANCE_DB, p.toleranceDb());
                text(r, ScheduleColumn.POINT_HAZARDOUS_AREA, yesNo(p.hazardousArea()));
                text(r, ScheduleColumn.POINT_HYDROGEN_SERVICE, yesNo(p.hydrogenService()));
                number(r, ScheduleColumn.POINT_PROCESS_TEMPERATURE_C, p.processTemperatureC());
                for (WavelengthBand b : p.bands()) {
                    Row br = newRow(ScheduleSheet.BANDS);
                    text(br, ScheduleColumn.BAND_POINT, p.tag());
                    text(br, ScheduleColumn.BAND_NAME, b.name());
                    number(br, ScheduleColumn.BAND_FROM_NM, b.fromNm());
                    number(br, ScheduleColumn.BAND_TO_NM, b.toNm());
                }
            }
            schedule.legs().forEach(this::leg);
            catalog(schedule.addedCatalog());
        }

        private void leg(PathLeg leg) {
            List<PathElement> elements = leg.elements();
            for (int i = 0; i < elements.size(); i++) {
                int position = i + 1;
                if (elements.get(i) instanceof CableSegment s) {
                    Row r = newRow(ScheduleSheet.SEGMENTS);
                    text(r, ScheduleColumn.SEGMENT_POINT, leg.pointTag());
                    text(r, ScheduleColumn.SEGMENT_DIRECTION, leg.direction().name());
                    number(r, ScheduleColumn.SEGMENT_POSITION, position);
                    text(r, ScheduleColumn.SEGMENT_CABLE_ID, s.label());
                    text(r, ScheduleColumn.SEGMENT_FIBER_TYPE, s.fiberTypeCode());
                    number(r, ScheduleColumn.SEGMENT_LENGTH_M, s.lengthM());
                    spreads(r, ScheduleSheet.SEGMENTS, s.spreads());
                    for (Bend b : s.bends()) {
                        Row br = newRow(ScheduleSheet.BENDS);
                        text(br, ScheduleColumn.BEND_CABLE_ID, s.label());
                        number(br, ScheduleColumn.BEND_RADIUS_MM, b.radiusMm());
                        number(br, ScheduleColumn.BEND_COUNT, b.count());
                    }
                } else if (elements.get(i) instanceof Joint j) {
                    Row r = newRow(ScheduleSheet.JOINTS);
                    text(r, ScheduleColumn.JOINT_POINT, leg.pointTag());
                    text(r, ScheduleColumn.JOINT_DIRECTION, leg.direction().name());
                    number(r, ScheduleColumn.JOINT_POSITION, position);
                    text(r, ScheduleColumn.JOINT_LABEL, j.label());
                    text(r, ScheduleColumn.JOINT_UPSTREAM_CONNECTOR, j.connectorTypeA());
                    text(r, ScheduleColumn.JOINT_DOWNSTREAM_CONNECTOR, j.connectorTypeB());
                    text(r, ScheduleColumn.JOINT_GRADE, j.grade().name());
                    number(r, ScheduleColumn.JOINT_LOSS_DB, j.lossDb());
                    text(r, ScheduleColumn.JOINT_LOSS_BASIS, j.lossBasis().name());
                    spreads(r, ScheduleSheet.JOINTS, j.spreads());
                }
            }
        }

        private void catalog(ComponentCatalog added) {
            for (FiberType f : added.fiberTypes()) {
                Row r = newRow(ScheduleSheet.FIBER_TYPES);
                text(r, ScheduleColumn.FIBER_CODE, f.code());
                text(r, ScheduleColumn.FIBER_DESCRIPTION, f.description());
                number(r, ScheduleColumn.FIBER_CORE_UM, f.coreUm());
                number(r, ScheduleColumn.FIBER_CLADDING_UM, f.claddingUm());
                number(r, ScheduleColumn.FIBER_BUFFER_UM, f.bufferUm());
                number(r, ScheduleColumn.FIBER_NA, f.na());
                text(r, ScheduleColumn.FIBER_CORE_MATERIAL, f.coreMaterial());
                text(r, ScheduleColumn.FIBER_OH_GRADE, f.ohGrade().name());
                number(r, ScheduleColumn.FIBER_OH_PPM, f.ohPpm());
                spreads(r, ScheduleSheet.FIBER_TYPES, f.spreads());
                for (AttenuationPoint a : f.datasheet()) {
                    Row ar = newRow(ScheduleSheet.FIBER_ATTENUATION);
                    text(ar, ScheduleColumn.ATTENUATION_FIBER, f.code());
                    number(ar, ScheduleColumn.ATTENUATION_WAVELENGTH_NM, a.wavelengthNm());
                    number(ar, ScheduleColumn.ATTENUATION_DB_PER_KM, a.attenuationDbPerKm());
                }
            }
            for (ConnectorType c : added.connectorTypes()) {
                Row r = newRow(ScheduleSheet.CONNECTOR_TYPES);
                text(r, ScheduleColumn.CONNECTOR_CODE, c.code());
                text(r, ScheduleColumn.CONNECTOR_DESCRIPTION, c.description());
                text(r, ScheduleColumn.CONNECTOR_FAMILY, c.family());
                number(r, ScheduleColumn.CONNECTOR_TYPICAL_LOSS_DB, c.typicalLossDb());
                text(r, ScheduleColumn.CONNECTOR_AIR_GAP, yesNo(c.airGap()));
                spreads(r, ScheduleSheet.CONNECTOR_TYPES, c.spreads());
            }
            for (ProbeType p : added.probeTypes()) {
                Row r = newRow(ScheduleSheet.PROBE_TYPES);
                text(r, ScheduleColumn.PROBE_CODE, p.code());
                text(r, ScheduleColumn.PROBE_DESCRIPTION, p.description());
                text(r, ScheduleColumn.PROBE_KIND, p.kind().name());
                text(r, ScheduleColumn.PROBE_WINDOW_MATERIAL, p.windowMaterial());
                number(r, ScheduleColumn.PROBE_WINDOW_FACES, p.windowFaces());
                number(r, ScheduleColumn.PROBE_OPTICAL_PATH_MM, p.opticalPathMm());
                number(r, ScheduleColumn.PROBE_FIXED_LOSS_DB, p.fixedLossDb());
                spreads(r, ScheduleSheet.PROBE_TYPES, p.spreads());
            }
        }

        /** The sheet's spread columns and spread basis, as the row's owner states them. */
        private void spreads(Row row, ScheduleSheet sheet, StatedSpreads spreads) {
            for (ScheduleColumn column : sheet.columns()) {
                if (column.spreadBasis()) {
                    text(row, column, spreads.basis());
                } else if (column.spread() != null) {
                    spreads.of(column.spread()).ifPresent(s -> text(row, column, s.toString()));
                }
            }
        }

        private Row newRow(ScheduleSheet sheet) {
            Sheet s = workbook.getSheet(sheet.title());
            int index = nextRow.merge(sheet, 1, Integer::sum);
            return s.createRow(index);
        }

        private void text(Row row, ScheduleColumn column, String value) {
            if (value == null || value.isEmpty()) {
                return;
            }
            Cell cell = row.createCell(column.index());
            cell.setCellValue(value);
            cell.setCellStyle(FormulaText.startsLikeFormula(value) ? quotedTextStyle : textStyle);
        }

        private void number(Row row, ScheduleColumn column, double value) {
            row.createCell(column.index()).setCellValue(value);
        }

        private void number(Row row, ScheduleColumn column, OptionalDouble value) {
            if (value.isPresent()) {
                number(row, column, value.getAsDouble());
            }
        }

        private static String yesNo(boolean value) {
            return value ? "YES" : "NO";
        }
    }
}
