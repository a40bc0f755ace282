package org.strandbook.evaluation;

import java.util.Objects;
import java.util.PriorityQueue;
import java.util.TreeSet;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.uncertainty.LossUncertainty;
import org.strandbook.uncertainty.PathUncertainty;

/**
 * The coverage band of a point's predicted loss at every wavelength of its evaluation grid: what
 * the window and the dossier shade around the predicted curve.
 *
 * <p>Why not Monte Carlo at every grid point: one run is 2·10⁵ trials, and a 1000–2500 nm analyzer
 * has 751 grid points, about a minute per point. Why not Monte Carlo at a few wavelengths and the
 * band's ends interpolated: the width follows the OH bands, tens of nm wide, and a coarse set of
 * wavelengths would step over them. So the width and the shape are split: the combined standard
 * uncertainty u_c(λ) by the law of propagation (JCGM 100:2008, 5.1.2) at every grid point (cheap,
 * it follows every band), and the Monte Carlo interval (JCGM 101:2008, 7.7) at a set of stations,
 * expressed as coverage factors k₋ = (y − low)/u_c and k₊ = (high − y)/u_c and interpolated
 * linearly between them. Those factors say only how far from normal the output's shape is (1.96
 * for a normal one at 95 %, less where rectangular inputs dominate, unequal for a tight bend or the
 * one-sided OH spread), and the shape follows which inputs dominate. So the stations start evenly
 * spaced and a station is added midway wherever the inputs' shares of the variance there differ
 * from the average of the neighbouring stations' (at an OH band's flank, where the OH content takes
 * over from the connectors). At a station the band's ends are the Monte Carlo interval itself, run
 * with at most {@link #STATION_TRIALS} trials: a band is drawn, not judged against, and the
 * verdicts' intervals at the band centres keep the engine's full count.
 *
 * @param grid the evaluation grid
 * @param predictedLossDb the predicted loss on it (dB)
 * @param lowDb lower end of the coverage interval (dB)
 * @param highDb upper end (dB)
 * @param coverageProbability p of every interval, e.g. 0.95
 */
public record PredictionSpread(WavelengthGrid grid, double[] predictedLossDb, double[] lowDb, double[] highDb,
        double coverageProbability) {

    /**
     * Trials per station, at most: design choice. With M = 2·10⁴ the ends of a 95 % interval scatter
     * by about 0.5 % of its width (√(p(1 − p)/M) over the density there, for a normal output),
     * finer than a plot shows, at a tenth of the standard run's time.
     */
    public static final int STATION_TRIALS = 20_000;

    /** Evenly spaced Monte Carlo stations before any is added: design choice. */
    public static final int EVEN_STATIONS = 9;
    /** At most this many Monte Carlo runs per point: design choice (about a second per point here). */
    public static final int MAX_STATIONS = 40;
    /**
     * A station is added where the variance shares differ from their neighbours' average by more
     * than this (sum of absolute differences, 0–2): design choice.
     */
    static final double SHARE_CHANGE = 0.1;

    public PredictionSpread {
        Objects.requireNonNull(grid, "grid");
        grid.requireSameLength(predictedLossDb);
        grid.requireSameLength(lowDb);
        grid.requireSameLength(highDb);
        predictedLossDb = predictedLossDb.clone();
        lowDb = lowDb.clone();
        highDb = highDb.clone();
        for (int i = 0; i < lowDb.length; i++) {
            if (!(lowDb[i] <= highDb[i])) {
                throw new IllegalArgumentException("coverage band reversed at " + grid.wavelengthNm(i) + " nm: "
                        + lowDb[i] + " > " + highDb[i] + " dB");
            }
        }
    }

    @Override
    public double[] predictedLossDb() {
        return predictedLossDb.clone();
    }

    @Override
    public double[] lowDb() {
        return lowDb.clone();
    }

    @Override
    public double[] highDb() {
        return highDb.clone();
    }

    /** Told after each Monte Carlo station; may throw to stop the work (a cancelled background job). */
    @FunctionalInterface
    public interface Progress {
        void stationDone(int done, int of);
    }

    /** The band around {@code predicted}'s curve, from {@code engine}. */
    public static PredictionSpread of(PredictedBudget predicted, PathUncertainty engine) {
        return of(predicted, engine, (done, of) -> { });
    }

    /** As {@link #of(PredictedBudget, PathUncertainty)}, telling {@code progress} after each station. */
    public static PredictionSpread of(PredictedBudget predicted, PathUncertainty engine, Progress progress) {
        Objects.requireNonNull(predicted, "predicted");
        Objects.requireNonNull(progress, "progress");
        Objects.requireNonNull(engine, "engine");
        PathUncertainty stationEngine = engine.trials() > STATION_TRIALS ? engine.withTrials(STATION_TRIALS) : engine;
        WavelengthGrid grid = predicted.grid();
        int n = grid.size();
        double[] y = predicted.totalLossDb();
        double[] uc = new double[n];
        double[][] shares = new double[n][];
        for (int i = 0; i < n; i++) {
            double[] contributions = engine.contributionsDb(predicted.budget(), i, predicted.allowances());
            double variance = 0;
            for (double c : contributions) {
                variance += c * c;
            }
            uc[i] = Math.sqrt(variance);
            shares[i] = new double[contributions.length];
            for (int k = 0; k < contributions.length; k++) {
                shares[i][k] = variance > 0 ? contributions[k] * contributions[k] / variance : 0;
            }
        }
        int[] at = stations(shares);
        double[] stationNm = new double[at.length];
        double[] kBelow = new double[at.length];
        double[] kAbove = new double[at.length];
        double[] stationLow = new double[at.length];
        double[] stationHigh = new double[at.length];
        for (int s = 0; s < at.length; s++) {
            LossUncertainty u = stationEngine.at(predicted.budget(), at[s], predicted.allowances());
            stationNm[s] = grid.wavelengthNm(at[s]);
            stationLow[s] = u.budget().interval().low();
            stationHigh[s] = u.budget().interval().high();
            double c = uc[at[s]];
            kBelow[s] = c > 0 ? -u.lowOffsetDb() / c : 0;
            kAbove[s] = c > 0 ? u.highOffsetDb() / c : 0;
            progress.stationDone(s + 1, at.length);
        }
        double[] low = new double[n];
        double[] high = new double[n];
        WavelengthGrid stationGrid = WavelengthGrid.ofNm(stationNm);
        for (int i = 0; i < n; i++) {
            double w = grid.wavelengthNm(i);
            low[i] = y[i] - stationGrid.interpolate(kBelow, w) * uc[i];
            high[i] = y[i] + stationGrid.interpolate(kAbove, w) * uc[i];
        }
        for (int s = 0; s < at.length; s++) {
            low[at[s]] = stationLow[s];
            high[at[s]] = stationHigh[s];
        }
        return new PredictionSpread(grid, y, low, high, engine.coverageProbability());
    }

    /**
     * Grid indices of the Monte Carlo stations: {@link #EVEN_STATIONS} evenly spaced (both ends),
     * then midpoints added, widest gap first, wherever the variance shares there differ from their
     * neighbours' average by more than {@link #SHARE_CHANGE}, up to {@link #MAX_STATIONS}.
     */
    static int[] stations(double[][] shares) {
        int n = shares.length;
        TreeSet<Integer> chosen = new TreeSet<>();
        int even = Math.min(EVEN_STATIONS, n);
        for (int s = 0; s < even; s++) {
            chosen.add(even == 1 ? n / 2 : (int) Math.round((double) s * (n - 1) / (even - 1)));
        }
        PriorityQueue<int[]> gaps = new PriorityQueue<>((a, b) -> (b[1] - b[0]) - (a[1] - a[0]));
        Integer previous = null;
        for (int index : chosen) {
            if (previous != null) {
                gaps.add(new int[] {previous, index});
            }
            previous = index;
        }
        while (!gaps.isEmpty() && chosen.size() < MAX_STATIONS) {
            int[] gap = gaps.poll();
            if (gap[1] - gap[0] < 2) {
                continue;
            }
            int mid = (gap[0] + gap[1]) >>> 1;
            if (shareChange(shares[gap[0]], shares[mid], shares[gap[1]]) > SHARE_CHANGE) {
                chosen.add(mid);
                gaps.add(new int[] {gap[0], mid});
                gaps.add(new int[] {mid, gap[1]});
            }
        }
        return chosen.stream().mapToInt(Integer::intValue).toArray();
    }

    private static double shareChange(double[] left, double[] mid, double[] right) {
        double sum = 0;
        for (int k = 0; k < mid.length; k++) {
            sum += Math.abs(mid[k] - 0.5 * (left[k] + right[k]));
        }
        return sum;
    }
}
