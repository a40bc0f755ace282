package org.strandbook.app.ui.sheet;

import java.util.function.BiFunction;
import java.util.function.Function;

/**
 * An editable column: reads a value from the row, writes it as text, parses text back and builds a
 * new row with the value (rows are immutable records). A setter may throw
 * {@link IllegalArgumentException} when the record's own validation refuses the combination; its
 * message becomes the cell's reason.
 */
public final class InputColumn<R, V> implements SheetColumn<R> {

    private final String key;
    private final String header;
    private final boolean numeric;
    private final Function<R, V> getter;
    private final Function<V, String> format;
    private final CellParser<V> parser;
    private final BiFunction<R, V, R> setter;
    private final Function<R, String> hint;

    InputColumn(String key, String header, boolean numeric, Function<R, V> getter, Function<V, String> format,
                CellParser<V> parser, BiFunction<R, V, R> setter) {
        this(key, header, numeric, getter, format, parser, setter, r -> "");
    }

    private InputColumn(String key, String header, boolean numeric, Function<R, V> getter, Function<V, String> format,
                CellParser<V> parser, BiFunction<R, V, R> setter, Function<R, String> hint) {
        this.key = key;
        this.header = header;
        this.numeric = numeric;
        this.getter = getter;
        this.format = format;
        this.parser = parser;
        this.setter = setter;
        this.hint = hint;
    }

    /**
     * The same column showing {@code hint} (greyed) in a cell whose text is blank, e.g. the default a
     * blank falls back to; the hint is never the cell's value (copy takes the blank).
     */
    public InputColumn<R, V> withHint(Function<R, String> blankHint) {
        return new InputColumn<>(key, header, numeric, getter, format, parser, setter, blankHint);
    }

    /** What a blank cell of {@code row} shows instead; empty for none. */
    public String hint(R row) {
        return hint.apply(row);
    }

    @Override
    public String key() {
        return key;
    }

    @Override
    public String header() {
        return header;
    }

    @Override
    public boolean numeric() {
        return numeric;
    }

    public String text(R row) {
        return format.apply(getter.apply(row));
    }

    /** The row with this column set from {@code text}, or the reason the text is refused. */
    public ParseResult<R> withText(R row, String text) {
        ParseResult<V> parsed = parser.parse(text);
        if (parsed instanceof ParseResult.Accepted<V> a) {
            return set(row, a.value());
        }
        return ParseResult.rejected(((ParseResult.Rejected<V>) parsed).reason());
    }

    /** {@code target} with this column's value taken from {@code source}, as fill down does. */
    public ParseResult<R> withValueOf(R source, R target) {
        return set(target, getter.apply(source));
    }

    private ParseResult<R> set(R row, V value) {
        try {
            return ParseResult.accepted(setter.apply(row, value));
        } catch (IllegalArgumentException e) {
            return ParseResult.rejected(e.getMessage());
        }
    }
}
