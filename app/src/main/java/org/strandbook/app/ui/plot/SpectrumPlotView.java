package org.strandbook.app.ui.plot;

import java.util.List;

import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Label;
import javafx.scene.control.RadioButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.util.StringConverter;

import org.strandbook.app.ui.sheet.CellFormats;

/** The detail plot: a line chart with axis toggles bound to a {@link SpectrumPlotModel}. */
public final class SpectrumPlotView {

    /** Tick labels without grouping, independent of the machine's locale (1000, not 1,000 or 1.000). */
    private static final StringConverter<Number> ROOT_NUMBERS = new StringConverter<>() {
        @Override
        public String toString(Number n) {
            return n == null ? "" : CellFormats.plain(n.doubleValue());
        }

        @Override
        public Number fromString(String s) {
            return Double.valueOf(s);
        }
    };

    private final NumberAxis xAxis = new NumberAxis();
    private final NumberAxis yAxis = new NumberAxis();
    private final LineChart<Number, Number> chart = new LineChart<>(xAxis, yAxis);
    private final BorderPane root = new BorderPane();

    public SpectrumPlotView(SpectrumPlotModel model) {
        chart.setId("loss-plot");
        chart.setLegendVisible(false);
        chart.setCreateSymbols(false);
        chart.setAnimated(false);
        xAxis.setForceZeroInRange(false);
        yAxis.setForceZeroInRange(false);
        xAxis.setAnimated(false);
        xAxis.setTickLabelFormatter(ROOT_NUMBERS);
        yAxis.setTickLabelFormatter(ROOT_NUMBERS);
        yAxis.setAnimated(false);
        chart.titleProperty().bind(model.titleProperty());

        ToggleGroup xGroup = new ToggleGroup();
        RadioButton nm = radio("nm", "plot-axis-nm", xGroup, model.axisProperty().get() == SpectralAxis.WAVELENGTH_NM);
        RadioButton cm = radio("cm\u207B\u00B9", "plot-axis-cm", xGroup, model.axisProperty().get() == SpectralAxis.WAVENUMBER_CM);
        nm.setOnAction(e -> model.axisProperty().set(SpectralAxis.WAVELENGTH_NM));
        cm.setOnAction(e -> model.axisProperty().set(SpectralAxis.WAVENUMBER_CM));
        ToggleGroup yGroup = new ToggleGroup();
        RadioButton db = radio("dB", "plot-scale-db", yGroup, model.scaleProperty().get() == LossScale.LOSS_DB);
        RadioButton pct = radio("% transmittance", "plot-scale-percent", yGroup,
                model.scaleProperty().get() == LossScale.TRANSMITTANCE_PERCENT);
        db.setOnAction(e -> model.scaleProperty().set(LossScale.LOSS_DB));
        pct.setOnAction(e -> model.scaleProperty().set(LossScale.TRANSMITTANCE_PERCENT));

        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        HBox bar = new HBox(8, new Label("x axis:"), nm, cm, gap, new Label("y axis:"), db, pct);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.getStyleClass().add("plot-toolbar");

        model.axisProperty().addListener((o, was, is) -> {
            xAxis.setLabel(is.label());
            (is == SpectralAxis.WAVELENGTH_NM ? nm : cm).setSelected(true);
        });
        model.scaleProperty().addListener((o, was, is) -> {
            yAxis.setLabel(is.label());
            (is == LossScale.LOSS_DB ? db : pct).setSelected(true);
        });
        xAxis.setLabel(model.axisProperty().get().label());
        yAxis.setLabel(model.scaleProperty().get().label());
        model.pointsProperty().addListener((o, was, is) -> draw(is));
        draw(model.pointsProperty().get());

        root.setTop(bar);
        root.setCenter(chart);
        root.getStyleClass().add("plot-pane");
    }

    public Node node() {
        return root;
    }

    public LineChart<Number, Number> chart() {
        return chart;
    }

    private static RadioButton radio(String text, String id, ToggleGroup group, boolean selected) {
        RadioButton b = new RadioButton(text);
        b.setId(id);
        b.setToggleGroup(group);
        b.setSelected(selected);
        return b;
    }

    private void draw(List<SpectrumPlotModel.PlotPoint> points) {
        XYChart.Series<Number, Number> series = new XYChart.Series<>();
        for (SpectrumPlotModel.PlotPoint p : points) {
            series.getData().add(new XYChart.Data<>(p.x(), p.y()));
        }
        chart.getData().setAll(List.of(series));
    }
}
