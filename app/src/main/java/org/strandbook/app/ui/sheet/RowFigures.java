package org.strandbook.app.ui.sheet;

import java.util.Map;

/** The computed figures of one row, by column key. */
public record RowFigures(Map<String, Figure> byKey) {

    public static final RowFigures NONE = new RowFigures(Map.of());

    public RowFigures {
        byKey = Map.copyOf(byKey);
    }

    public Figure figure(String key) {
        return byKey.getOrDefault(key, Figure.BLANK);
    }
}
