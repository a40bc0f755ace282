package org.strandbook.optics;

/**
 * Linear interpolation from one wavelength axis onto another, worked out once so that every
 * spectrum on the same source axis is carried over by one multiply-add per target point: an
 * evaluation puts hundreds of scans of one analyzer axis onto one grid, and locating each target
 * wavelength between its two neighbours costs more than the interpolation itself.
 *
 * <p>End values are held outside the source axis, as in {@link WavelengthGrid#resample}, which is
 * this resampling applied once. Immutable and thread-safe.
 */
public final class LinearResampling {

    private final WavelengthGrid source;
    private final WavelengthGrid target;
    /** Target points before this index hold the source's first value. */
    private final int interiorFrom;
    /** Target points from this index on hold the source's last value. */
    private final int interiorTo;
    /** Per interior target point: the source index just below it. */
    private final int[] lowerIndex;
    /** Per interior target point: its distance above the lower neighbour as a fraction of the step. */
    private final double[] fraction;

    LinearResampling(WavelengthGrid source, WavelengthGrid target) {
        this.source = source;
        this.target = target;
        int n = source.size();
        int m = target.size();
        double first = source.firstNm();
        double last = source.lastNm();
        int from = 0;
        while (from < m && (n == 1 || target.wavelengthNm(from) <= first)) {
            from++;
        }
        int to = m;
        while (to > from && target.wavelengthNm(to - 1) >= last) {
            to--;
        }
        interiorFrom = from;
        interiorTo = to;
        lowerIndex = new int[to - from];
        fraction = new double[to - from];
        int j = 0;
        for (int i = from; i < to; i++) {
            double w = target.wavelengthNm(i);
            while (source.wavelengthNm(j + 1) < w) {
                j++;
            }
            double below = source.wavelengthNm(j);
            lowerIndex[i - from] = j;
            fraction[i - from] = (w - below) / (source.wavelengthNm(j + 1) - below);
        }
    }

    public WavelengthGrid source() {
        return source;
    }

    public WavelengthGrid target() {
        return target;
    }

    /** {@code values} (one per source point) interpolated onto the target grid. */
    public double[] apply(double[] values) {
        source.requireSameLength(values);
        double[] out = new double[target.size()];
        double firstValue = values[0];
        for (int i = 0; i < interiorFrom; i++) {
            out[i] = firstValue;
        }
        int[] lower = lowerIndex;
        double[] part = fraction;
        for (int p = 0; p < lower.length; p++) {
            int j = lower[p];
            double below = values[j];
            out[interiorFrom + p] = below + part[p] * (values[j + 1] - below);
        }
        double lastValue = values[values.length - 1];
        for (int i = interiorTo; i < out.length; i++) {
            out[i] = lastValue;
        }
        return out;
    }
}
