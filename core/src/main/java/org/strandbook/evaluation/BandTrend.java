package org.strandbook.evaluation;

import java.time.Instant;
import java.util.List;
import java.util.Optional;

import org.strandbook.site.WavelengthBand;
import org.strandbook.trend.LossReading;
import org.strandbook.trend.LossTrend;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.StepEvent;

/**
 * The loss history of one band of one point and where its margin is heading.
 *
 * <p>Everything here follows one quantity: the highest measured loss in the driving sub-band
 * ({@link SubBands}), the region of the band whose margin runs out first (or, when none is
 * running out, the one with the least margin). That is the quantity whose margin the forecast
 * states, so the date cannot lag a loss that grows at one place in the band.
 *
 * @param band          the band
 * @param readings      highest measured loss in the driving sub-band per paired loop scan, in time order (dB)
 * @param noLight       times of loop scans that returned no light anywhere in the band
 * @param trend         Theil–Sen trend of the readings since the latest repair when there are at least
 *                      two of them, else of all readings, when there are at least two
 * @param steps         step changes of the band-mean loss between consecutive scans larger than the noise
 *                      (a connector, bend or repair moves the whole band at once)
 * @param outlook       when the driving sub-band's margin against the analyzer's allowed loss runs out
 * @param drivingFromNm lower edge of the driving sub-band, nm
 * @param drivingToNm   upper edge of the driving sub-band, nm
 */
public record BandTrend(WavelengthBand band, List<LossReading> readings, List<Instant> noLight,
                        Optional<LossTrend> trend, List<StepEvent> steps, Optional<MarginForecast.Outlook> outlook,
                        double drivingFromNm, double drivingToNm) {

    public BandTrend {
        readings = List.copyOf(readings);
        noLight = List.copyOf(noLight);
        steps = List.copyOf(steps);
        if (!(drivingFromNm >= band.fromNm() && drivingToNm <= band.toNm() && drivingFromNm < drivingToNm)) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "driving range %.1f–%.1f nm must lie inside band %s (%.1f–%.1f nm)", drivingFromNm, drivingToNm,
                    band.name(), band.fromNm(), band.toNm()));
        }
    }

    /** A trend of one quantity over the whole band (the band is its own driving range). */
    public BandTrend(WavelengthBand band, List<LossReading> readings, List<Instant> noLight,
                     Optional<LossTrend> trend, List<StepEvent> steps, Optional<MarginForecast.Outlook> outlook) {
        this(band, readings, noLight, trend, steps, outlook, band.fromNm(), band.toNm());
    }

    /** The driving range in words, e.g. "1230–1250 nm". */
    public String drivingRange() {
        return String.format(java.util.Locale.ROOT, "%.0f–%.0f nm", drivingFromNm, drivingToNm);
    }
}
