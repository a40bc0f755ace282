package org.strandbook.throughput;

import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.strandbook.optics.WavelengthGrid;

/**
 * Measured throughput and loss of a light path by the one-cord reference method (the reference
 * taken through the launch cord alone, as in the family of methods of IEC 61280-4-1), so the loss
 * holds the path and both of its end connections. Re-reference whenever a cord changes.
 *
 * <p>Safety: the lamp and any laser source stay blocked or off while connectors are opened; never
 * look into a fiber end or an open connector to see whether light comes out (IEC 60825-2,
 * IEC 62471), use a power meter or a viewing card. Follow the site's rules for optical sources in
 * hazardous areas (IEC 60079-28) and for opening process connections.
 *
 * <p>Each scan is linearly interpolated from its own axis onto the common grid. Per grid point:
 * <pre>
 *   N_loop = I_loop − D_loop,   N_ref = I_ref − D_ref
 *   T = N_loop / N_ref,         L = −10·log₁₀ T  [dB]
 *   σ_L = (10 / ln 10)·√((σ_loop/N_loop)² + (σ_ref/N_ref)²)
 * </pre>
 * σ_L is the first-order propagation of the detector noise of the four uncorrelated scans (JCGM
 * 100:2008, Guide to the Expression of Uncertainty in Measurement, 5.1.2), with
 * σ_loop = √(σ²(I_loop) + σ²(D_loop)) and likewise for the reference. The noise width of a scan is
 * the one given with it, else for a dark scan its {@link DarkNoise} estimate and for a lamp scan
 * that of its own dark scan (read noise dominates exactly where the masking decision is made).
 * Interpolation between two readings lowers their noise by up to √2; the full width is kept, so
 * masking errs on the safe side.
 *
 * <p>A grid point is masked, not guessed, where it lies outside any scan's axis or where a
 * dark-corrected signal N is not above k·σ of its own (default k = 3: a reading of pure noise
 * exceeds 3σ in 0.13 % of cases). Runs of masked points are reported with their reason. When the
 * loop signal summed over every wavelength the reference lights is itself within k·σ·√count of
 * dark, no light came back at all: every point is masked and the result says so. A usable
 * point with L &lt; −k·σ_L is a warning: more light through the path than through the cord
 * alone means a bad reference.
 */
public final class OneCordThroughput {

    /** k unless stated otherwise. */
    public static final double DEFAULT_NOISE_WIDTHS = 3.0;

    /** Negative losses smaller than this are rounding, not a finding, even for noise-free scans. */
    private static final double NUMERICAL_FLOOR_DB = 1e-9;

    /** dL/dT·T: the loss change in dB for a small relative change of signal. */
    private static final double DB_PER_RELATIVE_CHANGE = 10 / Math.log(10);

    private static final DecimalFormatSymbols ROOT_SYMBOLS = DecimalFormatSymbols.getInstance(Locale.ROOT);

    private final double noiseWidths;
    private final OptionalDouble fullScaleCounts;

    private OneCordThroughput(double noiseWidths, OptionalDouble fullScaleCounts) {
        this.noiseWidths = noiseWidths;
        this.fullScaleCounts = fullScaleCounts;
    }

    /** k = {@link #DEFAULT_NOISE_WIDTHS}, no declared full scale. */
    public static OneCordThroughput withDefaults() {
        return new OneCordThroughput(DEFAULT_NOISE_WIDTHS, OptionalDouble.empty());
    }

    /**
     * The same method with the detector's declared full scale, in the unit of the scans it is
     * given: readings at or above it are clipped (see {@link DetectorClipping}).
     */
    public OneCordThroughput withFullScaleCounts(double fullScale) {
        if (!(fullScale > 0) || !Double.isFinite(fullScale)) {
            throw new IllegalArgumentException("full scale " + fullScale + " counts must be a positive number");
        }
        return new OneCordThroughput(noiseWidths, OptionalDouble.of(fullScale));
    }

    /** The same method masking signals within k noise widths of dark (k ≥ 0). */
    public OneCordThroughput withNoiseWidths(double k) {
        if (!(k >= 0) || !Double.isFinite(k)) {
            throw new IllegalArgumentException("number of noise widths " + k + " must be a finite number ≥ 0");
        }
        return new OneCordThroughput(k, fullScaleCounts);
    }

    /** Loss spectrum of the path on {@code grid}. */
    public ThroughputResult measure(ThroughputScans scans, WavelengthGrid grid) {
        return measure(scans, new ScanRegridder(grid));
    }

    /**
     * Loss spectrum of the path on the regridder's grid; the regridder carries the interpolation of
     * each scan axis from one measurement of an evaluation to the next.
     */
    public ThroughputResult measure(ThroughputScans scans, ScanRegridder regridder) {
        WavelengthGrid grid = regridder.grid();
        double loopDarkSigma = noise(scans.loopDark(), "loop dark scan");
        double loopSigma = scans.loop().noiseCounts().orElse(loopDarkSigma);
        double refDarkSigma = noise(scans.referenceDark(), "reference dark scan");
        double refSigma = scans.reference().noiseCounts().orElse(refDarkSigma);
        double loopNoise = Math.hypot(loopSigma, loopDarkSigma);
        double refNoise = Math.hypot(refSigma, refDarkSigma);

        double[] loop = regridder.onGrid(scans.loop());
        double[] loopDark = regridder.onGrid(scans.loopDark());
        double[] ref = regridder.onGrid(scans.reference());
        // one dark often serves both the loop and its reference
        double[] refDark = scans.referenceDark() == scans.loopDark() ? loopDark : regridder.onGrid(scans.referenceDark());

        int n = grid.size();
        boolean[] refClipped = clippedOnGrid(scans.reference(), refSigma, grid);
        boolean[] loopClipped = clippedOnGrid(scans.loop(), loopSigma, grid);
        boolean[] loopDarkClipped = clippedOnGrid(scans.loopDark(), loopDarkSigma, grid);
        boolean[] refDarkClipped = scans.referenceDark() == scans.loopDark() ? loopDarkClipped
                : clippedOnGrid(scans.referenceDark(), refDarkSigma, grid);
        MaskReason[] reasons = new MaskReason[n];
        double[] lossDb = new double[n];
        double[] sigmaDb = new double[n];
        boolean[] usable = new boolean[n];
        int referenceLit = 0;
        double loopSumWhereReferenceLit = 0;
        for (int i = 0; i < n; i++) {
            double nm = grid.wavelengthNm(i);
            double netLoop = loop[i] - loopDark[i];
            double netRef = ref[i] - refDark[i];
            if (!scans.loop().covers(nm)) {
                reasons[i] = MaskReason.OUTSIDE_LOOP_SCAN;
            } else if (!scans.reference().covers(nm)) {
                reasons[i] = MaskReason.OUTSIDE_REFERENCE_SCAN;
            } else if (!scans.loopDark().covers(nm) || !scans.referenceDark().covers(nm)) {
                reasons[i] = MaskReason.OUTSIDE_DARK_SCAN;
            } else if (refClipped[i]) {
                reasons[i] = MaskReason.REFERENCE_SATURATED;
            } else if (loopClipped[i]) {
                reasons[i] = MaskReason.LOOP_SATURATED;
            } else if (loopDarkClipped[i] || refDarkClipped[i]) {
                reasons[i] = MaskReason.DARK_SATURATED;
            } else if (!(netRef > noiseWidths * refNoise)) {
                reasons[i] = MaskReason.REFERENCE_AT_DARK;
            } else {
                referenceLit++;
                loopSumWhereReferenceLit += netLoop;
                if (!(netLoop > noiseWidths * loopNoise)) {
                    reasons[i] = MaskReason.LOOP_AT_DARK;
                }
            }
            if (reasons[i] == null) {
                usable[i] = true;
                lossDb[i] = -10 * Math.log10(netLoop / netRef);
                sigmaDb[i] = DB_PER_RELATIVE_CHANGE * Math.sqrt(square(loopNoise / netLoop) + square(refNoise / netRef));
            } else {
                lossDb[i] = Double.NaN;
                sigmaDb[i] = Double.NaN;
            }
        }
        // Judged on the whole spectrum, not point by point: in pure noise about one point in 740
        // still clears 3σ, and a handful of such points must not pass for light returned.
        boolean noLight = referenceLit > 0
                && !(loopSumWhereReferenceLit > noiseWidths * loopNoise * Math.sqrt(referenceLit));
        boolean noReference = referenceLit == 0 && hasReason(reasons, MaskReason.REFERENCE_AT_DARK);
        if (noLight) {
            for (int i = 0; i < n; i++) {
                if (reasons[i] == null) {
                    reasons[i] = MaskReason.LOOP_AT_DARK;
                    usable[i] = false;
                    lossDb[i] = Double.NaN;
                    sigmaDb[i] = Double.NaN;
                }
            }
        }

        DecimalFormat number = numberFormat();
        String k = formatNumber(noiseWidths, number);
        List<MaskedRange> masked = maskedRanges(grid, reasons, k, number);
        List<ThroughputResult.NegativeLossRange> negative = negativeLossRanges(grid, usable, lossDb, sigmaDb);

        List<String> warnings = new ArrayList<>();
        if (noLight) {
            warnings.add("no light returned: break or open connector in the light path"
                    + " (check with a power meter or viewing card; never look into a fiber end)");
        }
        if (noReference) {
            warnings.add("no reference light: lamp off, shutter closed or launch cord broken");
        }
        for (ThroughputResult.NegativeLossRange r : negative) {
            warnings.add(formatRange(r.fromNm(), r.toNm(), number) + ": loss down to "
                    + String.format(Locale.ROOT, "%.2f", r.minLossDb()) + " dB, below zero by more than " + k
                    + "σ: bad reference (re-reference through the launch cord alone)");
        }
        return new ThroughputResult(grid, lossDb, sigmaDb, usable, masked, noLight, noReference, negative, warnings,
                loopNoise, refNoise, noiseWidths);
    }

    /** Grid points that fall within a clipped run of {@code scan} (its widened ends included). */
    private boolean[] clippedOnGrid(RawSpectrum scan, double sigmaCounts, WavelengthGrid grid) {
        boolean[] out = new boolean[grid.size()];
        List<DetectorClipping.Run> runs = DetectorClipping.find(scan.countsView(), sigmaCounts, fullScaleCounts);
        for (DetectorClipping.Run r : runs) {
            double from = scan.axis().wavelengthNm(r.from());
            double to = scan.axis().wavelengthNm(r.to());
            for (int i = 0; i < out.length; i++) {
                double nm = grid.wavelengthNm(i);
                out[i] |= nm >= from && nm <= to;
            }
        }
        return out;
    }

    private static double noise(RawSpectrum dark, String what) {
        if (dark.noiseCounts().isPresent()) {
            return dark.noiseCounts().getAsDouble();
        }
        try {
            return DarkNoise.sigmaCounts(dark.counts());
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(what + ": " + e.getMessage(), e);
        }
    }

    private static List<MaskedRange> maskedRanges(WavelengthGrid grid, MaskReason[] reasons, String k,
                                                  DecimalFormat number) {
        List<MaskedRange> ranges = new ArrayList<>();
        int i = 0;
        while (i < reasons.length) {
            if (reasons[i] == null) {
                i++;
                continue;
            }
            int j = i;
            while (j + 1 < reasons.length && reasons[j + 1] == reasons[i]) {
                j++;
            }
            double from = grid.wavelengthNm(i);
            double to = grid.wavelengthNm(j);
            ranges.add(new MaskedRange(from, to, reasons[i], formatRange(from, to, number) + ": " + reasons[i].describe(k)));
            i = j + 1;
        }
        return ranges;
    }

    private List<ThroughputResult.NegativeLossRange> negativeLossRanges(WavelengthGrid grid, boolean[] usable,
                                                                        double[] lossDb, double[] sigmaDb) {
        List<ThroughputResult.NegativeLossRange> ranges = new ArrayList<>();
        int i = 0;
        while (i < lossDb.length) {
            if (!isNegativeBeyondNoise(usable[i], lossDb[i], sigmaDb[i])) {
                i++;
                continue;
            }
            int j = i;
            double min = lossDb[i];
            while (j + 1 < lossDb.length && isNegativeBeyondNoise(usable[j + 1], lossDb[j + 1], sigmaDb[j + 1])) {
                j++;
                min = Math.min(min, lossDb[j]);
            }
            ranges.add(new ThroughputResult.NegativeLossRange(grid.wavelengthNm(i), grid.wavelengthNm(j), min));
            i = j + 1;
        }
        return ranges;
    }

    private boolean isNegativeBeyondNoise(boolean usable, double lossDb, double sigmaDb) {
        return usable && lossDb < -Math.max(noiseWidths * sigmaDb, NUMERICAL_FLOOR_DB);
    }

    private static boolean hasReason(MaskReason[] reasons, MaskReason wanted) {
        for (MaskReason r : reasons) {
            if (r == wanted) {
                return true;
            }
        }
        return false;
    }

    private static String formatRange(double fromNm, double toNm, DecimalFormat number) {
        return fromNm == toNm ? formatNumber(fromNm, number) + " nm"
                : formatNumber(fromNm, number) + "–" + formatNumber(toNm, number) + " nm";
    }

    /**
     * {@code value} as {@code number} ("0.#") writes it. Whole wavelengths, which most grid points
     * are, skip the general decimal conversion: the pattern has no grouping and no fraction digit
     * to show, so they come out as the whole number's digits.
     */
    static String formatNumber(double value, DecimalFormat number) {
        if (value >= 1 && value < 1e9 && value == Math.rint(value)) {
            return Long.toString((long) value);
        }
        return number.format(value);
    }

    /**
     * Made once per measurement: building the format costs more than the few numbers it writes.
     * The symbols are shared read-only; the format copies them.
     */
    static DecimalFormat numberFormat() {
        return new DecimalFormat("0.#", ROOT_SYMBOLS);
    }

    private static double square(double v) {
        return v * v;
    }
}
