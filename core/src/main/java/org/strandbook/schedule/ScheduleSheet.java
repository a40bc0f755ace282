package org.strandbook.schedule;

import java.util.Arrays;
import java.util.List;

/**
 * The data sheets of the cable schedule, in the order the template shows them. Each sheet holds a
 * header row (row 1) and one item per row from row 2; its columns are the {@link ScheduleColumn}s
 * that name it.
 */
public enum ScheduleSheet {
    ANALYZERS("Analyzers", "One row per analyzer (process spectrometer)."),
    POINTS("Points", "One row per measurement point (one probe on the process)."),
    BANDS("Bands", "One row per band of interest; every point needs at least one."),
    SEGMENTS("Segments", "One row per cable segment (one fiber) of a leg."),
    BENDS("Bends", "One row per bend radius along a cable, only for bends tighter than the cable's own rating."),
    JOINTS("Joints", "One row per joint (mated connector pair or splice) of a leg."),
    FIBER_TYPES("Fiber types", "New fiber types of your own; the shipped ones need no row."),
    FIBER_ATTENUATION("Fiber attenuation", "Datasheet attenuation points of the new fiber types (optional)."),
    CONNECTOR_TYPES("Connector types", "New connector types of your own; the shipped ones need no row."),
    PROBE_TYPES("Probe types", "New probe types of your own; the shipped ones need no row.");

    /** Title of the instructions sheet, which the reader ignores. */
    public static final String README_TITLE = "Read me";

    private final String title;
    private final String purpose;

    ScheduleSheet(String title, String purpose) {
        this.title = title;
        this.purpose = purpose;
    }

    /** The sheet's tab name as the contractor sees it. */
    public String title() {
        return title;
    }

    /** One sentence saying what a row of this sheet is. */
    public String purpose() {
        return purpose;
    }

    /** The sheet's columns, left to right from column A. */
    public List<ScheduleColumn> columns() {
        return Arrays.stream(ScheduleColumn.values()).filter(c -> c.sheet() == this).toList();
    }
}
