package org.strandbook.throughput;

/** Why a wavelength of a throughput spectrum carries no loss value. */
public enum MaskReason {
    /** The loop scan's axis does not reach this wavelength. */
    OUTSIDE_LOOP_SCAN("outside the loop scan's wavelength range"),
    /** The reference scan's axis does not reach this wavelength. */
    OUTSIDE_REFERENCE_SCAN("outside the reference scan's wavelength range"),
    /** One of the dark scans does not reach this wavelength. */
    OUTSIDE_DARK_SCAN("outside a dark scan's wavelength range"),
    /** The lamp reference is no brighter than its dark level: nothing to divide by. */
    REFERENCE_AT_DARK("reference signal within %sσ of dark"),
    /** The light returned through the loop is no brighter than its dark level. */
    LOOP_AT_DARK("loop signal within %sσ of dark");

    private final String template;

    MaskReason(String template) {
        this.template = template;
    }

    /** The reason in words; {@code noiseWidths} fills in k where the reason names it. */
    public String describe(String noiseWidths) {
        // a plain substitution: a formatter parse per masked range showed in evaluation profiles
        return template.replace("%s", noiseWidths);
    }
}
