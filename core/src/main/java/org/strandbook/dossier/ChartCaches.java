package org.strandbook.dossier;

import java.util.HashMap;
import java.util.Map;
import java.util.function.Supplier;

/**
 * The values behind each chart series, by the cell range the series plots. Charts are built with
 * their ranges only; the values are written into each chart's cache as the file is written (see
 * {@link ChartCacheStream}), computed again from the dossier's content at that moment, so that a
 * site of any size never holds a copy of every plotted value as XML objects until the end.
 * The values must be exactly what the cells of the range hold (NaN for an empty cell).
 */
final class ChartCaches {

    private final Map<String, Supplier<double[]>> byRange = new HashMap<>();

    /** Registers the values of a range; the range is as the series' formula writes it. */
    void register(String range, Supplier<double[]> values) {
        byRange.put(escape(range), values);
    }

    /** The values of a range as it appears in chart XML (escaped), or null when unknown. */
    double[] values(String escapedRange) {
        Supplier<double[]> s = byRange.get(escapedRange);
        return s == null ? null : s.get();
    }

    int size() {
        return byRange.size();
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
