package org.strandbook.throughput;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.strandbook.throughput.OneCordThroughputTest.axis;
import static org.strandbook.throughput.OneCordThroughputTest.scan;

import java.util.function.DoubleUnaryOperator;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.Spectrum;

class ScanRegridderTest {

    private static final DoubleUnaryOperator LOOP_DARK = l -> 100 + 0.05 * l;
    private static final DoubleUnaryOperator LOOP_NET = l -> 2000 + 1.5 * l;
    private static final DoubleUnaryOperator REF_DARK = l -> 300 - 0.02 * l;
    private static final DoubleUnaryOperator REF_NET = l -> 5000 + 2 * l;

    // Linear interpolation reproduces a straight line exactly (R. L. Burden, J. D. Faires, Numerical
    // Analysis, 9th ed., 2011, Theorem 3.3), so every measurement through one regridder, whatever
    // axes its scans come on and in whatever order they were first seen, gives the exact ratio.
    @Test
    void oneRegridderServesMeasurementsOnSeveralAxes() {
        double[][] axes = {axis(1000, 1, 2000), axis(995, 3.3, 2010), axis(990, 2.5, 2010), axis(993, 7, 2008)};
        WavelengthGrid grid = WavelengthGrid.uniformNm(1000, 2000, 251);
        ScanRegridder regridder = new ScanRegridder(grid);

        for (int shift = 0; shift < axes.length; shift++) {
            ThroughputScans scans = new ThroughputScans(
                    scan(axes[shift % 4], l -> LOOP_DARK.applyAsDouble(l) + LOOP_NET.applyAsDouble(l), 1),
                    scan(axes[(shift + 1) % 4], LOOP_DARK, 1),
                    scan(axes[(shift + 2) % 4], l -> REF_DARK.applyAsDouble(l) + REF_NET.applyAsDouble(l), 1),
                    scan(axes[(shift + 3) % 4], REF_DARK, 1));

            ThroughputResult r = OneCordThroughput.withDefaults().measure(scans, regridder);

            for (int i = 0; i < grid.size(); i++) {
                double l = grid.wavelengthNm(i);
                double expected = -10 * Math.log10(LOOP_NET.applyAsDouble(l) / REF_NET.applyAsDouble(l));
                assertEquals(expected, r.lossDb()[i], 1e-9, "shift " + shift + ", " + l + " nm");
            }
        }
    }

    @Test
    void scansOnOneAxisShareOneAxis() {
        // design choice: one analyzer writes every scan on the same axis, so its interpolation is worked out once
        ScanRegridder regridder = new ScanRegridder(WavelengthGrid.uniformNm(1000, 2000, 11));

        WavelengthGrid first = regridder.axisNm(axis(1000, 0.5, 2000));
        regridder.axisNm(axis(990, 2.5, 2010));

        assertSame(first, regridder.axisNm(axis(1000, 0.5, 2000)));
    }

    @Test
    void aScanOnAKnownAxisGetsThatAxis() {
        // design choice, as above: a stored spectrum on a seen axis reuses that axis's interpolation
        ScanRegridder regridder = new ScanRegridder(WavelengthGrid.uniformNm(1000, 2000, 11));
        double[] nm = axis(1000, 0.5, 2000);
        WavelengthGrid known = regridder.axisNm(nm);

        assertSame(known, regridder.axisOf(new Spectrum(nm, new double[nm.length])));
    }
}
