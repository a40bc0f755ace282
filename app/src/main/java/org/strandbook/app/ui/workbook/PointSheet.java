package org.strandbook.app.ui.workbook;

import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Function;
import java.util.function.Supplier;

import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.CellParsers;
import org.strandbook.app.ui.sheet.DecimalParser;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.RowFigures;
import org.strandbook.app.ui.sheet.SheetColumn;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.WavelengthBand;

/**
 * The "Points" sheet: one row per measurement point. Status, margin and predicted loss come right
 * after the tag so they stay in view on a laptop screen; long free text comes last.
 */
public final class PointSheet {

    public static final String PREDICTED = "predictedDb";
    public static final String ALLOWED = "allowedDb";
    public static final String MARGIN = "marginDb";
    public static final String STATUS = "status";

    private PointSheet() {
    }

    /**
     * @param outline  the site as loaded (analyzer tags, allowed loss, default tolerance)
     * @param catalog  the catalogs (probe codes)
     * @param figures  the evaluator of the computed columns
     */
    public static SheetModel<MeasurementPoint> create(Supplier<SiteOutline> outline, Supplier<Catalog> catalog,
                                                      Function<List<MeasurementPoint>, List<RowFigures>> figures) {
        return SheetModel.<MeasurementPoint>builder()
                .column(SheetColumn.derived("tag", "Point tag", false, p -> Figure.text(p.tag())))
                .column(SheetColumn.computed(STATUS, "Status", false))
                .column(SheetColumn.computed(MARGIN, "Margin (dB)", true))
                .column(SheetColumn.computed(PREDICTED, "Predicted loss (dB)", true))
                .column(SheetColumn.computed(ALLOWED, "Allowed loss (dB)", true))
                .column(SheetColumn.input("analyzer", "Analyzer", MeasurementPoint::analyzerTag, s -> s,
                        CellParsers.catalogCode("site's analyzers",
                                () -> outline.get().analyzers().stream().map(a -> a.tag()).toList()),
                        (p, v) -> with(p, p.service(), p.location(), v, p.channel(),
                                p.probeTypeCode(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService())))
                .column(SheetColumn.input("channel", "Channel", MeasurementPoint::channel, String::valueOf,
                        CellParsers.wholeNumber(1, 64), (p, v) -> with(p, p.service(), p.location(), p.analyzerTag(), v,
                                p.probeTypeCode(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService())))
                .column(SheetColumn.input("probe", "Probe type", MeasurementPoint::probeTypeCode, s -> s,
                        CellParsers.catalogCode("probe catalog", () -> catalog.get().probeCodes()),
                        (p, v) -> with(p, p.service(), p.location(), p.analyzerTag(), p.channel(),
                                v, p.toleranceDb(), p.hazardousArea(), p.hydrogenService())))
                .column(SheetColumn.derived("band", "Band of interest (nm)", false, p -> Figure.text(bandText(p.bands().get(0)))))
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
                .evaluator(figures)
                .build();
    }

    static String bandText(WavelengthBand band) {
        return band.name() + " (" + CellFormats.plain(band.fromNm()) + "\u2013" + CellFormats.plain(band.toNm()) + ")";
    }

    private static MeasurementPoint with(MeasurementPoint p, String service, String location, String analyzerTag,
                                         int channel, String probe, OptionalDouble toleranceDb, boolean hazardous,
                                         boolean hydrogen) {
        return new MeasurementPoint(p.tag(), service, location, analyzerTag, channel, probe, p.bands(), toleranceDb,
                hazardous, hydrogen, p.processTemperatureC());
    }
}
