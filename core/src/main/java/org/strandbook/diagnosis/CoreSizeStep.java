package org.strandbook.diagnosis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Light passing from a larger core into a smaller one: for uniformly filled step-index fibers of
 * equal NA the smaller core accepts the fraction (d₂/d₁)² of the power, a loss of
 * 10·log₁₀((d₁/d₂)²) dB, and nothing is lost the other way (Keiser, Optical Fiber Communications,
 * ch. 5, from memory). A wrong cord or tail of a smaller core in a path therefore shows as a
 * wavelength-flat excess of that size.
 *
 * @param largerUm  core diameter light leaves, µm
 * @param smallerUm core diameter light enters, µm
 */
public record CoreSizeStep(double largerUm, double smallerUm) {

    /** dB: steps smaller than this hide in connector scatter and are not named (a design choice). */
    public static final double MIN_STEP_DB = 1.0;
    /** dB: a flat excess within this of a step, or {@link #MATCH_FRACTION} of it, matches it (a design choice). */
    public static final double MATCH_DB = 0.5;
    /** Fraction of the step's loss accepted as a match on large steps (a design choice). */
    public static final double MATCH_FRACTION = 0.1;

    public CoreSizeStep {
        if (!(smallerUm > 0) || !(largerUm > smallerUm)) {
            throw new IllegalArgumentException("a core-size step needs a larger core before a smaller one, was "
                    + largerUm + " µm into " + smallerUm + " µm");
        }
    }

    /** The step's loss, 10·log₁₀((d₁/d₂)²), dB. */
    public double lossDb() {
        double ratio = largerUm / smallerUm;
        return 10 * Math.log10(ratio * ratio);
    }

    /** The arithmetic in words, e.g. "10·log10((400/200)²) = 6.02 dB". */
    public String arithmetic() {
        return String.format(Locale.ROOT, "10·log10((%.0f/%.0f)²) = %.2f dB", largerUm, smallerUm, lossDb());
    }

    /**
     * The step whose loss lies closest to a flat excess, if one matches it: light leaves a core
     * recorded in the path and enters a smaller core recorded in the path or offered by the catalog.
     */
    public static Optional<CoreSizeStep> matching(double flatExcessDb, List<Double> pathCoresUm,
                                                  List<Double> catalogCoresUm) {
        List<Double> smaller = new ArrayList<>(pathCoresUm);
        smaller.addAll(catalogCoresUm);
        List<CoreSizeStep> steps = new ArrayList<>();
        for (double d1 : pathCoresUm) {
            smaller.stream().filter(d2 -> d2 > 0 && d2 < d1).distinct()
                    .forEach(d2 -> steps.add(new CoreSizeStep(d1, d2)));
        }
        return steps.stream()
                .filter(s -> s.lossDb() >= MIN_STEP_DB)
                .filter(s -> Math.abs(flatExcessDb - s.lossDb()) <= Math.max(MATCH_DB, MATCH_FRACTION * s.lossDb()))
                .min(Comparator.comparingDouble(s -> Math.abs(flatExcessDb - s.lossDb())));
    }
}
