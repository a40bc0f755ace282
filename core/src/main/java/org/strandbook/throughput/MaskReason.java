package org.strandbook.throughput;

/** Why a wavelength of a throughput spectrum carries no loss value. */
public enum MaskReason {
    /** The loop scan's axis does not reach this wavelength. */
    OUTSIDE_LOOP_SCAN("outside the loop scan's wavelength range"),
    /** The reference scan's axis does not reach this wavelength. */
    OUTSIDE_REFERENCE_SCAN("outside the reference scan's wavelength range"),
    /** One of the dark scans does not reach this wavelength. */
    OUTSIDE_DARK_SCAN("outside a dark scan's wavelength range"),
    /** The reference scan's detector was saturated or its converter clipped here. */
    REFERENCE_SATURATED("reference saturated: shorten the integration time and re-take it"),
    /** The loop scan's detector was saturated or clipped here. */
    LOOP_SATURATED("loop scan saturated: shorten the integration time and re-take it"),
    /** A dark scan reads at its limit here: stray light or a detector fault, not darkness. */
    DARK_SATURATED("dark scan saturated: block the lamp fully, check the detector and re-take the dark"),
    /** The lamp reference is no brighter than its dark level: nothing to divide by. */
    REFERENCE_AT_DARK("reference signal within %sσ of dark"),
    /** The light returned through the loop is no brighter than its dark level. */
    LOOP_AT_DARK("loop signal within %sσ of dark");

    private final String template;

    MaskReason(String template) {
        this.template = template;
    }

    /** The reason in words; {@code noiseWidths} fills in k where the reason names it. */
    /** True for the reasons that say a detector was saturated or clipped. */
    public boolean isSaturation() {
        return this == REFERENCE_SATURATED || this == LOOP_SATURATED || this == DARK_SATURATED;
    }

    public String describe(String noiseWidths) {
        // a plain substitution: a formatter parse per masked range showed in evaluation profiles
        return template.replace("%s", noiseWidths);
    }
}
