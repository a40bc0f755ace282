package org.strandbook.site;

/**
 * A plant site: one workbook file holds one site.
 *
 * @param name              site name as the plant writes it
 * @param plantArea         plant area or unit (may be empty)
 * @param revision          the workbook's revision label, e.g. "A" or "2"
 * @param defaultToleranceDb acceptance tolerance in dB for points that set none of their own
 */
public record Site(String name, String plantArea, String revision, double defaultToleranceDb) {

    /** Common practice: half a dB either way is about what a re-mated SMA pair repeats to. */
    public static final double COMMON_PRACTICE_TOLERANCE_DB = 1.0;

    public Site {
        name = Require.text(name, "site name");
        plantArea = plantArea == null ? "" : plantArea.strip();
        revision = revision == null || revision.isBlank() ? "A" : revision.strip();
        Require.positive(defaultToleranceDb, "default tolerance (dB)");
    }

    public Site(String name) {
        this(name, "", "A", COMMON_PRACTICE_TOLERANCE_DB);
    }
}
