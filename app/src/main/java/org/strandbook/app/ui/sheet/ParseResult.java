package org.strandbook.app.ui.sheet;

import java.util.function.Function;

/** What a column made of a cell's text: a value, or the reason it could not. */
public sealed interface ParseResult<V> {

    record Accepted<V>(V value) implements ParseResult<V> {
    }

    record Rejected<V>(String reason) implements ParseResult<V> {
    }

    static <V> ParseResult<V> accepted(V value) {
        return new Accepted<>(value);
    }

    static <V> ParseResult<V> rejected(String reason) {
        return new Rejected<>(reason);
    }

    default <W> ParseResult<W> map(Function<? super V, ? extends W> f) {
        if (this instanceof Accepted<V> a) {
            return new Accepted<>(f.apply(a.value()));
        }
        return new Rejected<>(((Rejected<V>) this).reason());
    }
}
