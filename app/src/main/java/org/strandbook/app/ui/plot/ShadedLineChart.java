package org.strandbook.app.ui.plot;

import java.util.ArrayList;
import java.util.List;

import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.shape.Polygon;

/**
 * A line chart that shades bands behind its lines. JavaFX's charts have no band between two curves
 * (an area chart fills down to the axis), so each band is a polygon in the plot's own children,
 * laid out from the axes' display positions whenever the chart lays out its lines.
 */
final class ShadedLineChart extends LineChart<Number, Number> {

    /** Fill opacity of a band: design choice, light enough for every line to stay readable on it. */
    static final double BAND_OPACITY = 0.3;

    private List<SpectrumPlotModel.PlotBand> bands = List.of();
    private final List<Polygon> shapes = new ArrayList<>();

    ShadedLineChart(NumberAxis x, NumberAxis y) {
        super(x, y);
    }

    void setBands(List<SpectrumPlotModel.PlotBand> shown) {
        bands = List.copyOf(shown);
        getPlotChildren().removeAll(shapes);
        shapes.clear();
        for (SpectrumPlotModel.PlotBand b : bands) {
            Polygon p = new Polygon();
            p.getStyleClass().add("coverage-band");
            p.setStyle("-fx-fill: " + b.colour() + "; -fx-stroke: transparent;");
            p.setOpacity(BAND_OPACITY);
            p.setMouseTransparent(true);
            shapes.add(p);
        }
        getPlotChildren().addAll(0, shapes);
        requestChartLayout();
    }

    /** The polygons drawn now, one per band (for tests). */
    List<Polygon> bandShapes() {
        return List.copyOf(shapes);
    }

    @Override
    protected void layoutPlotChildren() {
        super.layoutPlotChildren();
        NumberAxis x = (NumberAxis) getXAxis();
        NumberAxis y = (NumberAxis) getYAxis();
        for (int b = 0; b < bands.size(); b++) {
            List<SpectrumPlotModel.BandPoint> points = bands.get(b).points();
            Double[] xy = new Double[4 * points.size()];
            int k = 0;
            for (SpectrumPlotModel.BandPoint p : points) {
                xy[k++] = x.getDisplayPosition(p.x());
                xy[k++] = y.getDisplayPosition(p.y2());
            }
            for (int i = points.size() - 1; i >= 0; i--) {
                SpectrumPlotModel.BandPoint p = points.get(i);
                xy[k++] = x.getDisplayPosition(p.x());
                xy[k++] = y.getDisplayPosition(p.y1());
            }
            shapes.get(b).getPoints().setAll(xy);
        }
    }
}
