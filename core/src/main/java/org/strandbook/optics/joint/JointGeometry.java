package org.strandbook.optics.joint;

import java.util.Objects;

import org.strandbook.optics.ConstantIndexMaterial;
import org.strandbook.optics.OpticalMaterial;

/**
 * Measured or specified geometry of a joint: lateral offset, end gap, tilt and what fills the gap.
 * The loss is computed by {@link JointEfficiency} plus the Fresnel loss of the two faces against
 * the gap medium (incoherent multiple reflections, see {@code Fresnel}). The gap medium is taken to
 * be present even at zero gap (a non-contact connector whose gap is small next to the core); use
 * {@link #physicalContact(double, double)} for fused or physically touching ends, which have no
 * Fresnel loss.
 *
 * @param lateralOffsetUm core-centre offset (µm), ≥ 0
 * @param gapUm end gap (µm), ≥ 0
 * @param tiltDeg angle between the fiber axes (°), ≥ 0
 * @param gapMedium what fills the gap (air, a gel)
 * @param physicalContact true when the ends touch: no gap medium, no Fresnel loss
 */
public record JointGeometry(double lateralOffsetUm, double gapUm, double tiltDeg, OpticalMaterial gapMedium,
        boolean physicalContact) implements JointMechanics {

    public JointGeometry {
        requireNonNegative(lateralOffsetUm, "lateral offset (µm)");
        requireNonNegative(gapUm, "end gap (µm)");
        requireNonNegative(tiltDeg, "tilt (°)");
        Objects.requireNonNull(gapMedium, "gapMedium");
        if (physicalContact && gapUm != 0) {
            throw new IllegalArgumentException("a physical-contact joint has no gap, was " + gapUm + " µm");
        }
    }

    /** A non-contact joint with an air gap and the given misalignments. */
    public static JointGeometry airGap(double lateralOffsetUm, double gapUm, double tiltDeg) {
        return new JointGeometry(lateralOffsetUm, gapUm, tiltDeg, ConstantIndexMaterial.AIR, false);
    }

    /** A joint whose gap is filled with an index-matching gel of the given index. */
    public static JointGeometry indexMatched(double lateralOffsetUm, double gapUm, double tiltDeg, double gelIndex) {
        return new JointGeometry(lateralOffsetUm, gapUm, tiltDeg, ConstantIndexMaterial.indexMatchingGel(gelIndex), false);
    }

    /** Ends in physical contact (or fused): no gap, no Fresnel loss. */
    public static JointGeometry physicalContact(double lateralOffsetUm, double tiltDeg) {
        return new JointGeometry(lateralOffsetUm, 0, tiltDeg, ConstantIndexMaterial.AIR, true);
    }

    private static void requireNonNegative(double v, String what) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be a finite number ≥ 0, was " + v);
        }
    }
}
