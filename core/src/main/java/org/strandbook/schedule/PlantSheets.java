package org.strandbook.schedule;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apache.poi.ss.usermodel.Workbook;
import org.strandbook.site.Analyzer;
import org.strandbook.site.DetectorType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.WavelengthBand;

/** The sheets that describe the plant side: analyzers, measurement points and their bands. */
final class PlantSheets {

    private static final Quantity ANALYZER_NM = Quantity.positive("wavelength", "nm", 100_000);
    private static final WholeRange CHANNELS = new WholeRange("channel count", 1, 1000);
    private static final Quantity ALLOWED_LOSS_DB = Quantity.positive("allowed loss", "dB", 100);
    private static final WholeRange CHANNEL = new WholeRange("channel", 1, 1000);
    private static final Quantity TOLERANCE_DB = Quantity.positive("tolerance", "dB", 100);
    private static final Quantity PROCESS_C = Quantity.between("process temperature", "°C", -273.15, 2000);
    private static final Quantity BAND_FROM_NM = Quantity.positive("lower edge", "nm", 100_000);
    private static final Quantity BAND_TO_NM = Quantity.positive("upper edge", "nm", 100_000);

    /** A measurement point as entered; built into a {@link MeasurementPoint} once its bands are known. */
    static final class PointDraft {
        final SheetRow row;
        final String tag;
        String service;
        String location;
        String analyzerTag;
        int channel;
        String probeTypeCode;
        OptionalDouble toleranceDb;
        Boolean hazardousArea;
        Boolean hydrogenService;
        OptionalDouble processTemperatureC;
        final List<WavelengthBand> bands = new ArrayList<>();
        boolean hasBandRows;

        PointDraft(SheetRow row, String tag) {
            this.row = row;
            this.tag = tag;
        }

        MeasurementPoint build() {
            return new MeasurementPoint(tag, service, location, analyzerTag, channel, probeTypeCode, bands,
                    toleranceDb, hazardousArea, hydrogenService, processTemperatureC);
        }
    }

    /**
     * @param analyzers    analyzers whose rows passed, by tag in sheet order
     * @param analyzerTags defined analyzer tags and their cells
     * @param points       one draft per distinct point tag, in sheet order
     * @param pointTags    defined point tags and their cells, for references from other sheets
     */
    record Result(Map<String, Analyzer> analyzers, KeyIndex analyzerTags, Map<String, PointDraft> points,
                  KeyIndex pointTags) {
    }

    private final Workbook workbook;
    private final CatalogSheets.Result catalog;
    private final ProblemLog log;

    private PlantSheets(Workbook workbook, CatalogSheets.Result catalog, ProblemLog log) {
        this.workbook = workbook;
        this.catalog = catalog;
        this.log = log;
    }

    static Result read(Workbook workbook, CatalogSheets.Result catalog, ProblemLog log) {
        return new PlantSheets(workbook, catalog, log).read();
    }

    private Result read() {
        KeyIndex analyzerTags = new KeyIndex();
        Map<String, Analyzer> analyzers = analyzers(analyzerTags);
        KeyIndex pointTags = new KeyIndex();
        Map<String, PointDraft> points = points(pointTags, analyzerTags, analyzers);
        boolean bandsRead = bands(pointTags, points, analyzers);
        if (bandsRead) {
            for (PointDraft p : points.values()) {
                if (!p.hasBandRows) {
                    p.row.problem(ScheduleColumn.POINT_TAG, "point " + p.tag
                            + " has no band of interest: add at least one row for it on sheet 'Bands'");
                }
            }
        }
        return new Result(analyzers, analyzerTags, points, pointTags);
    }

    private Map<String, Analyzer> analyzers(KeyIndex tags) {
        Map<String, Analyzer> analyzers = new LinkedHashMap<>();
        Optional<List<SheetRow>> rows = SheetTable.rows(workbook, ScheduleSheet.ANALYZERS, log);
        if (rows.isEmpty()) {
            tags.markIncomplete();
            return analyzers;
        }
        for (SheetRow row : rows.get()) {
            String tag = row.uniqueKey(ScheduleColumn.ANALYZER_TAG, tags, "analyzer tag");
            String description = row.text(ScheduleColumn.ANALYZER_DESCRIPTION);
            double minNm = row.number(ScheduleColumn.ANALYZER_MIN_NM, ANALYZER_NM);
            double maxNm = row.number(ScheduleColumn.ANALYZER_MAX_NM, ANALYZER_NM);
            if (maxNm <= minNm) {
                row.problem(ScheduleColumn.ANALYZER_MAX_NM, "longest wavelength must be more than the shortest "
                        + DecimalText.display(minNm) + " nm, was " + DecimalText.display(maxNm));
            }
            int channels = row.whole(ScheduleColumn.ANALYZER_CHANNELS, CHANNELS);
            double allowedLossDb = row.number(ScheduleColumn.ANALYZER_ALLOWED_LOSS_DB, ALLOWED_LOSS_DB);
            DetectorType detector = row.choice(ScheduleColumn.ANALYZER_DETECTOR, DetectorType.class,
                    DetectorType.OTHER, "detector");
            if (!row.faulty()) {
                Analyzer analyzer = row.guard(ScheduleColumn.ANALYZER_TAG,
                        () -> new Analyzer(tag, description, minNm, maxNm, channels, allowedLossDb, detector));
                if (analyzer != null) {
                    analyzers.put(tag, analyzer);
                }
            }
        }
        return analyzers;
    }

    private Map<String, PointDraft> points(KeyIndex tags, KeyIndex analyzerTags, Map<String, Analyzer> analyzers) {
        Map<String, PointDraft> points = new LinkedHashMap<>();
        Optional<List<SheetRow>> rows = SheetTable.rows(workbook, ScheduleSheet.POINTS, log);
        if (rows.isEmpty()) {
            tags.markIncomplete();
            return points;
        }
        if (rows.get().isEmpty()) {
            log.add(ScheduleProblem.ofSheet(ScheduleSheet.POINTS.title(), "sheet 'Points' holds no measurement point;"
                    + " enter at least one from row 2"));
        }
        Map<String, Map<Integer, PointDraft>> channelUse = new HashMap<>();
        for (SheetRow row : rows.get()) {
            String tag = row.uniqueKey(ScheduleColumn.POINT_TAG, tags, "point tag");
            PointDraft p = new PointDraft(row, tag);
            p.service = row.text(ScheduleColumn.POINT_SERVICE);
            p.location = row.text(ScheduleColumn.POINT_LOCATION);
            p.analyzerTag = row.reference(ScheduleColumn.POINT_ANALYZER, analyzerTags, "analyzer tag",
                    "on sheet 'Analyzers'");
            p.channel = row.whole(ScheduleColumn.POINT_CHANNEL, CHANNEL);
            Analyzer analyzer = p.analyzerTag == null ? null : analyzers.get(p.analyzerTag);
            if (analyzer != null && p.channel > analyzer.channels()) {
                row.problem(ScheduleColumn.POINT_CHANNEL, "channel " + p.channel + " exceeds analyzer "
                        + analyzer.tag() + "'s " + analyzer.channels() + " channels");
            } else if (analyzer != null && p.channel > 0) {
                PointDraft other = channelUse.computeIfAbsent(analyzer.tag(), k -> new HashMap<>()).putIfAbsent(p.channel, p);
                if (other != null) {
                    row.problem(ScheduleColumn.POINT_CHANNEL, "channel " + p.channel + " of analyzer " + analyzer.tag()
                            + " already serves point " + other.tag + " (row " + other.row.number() + ")");
                }
            }
            p.probeTypeCode = row.reference(ScheduleColumn.POINT_PROBE_TYPE, catalog.probeCodes(), "probe type",
                    "in the catalog nor on sheet 'Probe types'");
            p.toleranceDb = row.optionalNumber(ScheduleColumn.POINT_TOLERANCE_DB, TOLERANCE_DB);
            p.hazardousArea = row.yesNo(ScheduleColumn.POINT_HAZARDOUS_AREA, "hazardous area");
            p.hydrogenService = row.yesNo(ScheduleColumn.POINT_HYDROGEN_SERVICE, "hydrogen service");
            p.processTemperatureC = row.optionalNumber(ScheduleColumn.POINT_PROCESS_TEMPERATURE_C, PROCESS_C);
            if (tag != null) {
                points.put(tag, p);
            }
        }
        return points;
    }

    private boolean bands(KeyIndex pointTags, Map<String, PointDraft> points, Map<String, Analyzer> analyzers) {
        Optional<List<SheetRow>> rows = SheetTable.rows(workbook, ScheduleSheet.BANDS, log);
        if (rows.isEmpty()) {
            return false;
        }
        for (SheetRow row : rows.get()) {
            String tag = row.reference(ScheduleColumn.BAND_POINT, pointTags, "point tag", "on sheet 'Points'");
            String name = row.text(ScheduleColumn.BAND_NAME);
            double fromNm = row.number(ScheduleColumn.BAND_FROM_NM, BAND_FROM_NM);
            double toNm = row.number(ScheduleColumn.BAND_TO_NM, BAND_TO_NM);
            if (toNm <= fromNm) {
                row.problem(ScheduleColumn.BAND_TO_NM, "upper edge must be more than the lower edge "
                        + DecimalText.display(fromNm) + " nm, was " + DecimalText.display(toNm));
            }
            PointDraft point = tag == null ? null : points.get(tag);
            if (point == null) {
                continue;
            }
            point.hasBandRows = true;
            Analyzer analyzer = point.analyzerTag == null ? null : analyzers.get(point.analyzerTag);
            if (analyzer != null && fromNm < analyzer.minNm()) {
                row.problem(ScheduleColumn.BAND_FROM_NM, "band starts below analyzer " + analyzer.tag()
                        + "'s shortest wavelength " + DecimalText.display(analyzer.minNm()) + " nm, was "
                        + DecimalText.display(fromNm));
            }
            if (analyzer != null && toNm > analyzer.maxNm()) {
                row.problem(ScheduleColumn.BAND_TO_NM, "band ends above analyzer " + analyzer.tag()
                        + "'s longest wavelength " + DecimalText.display(analyzer.maxNm()) + " nm, was "
                        + DecimalText.display(toNm));
            }
            if (!row.faulty()) {
                WavelengthBand band = row.guard(ScheduleColumn.BAND_NAME, () -> new WavelengthBand(name, fromNm, toNm));
                if (band != null) {
                    point.bands.add(band);
                }
            }
        }
        return true;
    }
}
