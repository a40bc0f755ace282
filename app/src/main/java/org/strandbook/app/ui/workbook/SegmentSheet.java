package org.strandbook.app.ui.workbook;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.DoubleSupplier;
import java.util.function.Supplier;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.CellParser;
import org.strandbook.app.ui.sheet.CellParsers;
import org.strandbook.app.ui.sheet.DecimalParser;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.ParseResult;
import org.strandbook.app.ui.sheet.RowFigures;
import org.strandbook.app.ui.sheet.SheetColumn;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;

/** The "Cable segments" sheet of one point: both legs, with each segment's fiber loss at the band centre. */
public final class SegmentSheet {

    public static final String FIBER_LOSS = "fiberLossDb";
    /** Longest run a sheet accepts, m: longer is almost always a typing slip (common practice for plant runs). */
    static final double MAX_LENGTH_M = 20_000;

    private static final Pattern BEND = Pattern.compile("(\\d+)\\s*[x\u00D7*]\\s*(\\d+(?:[.,]\\d+)?)\\s*(?:mm)?");

    private SegmentSheet() {
    }

    /**
     * @param catalog  fiber codes and attenuation
     * @param centreNm the band centre of the point shown, nm
     */
    public static SheetModel<LegSegment> create(Supplier<Catalog> catalog, DoubleSupplier centreNm) {
        return SheetModel.<LegSegment>builder()
                .column(SheetColumn.derived("leg", "Leg", false, s -> Figure.text(CellFormats.choice(s.direction()))))
                .column(SheetColumn.input("label", "Cable ID", (LegSegment s) -> s.segment().label(), v -> v,
                        CellParsers.text("a cable ID"), (s, v) -> with(s, v, s.segment().fiberTypeCode(),
                                s.segment().lengthM(), s.segment().bends())))
                .column(SheetColumn.input("fiber", "Fiber type", (LegSegment s) -> s.segment().fiberTypeCode(), v -> v,
                        CellParsers.catalogCode("fiber catalog", () -> catalog.get().fiberCodes()),
                        (s, v) -> with(s, s.segment().label(), v, s.segment().lengthM(), s.segment().bends())))
                .column(SheetColumn.number("length", "Length (m)", (LegSegment s) -> s.segment().lengthM(), 1,
                        DecimalParser.in("m").above(0).atMost(MAX_LENGTH_M).withDecimalComma(),
                        (s, v) -> with(s, s.segment().label(), s.segment().fiberTypeCode(), v, s.segment().bends())))
                .column(SheetColumn.input("bends", "Bends (count \u00D7 radius mm)", (LegSegment s) -> s.segment().bends(),
                        SegmentSheet::bendsText, bendsParser(),
                        (s, v) -> with(s, s.segment().label(), s.segment().fiberTypeCode(), s.segment().lengthM(), v)))
                .column(SheetColumn.computed(FIBER_LOSS, "Fiber loss at band centre (dB)", true))
                .uniqueKey("label", s -> s.segment().label())
                .newRowsFrom((above, all) -> with(above, LabelSequence.nextUnused(above.segment().label(),
                        all.stream().map(s -> s.segment().label()).toList()), above.segment().fiberTypeCode(),
                        above.segment().lengthM(), above.segment().bends()))
                .evaluator(SheetModel.perRow(s -> {
                    DatasheetLossBudget budget = new DatasheetLossBudget(catalog.get());
                    if (catalog.get().fiber(s.segment().fiberTypeCode()).isEmpty()) {
                        return new RowFigures(Map.of(FIBER_LOSS, Figure.text("no such fiber")));
                    }
                    return new RowFigures(Map.of(FIBER_LOSS,
                            Figure.number(budget.segmentLossDb(s.segment(), centreNm.getAsDouble()), 2)));
                }))
                .build();
    }

    static String bendsText(List<Bend> bends) {
        return bends.stream().map(b -> b.count() + "\u00D7" + CellFormats.plain(b.radiusMm()))
                .collect(Collectors.joining("; "));
    }

    /** "2×50; 1×100" (also "2x50 mm", decimal comma in the radius); blank for none. */
    static CellParser<List<Bend>> bendsParser() {
        return text -> {
            List<Bend> bends = new ArrayList<>();
            if (text == null || text.isBlank()) {
                return ParseResult.accepted(bends);
            }
            for (String item : text.split(";")) {
                Matcher m = BEND.matcher(item.strip().toLowerCase(Locale.ROOT));
                if (!m.matches()) {
                    return ParseResult.rejected("'" + item.strip() + "': write bends as count\u00D7radius in mm, e.g. 2\u00D750; 1\u00D7100");
                }
                try {
                    bends.add(new Bend(Double.parseDouble(m.group(2).replace(',', '.')), Integer.parseInt(m.group(1))));
                } catch (IllegalArgumentException e) {
                    return ParseResult.rejected(e.getMessage());
                }
            }
            return ParseResult.accepted(bends);
        };
    }

    private static LegSegment with(LegSegment s, String label, String fiber, double lengthM, List<Bend> bends) {
        return new LegSegment(s.direction(), new CableSegment(label, fiber, lengthM, bends));
    }
}
