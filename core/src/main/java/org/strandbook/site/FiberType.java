package org.strandbook.site;

import java.util.Comparator;
import java.util.List;
import java.util.Set;

/**
 * A catalog fiber type (multimode step index).
 *
 * @param code          catalog code, unique within the workbook
 * @param description   free text
 * @param coreUm        core diameter, µm
 * @param claddingUm    cladding diameter, µm
 * @param bufferUm      buffer (coating) diameter, µm
 * @param na            numerical aperture
 * @param coreMaterial  core glass, e.g. "FUSED_SILICA"
 * @param ohGrade       low-OH or high-OH grade
 * @param ohPpm         OH content, ppm by weight
 * @param datasheet     datasheet attenuation points, ascending wavelength; empty uses the model alone
 * @param spreads       OH content and attenuation spreads, if the site states them
 */
public record FiberType(String code, String description, double coreUm, double claddingUm, double bufferUm,
                        double na, String coreMaterial, OhGrade ohGrade, double ohPpm,
                        List<AttenuationPoint> datasheet, StatedSpreads spreads) {

    public FiberType {
        code = Require.text(code, "fiber type code");
        description = description == null ? "" : description.strip();
        Require.positive(coreUm, "fiber " + code + ": core diameter (µm)");
        Require.positive(claddingUm, "fiber " + code + ": cladding diameter (µm)");
        if (claddingUm < coreUm) {
            throw new IllegalArgumentException("fiber " + code + ": cladding " + claddingUm
                    + " µm is smaller than core " + coreUm + " µm");
        }
        Require.nonNegative(bufferUm, "fiber " + code + ": buffer diameter (µm)");
        if (!(na > 0 && na < 1)) {
            throw new IllegalArgumentException("fiber " + code + ": NA must lie between 0 and 1, was " + na);
        }
        coreMaterial = coreMaterial == null || coreMaterial.isBlank() ? "FUSED_SILICA" : coreMaterial.strip();
        ohGrade = ohGrade == null ? OhGrade.LOW_OH : ohGrade;
        Require.nonNegative(ohPpm, "fiber " + code + ": OH content (ppm)");
        datasheet = datasheet.stream().sorted(Comparator.comparingDouble(AttenuationPoint::wavelengthNm)).toList();
        spreads = spreads == null ? StatedSpreads.NONE : spreads.requireOnly(
                Set.of(SpreadInput.OH_CONTENT, SpreadInput.ATTENUATION), "fiber type " + code);
        StatedSpread oh = spreads.of(SpreadInput.OH_CONTENT).orElse(null);
        if (oh != null && oh.form() == StatedSpread.Form.RANGE && !(oh.low() <= ohPpm && ohPpm <= oh.high())) {
            throw new IllegalArgumentException("fiber " + code + ": OH content " + ohPpm + " ppm lies outside its"
                    + " stated range " + oh);
        }
    }

    /** A fiber type with no stated spread: its OH content and attenuation take the shipped defaults. */
    public FiberType(String code, String description, double coreUm, double claddingUm, double bufferUm, double na,
                     String coreMaterial, OhGrade ohGrade, double ohPpm, List<AttenuationPoint> datasheet) {
        this(code, description, coreUm, claddingUm, bufferUm, na, coreMaterial, ohGrade, ohPpm, datasheet,
                StatedSpreads.NONE);
    }

    public FiberType withSpreads(StatedSpreads stated) {
        return new FiberType(code, description, coreUm, claddingUm, bufferUm, na, coreMaterial, ohGrade, ohPpm,
                datasheet, stated);
    }

    public FiberType withDatasheet(List<AttenuationPoint> points) {
        return new FiberType(code, description, coreUm, claddingUm, bufferUm, na, coreMaterial, ohGrade, ohPpm,
                points, spreads);
    }
}
