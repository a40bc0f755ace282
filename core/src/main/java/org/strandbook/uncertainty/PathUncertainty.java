package org.strandbook.uncertainty;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.DoubleUnaryOperator;

import org.strandbook.optics.attenuation.AttenuationModel;
import org.strandbook.optics.attenuation.SilicaAttenuation;
import org.strandbook.optics.bend.GlogeBend;
import org.strandbook.optics.joint.ConnectorAllowance;
import org.strandbook.optics.path.FiberSegment;
import org.strandbook.optics.path.FiberSpec;
import org.strandbook.optics.path.JointElement;
import org.strandbook.optics.path.LossBudget;
import org.strandbook.optics.path.PathElement;
import org.strandbook.optics.path.ProbeElement;

/**
 * The uncertainty of a {@link LossBudget}'s total at one wavelength, from the same path the
 * prediction used. Every input is a deviation from the value the prediction took, so the
 * prediction itself is the model's offset and an input's sensitivity is the budget's own slope:
 * <ul>
 * <li>fiber length (m): the attenuation there, dB/m; attenuation and OH content (relative): the
 *     segment's attenuation loss without and with only its OH bands, dB — all linear;</li>
 * <li>connector pair, measured joint, probe fixed loss (dB): 1, linear;</li>
 * <li>bend radius (relative): not linear (Gloge's loss rises steeply as the radius shrinks), so its
 *     row carries the slope at the recorded radius and the Monte Carlo trial recomputes the loss.</li>
 * </ul>
 * Inputs are taken as independent. The standard uncertainty and the rows come from the law of
 * propagation (JCGM 100:2008, 5.1.2); the coverage interval from Monte Carlo over the full model
 * (JCGM 101:2008, 7), probabilistically symmetric (7.7.1) because a verdict looks at both tails.
 */
public final class PathUncertainty {

    /**
     * Digits of u(y) the adaptive Monte Carlo run stabilises (JCGM 101:2008, 7.9.2 allows 1 or 2).
     * Design choice: 1, so the interval's ends are fixed to δ = ½·10^ℓ (0.05 dB for u between 0.1 and
     * 0.95 dB), a quarter of the default guard band and below the measurement's own expanded
     * uncertainty; two digits would cost about five times the trials for limits no verdict needs.
     */
    static final int SIGNIFICANT_DIGITS = 1;

    /** Relative step of the central difference for the bend slope: design choice. */
    private static final double BEND_STEP = 0.01;

    private final MonteCarloPropagation monteCarlo;
    private final double coverageProbability;

    public PathUncertainty(MonteCarloPropagation monteCarlo, double coverageProbability) {
        this.monteCarlo = Objects.requireNonNull(monteCarlo, "monteCarlo");
        if (!(coverageProbability > 0 && coverageProbability < 1)) {
            throw new IllegalArgumentException("coverage probability must lie in (0, 1), was " + coverageProbability);
        }
        this.coverageProbability = coverageProbability;
    }

    /** 95 % coverage, the standard Monte Carlo settings. */
    public static PathUncertainty standard() {
        return new PathUncertainty(MonteCarloPropagation.standard()
                .withGenerator(MonteCarloPropagation.Generator.SPLITMIX64), 0.95);
    }

    /** The same inputs and coverage with {@code trials} Monte Carlo trials per run. */
    public PathUncertainty withTrials(int trials) {
        return new PathUncertainty(monteCarlo.withTrials(trials), coverageProbability);
    }

    /** The same inputs and trials at another coverage probability (a site's decision rule). */
    public PathUncertainty withCoverage(double probability) {
        return probability == coverageProbability ? this : new PathUncertainty(monteCarlo, probability);
    }

    public int trials() {
        return monteCarlo.trials();
    }

    public double coverageProbability() {
        return coverageProbability;
    }

    /**
     * @param budget the prediction's budget
     * @param gridIndex where on its grid
     * @param allowances every element's input allowances, in path order
     */
    public LossUncertainty at(LossBudget budget, int gridIndex, PathAllowances allowances) {
        Terms terms = terms(budget, gridIndex, allowances);
        List<SensitivityTerm> rows = terms.list().stream().map(Term::row).toList();
        UncertaintyBudget framework = LinearPropagation.propagate(terms.predictedDb(), rows, coverageProbability);
        MonteCarloResult mc = monteCarlo.propagateAdaptive(terms.distributions(), terms.model(), coverageProbability,
                CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC, SIGNIFICANT_DIGITS);
        return new LossUncertainty(terms.wavelengthNm(), terms.predictedDb(), framework.withInterval(mc.interval()),
                framework.interval());
    }

    /**
     * Each input's contribution uᵢ(y) = |cᵢ|·u(xᵢ) (dB), in the order of {@link #at}'s rows, by the
     * law of propagation alone (JCGM 100:2008, 5.1.3) with no Monte Carlo run: cheap enough for
     * every point of an evaluation grid. Their root sum of squares is u_c(y).
     */
    public double[] contributionsDb(LossBudget budget, int gridIndex, PathAllowances allowances) {
        return terms(budget, gridIndex, allowances).list().stream().mapToDouble(t -> t.row().contribution())
                .toArray();
    }

    /**
     * The chance that the path's loss at one wavelength stays within {@code allowedLossDb}, from
     * the same inputs and Monte Carlo trials that give {@link #at}'s interval: the design question
     * "with these parts, will the loop stay within the analyzer's allowed loss?".
     *
     * @param allowedLossDb the loss the loop may have there (dB)
     */
    public Chance chanceWithin(LossBudget budget, int gridIndex, PathAllowances allowances, double allowedLossDb) {
        if (!Double.isFinite(allowedLossDb)) {
            throw new IllegalArgumentException("the allowed loss must be a finite number of dB, was " + allowedLossDb);
        }
        Terms terms = terms(budget, gridIndex, allowances);
        return monteCarlo.chanceAtMost(terms.distributions(), terms.model(), allowedLossDb);
    }

    private static Terms terms(LossBudget budget, int gridIndex, PathAllowances allowances) {
        double wavelengthNm = budget.grid().wavelengthNm(gridIndex);
        List<Term> terms = new ArrayList<>();
        List<PathElement> elements = budget.path().elements();
        if (allowances.elements().size() != elements.size()) {
            throw new IllegalArgumentException("path '" + budget.path().name() + "' has " + elements.size()
                    + " elements but " + allowances.elements().size() + " sets of allowances");
        }
        for (int e = 0; e < elements.size(); e++) {
            PathElement element = elements.get(e);
            ElementAllowances allowed = allowances.elements().get(e);
            if (element instanceof FiberSegment f) {
                fiberTerms(f, wavelengthNm, kind(allowed, ElementAllowances.Fiber.class, f), terms);
            } else if (element instanceof JointElement j) {
                double nominal = j.mechanics() instanceof ConnectorAllowance a ? a.lossDb()
                        : budget.contributions().get(e).lossDbAt(gridIndex);
                Allowance loss = kind(allowed, ElementAllowances.Lumped.class, j).loss();
                terms.add(Term.linear(loss.input(j.label(), nominal, nominal), 1));
            } else if (element instanceof ProbeElement p) {
                Allowance loss = kind(allowed, ElementAllowances.Lumped.class, p).loss();
                terms.add(Term.linear(loss.input(p.label(), p.fixedLossDb(), p.fixedLossDb()), 1));
            }
        }
        return new Terms(wavelengthNm, budget.totalLossDbAt(gridIndex), terms);
    }

    private static <T extends ElementAllowances> T kind(ElementAllowances given, Class<T> expected,
            PathElement element) {
        if (!expected.isInstance(given)) {
            throw new IllegalArgumentException("element '" + element.label() + "' needs " + expected.getSimpleName()
                    .toLowerCase(java.util.Locale.ROOT) + " allowances, was given " + given);
        }
        return expected.cast(given);
    }

    private static void fiberTerms(FiberSegment f, double wavelengthNm, ElementAllowances.Fiber inputs,
            List<Term> out) {
        AttenuationModel model = f.fiber().attenuation();
        double attDbPerKm = model.attenuationDbPerKm(wavelengthNm);
        double ohDbPerKm = model instanceof SilicaAttenuation s && s.ohPpm() > 0
                ? attDbPerKm - s.withOhPpm(0).attenuationDbPerKm(wavelengthNm) : 0;
        double lengthKm = f.lengthM() * 1e-3;
        out.add(Term.linear(inputs.length().input(f.label(), f.lengthM(), f.lengthM()), attDbPerKm * 1e-3));
        out.add(Term.linear(inputs.attenuation().input(f.label(), 1, 1), (attDbPerKm - ohDbPerKm) * lengthKm));
        if (ohDbPerKm > 0) {
            out.add(Term.linear(inputs.ohContent().input(f.label(), 1, 1), ohDbPerKm * lengthKm));
        }
        if (f.chargedBends() > 0) {
            out.add(bendTerm(f, wavelengthNm, inputs.bendRadius()));
        }
    }

    private static Term bendTerm(FiberSegment f, double wavelengthNm, Allowance bendRadius) {
        FiberSpec fiber = f.fiber();
        double radiusMm = f.bendRadiusMm().getAsDouble();
        double n1 = fiber.coreMaterial().refractiveIndex(wavelengthNm);
        int charged = f.chargedBends();
        DoubleUnaryOperator lossAt = d -> charged
                * GlogeBend.lossPerBend(fiber.coreUm(), fiber.na(), n1, radiusMm * (1 + d), wavelengthNm).lossDb();
        double nominal = lossAt.applyAsDouble(0);
        double slope = (lossAt.applyAsDouble(BEND_STEP) - lossAt.applyAsDouble(-BEND_STEP)) / (2 * BEND_STEP);
        UncertainInput input = bendRadius.input(f.label(), 1, 0.9);
        return new Term(new SensitivityTerm(input, slope), d -> lossAt.applyAsDouble(d) - nominal);
    }

    /** The inputs of the budget at one wavelength, around the prediction there. */
    private record Terms(double wavelengthNm, double predictedDb, List<Term> list) {

        List<InputDistribution> distributions() {
            return list.stream().map(t -> t.row().input().distribution()).toList();
        }

        /** The prediction plus every input's effect: the full model a Monte Carlo trial evaluates. */
        MeasurementModel model() {
            DoubleUnaryOperator[] effects = list.stream().map(Term::effectDb).toArray(DoubleUnaryOperator[]::new);
            return x -> {
                double y = predictedDb;
                for (int i = 0; i < x.length; i++) {
                    y += effects[i].applyAsDouble(x[i]);
                }
                return y;
            };
        }
    }

    /** A budget row and how the output moves with the input's deviation in a Monte Carlo trial. */
    private record Term(SensitivityTerm row, DoubleUnaryOperator effectDb) {

        static Term linear(UncertainInput input, double sensitivity) {
            return new Term(new SensitivityTerm(input, sensitivity), d -> sensitivity * d);
        }
    }
}
