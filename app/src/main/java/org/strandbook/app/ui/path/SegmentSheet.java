package org.strandbook.app.ui.path;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Function;
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
import org.strandbook.site.SpreadInput;
import org.strandbook.uncertainty.BudgetInputUncertainties;
import org.strandbook.app.ui.catalog.SpreadColumns;

/**
 * The "Cable segments" sheet of one point: both legs, each segment with the loss it contributes
 * to the point's predicted loop at the first band's centre and its share of the loop's loss there.
 */
public final class SegmentSheet {

    public static final String LOSS = "lossDb";
    public static final String SHARE = "sharePercent";
    /** Longest run a sheet accepts, m: longer is almost always a typing slip (common practice for plant runs). */
    static final double MAX_LENGTH_M = 20_000;

    private static final Pattern BEND = Pattern.compile("(\\d+)\\s*[x\u00D7*]\\s*(\\d+(?:[.,]\\d+)?)\\s*(?:mm)?");

    private SegmentSheet() {
    }

    /**
     * @param fiberCodes         the fiber catalog's codes, read at each parse
     * @param cableUsedElsewhere the tag of another point whose legs already use a cable ID, if any
     *                           (a cable ID names one run of fiber on the whole site)
     * @param figures            the computed columns {@link #LOSS} and {@link #SHARE} for all rows
     */
    public static SheetModel<LegSegment> create(Supplier<? extends Collection<String>> fiberCodes,
                                                Function<String, Optional<String>> cableUsedElsewhere,
                                                Function<List<LegSegment>, List<RowFigures>> figures) {
        return SheetModel.<LegSegment>builder()
                .column(SheetColumn.derived("leg", "Leg", false, s -> Figure.text(CellFormats.choice(s.direction()))))
                .column(SheetColumn.input("label", "Cable ID", (LegSegment s) -> s.segment().label(), v -> v,
                        cableId(cableUsedElsewhere), (s, v) -> with(s, v, s.segment().fiberTypeCode(),
                                s.segment().lengthM(), s.segment().bends())))
                .column(SheetColumn.input("fiber", "Fiber type", (LegSegment s) -> s.segment().fiberTypeCode(), v -> v,
                        CellParsers.catalogCode("fiber catalog", fiberCodes),
                        (s, v) -> with(s, s.segment().label(), v, s.segment().lengthM(), s.segment().bends())))
                .column(SheetColumn.number("length", "Length (m)", (LegSegment s) -> s.segment().lengthM(), 1,
                        DecimalParser.in("m").above(0).atMost(MAX_LENGTH_M).withDecimalComma(),
                        (s, v) -> with(s, s.segment().label(), s.segment().fiberTypeCode(), v, s.segment().bends())))
                .column(SheetColumn.input("bends", "Bends (count \u00D7 radius mm)", (LegSegment s) -> s.segment().bends(),
                        SegmentSheet::bendsText, bendsParser(),
                        (s, v) -> with(s, s.segment().label(), s.segment().fiberTypeCode(), s.segment().lengthM(), v)))
                .column(SheetColumn.computed(LOSS, "Loss at 1st band centre (dB)", true))
                .column(SheetColumn.computed(SHARE, "Share of loop loss (%)", true))
                .column(SpreadColumns.spread("lengthSpread", "Length tolerance (\u00B1m or \u00B1%)", SpreadInput.LENGTH,
                        (LegSegment s) -> s.segment().spreads(),
                        s -> BudgetInputUncertainties.SHIPPED.fiberLength().inWords(),
                        (s, v) -> s.with(s.segment().withSpreads(v))))
                .column(SpreadColumns.spread("bendSpread", "Bend radius spread (\u00B1mm or \u00B1%)", SpreadInput.BEND_RADIUS,
                        (LegSegment s) -> s.segment().spreads(),
                        s -> BudgetInputUncertainties.SHIPPED.bendRadius().inWords(),
                        (s, v) -> s.with(s.segment().withSpreads(v))))
                .column(SpreadColumns.basis((LegSegment s) -> s.segment().spreads(),
                        (s, v) -> s.with(s.segment().withSpreads(v))))
                .uniqueKey("label", s -> s.segment().label())
                .newRowsFrom((above, all) -> new LegSegment(above.direction(),
                        LegRows.placeAfter(above.position(), all.stream().filter(s -> s.direction() == above.direction())
                                .map(LegSegment::position).toList()),
                        new CableSegment(LabelSequence.nextUnused(above.segment().label(),
                                all.stream().map(s -> s.segment().label()).toList()), above.segment().fiberTypeCode(),
                                above.segment().lengthM(), above.segment().bends())))
                .evaluator(figures)
                .build();
    }

    private static CellParser<String> cableId(Function<String, Optional<String>> usedElsewhere) {
        CellParser<String> text = CellParsers.text("a cable ID");
        return t -> {
            ParseResult<String> parsed = text.parse(t);
            if (parsed instanceof ParseResult.Accepted<String> a) {
                Optional<String> owner = usedElsewhere.apply(a.value());
                if (owner.isPresent()) {
                    return ParseResult.rejected("'" + a.value() + "' is already a cable of point " + owner.get()
                            + " (a cable ID names one run on the site)");
                }
            }
            return parsed;
        };
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
        return s.with(new CableSegment(label, fiber, lengthM, bends, s.segment().spreads()));
    }
}
