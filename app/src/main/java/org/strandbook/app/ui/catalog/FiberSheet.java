package org.strandbook.app.ui.catalog;

import java.util.Locale;

import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.CellParsers;
import org.strandbook.app.ui.sheet.DecimalParser;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.SheetColumn;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.site.FiberType;
import org.strandbook.site.OhGrade;
import org.strandbook.site.SpreadInput;
import org.strandbook.uncertainty.BudgetInputUncertainties;

/** The fiber-type catalog as a sheet (codes are keys and stay read-only; the datasheet comes from the schedule). */
public final class FiberSheet {

    private FiberSheet() {
    }

    public static SheetModel<FiberType> create() {
        return SheetModel.<FiberType>builder()
                .column(SheetColumn.derived("code", "Code", false, f -> Figure.text(f.code())))
                .column(SheetColumn.input("description", "Description", FiberType::description, v -> v,
                        CellParsers.freeText(), (f, v) -> with(f, v, f.coreUm(), f.claddingUm(), f.bufferUm(), f.na(),
                                f.ohGrade(), f.ohPpm())))
                .column(SheetColumn.number("core", "Core (\u00B5m)", FiberType::coreUm, 0,
                        DecimalParser.in("\u00B5m").above(0).atMost(2000).withDecimalComma(),
                        (f, v) -> with(f, f.description(), v, f.claddingUm(), f.bufferUm(), f.na(), f.ohGrade(), f.ohPpm())))
                .column(SheetColumn.number("cladding", "Cladding (\u00B5m)", FiberType::claddingUm, 0,
                        DecimalParser.in("\u00B5m").above(0).atMost(2500).withDecimalComma(),
                        (f, v) -> with(f, f.description(), f.coreUm(), v, f.bufferUm(), f.na(), f.ohGrade(), f.ohPpm())))
                .column(SheetColumn.number("buffer", "Buffer (\u00B5m)", FiberType::bufferUm, 0,
                        DecimalParser.in("\u00B5m").atLeast(0).atMost(5000).withDecimalComma(),
                        (f, v) -> with(f, f.description(), f.coreUm(), f.claddingUm(), v, f.na(), f.ohGrade(), f.ohPpm())))
                .column(SheetColumn.number("na", "NA", FiberType::na, 2,
                        DecimalParser.in("").above(0).atMost(0.99).withDecimalComma(),
                        (f, v) -> with(f, f.description(), f.coreUm(), f.claddingUm(), f.bufferUm(), v, f.ohGrade(), f.ohPpm())))
                .column(SheetColumn.derived("glass", "Core glass", false, f -> Figure.text(
                        f.coreMaterial().toLowerCase(Locale.ROOT).replace('_', ' '))))
                .column(SheetColumn.input("oh", "OH grade", FiberType::ohGrade, CellFormats::choice,
                        CellParsers.choice(OhGrade.class),
                        (f, v) -> with(f, f.description(), f.coreUm(), f.claddingUm(), f.bufferUm(), f.na(), v, f.ohPpm())))
                .column(SheetColumn.number("ohPpm", "OH (ppm)", FiberType::ohPpm, 1,
                        DecimalParser.in("ppm").atLeast(0).atMost(2000).withDecimalComma(),
                        (f, v) -> with(f, f.description(), f.coreUm(), f.claddingUm(), f.bufferUm(), f.na(), f.ohGrade(), v)))
                .column(SheetColumn.derived("datasheet", "Datasheet attenuation", false, f -> Figure.text(
                        f.datasheet().isEmpty() ? "none: model only" : String.format(Locale.ROOT, "%d points, %s\u2013%s nm",
                                f.datasheet().size(), CellFormats.plain(f.datasheet().get(0).wavelengthNm()),
                                CellFormats.plain(f.datasheet().get(f.datasheet().size() - 1).wavelengthNm())))))
                .column(SpreadColumns.spread("ohSpread", "OH spread (ppm range or \u00B1%)", SpreadInput.OH_CONTENT,
                        FiberType::spreads, f -> BudgetInputUncertainties.SHIPPED.ohContent().inWords(),
                        FiberType::withSpreads))
                .column(SpreadColumns.spread("attenuationSpread", "Attenuation spread (\u00B1%)", SpreadInput.ATTENUATION,
                        FiberType::spreads, f -> BudgetInputUncertainties.SHIPPED.attenuation().inWords(),
                        FiberType::withSpreads))
                .column(SpreadColumns.basis(FiberType::spreads, FiberType::withSpreads))
                .build();
    }

    private static FiberType with(FiberType f, String description, double coreUm, double claddingUm, double bufferUm,
                                  double na, OhGrade oh, double ohPpm) {
        return new FiberType(f.code(), description, coreUm, claddingUm, bufferUm, na, f.coreMaterial(), oh, ohPpm,
                f.datasheet(), f.spreads());
    }
}
