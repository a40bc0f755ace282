package org.strandbook.trend;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.descriptive.rank.Median;

/**
 * Finds sudden changes of loss between consecutive scans of a light path.
 *
 * <p>Each scan-to-scan change is first cleared of slow ageing: dᵢ = (yᵢ₊₁ − yᵢ) − b·(tᵢ₊₁ − tᵢ),
 * with b the median of the consecutive-scan slopes (yᵢ₊₁ − yᵢ)/(tᵢ₊₁ − tᵢ). That median is used
 * rather than the Theil–Sen slope of the whole series because a step in mid-series falls between
 * about half of all pairs of scans and tilts the all-pairs slope, whereas it spoils only one
 * consecutive slope. The dᵢ are compared with k noise widths of such a difference.
 *
 * <p>The noise width of one reading, σ, is either given by the caller or estimated from the same
 * differences as σ = 1.4826·MAD(d)/√2: differencing (J. von Neumann et al., "The mean square
 * successive difference", Ann. Math. Stat. 12, 153 (1941)) removes whatever drift is left, and
 * the median absolute deviation scaled by 1/Φ⁻¹(3/4) ≈ 1.4826 (F. R. Hampel, J. Am. Stat. Assoc.
 * 69, 383 (1974)) ignores the few large changes being looked for. The scatter of the residuals
 * about a fitted line is not used: a step in mid-series pushes half of them up and half down, so
 * it would inflate the noise by about half its own size and hide itself.
 *
 * <p>A difference of two readings carries √2·σ of noise, so the threshold is k·√2·σ. Two
 * consecutive changes over the threshold with opposite signs that cancel to within it are one
 * outlying reading, reported as {@link StepEvent.Kind#OUTLIER}; everything else over the threshold
 * is a {@link StepEvent.Kind#STEP}.
 */
public final class StepDetector {

    /**
     * k: how many noise widths a change must exceed, unless stated otherwise. For Gaussian noise a
     * change exceeds 3 widths by chance with probability 0.27 %, so a life of 100 scans would show
     * a false event about one time in four; at 4 widths (6.3·10⁻⁵ per change) under 1 % of such
     * series show one.
     */
    public static final double DEFAULT_NOISE_WIDTHS = 4.0;

    /** Fewest scan-to-scan changes (readings − 1) from which the noise width is estimated. */
    public static final int MIN_CHANGES_FOR_NOISE_ESTIMATE = 4;

    /**
     * A change must exceed this even when the noise is estimated as zero (noise-free data), so
     * that rounding in the last digit is never an event; far below any measurable loss change.
     */
    public static final double NUMERICAL_FLOOR_DB = 1e-9;

    private static final double MAD_TO_SIGMA = 1 / new NormalDistribution().inverseCumulativeProbability(0.75);

    private final double noiseWidths;
    private final double givenNoiseDb;

    private StepDetector(double noiseWidths, double givenNoiseDb) {
        this.noiseWidths = noiseWidths;
        this.givenNoiseDb = givenNoiseDb;
    }

    /** k = {@link #DEFAULT_NOISE_WIDTHS} noise widths, noise estimated from the readings. */
    public static StepDetector withDefaults() {
        return new StepDetector(DEFAULT_NOISE_WIDTHS, Double.NaN);
    }

    /** The same detector with threshold k noise widths (k &gt; 0). */
    public StepDetector withNoiseWidths(double k) {
        if (!(k > 0) || !Double.isFinite(k)) {
            throw new IllegalArgumentException("number of noise widths " + k + " must be a positive number");
        }
        return new StepDetector(k, givenNoiseDb);
    }

    /** The same detector judging against a known noise width of one reading, σ in dB (&gt; 0). */
    public StepDetector withNoiseDb(double sigmaDb) {
        if (!(sigmaDb > 0) || !Double.isFinite(sigmaDb)) {
            throw new IllegalArgumentException("noise width " + sigmaDb + " dB must be a positive number");
        }
        return new StepDetector(noiseWidths, sigmaDb);
    }

    /** Events in {@code readings}, given in any order. */
    public StepReport detect(List<LossReading> readings) {
        List<LossReading> sorted = new ArrayList<>(readings);
        sorted.sort(Comparator.comparing(LossReading::time));
        int changeCount = Math.max(sorted.size() - 1, 0);
        double[] rise = new double[changeCount];
        double[] span = new double[changeCount];
        List<Double> slopes = new ArrayList<>();
        for (int i = 0; i < changeCount; i++) {
            rise[i] = sorted.get(i + 1).lossDb() - sorted.get(i).lossDb();
            span[i] = YearScale.yearsBetween(sorted.get(i).time(), sorted.get(i + 1).time());
            if (span[i] > 0) {
                slopes.add(rise[i] / span[i]);
            }
        }
        double localSlope = slopes.isEmpty() ? 0
                : new Median().evaluate(slopes.stream().mapToDouble(Double::doubleValue).toArray());
        double[] d = new double[changeCount];
        for (int i = 0; i < changeCount; i++) {
            d[i] = rise[i] - localSlope * span[i];
        }

        double sigmaDb;
        StepReport.NoiseSource source;
        if (!Double.isNaN(givenNoiseDb)) {
            sigmaDb = givenNoiseDb;
            source = StepReport.NoiseSource.GIVEN;
        } else if (changeCount >= MIN_CHANGES_FOR_NOISE_ESTIMATE) {
            sigmaDb = MAD_TO_SIGMA * medianAbsoluteDeviation(d) / Math.sqrt(2);
            source = StepReport.NoiseSource.ESTIMATED;
        } else {
            return new StepReport(Double.NaN, StepReport.NoiseSource.UNKNOWN, Double.NaN, List.of());
        }
        double differenceNoiseDb = Math.sqrt(2) * sigmaDb;
        double threshold = Math.max(noiseWidths * differenceNoiseDb, NUMERICAL_FLOOR_DB);

        List<StepEvent> events = new ArrayList<>();
        for (int i = 0; i < changeCount; i++) {
            if (Math.abs(d[i]) <= threshold) {
                continue;
            }
            double size = differenceNoiseDb > 0 ? Math.abs(d[i]) / differenceNoiseDb : Double.POSITIVE_INFINITY;
            boolean comesBack = i + 1 < changeCount
                    && Math.abs(d[i + 1]) > threshold
                    && Math.signum(d[i + 1]) != Math.signum(d[i])
                    && Math.abs(d[i] + d[i + 1]) <= threshold;
            StepEvent.Kind kind = comesBack ? StepEvent.Kind.OUTLIER : StepEvent.Kind.STEP;
            events.add(new StepEvent(kind, sorted.get(i).time(), sorted.get(i + 1).time(), d[i], size));
            if (comesBack) {
                i++;
            }
        }
        return new StepReport(sigmaDb, source, threshold, events);
    }

    private static double medianAbsoluteDeviation(double[] values) {
        Median median = new Median();
        double centre = median.evaluate(values);
        double[] deviations = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            deviations[i] = Math.abs(values[i] - centre);
        }
        return median.evaluate(deviations);
    }
}
