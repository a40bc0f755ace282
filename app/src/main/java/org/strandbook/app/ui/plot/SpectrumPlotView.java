package org.strandbook.app.ui.plot;

import java.util.ArrayList;
import java.util.List;

import javafx.scene.Node;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Label;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.StackPane;
import javafx.scene.shape.Polygon;

/** A spectral plot bound to a {@link SpectrumPlotModel}: a line chart, its legend below, and a message when empty. */
public final class SpectrumPlotView {

    private final NumberAxis xAxis = ChartStyling.axis();
    private final NumberAxis yAxis = ChartStyling.axis();
    private final ShadedLineChart chart = new ShadedLineChart(xAxis, yAxis);
    private final FlowPane legend;
    private final Label placeholder = new Label();
    private final BorderPane root = new BorderPane();
    private List<CurveStyle> drawnStyles = List.of();
    private List<String> legendLabels = List.of();
    private List<CurveStyle> legendStyles = List.of();
    private List<SpectrumPlotModel.PlotBand> shownBands = List.of();

    /** {@code id} names the chart node; the legend is {@code id + "-legend"}. */
    public SpectrumPlotView(SpectrumPlotModel model, String id) {
        chart.setId(id);
        chart.setLegendVisible(false);
        chart.setCreateSymbols(false);
        chart.setAnimated(false);
        chart.setAxisSortingPolicy(LineChart.SortingPolicy.NONE);
        chart.getStyleClass().add("loss-plot");
        chart.titleProperty().bind(model.titleProperty());
        legend = ChartStyling.legend(id + "-legend");

        placeholder.setId(id + "-placeholder");
        placeholder.getStyleClass().add("plot-placeholder");
        placeholder.setWrapText(true);
        placeholder.textProperty().bind(model.placeholderProperty());
        placeholder.visibleProperty().bind(model.placeholderProperty().isNotEmpty());

        model.axes().axisProperty().addListener((o, was, is) -> xAxis.setLabel(is.label()));
        model.axes().scaleProperty().addListener((o, was, is) -> yAxis.setLabel(is.label()));
        xAxis.setLabel(model.axes().axisProperty().get().label());
        yAxis.setLabel(model.axes().scaleProperty().get().label());
        model.linesProperty().addListener((o, was, is) -> draw(is));
        model.bandsProperty().addListener((o, was, is) -> shade(is));
        model.xRangeProperty().addListener((o, was, is) -> ChartStyling.apply(xAxis, is));
        model.yRangeProperty().addListener((o, was, is) -> ChartStyling.apply(yAxis, is));
        draw(model.linesProperty().get());
        shade(model.bandsProperty().get());
        ChartStyling.apply(xAxis, model.xRangeProperty().get());
        ChartStyling.apply(yAxis, model.yRangeProperty().get());

        root.setCenter(new StackPane(chart, placeholder));
        root.setBottom(legend);
        root.getStyleClass().add("plot-pane");
    }

    public Node node() {
        return root;
    }

    public LineChart<Number, Number> chart() {
        return chart;
    }

    public FlowPane legend() {
        return legend;
    }

    /** The polygons of the shaded bands drawn now. */
    public List<Polygon> bandShapes() {
        return chart.bandShapes();
    }

    private void shade(List<SpectrumPlotModel.PlotBand> bands) {
        boolean sameLegend = bands.stream().map(SpectrumPlotModel.PlotBand::label).toList()
                .equals(shownBands.stream().map(SpectrumPlotModel.PlotBand::label).toList());
        shownBands = bands;
        chart.setBands(bands);
        if (!sameLegend) {
            fillLegend();
        }
    }

    private void fillLegend() {
        ChartStyling.fillLegend(legend, legendLabels, legendStyles);
        for (SpectrumPlotModel.PlotBand b : shownBands) {
            legend.getChildren().add(ChartStyling.bandLegendEntry(legend, b.label(), b.colour()));
        }
    }

    /**
     * Draws the lines. When only the values changed (an edit moves the curves, the curves stay the
     * same), the points already on the chart are moved instead of replaced: new series and new
     * legend nodes would each go through CSS and layout, which costs more than the arithmetic.
     */
    private void draw(List<SpectrumPlotModel.PlotLine> lines) {
        List<List<SpectrumPlotModel.PlotPoint>> runs = new ArrayList<>();
        List<CurveStyle> styles = new ArrayList<>();
        for (SpectrumPlotModel.PlotLine line : lines) {
            for (List<SpectrumPlotModel.PlotPoint> run : line.runs()) {
                runs.add(run);
                styles.add(line.style());
            }
        }
        if (styles.equals(drawnStyles) && sameShape(runs)) {
            for (int i = 0; i < runs.size(); i++) {
                List<XYChart.Data<Number, Number>> data = chart.getData().get(i).getData();
                List<SpectrumPlotModel.PlotPoint> run = runs.get(i);
                for (int k = 0; k < run.size(); k++) {
                    data.get(k).setXValue(run.get(k).x());
                    data.get(k).setYValue(run.get(k).y());
                }
            }
        } else {
            List<XYChart.Series<Number, Number>> all = new ArrayList<>();
            for (List<SpectrumPlotModel.PlotPoint> run : runs) {
                XYChart.Series<Number, Number> series = new XYChart.Series<>();
                List<XYChart.Data<Number, Number>> data = new ArrayList<>(run.size());
                for (SpectrumPlotModel.PlotPoint p : run) {
                    data.add(new XYChart.Data<>(p.x(), p.y()));
                }
                series.getData().setAll(data);
                all.add(series);
            }
            chart.getData().setAll(all);
            for (int i = 0; i < all.size(); i++) {
                ChartStyling.style(all.get(i), styles.get(i));
            }
            drawnStyles = styles;
        }
        List<String> labels = lines.stream().map(SpectrumPlotModel.PlotLine::label).toList();
        List<CurveStyle> lineStyles = lines.stream().map(SpectrumPlotModel.PlotLine::style).toList();
        if (!labels.equals(legendLabels) || !lineStyles.equals(legendStyles)) {
            legendLabels = labels;
            legendStyles = lineStyles;
            fillLegend();
        }
    }

    private boolean sameShape(List<List<SpectrumPlotModel.PlotPoint>> runs) {
        if (chart.getData().size() != runs.size()) {
            return false;
        }
        for (int i = 0; i < runs.size(); i++) {
            if (chart.getData().get(i).getData().size() != runs.get(i).size()) {
                return false;
            }
        }
        return true;
    }
}
