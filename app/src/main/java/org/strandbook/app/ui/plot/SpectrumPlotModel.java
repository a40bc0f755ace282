package org.strandbook.app.ui.plot;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;


/**
 * What one spectral plot shows: curves in nm and dB, turned into points in the axes the user chose
 * ({@link PlotAxes}) whenever the curves or the choice change. A curve with NaN values becomes
 * several runs, so masked ranges show as gaps. Long curves are thinned to at most
 * {@link #MAX_POINTS} points per curve: the evaluation grid's 2 nm steps are finer than a plot a
 * few hundred pixels wide can show, and fewer points keep a redraw inside a frame.
 */
public final class SpectrumPlotModel extends PlotModel<SpectrumPlotModel.PlotLine> {

    static final int MAX_POINTS = 400;

    /** A point in the chosen axes. */
    public record PlotPoint(double x, double y) {
    }

    /** A curve in the chosen axes: its legend text, style, and its runs between gaps, x ascending. */
    public record PlotLine(String label, CurveStyle style, List<List<PlotPoint>> runs) {

        public PlotLine {
            runs = List.copyOf(runs);
        }
    }

    /** A point of a shaded band in the chosen axes: the band runs from {@code y1} to {@code y2} at {@code x}. */
    public record BandPoint(double x, double y1, double y2) {
    }

    /** A shaded band in the chosen axes, x ascending. */
    public record PlotBand(String label, String colour, List<BandPoint> points) {

        public PlotBand {
            points = List.copyOf(points);
        }
    }

    private final ReadOnlyObjectWrapper<List<PlotBand>> bands = new ReadOnlyObjectWrapper<>(this, "bands", List.of());
    private CoverageBand band;
    private List<Curve> curves = List.of();
    private double ceilingDb = Double.POSITIVE_INFINITY;

    public SpectrumPlotModel(PlotAxes axes) {
        super(axes);
    }

    /** The curves shown now, in nm and dB. */
    public List<Curve> curves() {
        return curves;
    }

    public void show(String caption, List<Curve> shown) {
        show(caption, shown, Double.POSITIVE_INFINITY);
    }

    /**
     * Shows curves with the loss axis cut at {@code ceilingDb}: silica's infrared edge climbs to
     * hundreds of dB at the end of an analyzer's range and would flatten the few dB that matter.
     */
    public void show(String caption, List<Curve> shown, double ceilingDb) {
        title.set(caption);
        placeholder.set("");
        curves = List.copyOf(shown);
        this.ceilingDb = ceilingDb;
        recompute();
    }

    /** The shaded bands drawn behind the lines (none, or the prediction's coverage interval). */
    public ReadOnlyObjectProperty<List<PlotBand>> bandsProperty() {
        return bands.getReadOnlyProperty();
    }

    /** Shades {@code shown} behind the curves; {@code null} removes the band. */
    public void showBand(CoverageBand shown) {
        band = shown;
        bands.set(band == null ? List.of() : List.of(plotBand(band, axes().axisProperty().get(),
                axes().scaleProperty().get())));
    }

    /** Shows nothing, and {@code message} in its place. */
    public void clear(String caption, String message) {
        title.set(caption);
        placeholder.set(message);
        curves = List.of();
        band = null;
        ceilingDb = Double.POSITIVE_INFINITY;
        recompute();
    }

    @Override
    protected void recompute() {
        SpectralAxis x = axes().axisProperty().get();
        LossScale y = axes().scaleProperty().get();
        List<PlotLine> out = new ArrayList<>(curves.size());
        for (Curve c : curves) {
            out.add(new PlotLine(c.label(y), c.style(), runs(c, x, y)));
        }
        lines.set(List.copyOf(out));
        ranges(out, y);
        bands.set(band == null ? List.of() : List.of(plotBand(band, x, y)));
    }

    private static PlotBand plotBand(CoverageBand b, SpectralAxis x, LossScale y) {
        double[] nm = b.wavelengthsNm();
        double[] low = b.lowDb();
        double[] high = b.highDb();
        int stride = Math.max(1, (nm.length + MAX_POINTS - 1) / MAX_POINTS);
        List<BandPoint> points = new ArrayList<>();
        for (int i = 0; i < nm.length; i++) {
            if (i % stride == 0 || i == nm.length - 1) {
                points.add(new BandPoint(x.fromNm(nm[i]), y.fromLossDb(low[i]), y.fromLossDb(high[i])));
            }
        }
        if (x == SpectralAxis.WAVENUMBER_CM) {
            Collections.reverse(points);
        }
        return new PlotBand(b.label(), b.colour(), points);
    }

    private void ranges(List<PlotLine> shown, LossScale y) {
        double xLo = Double.POSITIVE_INFINITY;
        double xHi = Double.NEGATIVE_INFINITY;
        double yLo = Double.POSITIVE_INFINITY;
        double yHi = Double.NEGATIVE_INFINITY;
        for (PlotLine line : shown) {
            for (List<PlotPoint> run : line.runs()) {
                for (PlotPoint p : run) {
                    xLo = Math.min(xLo, p.x());
                    xHi = Math.max(xHi, p.x());
                    yLo = Math.min(yLo, p.y());
                    yHi = Math.max(yHi, p.y());
                }
            }
        }
        if (xLo > xHi) {
            xRange.set(null);
            yRange.set(null);
            return;
        }
        xRange.set(AxisRange.exact(xLo, xHi, 6));
        if (y == LossScale.LOSS_DB) {
            yHi = Math.min(yHi, ceilingDb);
            yLo = Math.max(yLo, -ceilingDb / 4);
        }
        yRange.set(AxisRange.rounded(Math.min(yLo, 0), yHi, 6));
    }

    private static List<List<PlotPoint>> runs(Curve c, SpectralAxis x, LossScale y) {
        int stride = Math.max(1, (c.size() + MAX_POINTS - 1) / MAX_POINTS);
        List<List<PlotPoint>> runs = new ArrayList<>();
        List<PlotPoint> run = new ArrayList<>();
        for (int i = 0; i < c.size(); i++) {
            double v = c.lossDb(i);
            if (Double.isNaN(v)) {
                if (!run.isEmpty()) {
                    runs.add(run);
                    run = new ArrayList<>();
                }
                continue;
            }
            // thin evenly but keep both ends of every run, so gaps start and stop where they are
            boolean edge = i == 0 || i == c.size() - 1 || Double.isNaN(c.lossDb(i - 1)) || Double.isNaN(c.lossDb(i + 1));
            if (edge || i % stride == 0) {
                run.add(new PlotPoint(x.fromNm(c.wavelengthNm(i)), y.fromLossDb(v)));
            }
        }
        if (!run.isEmpty()) {
            runs.add(run);
        }
        if (x == SpectralAxis.WAVENUMBER_CM) {
            // wavenumber falls as wavelength rises: reverse so every run reads left to right
            for (List<PlotPoint> r : runs) {
                Collections.reverse(r);
            }
            Collections.reverse(runs);
        }
        runs.replaceAll(List::copyOf);
        return runs;
    }
}
