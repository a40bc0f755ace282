package org.strandbook.evaluation;

import java.util.Objects;

/**
 * The limits a band was judged against under the coverage-interval rule: the prediction's
 * coverage interval widened by the measurement's own expanded uncertainty, and the guard band
 * beyond it.
 *
 * @param prediction the prediction's uncertainty at the band centre (budget and interval)
 * @param measurement the measurement's own uncertainty of the band's mean loss
 * @param coverage coverage probability of both
 * @param guardBandDb the guard band, dB
 * @param lowerDeviationDb the widened interval's lower end as measured − predicted, dB (≤ 0)
 * @param upperDeviationDb its upper end as measured − predicted, dB (≥ 0)
 */
public record BandInterval(BandUncertainty prediction, MeasurementUncertainty measurement, double coverage,
        double guardBandDb, double lowerDeviationDb, double upperDeviationDb) {

    public BandInterval {
        Objects.requireNonNull(prediction, "prediction");
        Objects.requireNonNull(measurement, "measurement");
    }

    /** The measurement's expanded uncertainty U = k·u, dB. */
    public double measurementExpandedDb() {
        return measurement.expandedDb(coverage);
    }
}
