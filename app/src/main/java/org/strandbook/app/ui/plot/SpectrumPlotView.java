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

/** A spectral plot bound to a {@link SpectrumPlotModel}: a line chart, its legend below, and a message when empty. */
public final class SpectrumPlotView {

    private final NumberAxis xAxis = ChartStyling.axis();
    private final NumberAxis yAxis = ChartStyling.axis();
    private final LineChart<Number, Number> chart = new LineChart<>(xAxis, yAxis);
    private final FlowPane legend;
    private final Label placeholder = new Label();
    private final BorderPane root = new BorderPane();

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
        model.xRangeProperty().addListener((o, was, is) -> ChartStyling.apply(xAxis, is));
        model.yRangeProperty().addListener((o, was, is) -> ChartStyling.apply(yAxis, is));
        draw(model.linesProperty().get());
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

    private void draw(List<SpectrumPlotModel.PlotLine> lines) {
        List<XYChart.Series<Number, Number>> all = new ArrayList<>();
        List<CurveStyle> styles = new ArrayList<>();
        for (SpectrumPlotModel.PlotLine line : lines) {
            for (List<SpectrumPlotModel.PlotPoint> run : line.runs()) {
                XYChart.Series<Number, Number> series = new XYChart.Series<>();
                series.setName(line.label());
                List<XYChart.Data<Number, Number>> data = new ArrayList<>(run.size());
                for (SpectrumPlotModel.PlotPoint p : run) {
                    data.add(new XYChart.Data<>(p.x(), p.y()));
                }
                series.getData().setAll(data);
                all.add(series);
                styles.add(line.style());
            }
        }
        chart.getData().setAll(all);
        for (int i = 0; i < all.size(); i++) {
            ChartStyling.style(all.get(i), styles.get(i));
        }
        ChartStyling.fillLegend(legend, lines.stream().map(SpectrumPlotModel.PlotLine::label).toList(),
                lines.stream().map(SpectrumPlotModel.PlotLine::style).toList());
    }
}
