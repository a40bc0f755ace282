package org.strandbook.optics.path;

import java.util.Objects;

import org.strandbook.optics.ConstantIndexMaterial;
import org.strandbook.optics.OpticalMaterial;

/**
 * A probe window crossed by the light: {@code faceCount} faces of {@code material} against
 * {@code surrounding}, counted in pairs with incoherent multiple reflections (see {@code Fresnel}).
 * A transmission cell's window crossed once has 2 faces; a window crossed out and back has 4.
 * Absorption in the window glass itself is not modelled (negligible for mm-thick silica or
 * sapphire in the near infrared).
 *
 * @param material window material, e.g. sapphire
 * @param faceCount faces crossed, ≥ 0
 * @param surrounding medium at the faces (air; a process liquid reflects less)
 */
public record ProbeWindow(OpticalMaterial material, int faceCount, OpticalMaterial surrounding) {

    public ProbeWindow {
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(surrounding, "surrounding");
        if (faceCount < 0) {
            throw new IllegalArgumentException("window face count must not be negative, was " + faceCount);
        }
    }

    /** A window in air. */
    public static ProbeWindow inAir(OpticalMaterial material, int faceCount) {
        return new ProbeWindow(material, faceCount, ConstantIndexMaterial.AIR);
    }
}
