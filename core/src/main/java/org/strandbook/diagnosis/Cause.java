package org.strandbook.diagnosis;

/** What a technician goes out to fix. */
public enum Cause {
    DIRTY_CONNECTOR("dirty or misaligned connector"),
    TIGHT_BEND("tight bend or crush"),
    HIGH_OH_FIBER("high-OH fiber or OH growth"),
    HYDROGEN_DARKENING("hydrogen darkening"),
    RADIATION_DARKENING("radiation or solarization darkening"),
    AIR_GAP("air gap or crack acting as an etalon"),
    REFERENCE_DRIFT("lamp drift since the reference scan"),
    BROKEN_FIBER("broken fiber or open connector"),
    CORE_SIZE_STEP("a smaller core somewhere in the path"),
    OH_OR_HYDROGEN("OH or hydrogen: the measured range cannot tell them apart"),
    REFERENCE_OR_RECORDS("the loop loses less than predicted: the reference or the records are wrong"),
    RECORDS_LIST_MORE_LOSS("the loop loses less than predicted where the fiber's loss is high: the records list more"
            + " fiber than the light went through");

    private final String words;

    Cause(String words) {
        this.words = words;
    }

    /** The cause in plain words. */
    public String words() {
        return words;
    }
}
