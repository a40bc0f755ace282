package org.strandbook.optics.bend;

import java.util.Locale;

/**
 * Outcome of {@link MinimumBendRadius#check}.
 *
 * @param bendRadiusMm the checked radius (mm)
 * @param shortTermMinMm short-term minimum (mm)
 * @param longTermMinMm long-term minimum (mm)
 * @param verdict where the radius falls
 */
public record BendRadiusCheck(double bendRadiusMm, double shortTermMinMm, double longTermMinMm, Verdict verdict) {

    /** Where a bend radius falls against the two minima. */
    public enum Verdict { OK, BELOW_LONG_TERM, BELOW_SHORT_TERM }

    public boolean ok() {
        return verdict == Verdict.OK;
    }

    /** One line for a technician, empty when the radius is fine. */
    public String message() {
        return switch (verdict) {
            case OK -> "";
            case BELOW_LONG_TERM -> String.format(Locale.ROOT,
                    "bend radius %.1f mm is below the long-term minimum %.1f mm (200× cladding radius, common practice): "
                            + "risk of fiber breakage over time", bendRadiusMm, longTermMinMm);
            case BELOW_SHORT_TERM -> String.format(Locale.ROOT,
                    "bend radius %.1f mm is below the short-term minimum %.1f mm (100× cladding radius, common practice): "
                            + "the fiber may break", bendRadiusMm, shortTermMinMm);
        };
    }
}
