package org.strandbook.optics.bend;

/**
 * Mechanical minimum bend radius of a bare glass fiber, as multiples of the cladding radius
 * (common practice; sources disagree, reliability guides ask for 300–600×): short-term (during
 * installation) ≥ 100×, long-term (as routed) ≥ 200×. Cable jackets have their own rules
 * (10–20× cable diameter) that this check does not cover.
 */
public final class MinimumBendRadius {

    /** Short-term minimum as a multiple of the cladding radius (common practice). */
    public static final double SHORT_TERM_FACTOR = 100;
    /** Long-term minimum as a multiple of the cladding radius (common practice). */
    public static final double LONG_TERM_FACTOR = 200;

    private MinimumBendRadius() {
    }

    /** Short-term minimum bend radius in mm for a cladding diameter in µm. */
    public static double shortTermMm(double claddingUm) {
        return SHORT_TERM_FACTOR * claddingUm * 0.5e-3;
    }

    /** Long-term minimum bend radius in mm for a cladding diameter in µm. */
    public static double longTermMm(double claddingUm) {
        return LONG_TERM_FACTOR * claddingUm * 0.5e-3;
    }

    /** Checks a routed bend radius (mm) against both minima. */
    public static BendRadiusCheck check(double claddingUm, double bendRadiusMm) {
        if (!(claddingUm > 0) || !(bendRadiusMm > 0)) {
            throw new IllegalArgumentException("cladding diameter and bend radius must be positive");
        }
        double shortMm = shortTermMm(claddingUm);
        double longMm = longTermMm(claddingUm);
        BendRadiusCheck.Verdict v = bendRadiusMm < shortMm ? BendRadiusCheck.Verdict.BELOW_SHORT_TERM
                : bendRadiusMm < longMm ? BendRadiusCheck.Verdict.BELOW_LONG_TERM
                : BendRadiusCheck.Verdict.OK;
        return new BendRadiusCheck(bendRadiusMm, shortMm, longMm, v);
    }
}
