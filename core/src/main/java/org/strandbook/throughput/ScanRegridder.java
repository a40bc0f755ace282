package org.strandbook.throughput;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.strandbook.optics.LinearResampling;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.Spectrum;

/**
 * Puts the scans of one evaluation onto its common grid. The scans of one analyzer share one axis,
 * so each distinct axis is checked and its interpolation onto the grid worked out once, not once
 * per scan. Holds one evaluation's axes: make one per evaluation; not thread-safe.
 */
public final class ScanRegridder {

    private final WavelengthGrid grid;
    private final List<double[]> knownAxesNm = new ArrayList<>();
    private final List<WavelengthGrid> knownAxes = new ArrayList<>();
    private final List<LinearResampling> resamplings = new ArrayList<>();

    /** For scans to be put onto {@code grid}. */
    public ScanRegridder(WavelengthGrid grid) {
        this.grid = grid;
    }

    public WavelengthGrid grid() {
        return grid;
    }

    /**
     * The axis of a scan: the same instance for every scan on an axis this regridder has seen, so
     * its interpolation is shared.
     */
    public WavelengthGrid axisOf(Spectrum scan) {
        // most scans of a site share a few axes: compare in place rather than copy each scan's axis out
        for (int i = 0; i < knownAxesNm.size(); i++) {
            if (scan.hasAxisNm(knownAxesNm.get(i))) {
                return knownAxes.get(i);
            }
        }
        return axisNm(scan.wavelengthsNm());
    }

    /** As {@link #axisOf(Spectrum)}, for an axis given as its wavelengths (strictly ascending, nm). */
    public WavelengthGrid axisNm(double[] wavelengthsNm) {
        for (int i = 0; i < knownAxesNm.size(); i++) {
            if (Arrays.equals(knownAxesNm.get(i), wavelengthsNm)) {
                return knownAxes.get(i);
            }
        }
        WavelengthGrid axis = WavelengthGrid.ofNm(wavelengthsNm);
        knownAxesNm.add(axis.wavelengthsNm());
        knownAxes.add(axis);
        return axis;
    }

    /** The scan's counts linearly interpolated onto the grid (end values held outside its axis). */
    double[] onGrid(RawSpectrum scan) {
        return scan.resampledBy(resamplingFrom(scan.axis()));
    }

    private LinearResampling resamplingFrom(WavelengthGrid axis) {
        for (LinearResampling r : resamplings) {
            if (r.source() == axis) {
                return r;
            }
        }
        for (LinearResampling r : resamplings) {
            if (r.source().equals(axis)) {
                return r;
            }
        }
        LinearResampling r = axis.resamplingOnto(grid);
        resamplings.add(r);
        return r;
    }
}
