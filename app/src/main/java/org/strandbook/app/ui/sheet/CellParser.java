package org.strandbook.app.ui.sheet;

/** Turns the text a technician typed or pasted into a column's value, or says why it cannot. */
@FunctionalInterface
public interface CellParser<V> {

    ParseResult<V> parse(String text);
}
