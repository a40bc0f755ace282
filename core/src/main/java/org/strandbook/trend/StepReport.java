package org.strandbook.trend;

import java.util.List;
import java.util.Objects;

/**
 * The outcome of {@link StepDetector}: the noise it judged against and the events it found.
 *
 * @param noiseDb        noise width of a single reading (standard deviation, dB); {@code NaN} when
 *                       it could neither be estimated nor was given
 * @param noiseSource    where {@code noiseDb} came from
 * @param thresholdDb    a scan-to-scan change larger than this is an event, dB
 * @param events         the events, in time order
 */
public record StepReport(double noiseDb, NoiseSource noiseSource, double thresholdDb, List<StepEvent> events) {

    /** Origin of the noise width. */
    public enum NoiseSource {
        /** Given by the caller (e.g. the known repeatability of the measurement). */
        GIVEN,
        /** Estimated from the scatter of the scan-to-scan changes about the trend. */
        ESTIMATED,
        /** Too few readings to estimate it and none given: no events can be judged. */
        UNKNOWN
    }

    public StepReport {
        Objects.requireNonNull(noiseSource, "noiseSource");
        events = List.copyOf(events);
    }
}
