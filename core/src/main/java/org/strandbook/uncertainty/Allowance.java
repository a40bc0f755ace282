package org.strandbook.uncertainty;

import java.util.Locale;
import java.util.Objects;

/**
 * How far an input of the loss budget may lie from the value the prediction uses: an absolute
 * allowance (dB, m) or a fraction of the nominal value, whichever is larger, as a rectangular or
 * normal spread, possibly asymmetric ({@code below} ≠ {@code above}), with its basis.
 *
 * @param what the input, in words
 * @param unit unit of the absolute allowance ("dB", "m", "relative")
 * @param belowFraction how far below nominal, as a fraction of nominal, ≥ 0
 * @param aboveFraction how far above nominal, as a fraction of nominal, ≥ 0
 * @param belowAbsolute how far below nominal at least, in {@code unit}, ≥ 0
 * @param aboveAbsolute how far above nominal at least, in {@code unit}, ≥ 0
 * @param normal true: the allowance is one standard deviation of a normal spread (symmetric only);
 *        false: the bounds of a rectangular spread
 * @param basis where the numbers come from
 * @param basisText the words a report shows
 */
public record Allowance(String what, String unit, double belowFraction, double aboveFraction, double belowAbsolute,
        double aboveAbsolute, boolean normal, BasisKind basis, String basisText) {

    public Allowance {
        Objects.requireNonNull(what, "what");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(basis, "basis");
        Objects.requireNonNull(basisText, "basisText");
        for (double v : new double[] {belowFraction, aboveFraction, belowAbsolute, aboveAbsolute}) {
            if (!(v >= 0) || !Double.isFinite(v)) {
                throw new IllegalArgumentException(what + ": allowances must be finite numbers ≥ 0, was " + v);
            }
        }
        if (normal && (belowFraction != aboveFraction || belowAbsolute != aboveAbsolute)) {
            throw new IllegalArgumentException(what + ": a normal spread is symmetric; give a rectangular one for "
                    + "an asymmetric range");
        }
    }

    /** A symmetric rectangular ± max(fraction × nominal, absolute). */
    public static Allowance rectangular(String what, String unit, double fraction, double absolute, BasisKind basis,
            String basisText) {
        return new Allowance(what, unit, fraction, fraction, absolute, absolute, false, basis, basisText);
    }

    /**
     * The deviation from {@code nominal}, as a distribution in {@code unit}; never reaching below
     * −{@code floorBelow} (a loss cannot go below zero).
     */
    public InputDistribution deviation(double nominal, double floorBelow) {
        double size = Math.abs(nominal);
        double below = Math.min(Math.max(belowFraction * size, belowAbsolute), floorBelow);
        double above = Math.max(aboveFraction * size, aboveAbsolute);
        if (normal) {
            return new InputDistribution.Normal(0, above);
        }
        return new InputDistribution.Rectangular(-below, above);
    }

    /** The input for one element, e.g. "J3 connector pair loss". */
    public UncertainInput input(String elementLabel, double nominal, double floorBelow) {
        return new UncertainInput(elementLabel + " " + what, unit, deviation(nominal, floorBelow), basis,
                basisText);
    }

    /** The allowance as a person writes it: "±0.5 dB", "±2 % or ±0.1 m", "−50 %/+100 %", "u 0.1 dB". */
    public String inWords() {
        boolean relative = unit.equals("relative");
        String prefix = normal ? "u " : "±";
        java.util.List<String> parts = new java.util.ArrayList<>();
        if (belowFraction > 0 || aboveFraction > 0 || relative && (belowAbsolute > 0 || aboveAbsolute > 0)) {
            double below = 100 * (relative ? Math.max(belowFraction, belowAbsolute) : belowFraction);
            double above = 100 * (relative ? Math.max(aboveFraction, aboveAbsolute) : aboveFraction);
            parts.add(below == above ? prefix + plain(above) + " %" : "−" + plain(below) + " %/+" + plain(above) + " %");
        }
        if (!relative && (belowAbsolute > 0 || aboveAbsolute > 0)) {
            parts.add(belowAbsolute == aboveAbsolute ? prefix + plain(aboveAbsolute) + " " + unit
                    : "−" + plain(belowAbsolute) + "/+" + plain(aboveAbsolute) + " " + unit);
        }
        return parts.isEmpty() ? "exact" : String.join(" or ", parts);
    }

    private static String plain(double v) {
        return java.math.BigDecimal.valueOf(v).round(new java.math.MathContext(6)).stripTrailingZeros()
                .toPlainString();
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s: -%s/+%s %s or -%.0f/+%.0f %%", what, belowAbsolute, aboveAbsolute, unit,
                100 * belowFraction, 100 * aboveFraction);
    }
}
