package org.strandbook.site;

import java.util.List;

/**
 * An input of the loss budget whose spread a site may state, on a catalog row or a single path
 * element, with the units a spread of it may be given in.
 */
public enum SpreadInput {
    /** A connector type's mated-pair loss. */
    CONNECTOR_LOSS("connector pair loss", List.of("dB"), false),
    /** A fiber type's OH content: a ppm range the grade or datasheet states, or ± %. */
    OH_CONTENT("OH content", List.of("ppm", "%"), true),
    /** A fiber type's attenuation model or datasheet curve. */
    ATTENUATION("attenuation", List.of("%"), false),
    /** A probe type's fixed loss. */
    PROBE_FIXED_LOSS("probe fixed loss", List.of("dB", "%"), false),
    /** One joint's loss; for a measured joint, the reading's own uncertainty. */
    JOINT_LOSS("joint loss", List.of("dB"), false),
    /** One cable segment's length against the schedule. */
    LENGTH("length", List.of("m", "%"), false),
    /** One cable segment's recorded bend radius. */
    BEND_RADIUS("bend radius", List.of("mm", "%"), false);

    private final String words;
    private final List<String> units;
    private final boolean rangeAllowed;

    SpreadInput(String words, List<String> units, boolean rangeAllowed) {
        this.words = words;
        this.units = units;
        this.rangeAllowed = rangeAllowed;
    }

    /** The input in words, e.g. "connector pair loss". */
    public String words() {
        return words;
    }

    /** Units a spread of this input may be stated in; the first is the input's own. */
    public List<String> units() {
        return units;
    }

    /** Whether a spread may be a range of the value itself ("5..40 ppm") rather than ± about it. */
    public boolean rangeAllowed() {
        return rangeAllowed;
    }

    /** How to write a spread of this input, e.g. "±0.3 dB or u 0.1 dB". */
    public String example() {
        return switch (this) {
            case CONNECTOR_LOSS, JOINT_LOSS -> "±0.3 dB or u 0.1 dB";
            case OH_CONTENT -> "5..40 ppm or ±50 %";
            case ATTENUATION -> "±15 %";
            case PROBE_FIXED_LOSS -> "±0.2 dB or ±20 %";
            case LENGTH -> "±0.5 m or ±2 %";
            case BEND_RADIUS -> "±5 mm or ±20 %";
        };
    }
}
