package org.strandbook.trend;

import java.time.Instant;
import java.util.Objects;

/**
 * A Theil–Sen trend line of loss against time, with Sen's confidence interval for the slope.
 *
 * @param slopeDbPerYear      median of the pairwise slopes, dB per Julian year
 * @param interceptLossDb     loss of the line at {@code referenceTime}, dB
 * @param referenceTime       the time the intercept belongs to (the earliest reading)
 * @param lowerSlopeDbPerYear lower confidence limit of the slope; {@code −∞} when the readings are
 *                            too few to bound it at this confidence
 * @param upperSlopeDbPerYear upper confidence limit of the slope; {@code +∞} likewise
 * @param confidenceLevel     two-sided confidence of the limits, in (0, 1)
 * @param readingCount        number of readings n
 * @param slopeCount          number of pairwise slopes N (pairs taken at different times)
 * @param kendallS            Kendall's S of loss against time: concordant minus discordant pairs
 * @param kendallVarianceS    variance of S under no trend, corrected for ties
 */
public record LossTrend(double slopeDbPerYear, double interceptLossDb, Instant referenceTime,
                        double lowerSlopeDbPerYear, double upperSlopeDbPerYear, double confidenceLevel,
                        int readingCount, int slopeCount, long kendallS, double kendallVarianceS) {

    public LossTrend {
        Objects.requireNonNull(referenceTime, "referenceTime");
        if (!(lowerSlopeDbPerYear <= slopeDbPerYear && slopeDbPerYear <= upperSlopeDbPerYear)) {
            throw new IllegalArgumentException("slope " + slopeDbPerYear + " dB/year lies outside its limits ["
                    + lowerSlopeDbPerYear + ", " + upperSlopeDbPerYear + "]");
        }
    }

    /** Loss of the trend line at {@code time}, dB. */
    public double lossDbAt(Instant time) {
        return interceptLossDb + slopeDbPerYear * YearScale.yearsBetween(referenceTime, time);
    }

    /** True when both confidence limits are finite. */
    public boolean slopeIsBounded() {
        return Double.isFinite(lowerSlopeDbPerYear) && Double.isFinite(upperSlopeDbPerYear);
    }
}
