package org.strandbook.app.ui.sheet;

import java.util.function.BiFunction;
import java.util.function.Function;

/** A column of a sheet: typed in ({@link InputColumn}) or computed and read-only ({@link ComputedColumn}). */
public sealed interface SheetColumn<R> permits InputColumn, ComputedColumn {

    /** Stable key, used by evaluators to address computed figures. */
    String key();

    /** Header text with the unit, e.g. "Length (m)". */
    String header();

    /** Right-aligned in the view. */
    boolean numeric();

    default boolean editable() {
        return this instanceof InputColumn;
    }

    /** A text or choice column. */
    static <R, V> InputColumn<R, V> input(String key, String header, Function<R, V> getter,
                                          Function<V, String> format, CellParser<V> parser,
                                          BiFunction<R, V, R> setter) {
        return new InputColumn<>(key, header, false, getter, format, parser, setter);
    }

    /** A number column written with {@code places} decimals. */
    static <R> InputColumn<R, Double> number(String key, String header, Function<R, Double> getter, int places,
                                             CellParser<Double> parser, BiFunction<R, Double, R> setter) {
        return new InputColumn<>(key, header, true, getter, CellFormats.decimal(places), parser, setter);
    }

    /** A read-only column whose figures the sheet's evaluator supplies. */
    static <R> ComputedColumn<R> computed(String key, String header, boolean numeric) {
        return new ComputedColumn<>(key, header, numeric, null);
    }

    /** A read-only column derived from the row alone. */
    static <R> ComputedColumn<R> derived(String key, String header, boolean numeric, Function<R, Figure> fromRow) {
        return new ComputedColumn<>(key, header, numeric, fromRow);
    }
}
