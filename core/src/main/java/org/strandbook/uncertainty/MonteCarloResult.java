package org.strandbook.uncertainty;

/**
 * What the Monte Carlo method reports (JCGM 101:2008, 7.6 and 7.7).
 *
 * @param estimate the average of the model values
 * @param standardUncertainty their standard deviation
 * @param interval the coverage interval from the ordered model values
 * @param trials M, the number of trials
 */
public record MonteCarloResult(double estimate, double standardUncertainty, CoverageInterval interval, int trials) {
}
