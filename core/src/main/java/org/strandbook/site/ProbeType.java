package org.strandbook.site;

import java.util.Set;

/**
 * A catalog probe type.
 *
 * @param code            catalog code, unique within the workbook
 * @param description     free text
 * @param kind            optical arrangement
 * @param windowMaterial  window material, e.g. "SAPPHIRE" or "FUSED_SILICA"
 * @param windowFaces     uncoated window faces light crosses between send and return fiber
 * @param opticalPathMm   optical path through the process medium, mm (0 for none)
 * @param fixedLossDb     lumped loss of the probe's own optics (collimation, mirror), dB
 * @param spreads         the fixed loss's spread, if the site states one
 */
public record ProbeType(String code, String description, ProbeKind kind, String windowMaterial, int windowFaces,
                        double opticalPathMm, double fixedLossDb, StatedSpreads spreads) {

    public ProbeType {
        code = Require.text(code, "probe type code");
        description = description == null ? "" : description.strip();
        kind = kind == null ? ProbeKind.TRANSMISSION : kind;
        windowMaterial = windowMaterial == null || windowMaterial.isBlank() ? "SAPPHIRE" : windowMaterial.strip();
        if (windowFaces < 0) {
            throw new IllegalArgumentException("probe " + code + ": window faces must be 0 or more, was " + windowFaces);
        }
        Require.nonNegative(opticalPathMm, "probe " + code + ": optical path (mm)");
        Require.nonNegative(fixedLossDb, "probe " + code + ": fixed loss (dB)");
        spreads = spreads == null ? StatedSpreads.NONE
                : spreads.requireOnly(Set.of(SpreadInput.PROBE_FIXED_LOSS), "probe type " + code);
    }

    /** A probe type with no stated spread: its fixed loss takes the shipped default. */
    public ProbeType(String code, String description, ProbeKind kind, String windowMaterial, int windowFaces,
                     double opticalPathMm, double fixedLossDb) {
        this(code, description, kind, windowMaterial, windowFaces, opticalPathMm, fixedLossDb, StatedSpreads.NONE);
    }

    public ProbeType withSpreads(StatedSpreads stated) {
        return new ProbeType(code, description, kind, windowMaterial, windowFaces, opticalPathMm, fixedLossDb, stated);
    }
}
