package org.strandbook.throughput;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.strandbook.optics.WavelengthGrid;

class OneCordThroughputTest {

    private static final OneCordThroughput METHOD = OneCordThroughput.withDefaults();

    static double[] axis(double startNm, double stepNm, double endNm) {
        int n = (int) Math.floor((endNm - startNm) / stepNm + 1e-9) + 1;
        double[] nm = new double[n];
        for (int i = 0; i < n; i++) {
            nm[i] = startNm + i * stepNm;
        }
        return nm;
    }

    static RawSpectrum scan(double[] nm, DoubleUnaryOperator counts, double sigmaCounts) {
        double[] v = new double[nm.length];
        for (int i = 0; i < nm.length; i++) {
            v[i] = counts.applyAsDouble(nm[i]);
        }
        return RawSpectrum.ofNm(nm, v).withNoiseCounts(sigmaCounts);
    }

    /** Loop and reference on one axis, darks with offsets, loop net = T × reference net. */
    private static ThroughputScans scansWithTransmittance(double[] nm, DoubleUnaryOperator transmittance) {
        DoubleUnaryOperator refDark = l -> 200 + 0.01 * l;
        DoubleUnaryOperator loopDark = l -> 150;
        DoubleUnaryOperator refNet = l -> 10_000 + 2 * l;
        return new ThroughputScans(
                scan(nm, l -> loopDark.applyAsDouble(l) + transmittance.applyAsDouble(l) * refNet.applyAsDouble(l), 2),
                scan(nm, loopDark, 2),
                scan(nm, l -> refDark.applyAsDouble(l) + refNet.applyAsDouble(l), 2),
                scan(nm, refDark, 2));
    }

    // Source: the decibel for a power ratio, L = −10·log₁₀(P_out/P_in): 10·log₁₀ 2 = 3.0103 dB
    // for 50 %, and exactly 10 dB for 10 %, 20 dB for 1 %, 0 dB for 100 %.
    @ParameterizedTest
    @CsvSource(textBlock = """
            0.5,  3.0103, 0.00005
            0.1,  10.0,   1e-12
            0.01, 20.0,   1e-12
            1.0,  0.0,    1e-12
            """)
    void lossFollowsTheDecibelDefinition(double transmittance, double expectedLossDb, double toleranceDb) {
        double[] nm = axis(1000, 5, 1100);

        ThroughputResult r = METHOD.measure(scansWithTransmittance(nm, l -> transmittance), WavelengthGrid.ofNm(nm));

        for (double loss : r.lossDb()) {
            assertEquals(expectedLossDb, loss, toleranceDb);
        }
        assertEquals(nm.length, r.usableCount());
        assertTrue(r.warnings().isEmpty(), r.warnings().toString());
    }

    // Dark-corrected ratio (IEC 61280-4-1 family, spectral form): L = 10·log₁₀[(S_ref − D)/(S_test − D)].
    // 1500 over a dark of 1000 against 2000 over a dark of 1000 is half the light, 3.0103 dB; the
    // uncorrected ratio 1500/2000 would read 1.2494 dB.
    @Test
    void darkLevelsAreSubtractedBeforeTheRatio() {
        double[] nm = axis(1500, 1, 1520);
        ThroughputScans scans = new ThroughputScans(scan(nm, l -> 1500, 3), scan(nm, l -> 1000, 3),
                scan(nm, l -> 2000, 3), scan(nm, l -> 1000, 3));

        ThroughputResult r = METHOD.measure(scans, WavelengthGrid.ofNm(nm));

        assertEquals(3.0103, r.lossDb()[10], 0.00005);
    }

    // Linear interpolation reproduces a straight line exactly, so scans of linear spectra on four
    // different axes must give the exact ratio of the lines at every grid point.
    @Test
    void scansOnDifferentAxesAreResampledOntoTheGrid() {
        DoubleUnaryOperator loopDark = l -> 100 + 0.05 * l;
        DoubleUnaryOperator loopNet = l -> 2000 + 1.5 * l;
        DoubleUnaryOperator refDark = l -> 300 - 0.02 * l;
        DoubleUnaryOperator refNet = l -> 5000 + 2 * l;
        ThroughputScans scans = new ThroughputScans(
                scan(axis(1000, 1, 2000), l -> loopDark.applyAsDouble(l) + loopNet.applyAsDouble(l), 1),
                scan(axis(995, 3.3, 2010), loopDark, 1),
                scan(axis(990, 2.5, 2010), l -> refDark.applyAsDouble(l) + refNet.applyAsDouble(l), 1),
                scan(axis(993, 7, 2008), refDark, 1));
        WavelengthGrid grid = WavelengthGrid.uniformNm(1000, 2000, 251);

        ThroughputResult r = METHOD.measure(scans, grid);

        for (int i = 0; i < grid.size(); i++) {
            double l = grid.wavelengthNm(i);
            double expected = -10 * Math.log10(loopNet.applyAsDouble(l) / refNet.applyAsDouble(l));
            assertEquals(expected, r.lossDb()[i], 1e-9, l + " nm");
        }
        assertEquals(grid.size(), r.usableCount());
    }

    @Test
    void absorbedBandIsMaskedAndReportedAsARange() {
        double[] nm = axis(1800, 1, 2000);
        ThroughputScans scans = scansWithTransmittance(nm, l -> l >= 1890 && l <= 1960 ? 0.0 : 0.3);
        WavelengthGrid grid = WavelengthGrid.ofNm(axis(1800, 10, 2000));

        ThroughputResult r = METHOD.measure(scans, grid);

        assertEquals(List.of("1890–1960 nm: loop signal within 3σ of dark"),
                r.maskedRanges().stream().map(MaskedRange::description).toList());
        assertEquals(MaskReason.LOOP_AT_DARK, r.maskedRanges().get(0).reason());
        boolean[] usable = r.usable();
        assertTrue(usable[grid.nearestIndex(1880)]);
        assertFalse(usable[grid.nearestIndex(1890)]);
        assertFalse(usable[grid.nearestIndex(1960)]);
        assertTrue(usable[grid.nearestIndex(1970)]);
        assertTrue(Double.isNaN(r.lossDb()[grid.nearestIndex(1920)]));
        assertFalse(r.noLightReturned());
    }

    // The loop's dark-corrected noise is √(σ_scan² + σ_dark²) = √2·2 counts here; a net signal of
    // 2.9 of those widths is masked at k = 3 (design choice), one of 3.1 widths is kept.
    @Test
    void maskingThresholdIsKNoiseWidthsOfTheNetSignal() {
        double[] nm = axis(1000, 1, 1010);
        double width = Math.sqrt(2) * 2;
        ThroughputScans scans = new ThroughputScans(
                scan(nm, l -> 100 + (l < 1005 ? 2.9 : 3.1) * width, 2), scan(nm, l -> 100, 2),
                scan(nm, l -> 5000, 2), scan(nm, l -> 100, 2));

        ThroughputResult r = METHOD.measure(scans, WavelengthGrid.ofNm(nm));

        assertFalse(r.usable()[4]);
        assertTrue(r.usable()[5]);
        assertEquals(width, r.loopNoiseCounts(), 1e-12);
    }

    @Test
    void wavelengthsOutsideAScanAreMaskedNotExtrapolated() {
        ThroughputScans wide = scansWithTransmittance(axis(800, 2, 2000), l -> 0.5);
        ThroughputScans scans = new ThroughputScans(scan(axis(900, 2, 1700), l -> 150 + 0.5 * (10_000 + 2 * l), 2),
                wide.loopDark(), wide.reference(), wide.referenceDark());
        WavelengthGrid grid = WavelengthGrid.ofNm(axis(850, 50, 1800));

        ThroughputResult r = METHOD.measure(scans, grid);

        assertEquals(List.of("850 nm: outside the loop scan's wavelength range",
                        "1750–1800 nm: outside the loop scan's wavelength range"),
                r.maskedRanges().stream().map(MaskedRange::description).toList());
        assertEquals(3.0103, r.lossDb()[grid.nearestIndex(1300)], 0.00005);
    }

    @Test
    void loopAtDarkEverywhereMeansNoLightReturned() {
        Random random = new Random(7);
        double[] nm = axis(1000, 1, 1400);
        double[] dark = new double[nm.length];
        double[] loop = new double[nm.length];
        for (int i = 0; i < nm.length; i++) {
            dark[i] = 500 + 2 * random.nextGaussian();
            loop[i] = 500 + 2 * random.nextGaussian();
        }
        ThroughputScans scans = new ThroughputScans(RawSpectrum.ofNm(nm, loop), RawSpectrum.ofNm(nm, dark),
                scan(nm, l -> 20_000, 2), scan(nm, l -> 500, 2));

        ThroughputResult r = METHOD.measure(scans, WavelengthGrid.ofNm(nm));

        assertTrue(r.noLightReturned());
        assertEquals(0, r.usableCount());
        assertTrue(r.warnings().get(0).startsWith("no light returned: break or open connector"), r.warnings().toString());
    }

    @Test
    void referenceAtDarkEverywhereMeansNoReferenceLight() {
        double[] nm = axis(1000, 1, 1100);
        ThroughputScans scans = new ThroughputScans(scan(nm, l -> 900, 2), scan(nm, l -> 500, 2),
                scan(nm, l -> 501, 2), scan(nm, l -> 500, 2));

        ThroughputResult r = METHOD.measure(scans, WavelengthGrid.ofNm(nm));

        assertTrue(r.noReferenceLight());
        assertFalse(r.noLightReturned());
        assertEquals(MaskReason.REFERENCE_AT_DARK, r.maskedRanges().get(0).reason());
    }

    // Common practice, stated with the one-cord method: a negative loss means a bad reference.
    // 20 % more light through the path than through the cord is −10·log₁₀ 1.2 = −0.7918 dB.
    @Test
    void negativeLossBeyondNoiseIsWarnedAsBadReference() {
        double[] nm = axis(1000, 10, 1500);
        ThroughputScans scans = scansWithTransmittance(nm, l -> l >= 1100 && l <= 1300 ? 1.2 : 0.8);

        WavelengthGrid grid = WavelengthGrid.ofNm(nm);
        ThroughputResult r = METHOD.measure(scans, grid);

        assertEquals(1, r.negativeLossRanges().size());
        ThroughputResult.NegativeLossRange range = r.negativeLossRanges().get(0);
        assertEquals(1100, range.fromNm());
        assertEquals(1300, range.toNm());
        assertEquals(-0.7918, range.minLossDb(), 0.00005);
        assertTrue(r.warnings().get(0).startsWith("1100–1300 nm: loss down to -0.79 dB"), r.warnings().get(0));
        assertTrue(r.warnings().get(0).contains("bad reference"));
        assertTrue(r.usable()[grid.nearestIndex(1200)], "the measured value is kept; the warning says what it means");
    }

    // Monte Carlo propagation (JCGM 101:2008, GUM Supplement 1) checks the first-order formula:
    // draw the four scans with their noise, compute L each time, compare the spread with σ_L.
    @Test
    void lossUncertaintyMatchesMonteCarloPropagation() {
        double[] nm = axis(1200, 1, 1209);
        double loopSigma = 10;
        double refSigma = 20;
        ThroughputScans scans = new ThroughputScans(scan(nm, l -> 300 + 800, loopSigma), scan(nm, l -> 300, loopSigma),
                scan(nm, l -> 400 + 4000, refSigma), scan(nm, l -> 400, refSigma));
        ThroughputResult r = METHOD.measure(scans, WavelengthGrid.ofNm(nm));

        Random random = new Random(11);
        int draws = 40_000;
        double sum = 0;
        double sumSquares = 0;
        for (int k = 0; k < draws; k++) {
            double loop = 1100 + loopSigma * random.nextGaussian() - (300 + loopSigma * random.nextGaussian());
            double ref = 4400 + refSigma * random.nextGaussian() - (400 + refSigma * random.nextGaussian());
            double loss = -10 * Math.log10(loop / ref);
            sum += loss;
            sumSquares += loss * loss;
        }
        double mean = sum / draws;
        double spread = Math.sqrt(sumSquares / draws - mean * mean);

        assertEquals(spread, r.sigmaDb()[0], 0.03 * spread);
    }

    @Test
    void darkNoiseIsEstimatedWhenNotGiven() {
        Random random = new Random(3);
        double[] nm = axis(1000, 0.5, 1999.5);
        double[] dark = new double[nm.length];
        for (int i = 0; i < nm.length; i++) {
            dark[i] = 500 + 0.05 * i + 4 * random.nextGaussian();
        }
        RawSpectrum darkScan = RawSpectrum.ofNm(nm, dark);
        ThroughputScans scans = new ThroughputScans(scan(nm, l -> 3000, 4).withNoiseCounts(4), darkScan,
                scan(nm, l -> 9000, 4), darkScan);

        ThroughputResult r = METHOD.measure(scans, WavelengthGrid.ofNm(nm));

        assertEquals(Math.sqrt(2) * 4, r.loopNoiseCounts(), 0.05 * Math.sqrt(2) * 4);
    }

    @Test
    void badScanIsRejectedWithWavelengthNamed() {
        IllegalArgumentException descending = assertThrows(IllegalArgumentException.class,
                () -> RawSpectrum.ofNm(new double[] {1000, 999}, new double[] {1, 2}));
        assertTrue(descending.getMessage().contains("ascending"), descending.getMessage());
        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class,
                () -> RawSpectrum.ofNm(new double[] {1000, 1001}, new double[] {1, Double.NaN}));
        assertTrue(nan.getMessage().contains("1001"), nan.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> RawSpectrum.ofNm(new double[] {1000, 1001}, new double[] {1}));
    }

    @Test
    void shortDarkScanWithoutGivenNoiseIsRefused() {
        double[] nm = axis(1000, 1, 1004);
        ThroughputScans scans = new ThroughputScans(scan(nm, l -> 900, 2), RawSpectrum.ofNm(nm, new double[5]),
                scan(nm, l -> 1900, 2), scan(nm, l -> 0, 2));

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> METHOD.measure(scans, WavelengthGrid.ofNm(nm)));
        assertTrue(e.getMessage().startsWith("loop dark scan"), e.getMessage());
    }

    // reference: java.text.DecimalFormat with pattern "0.#" and Locale.ROOT symbols (Java SE 17 API),
    // the format the wavelengths of masked and negative ranges are written in
    @ParameterizedTest
    @CsvSource(textBlock = """
            1
            3
            1000
            1402
            2500
            123456789
            999999999
            1e9
            0.5
            1.25
            1.35
            2.05
            1401.9999999999998
            1402.04
            3.0000000001
            """)
    void rangeWavelengthsAreWrittenAsTheDecimalFormatWritesThem(double value) {
        java.text.DecimalFormat reference = new java.text.DecimalFormat("0.#",
                java.text.DecimalFormatSymbols.getInstance(java.util.Locale.ROOT));
        assertEquals(reference.format(value), OneCordThroughput.formatNumber(value, OneCordThroughput.numberFormat()));
    }
}
