package org.strandbook.uncertainty;

import java.util.Arrays;
import java.util.List;
import java.util.Objects;

import org.apache.commons.math3.random.MersenneTwister;
import org.apache.commons.math3.random.RandomGenerator;

/**
 * Propagation of distributions by the Monte Carlo method of JCGM 101:2008 (clause 7): M draws of
 * every input, the model evaluated for each, the ordered values giving the estimate, the standard
 * uncertainty and a coverage interval. Used where the model is not linear in its inputs or where
 * a rectangular or asymmetric input makes y ± k·u_c a poor interval.
 *
 * <p>Deterministic: a fixed seed drives a Mersenne Twister (Matsumoto &amp; Nishimura, ACM TOMACS
 * 8 (1998) 3–30), so the same workbook gives the same interval on every machine. Immutable.
 */
public final class MonteCarloPropagation {

    /**
     * M = 2·10⁵: JCGM 101:2008, 7.2.2 asks for M large against 1/(1 − p), at least 10⁴ times
     * (from memory), i.e. 2·10⁵ for 95 %.
     */
    public static final int DEFAULT_TRIALS = 200_000;
    /** Design choice: any fixed value; it only has to be the same every run. */
    public static final long DEFAULT_SEED = 20_081_001L;

    /** The uniform generator behind every draw. */
    public enum Generator {
        /** Matsumoto &amp; Nishimura, ACM TOMACS 8 (1998) 3–30. */
        MERSENNE_TWISTER,
        /** SplitMix64 ({@link SplitMixGenerator}): the same quality in tests, several times faster. */
        SPLITMIX64
    }

    private final int trials;
    private final long seed;
    private final Generator generator;

    public MonteCarloPropagation(int trials, long seed) {
        this(trials, seed, Generator.MERSENNE_TWISTER);
    }

    public MonteCarloPropagation(int trials, long seed, Generator generator) {
        if (trials < 100) {
            throw new IllegalArgumentException("Monte Carlo needs at least 100 trials, was " + trials);
        }
        this.trials = trials;
        this.seed = seed;
        this.generator = java.util.Objects.requireNonNull(generator, "generator");
    }

    /** The same settings drawing from {@code newGenerator}. */
    public MonteCarloPropagation withGenerator(Generator newGenerator) {
        return new MonteCarloPropagation(trials, seed, newGenerator);
    }

    private RandomGenerator newRandom() {
        return generator == Generator.SPLITMIX64 ? new SplitMixGenerator(seed) : new MersenneTwister(seed);
    }

    public static MonteCarloPropagation standard() {
        return new MonteCarloPropagation(DEFAULT_TRIALS, DEFAULT_SEED);
    }

    public MonteCarloPropagation withTrials(int newTrials) {
        return new MonteCarloPropagation(newTrials, seed, generator);
    }

    public int trials() {
        return trials;
    }

    /**
     * @param inputs one distribution per model input, in the model's order
     * @param model the measurement model
     * @param coverageProbability p, e.g. 0.95
     * @param method {@code SHORTEST} or {@code PROBABILISTICALLY_SYMMETRIC}
     */
    public MonteCarloResult propagate(List<InputDistribution> inputs, MeasurementModel model,
            double coverageProbability, CoverageInterval.Method method) {
        Objects.requireNonNull(inputs, "inputs");
        Objects.requireNonNull(model, "model");
        if (method == CoverageInterval.Method.NORMAL_COVERAGE_FACTOR) {
            throw new IllegalArgumentException("Monte Carlo gives a shortest or a probabilistically symmetric interval");
        }
        return summarise(modelValues(inputs, model), coverageProbability, method);
    }

    /**
     * The share of trials whose model value does not exceed {@code limit}: the probability that
     * the output stays at or below it, read from the same distribution of model values that gives
     * the coverage interval (JCGM 101:2008, 7.5: the ordered values stand for the output's
     * distribution function). Its own standard error is √(P(1 − P)/M) (binomial counting).
     */
    public Chance chanceAtMost(List<InputDistribution> inputs, MeasurementModel model, double limit) {
        Objects.requireNonNull(inputs, "inputs");
        Objects.requireNonNull(model, "model");
        if (Double.isNaN(limit)) {
            throw new IllegalArgumentException("the limit must be a number");
        }
        int within = 0;
        for (double v : modelValues(inputs, model)) {
            if (v <= limit) {
                within++;
            }
        }
        return new Chance((double) within / trials, trials);
    }

    private double[] modelValues(List<InputDistribution> inputs, MeasurementModel model) {
        InputDistribution[] dist = inputs.toArray(InputDistribution[]::new);
        RandomGenerator random = newRandom();
        double[] x = new double[dist.length];
        double[] y = new double[trials];
        for (int r = 0; r < trials; r++) {
            for (int i = 0; i < dist.length; i++) {
                x[i] = dist[i].sample(random);
            }
            double value = model.value(x);
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException("the model gave " + value + " at trial " + (r + 1)
                        + " for inputs " + Arrays.toString(x));
            }
            y[r] = value;
        }
        return y;
    }

    /**
     * The adaptive Monte Carlo procedure of JCGM 101:2008, 7.9: batches of M = max(⌈100/(1 − p)⌉,
     * 10⁴) trials (7.9.4 b) until twice the standard deviation of the batch averages of the
     * estimate, the standard uncertainty and both interval ends is within the numerical tolerance δ
     * of u(y) stated to {@code significantDigits} digits (7.9.2: u = c·10^ℓ with c of that many
     * digits, δ = ½·10^ℓ), then the summary of every trial run. It stops at {@link #trials()}
     * trials whether stabilised or not, so it never costs more than {@link #propagate}.
     *
     * @param significantDigits n_dig, 1 or 2 (7.9.2)
     */
    public MonteCarloResult propagateAdaptive(List<InputDistribution> inputs, MeasurementModel model,
            double coverageProbability, CoverageInterval.Method method, int significantDigits) {
        Objects.requireNonNull(inputs, "inputs");
        Objects.requireNonNull(model, "model");
        if (method == CoverageInterval.Method.NORMAL_COVERAGE_FACTOR) {
            throw new IllegalArgumentException("Monte Carlo gives a shortest or a probabilistically symmetric interval");
        }
        if (significantDigits < 1 || significantDigits > 2) {
            throw new IllegalArgumentException("significant digits of u(y) must be 1 or 2, was " + significantDigits);
        }
        int batch = Math.max((int) Math.ceil(100 / (1 - coverageProbability)), 10_000);
        int maxBatches = Math.max(2, trials / batch);
        InputDistribution[] dist = inputs.toArray(InputDistribution[]::new);
        RandomGenerator random = newRandom();
        double[] x = new double[dist.length];
        double[] all = new double[maxBatches * batch];
        double[][] perBatch = new double[4][maxBatches];
        int h = 0;
        while (h < maxBatches) {
            int from = h * batch;
            for (int r = 0; r < batch; r++) {
                for (int i = 0; i < dist.length; i++) {
                    x[i] = dist[i].sample(random);
                }
                double value = model.value(x);
                if (!Double.isFinite(value)) {
                    throw new IllegalArgumentException("the model gave " + value + " at trial " + (from + r + 1)
                            + " for inputs " + Arrays.toString(x));
                }
                all[from + r] = value;
            }
            MonteCarloResult one = summarise(Arrays.copyOfRange(all, from, from + batch), coverageProbability, method);
            perBatch[0][h] = one.estimate();
            perBatch[1][h] = one.standardUncertainty();
            perBatch[2][h] = one.interval().low();
            perBatch[3][h] = one.interval().high();
            h++;
            if (h >= 2 && stabilised(perBatch, h, Arrays.copyOf(all, h * batch), significantDigits)) {
                break;
            }
        }
        return summarise(Arrays.copyOf(all, h * batch), coverageProbability, method);
    }

    /** JCGM 101:2008, 7.9.4 f to i: 2·s of each batch-average below δ. */
    private static boolean stabilised(double[][] perBatch, int h, double[] values, int significantDigits) {
        double u = standardDeviation(values);
        if (u == 0) {
            return true;
        }
        double delta = numericalTolerance(u, significantDigits);
        for (double[] q : perBatch) {
            double mean = 0;
            for (int r = 0; r < h; r++) {
                mean += q[r];
            }
            mean /= h;
            double squares = 0;
            for (int r = 0; r < h; r++) {
                squares += (q[r] - mean) * (q[r] - mean);
            }
            double sOfAverage = Math.sqrt(squares / (h * (double) (h - 1)));
            if (2 * sOfAverage > delta) {
                return false;
            }
        }
        return true;
    }

    /** δ = ½·10^ℓ for u = c·10^ℓ, c an integer of {@code significantDigits} digits (JCGM 101:2008, 7.9.2). */
    static double numericalTolerance(double u, int significantDigits) {
        int exponent = (int) Math.floor(Math.log10(u)) - significantDigits + 1;
        // rounding can carry c to one digit more (0.0996 to two digits is 0.10): ℓ follows the rounded c
        if (Math.round(u / Math.pow(10, exponent)) >= Math.pow(10, significantDigits)) {
            exponent++;
        }
        return 0.5 * Math.pow(10, exponent);
    }

    private static double standardDeviation(double[] values) {
        double sum = 0;
        for (double v : values) {
            sum += v;
        }
        double mean = sum / values.length;
        double squares = 0;
        for (double v : values) {
            squares += (v - mean) * (v - mean);
        }
        return Math.sqrt(squares / (values.length - 1));
    }

    /** Estimate, standard uncertainty (JCGM 101:2008, 7.6) and interval (7.7) of model values. */
    static MonteCarloResult summarise(double[] values, double p, CoverageInterval.Method method) {
        int m = values.length;
        double sum = 0;
        for (double v : values) {
            sum += v;
        }
        double mean = sum / m;
        double squares = 0;
        for (double v : values) {
            double d = v - mean;
            squares += d * d;
        }
        double u = Math.sqrt(squares / (m - 1));
        if (method == CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC) {
            return new MonteCarloResult(mean, u, symmetricBySelection(values.clone(), p), m);
        }
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        return new MonteCarloResult(mean, u, interval(sorted, p, method), m);
    }

    /**
     * The probabilistically symmetric interval of 7.7.1 from its two order statistics, found by
     * selection (Hoare's FIND, Commun. ACM 4 (1961) 321) in linear time rather than by sorting all
     * M values, which cost most of a trial run; the same ends as {@link #interval} on sorted values.
     */
    static CoverageInterval symmetricBySelection(double[] values, double p) {
        int m = values.length;
        double pm = p * m;
        int q = pm == Math.rint(pm) ? (int) pm : (int) Math.floor(pm + 0.5);
        if (q >= m) {
            throw new IllegalArgumentException("too few trials (" + m + ") for a " + p + " coverage interval");
        }
        int r = Math.max((m - q) % 2 == 0 ? (m - q) / 2 : (m - q + 1) / 2, 1);
        double low = OrderStatistics.select(values, 0, m - 1, r - 1);
        double high = OrderStatistics.select(values, r, m - 1, r + q - 1);
        return new CoverageInterval(low, high, p, CoverageInterval.Method.PROBABILISTICALLY_SYMMETRIC);
    }

    /** JCGM 101:2008, 7.7.1 (q and the symmetric r) and 7.7.2 (the shortest r*), 1-based as printed. */
    static CoverageInterval interval(double[] sorted, double p, CoverageInterval.Method method) {
        int m = sorted.length;
        double pm = p * m;
        int q = pm == Math.rint(pm) ? (int) pm : (int) Math.floor(pm + 0.5);
        if (q >= m) {
            throw new IllegalArgumentException("too few trials (" + m + ") for a " + p + " coverage interval");
        }
        int r;
        if (method == CoverageInterval.Method.SHORTEST) {
            r = 1;
            double best = Double.POSITIVE_INFINITY;
            for (int k = 1; k <= m - q; k++) {
                double width = sorted[k + q - 1] - sorted[k - 1];
                if (width < best) {
                    best = width;
                    r = k;
                }
            }
        } else {
            r = (m - q) % 2 == 0 ? (m - q) / 2 : (m - q + 1) / 2;
            r = Math.max(r, 1);
        }
        return new CoverageInterval(sorted[r - 1], sorted[r + q - 1], p, method);
    }
}
