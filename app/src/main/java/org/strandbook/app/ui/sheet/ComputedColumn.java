package org.strandbook.app.ui.sheet;

import java.util.function.Function;

/**
 * A read-only column. With {@code fromRow} its figure comes from the row alone; without, from the
 * sheet's evaluator (which sees every row and can use whatever else the caller captured).
 */
public record ComputedColumn<R>(String key, String header, boolean numeric, Function<R, Figure> fromRow)
        implements SheetColumn<R> {
}
