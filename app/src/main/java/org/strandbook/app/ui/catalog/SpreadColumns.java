package org.strandbook.app.ui.catalog;

import java.util.function.BiFunction;
import java.util.function.Function;

import org.strandbook.app.ui.sheet.CellParser;
import org.strandbook.app.ui.sheet.InputColumn;
import org.strandbook.app.ui.sheet.ParseResult;
import org.strandbook.app.ui.sheet.SheetColumn;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;

/**
 * The spread columns of the catalog and path sheets: one per input the row may state a spread of,
 * and its basis. A blank cell shows the default the input falls back to, as a hint.
 */
public final class SpreadColumns {

    /** The word a blank spread cell's hint starts with; typing it (or nothing) clears the spread. */
    static final String DEFAULT = "default";

    private SpreadColumns() {
    }

    /**
     * @param fallback the default this row falls back to, in words, shown greyed in a blank cell
     */
    public static <R> InputColumn<R, StatedSpread> spread(String key, String header, SpreadInput input,
            Function<R, StatedSpreads> spreads, Function<R, String> fallback, BiFunction<R, StatedSpreads, R> with) {
        return SheetColumn.input(key, header, (R r) -> spreads.apply(r).of(input).orElse(null),
                (StatedSpread s) -> s == null ? "" : s.toString(), parser(input),
                (R r, StatedSpread s) -> with.apply(r, spreads.apply(r).with(input, s)))
                .withHint(r -> DEFAULT + " " + fallback.apply(r));
    }

    /** The row's spread basis, free text in the site's words. */
    public static <R> InputColumn<R, String> basis(Function<R, StatedSpreads> spreads,
            BiFunction<R, StatedSpreads, R> with) {
        return SheetColumn.input("spreadBasis", "Spread basis", (R r) -> spreads.apply(r).basis(), v -> v,
                t -> t != null && t.strip().length() > 500 ? ParseResult.rejected("a spread basis holds at most 500"
                        + " characters") : ParseResult.accepted(t == null ? "" : t.strip()),
                (r, v) -> with.apply(r, spreads.apply(r).withBasis(v)));
    }

    /** Blank or "default …" clears the spread; anything else must be a spread of {@code input}. */
    static CellParser<StatedSpread> parser(SpreadInput input) {
        return t -> {
            String s = t == null ? "" : t.strip();
            if (s.isEmpty() || s.toLowerCase(java.util.Locale.ROOT).startsWith(DEFAULT)) {
                return ParseResult.accepted(null);
            }
            try {
                return ParseResult.accepted(StatedSpread.parse(s, input));
            } catch (IllegalArgumentException e) {
                return ParseResult.rejected(e.getMessage());
            }
        };
    }
}
