package org.strandbook.store;

import java.util.List;
import java.util.Map;

/**
 * The unit a workbook field carries in its name (loss_db, length_m, radius_mm ...), so that a value
 * shown out of its sheet, such as the two sides of a sync conflict, still says what it measures.
 */
public final class FieldUnit {

    /** Name endings and their units, longest first so that _db_per_km is not read as _km. */
    private static final List<Map.Entry<String, String>> ENDINGS = List.of(
            Map.entry("_db_per_km", "dB/km"), Map.entry("_db", "dB"), Map.entry("_nm", "nm"),
            Map.entry("_um", "\u00B5m"), Map.entry("_mm", "mm"), Map.entry("_ms", "ms"), Map.entry("_m", "m"),
            Map.entry("_ppm", "ppm"), Map.entry("_c", "\u00B0C"));

    private FieldUnit() {
    }

    /** The unit of the field named {@code field}, or "" when its name carries none. */
    public static String of(String field) {
        for (Map.Entry<String, String> e : ENDINGS) {
            if (field.endsWith(e.getKey())) {
                return e.getValue();
            }
        }
        return "";
    }

    /** A number with its field's unit ("0.5 dB"); anything else as it is. */
    public static String shown(String field, Object value) {
        String unit = of(field);
        return value instanceof Number && !unit.isEmpty() ? value + " " + unit : String.valueOf(value);
    }
}
