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
import javafx.util.StringConverter;

/** The loss-over-time plot bound to a {@link TrendPlotModel}: dates across, loss or transmittance up. */
public final class TrendPlotView {

    private static final StringConverter<Number> MONTHS = new StringConverter<>() {
        @Override
        public String toString(Number n) {
            return n == null ? "" : TrendPlotModel.monthOf(n.doubleValue());
        }

        @Override
        public Number fromString(String s) {
            throw new UnsupportedOperationException("dates are not typed into the axis");
        }
    };

    private final NumberAxis xAxis = ChartStyling.axis();
    private final NumberAxis yAxis = ChartStyling.axis();
    private final LineChart<Number, Number> chart = new LineChart<>(xAxis, yAxis);
    private final FlowPane legend;
    private final Label placeholder = new Label();
    private final BorderPane root = new BorderPane();

    public TrendPlotView(TrendPlotModel model, String id) {
        chart.setId(id);
        chart.setLegendVisible(false);
        chart.setCreateSymbols(true);
        chart.setAnimated(false);
        chart.setAxisSortingPolicy(LineChart.SortingPolicy.NONE);
        chart.getStyleClass().add("loss-plot");
        chart.titleProperty().bind(model.titleProperty());
        xAxis.setTickLabelFormatter(MONTHS);
        xAxis.setLabel("Date of scan (UTC)");
        legend = ChartStyling.legend(id + "-legend");

        placeholder.setId(id + "-placeholder");
        placeholder.getStyleClass().add("plot-placeholder");
        placeholder.setWrapText(true);
        placeholder.textProperty().bind(model.placeholderProperty());
        placeholder.visibleProperty().bind(model.placeholderProperty().isNotEmpty());

        model.axes().scaleProperty().addListener((o, was, is) -> yAxis.setLabel(is.label()));
        yAxis.setLabel(model.axes().scaleProperty().get().label());
        model.linesProperty().addListener((o, was, is) -> draw(is));
        model.xRangeProperty().addListener((o, was, is) -> ChartStyling.apply(xAxis, is));
        model.yRangeProperty().addListener((o, was, is) -> ChartStyling.apply(yAxis, is));
        draw(model.linesProperty().get());

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

    private void draw(List<TrendPlotModel.TrendLine> lines) {
        List<XYChart.Series<Number, Number>> all = new ArrayList<>();
        List<CurveStyle> styles = new ArrayList<>();
        for (TrendPlotModel.TrendLine line : lines) {
            if (line.points().isEmpty()) {
                continue;
            }
            XYChart.Series<Number, Number> series = new XYChart.Series<>();
            series.setName(line.label());
            List<XYChart.Data<Number, Number>> data = new ArrayList<>(line.points().size());
            for (TrendPlotModel.TimePoint p : line.points()) {
                data.add(new XYChart.Data<>(p.epochDay(), p.y()));
            }
            series.getData().setAll(data);
            all.add(series);
            styles.add(line.style());
        }
        chart.getData().setAll(all);
        for (int i = 0; i < all.size(); i++) {
            ChartStyling.style(all.get(i), styles.get(i));
        }
        ChartStyling.fillLegend(legend, lines.stream().map(TrendPlotModel.TrendLine::label).toList(),
                lines.stream().map(l -> l.detail().isEmpty() ? l.label() : l.label() + "\n" + l.detail()).toList(),
                lines.stream().map(TrendPlotModel.TrendLine::style).toList());
    }
}
