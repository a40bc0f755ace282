package org.strandbook.diagnosis;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.throughput.MaskReason;
import org.strandbook.throughput.MaskedRange;
import org.strandbook.throughput.ThroughputResult;

/**
 * Where a loop scan measured its loss, and why it did not elsewhere: the diagnosis states amounts
 * only where they were measured and says so when a band it relies on was dark, masked or outside
 * the analyzer's range.
 */
final class MeasuredRange {

    private final WavelengthGrid grid;
    private final boolean[] usable;
    private final List<MaskedRange> masked;

    private MeasuredRange(WavelengthGrid grid, boolean[] usable, List<MaskedRange> masked) {
        this.grid = grid;
        this.usable = usable;
        this.masked = masked;
    }

    static MeasuredRange of(ThroughputResult measured) {
        return new MeasuredRange(measured.grid(), measured.usable(), measured.maskedRanges());
    }

    WavelengthGrid grid() {
        return grid;
    }

    /**
     * Share (0–1) of the range all four scans reach, in photon energy (1/λ), that lies between the
     * first and the last usable wavelength; 0 when nothing was usable. Energy, not wavelength: the
     * fault shapes (an Urbach edge, Wien's lamp drift, Rayleigh's λ⁻⁴) are smooth in photon energy,
     * so how far apart they can be told is set by the energy span the fit sees.
     */
    double usableEnergyShare() {
        double firstReachedNm = Double.NaN;
        double lastReachedNm = Double.NaN;
        for (int i = 0; i < usable.length; i++) {
            double nm = grid.wavelengthNm(i);
            if (reached(nm)) {
                firstReachedNm = Double.isNaN(firstReachedNm) ? nm : firstReachedNm;
                lastReachedNm = nm;
            }
        }
        double[] span = usableSpanNm();
        if (Double.isNaN(span[0]) || !(lastReachedNm > firstReachedNm)) {
            return 0;
        }
        return (1 / span[0] - 1 / span[1]) / (1 / firstReachedNm - 1 / lastReachedNm);
    }

    /** The first and last usable wavelength, nm; NaN when nothing was usable. */
    double[] usableSpanNm() {
        int first = -1;
        int last = -1;
        for (int i = 0; i < usable.length; i++) {
            if (usable[i]) {
                first = first < 0 ? i : first;
                last = i;
            }
        }
        return first < 0 ? new double[] {Double.NaN, Double.NaN}
                : new double[] {grid.wavelengthNm(first), grid.wavelengthNm(last)};
    }

    private boolean reached(double nm) {
        for (MaskedRange m : masked) {
            boolean outside = m.reason() == MaskReason.OUTSIDE_LOOP_SCAN || m.reason() == MaskReason.OUTSIDE_REFERENCE_SCAN
                    || m.reason() == MaskReason.OUTSIDE_DARK_SCAN;
            if (outside && nm >= m.fromNm() && nm <= m.toNm()) {
                return false;
            }
        }
        return true;
    }

    boolean usable(int index) {
        return usable[index];
    }

    /**
     * True when a band centred at {@code wavelengthNm} was measured: the grid point nearest to it and
     * its neighbours on both sides are usable (a design choice: one usable point could be a noise
     * spike between masked ones).
     */
    boolean measuredAt(double wavelengthNm) {
        if (!grid.covers(wavelengthNm)) {
            return false;
        }
        int i = grid.nearestIndex(wavelengthNm);
        for (int k = Math.max(0, i - 1); k <= Math.min(grid.size() - 1, i + 1); k++) {
            if (!usable[k]) {
                return false;
            }
        }
        return true;
    }

    /**
     * True when the loop returned no light at a band while the reference did: the band is there and
     * strong, only too strong to be measured. Seen, though not measured.
     */
    boolean darkAt(double wavelengthNm) {
        return maskAt(wavelengthNm).map(m -> m.reason() == MaskReason.LOOP_AT_DARK).orElse(false);
    }

    /** True when the loop scan says anything about a band: it was measured, or it was dark. */
    boolean observedAt(double wavelengthNm) {
        return measuredAt(wavelengthNm) || darkAt(wavelengthNm);
    }

    /** Why a band was not measured, in words, e.g. "dark (1370–1396 nm: loop signal within 3σ of dark)". */
    String whyNotMeasured(double wavelengthNm) {
        if (!grid.covers(wavelengthNm)) {
            return String.format(Locale.ROOT, "outside the measured range (%.0f–%.0f nm)", grid.firstNm(),
                    grid.lastNm());
        }
        return maskAt(wavelengthNm)
                .map(m -> (m.reason() == MaskReason.LOOP_AT_DARK ? "dark (" : "masked (") + m.description() + ")")
                .orElse("masked on either side");
    }

    private Optional<MaskedRange> maskAt(double wavelengthNm) {
        if (!grid.covers(wavelengthNm)) {
            return Optional.empty();
        }
        double w = grid.wavelengthNm(grid.nearestIndex(wavelengthNm));
        return masked.stream().filter(m -> m.fromNm() <= w && w <= m.toNm()).findFirst();
    }
}
