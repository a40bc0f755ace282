package org.strandbook.site;

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
 */
public record ProbeType(String code, String description, ProbeKind kind, String windowMaterial, int windowFaces,
                        double opticalPathMm, double fixedLossDb) {

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
    }
}
