package org.strandbook.throughput;

import java.util.Arrays;
import java.util.List;
import java.util.Objects;

import org.strandbook.optics.Decibel;
import org.strandbook.optics.WavelengthGrid;

/**
 * Measured loss spectrum of a light path by the one-cord reference method, with what could not be
 * measured and why.
 *
 * @param grid                 the wavelength grid every array below belongs to
 * @param lossDb               loss in dB per grid point; {@code NaN} where masked
 * @param sigmaDb              standard uncertainty of {@code lossDb} from detector noise, dB
 *                             (first-order propagation); {@code NaN} where masked. 1/σ is the row
 *                             weight for a fit of the loss spectrum
 * @param usable               true where the loss was measured
 * @param maskedRanges         the masked grid points as runs of equal reason, in wavelength order
 * @param noLightReturned      true when the reference shows lamp light but the loop returns none
 *                             anywhere: a break or an open connector
 * @param noReferenceLight     true when the reference itself is at its dark level everywhere
 * @param negativeLossRanges   runs of usable points whose loss is below zero by more than k σ
 * @param warnings             findings in words, for the technician
 * @param loopNoiseCounts      noise width of the dark-corrected loop signal used for masking, counts
 * @param referenceNoiseCounts noise width of the dark-corrected reference signal, counts
 * @param noiseWidths          k, the number of noise widths used for masking and warnings
 */
public record ThroughputResult(WavelengthGrid grid, double[] lossDb, double[] sigmaDb, boolean[] usable,
                               List<MaskedRange> maskedRanges, boolean noLightReturned, boolean noReferenceLight,
                               List<NegativeLossRange> negativeLossRanges, List<String> warnings,
                               double loopNoiseCounts, double referenceNoiseCounts, double noiseWidths) {

    /**
     * Usable grid points whose loss is negative beyond noise: more light came back through the
     * loop than through the launch cord alone, which only a bad reference explains.
     *
     * @param fromNm    first grid wavelength of the run, nm
     * @param toNm      last grid wavelength of the run, nm
     * @param minLossDb most negative loss in the run, dB
     */
    public record NegativeLossRange(double fromNm, double toNm, double minLossDb) {
    }

    public ThroughputResult {
        Objects.requireNonNull(grid, "grid");
        grid.requireSameLength(lossDb);
        grid.requireSameLength(sigmaDb);
        if (usable.length != grid.size()) {
            throw new IllegalArgumentException("mask has " + usable.length + " points but the grid has " + grid.size());
        }
        lossDb = lossDb.clone();
        sigmaDb = sigmaDb.clone();
        usable = usable.clone();
        maskedRanges = List.copyOf(maskedRanges);
        negativeLossRanges = List.copyOf(negativeLossRanges);
        warnings = List.copyOf(warnings);
    }

    @Override
    public double[] lossDb() {
        return lossDb.clone();
    }

    @Override
    public double[] sigmaDb() {
        return sigmaDb.clone();
    }

    @Override
    public boolean[] usable() {
        return usable.clone();
    }

    /** Number of usable grid points. */
    public int usableCount() {
        int c = 0;
        for (boolean u : usable) {
            if (u) {
                c++;
            }
        }
        return c;
    }

    /**
     * Share of the grid points that all four scans reach where a detector was saturated or
     * clipped (0–1); 0 when the scans reach none.
     */
    public double saturatedFraction() {
        int saturated = 0;
        int outside = 0;
        for (MaskedRange r : maskedRanges) {
            int points = pointsWithin(r);
            if (r.reason().isSaturation()) {
                saturated += points;
            } else if (r.reason() == MaskReason.OUTSIDE_LOOP_SCAN || r.reason() == MaskReason.OUTSIDE_REFERENCE_SCAN
                    || r.reason() == MaskReason.OUTSIDE_DARK_SCAN) {
                outside += points;
            }
        }
        int reached = grid.size() - outside;
        return reached == 0 ? 0 : (double) saturated / reached;
    }

    /** The reasons of the saturated ranges in words, each once, e.g. "reference saturated: ...". */
    public List<String> saturationReasons() {
        return maskedRanges.stream().filter(r -> r.reason().isSaturation()).map(r -> r.reason().describe(""))
                .distinct().toList();
    }

    private int pointsWithin(MaskedRange r) {
        int n = 0;
        for (int i = 0; i < grid.size(); i++) {
            double nm = grid.wavelengthNm(i);
            if (nm >= r.fromNm() && nm <= r.toNm()) {
                n++;
            }
        }
        return n;
    }

    /** Transmittance T = 10^(−L/10) per grid point; {@code NaN} where masked. */
    public double[] transmittance() {
        return Decibel.transmittanceFromLossDb(lossDb);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ThroughputResult r
                && grid.equals(r.grid)
                && Arrays.equals(lossDb, r.lossDb)
                && Arrays.equals(sigmaDb, r.sigmaDb)
                && Arrays.equals(usable, r.usable)
                && maskedRanges.equals(r.maskedRanges)
                && noLightReturned == r.noLightReturned
                && noReferenceLight == r.noReferenceLight
                && negativeLossRanges.equals(r.negativeLossRanges)
                && warnings.equals(r.warnings)
                && Double.compare(loopNoiseCounts, r.loopNoiseCounts) == 0
                && Double.compare(referenceNoiseCounts, r.referenceNoiseCounts) == 0
                && Double.compare(noiseWidths, r.noiseWidths) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(grid, Arrays.hashCode(lossDb), Arrays.hashCode(usable), maskedRanges, warnings);
    }

    @Override
    public String toString() {
        return "ThroughputResult[" + grid + ", usable " + usableCount() + " of " + grid.size()
                + ", maskedRanges=" + maskedRanges + ", warnings=" + warnings + "]";
    }
}
