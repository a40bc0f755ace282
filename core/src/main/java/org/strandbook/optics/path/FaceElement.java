package org.strandbook.optics.path;

import java.util.Objects;

import org.strandbook.optics.ConstantIndexMaterial;
import org.strandbook.optics.OpticalMaterial;

/**
 * One glass face against another medium, e.g. where the analyzer launches into the fiber or where
 * the fiber ends at the detector: Fresnel loss −10·log₁₀(1 − R).
 *
 * @param label name in the breakdown
 * @param glass the fiber core or window material
 * @param outside the medium on the other side (usually air)
 */
public record FaceElement(String label, OpticalMaterial glass, OpticalMaterial outside) implements PathElement {

    public FaceElement {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(glass, "glass");
        Objects.requireNonNull(outside, "outside");
    }

    /** A bare fiber face of {@code fiber}'s core glass in air. */
    public static FaceElement inAir(String label, FiberSpec fiber) {
        return new FaceElement(label, fiber.coreMaterial(), ConstantIndexMaterial.AIR);
    }

    @Override
    public ElementKind kind() {
        return ElementKind.FACE;
    }
}
