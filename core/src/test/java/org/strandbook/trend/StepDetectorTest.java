package org.strandbook.trend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

class StepDetectorTest {

    private static final Instant ORIGIN = Instant.parse("2021-01-01T00:00:00Z");
    private static final long QUARTER_SECONDS = Math.round(YearScale.SECONDS_PER_YEAR / 4);

    /** Quarterly scans: slow ageing of 0.05 dB/year plus Gaussian noise of σ dB. */
    private static List<LossReading> quarterlyScans(int count, double sigmaDb, long seed) {
        Random random = new Random(seed);
        List<LossReading> readings = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            double years = i / 4.0;
            readings.add(new LossReading(ORIGIN.plusSeconds(i * QUARTER_SECONDS),
                    3.0 + 0.05 * years + sigmaDb * random.nextGaussian()));
        }
        return readings;
    }

    private static List<LossReading> withOffset(List<LossReading> readings, int from, int to, double offsetDb) {
        List<LossReading> out = new ArrayList<>(readings);
        for (int i = from; i < to; i++) {
            out.set(i, new LossReading(out.get(i).time(), out.get(i).lossDb() + offsetDb));
        }
        return out;
    }

    private static StepReport detect(List<LossReading> readings, StepDetector detector) {
        return detector.detect(readings);
    }

    // A step in mid-series tilts an all-pairs line; the detector must still see one step of the
    // size put in and no spurious ones at the ends.
    @Test
    void findsLastingStepWithItsDateAndSize() {
        List<LossReading> readings = withOffset(quarterlyScans(24, 0.02, 1), 14, 24, 0.8);

        StepReport report = detect(readings, StepDetector.withDefaults());

        assertEquals(1, report.events().size(), report.toString());
        StepEvent step = report.events().get(0);
        assertEquals(StepEvent.Kind.STEP, step.kind());
        assertEquals(readings.get(13).time(), step.before());
        assertEquals(readings.get(14).time(), step.after());
        assertEquals(0.8, step.stepDb(), 0.1);
    }

    @Test
    void singleBadScanIsAnOutlierNotTwoSteps() {
        List<LossReading> readings = withOffset(quarterlyScans(20, 0.02, 2), 9, 10, -0.6);

        StepReport report = detect(readings, StepDetector.withDefaults());

        assertEquals(1, report.events().size(), report.toString());
        assertEquals(StepEvent.Kind.OUTLIER, report.events().get(0).kind());
        assertEquals(readings.get(9).time(), report.events().get(0).after());
        assertTrue(report.events().get(0).stepDb() < 0);
    }

    @Test
    void slowAgeingAloneRaisesNoEvent() {
        StepReport report = detect(quarterlyScans(40, 0.02, 3), StepDetector.withDefaults());

        assertTrue(report.events().isEmpty(), report.toString());
        assertEquals(StepReport.NoiseSource.ESTIMATED, report.noiseSource());
    }

    // Hampel (J. Am. Stat. Assoc. 69, 383, 1974): 1.4826·MAD estimates σ of Gaussian data; applied
    // to differences of independent readings and divided by √2 it estimates the σ of one reading.
    @Test
    void estimatedNoiseMatchesTrueScatter() {
        StepReport report = detect(withOffset(quarterlyScans(400, 0.05, 4), 200, 400, 1.0), StepDetector.withDefaults());

        assertEquals(0.05, report.noiseDb(), 0.005);
        assertEquals(StepDetector.DEFAULT_NOISE_WIDTHS * Math.sqrt(2) * report.noiseDb(), report.thresholdDb(), 1e-12);
        assertEquals(1, report.events().size());
    }

    // the 4-noise-width step threshold is a design choice
    @Test
    void givenNoiseWidthDecides() {
        List<LossReading> readings = withOffset(quarterlyScans(12, 0.0, 5), 6, 12, 0.3);

        StepReport coarse = detect(readings, StepDetector.withDefaults().withNoiseDb(0.1));
        StepReport fine = detect(readings, StepDetector.withDefaults().withNoiseDb(0.05));

        assertEquals(StepReport.NoiseSource.GIVEN, coarse.noiseSource());
        assertTrue(coarse.events().isEmpty(), "0.3 dB < 4·√2·0.1 dB");
        assertEquals(1, fine.events().size(), "0.3 dB > 4·√2·0.05 dB");
        assertEquals(0.3 / (Math.sqrt(2) * 0.05), fine.events().get(0).sizeInNoiseWidths(), 1e-9);
    }

    @Test
    void noiseFreeSeriesStillFindsItsStepAndNothingElse() {
        List<LossReading> readings = withOffset(quarterlyScans(10, 0.0, 6), 5, 10, 0.2);

        StepReport report = detect(readings, StepDetector.withDefaults());

        assertEquals(1, report.events().size(), report.toString());
        assertEquals(0.2, report.events().get(0).stepDb(), 1e-9);
    }

    @Test
    void fewReadingsWithoutGivenNoiseCannotBeJudged() {
        StepReport report = detect(quarterlyScans(4, 0.02, 7), StepDetector.withDefaults());

        assertEquals(StepReport.NoiseSource.UNKNOWN, report.noiseSource());
        assertTrue(Double.isNaN(report.noiseDb()));
        assertTrue(report.events().isEmpty());
    }
}
