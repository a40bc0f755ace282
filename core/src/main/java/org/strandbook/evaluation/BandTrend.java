package org.strandbook.evaluation;

import java.util.List;
import java.util.Optional;

import org.strandbook.site.WavelengthBand;
import org.strandbook.trend.LossReading;
import org.strandbook.trend.LossTrend;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.StepEvent;

/**
 * The loss history of one band of one point and where it is heading.
 *
 * @param band       the band
 * @param readings   mean measured loss in the band per paired loop scan, in time order (dB)
 * @param noLight    times of loop scans that returned no light in the band
 * @param trend      Theil–Sen trend of the readings since the latest repair when there are at least two
 *                   of them, else of all readings, when there are at least two
 * @param steps      step changes between consecutive scans larger than the noise
 * @param outlook    when the margin against the analyzer's allowed loss runs out
 */
public record BandTrend(WavelengthBand band, List<LossReading> readings, List<java.time.Instant> noLight,
                        Optional<LossTrend> trend, List<StepEvent> steps, Optional<MarginForecast.Outlook> outlook) {

    public BandTrend {
        readings = List.copyOf(readings);
        noLight = List.copyOf(noLight);
        steps = List.copyOf(steps);
    }
}
