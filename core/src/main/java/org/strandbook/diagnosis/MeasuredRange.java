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
