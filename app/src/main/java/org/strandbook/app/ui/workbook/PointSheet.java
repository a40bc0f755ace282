package org.strandbook.app.ui.workbook;

import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.Function;
import java.util.function.Supplier;
import java.util.stream.Collectors;

import org.strandbook.app.ui.budget.BandPrediction;
import org.strandbook.app.ui.budget.PointPrediction;
import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.CellParsers;
import org.strandbook.app.ui.sheet.DecimalParser;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.RowFigures;
import org.strandbook.app.ui.sheet.SheetColumn;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.app.ui.sheet.Verdict;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.WavelengthBand;

/**
 * The "Points" sheet: one row per measurement point. The measured and predicted status, the margin
 * and the predicted losses come right after the tag so they stay in view on a laptop screen; the
 * latest finding and long free text come last.
 */
public final class PointSheet {

    public static final String STATUS = "status";
    public static final String MARGIN = "marginDb";
    public static final String PREDICTED = "predictedDb";
    public static final String CENTRES = "centresNm";
    public static final String ALLOWED = "allowedDb";
    public static final String MEASURED = "measured";
    public static final String FINDING = "finding";

    private static final String SEPARATOR = " \u00B7 ";

    private PointSheet() {
    }

    /**
     * @param analyzerTags the site's analyzer tags, read at each parse
     * @param probeCodes   the probe catalog's codes, read at each parse
     * @param figures      the computed columns of one row
     */
    public static SheetModel<MeasurementPoint> create(Supplier<? extends Collection<String>> analyzerTags,
                                                      Supplier<? extends Collection<String>> probeCodes,
                                                      Function<MeasurementPoint, RowFigures> figures) {
        return SheetModel.<MeasurementPoint>builder()
                .column(SheetColumn.derived("tag", "Point tag", false, p -> Figure.text(p.tag())))
                .column(SheetColumn.computed(MEASURED, "Measured status", false))
                .column(SheetColumn.computed(STATUS, "Predicted status", false))
                .column(SheetColumn.computed(MARGIN, "Least margin (dB)", true))
                .column(SheetColumn.computed(PREDICTED, "Predicted loss at band centres (dB)", true))
                .column(SheetColumn.computed(CENTRES, "Band centres (nm)", true))
                .column(SheetColumn.computed(ALLOWED, "Allowed loss (dB)", true))
                .column(SheetColumn.computed(FINDING, "Latest finding", false))
                .column(SheetColumn.input("analyzer", "Analyzer", MeasurementPoint::analyzerTag, s -> s,
                        CellParsers.catalogCode("site's analyzers", analyzerTags),
                        (p, v) -> with(p, p.service(), p.location(), v, p.channel(),
                                p.probeTypeCode(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService())))
                .column(SheetColumn.input("channel", "Channel", MeasurementPoint::channel, String::valueOf,
                        CellParsers.wholeNumber(1, 64), (p, v) -> with(p, p.service(), p.location(), p.analyzerTag(), v,
                                p.probeTypeCode(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService())))
                .column(SheetColumn.input("probe", "Probe type", MeasurementPoint::probeTypeCode, s -> s,
                        CellParsers.catalogCode("probe catalog", probeCodes),
                        (p, v) -> with(p, p.service(), p.location(), p.analyzerTag(), p.channel(),
                                v, p.toleranceDb(), p.hazardousArea(), p.hydrogenService())))
                .column(SheetColumn.derived("bands", "Bands of interest (nm)", false, p -> Figure.text(
                        p.bands().stream().map(PointSheet::bandText).collect(Collectors.joining("; ")))))
                .column(SheetColumn.input("tolerance", "Tolerance (dB)", MeasurementPoint::toleranceDb,
                        CellFormats.optionalDecimal(2),
                        CellParsers.optional(DecimalParser.in("dB").above(0).atMost(10).withDecimalComma()),
                        (p, v) -> with(p, p.service(), p.location(), p.analyzerTag(), p.channel(),
                                p.probeTypeCode(), v, p.hazardousArea(), p.hydrogenService())))
                .column(SheetColumn.input("hazardous", "Hazardous area", MeasurementPoint::hazardousArea, CellFormats::yesNo,
                        CellParsers.yesNo(), (p, v) -> with(p, p.service(), p.location(), p.analyzerTag(), p.channel(),
                                p.probeTypeCode(), p.toleranceDb(), v, p.hydrogenService())))
                .column(SheetColumn.input("hydrogen", "H\u2082 service", MeasurementPoint::hydrogenService, CellFormats::yesNo,
                        CellParsers.yesNo(), (p, v) -> with(p, p.service(), p.location(), p.analyzerTag(), p.channel(),
                                p.probeTypeCode(), p.toleranceDb(), p.hazardousArea(), v)))
                .column(SheetColumn.input("service", "Service", MeasurementPoint::service, s -> s,
                        CellParsers.freeText(), (p, v) -> with(p, v, p.location(), p.analyzerTag(), p.channel(),
                                p.probeTypeCode(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService())))
                .column(SheetColumn.input("location", "Location", MeasurementPoint::location, s -> s,
                        CellParsers.freeText(), (p, v) -> with(p, p.service(), v, p.analyzerTag(), p.channel(),
                                p.probeTypeCode(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService())))
                .evaluator(SheetModel.perRow(figures))
                .build();
    }

    /** The predicted columns of one row; the measured ones come from {@code measured}. */
    static RowFigures figures(PointPrediction prediction, PointStatus measured) {
        Map<String, Figure> f = new HashMap<>();
        if (prediction.bands().isEmpty()) {
            f.put(STATUS, Figure.text("? no prediction"));
        } else {
            f.put(STATUS, prediction.verdict().map(Figure::of).orElse(Figure.text("? no prediction")));
            OptionalDouble least = prediction.leastMarginDb();
            f.put(MARGIN, least.isPresent() ? Figure.number(least.getAsDouble(), 2) : Figure.text("\u2014"));
            List<BandPrediction> bands = prediction.bands();
            f.put(PREDICTED, Figure.text(bands.stream().map(b -> Double.isNaN(b.predictedLossDb()) ? "\u2014"
                    : String.format(java.util.Locale.ROOT, "%.2f", b.predictedLossDb())).collect(Collectors.joining(SEPARATOR))));
            f.put(CENTRES, Figure.text(bands.stream().map(b -> CellFormats.plain(b.centreNm()))
                    .collect(Collectors.joining(SEPARATOR))));
            f.put(ALLOWED, Figure.number(bands.get(0).allowedLossDb(), 1));
        }
        if (measured == null) {
            f.put(MEASURED, Figure.text("not evaluated"));
        } else {
            f.put(MEASURED, measured.status().map(s -> Figure.of(Verdict.valueOf(s.name())))
                    .orElse(Figure.text("? cannot evaluate")));
            f.put(FINDING, Figure.text(measured.finding()));
        }
        return new RowFigures(f);
    }

    static String bandText(WavelengthBand band) {
        return band.name() + " " + CellFormats.plain(band.fromNm()) + "\u2013" + CellFormats.plain(band.toNm());
    }

    private static MeasurementPoint with(MeasurementPoint p, String service, String location, String analyzerTag,
                                         int channel, String probe, OptionalDouble toleranceDb, boolean hazardous,
                                         boolean hydrogen) {
        return new MeasurementPoint(p.tag(), service, location, analyzerTag, channel, probe, p.bands(), toleranceDb,
                hazardous, hydrogen, p.processTemperatureC());
    }
}
