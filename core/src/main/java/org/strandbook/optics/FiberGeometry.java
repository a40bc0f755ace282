package org.strandbook.optics;

/**
 * Ray-optics geometry of a step-index fiber: numerical aperture, acceptance cone, critical angle,
 * V number. Standard relations, as in G. Keiser, "Optical Fiber Communications", and J. Senior,
 * "Optical Fiber Communications" (chapters on ray theory; cited from memory).
 */
public final class FiberGeometry {

    private FiberGeometry() {
    }

    /** NA = √(n₁² − n₂²), core index n₁ above cladding index n₂. */
    public static double numericalAperture(double coreIndex, double claddingIndex) {
        if (!(coreIndex > claddingIndex) || !(claddingIndex >= 1.0)) {
            throw new IllegalArgumentException("core index " + coreIndex
                    + " must exceed cladding index " + claddingIndex + " (≥ 1)");
        }
        return Math.sqrt(coreIndex * coreIndex - claddingIndex * claddingIndex);
    }

    /** Cladding index implied by a core index and an NA: n₂ = √(n₁² − NA²). */
    public static double claddingIndex(double coreIndex, double na) {
        requireNa(na);
        double n2sq = coreIndex * coreIndex - na * na;
        if (!(n2sq >= 1.0)) {
            throw new IllegalArgumentException("NA " + na + " is too large for core index " + coreIndex);
        }
        return Math.sqrt(n2sq);
    }

    /** Acceptance half-angle in degrees: θₐ = arcsin(NA/n₀), n₀ the index outside the end face. */
    public static double acceptanceHalfAngleDeg(double na, double outsideIndex) {
        requireNa(na);
        if (!(na < outsideIndex)) {
            throw new IllegalArgumentException("NA " + na + " is not below the outside index " + outsideIndex);
        }
        return Math.toDegrees(Math.asin(na / outsideIndex));
    }

    /** Full acceptance cone angle in degrees, 2θₐ. */
    public static double acceptanceFullConeDeg(double na, double outsideIndex) {
        return 2.0 * acceptanceHalfAngleDeg(na, outsideIndex);
    }

    /**
     * Critical angle at the core/cladding interface in degrees from the interface normal:
     * θc = arcsin(n₂/n₁). Rays meeting the interface at larger angles are totally reflected.
     */
    public static double criticalAngleDeg(double coreIndex, double claddingIndex) {
        if (!(coreIndex > claddingIndex)) {
            throw new IllegalArgumentException("core index must exceed cladding index");
        }
        return Math.toDegrees(Math.asin(claddingIndex / coreIndex));
    }

    /** Relative index difference Δ = (n₁² − n₂²)/(2n₁²) = NA²/(2n₁²). */
    public static double relativeIndexDifference(double coreIndex, double na) {
        requireNa(na);
        return na * na / (2.0 * coreIndex * coreIndex);
    }

    /** Normalised frequency V = 2π·a·NA/λ with a the core radius. */
    public static double vNumber(double coreDiameterUm, double na, double wavelengthNm) {
        requireNa(na);
        return Math.PI * coreDiameterUm * 1e3 * na / wavelengthNm;
    }

    /** Approximate number of guided modes of a step-index fiber, V²/2 (large V). */
    public static double stepIndexModeCount(double vNumber) {
        return vNumber * vNumber / 2.0;
    }

    private static void requireNa(double na) {
        if (!(na > 0 && na < 1)) {
            throw new IllegalArgumentException("NA must lie between 0 and 1 exclusive, was " + na);
        }
    }
}
