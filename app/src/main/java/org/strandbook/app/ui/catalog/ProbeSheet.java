package org.strandbook.app.ui.catalog;

import java.util.List;
import java.util.Locale;

import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.CellParsers;
import org.strandbook.app.ui.sheet.DecimalParser;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.SheetColumn;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.SpreadInput;
import org.strandbook.uncertainty.BudgetInputUncertainties;

/** The probe-type catalog as a sheet (codes are keys and stay read-only). */
public final class ProbeSheet {

    /** The window materials the optics engine has dispersion data for. */
    static final List<String> WINDOW_MATERIALS = List.of("SAPPHIRE", "FUSED_SILICA");

    private ProbeSheet() {
    }

    public static SheetModel<ProbeType> create() {
        return SheetModel.<ProbeType>builder()
                .column(SheetColumn.derived("code", "Code", false, p -> Figure.text(p.code())))
                .column(SheetColumn.input("description", "Description", ProbeType::description, v -> v,
                        CellParsers.freeText(), (p, v) -> with(p, v, p.kind(), p.windowMaterial(), p.windowFaces(),
                                p.opticalPathMm(), p.fixedLossDb())))
                .column(SheetColumn.input("kind", "Kind", ProbeType::kind, CellFormats::choice, CellParsers.choice(ProbeKind.class),
                        (p, v) -> with(p, p.description(), v, p.windowMaterial(), p.windowFaces(), p.opticalPathMm(), p.fixedLossDb())))
                .column(SheetColumn.input("window", "Window material", ProbeType::windowMaterial,
                        m -> m.toLowerCase(Locale.ROOT).replace('_', ' '),
                        t -> CellParsers.catalogCode("window materials", () -> WINDOW_MATERIALS)
                                .parse(t == null ? "" : t.strip().replace(' ', '_')),
                        (p, v) -> with(p, p.description(), p.kind(), v, p.windowFaces(), p.opticalPathMm(), p.fixedLossDb())))
                .column(SheetColumn.input("faces", "Window faces", ProbeType::windowFaces, String::valueOf,
                        CellParsers.wholeNumber(0, 16),
                        (p, v) -> with(p, p.description(), p.kind(), p.windowMaterial(), v, p.opticalPathMm(), p.fixedLossDb())))
                .column(SheetColumn.number("path", "Optical path (mm)", ProbeType::opticalPathMm, 1,
                        DecimalParser.in("mm").atLeast(0).atMost(1000).withDecimalComma(),
                        (p, v) -> with(p, p.description(), p.kind(), p.windowMaterial(), p.windowFaces(), v, p.fixedLossDb())))
                .column(SheetColumn.number("fixed", "Fixed optics loss (dB)", ProbeType::fixedLossDb, 2,
                        DecimalParser.in("dB").atLeast(0).atMost(40).withDecimalComma(),
                        (p, v) -> with(p, p.description(), p.kind(), p.windowMaterial(), p.windowFaces(), p.opticalPathMm(), v)))
                .column(SpreadColumns.spread("fixedSpread", "Fixed loss spread (\u00B1dB or \u00B1%)",
                        SpreadInput.PROBE_FIXED_LOSS, ProbeType::spreads,
                        p -> BudgetInputUncertainties.SHIPPED.probeFixedLoss().inWords(), ProbeType::withSpreads))
                .column(SpreadColumns.basis(ProbeType::spreads, ProbeType::withSpreads))
                .build();
    }

    private static ProbeType with(ProbeType p, String description, ProbeKind kind, String window, int faces,
                                  double pathMm, double fixedDb) {
        return new ProbeType(p.code(), description, kind, window, faces, pathMm, fixedDb, p.spreads());
    }
}
