package org.strandbook.app.ui.plot;

import java.util.List;
import java.util.Locale;

import javafx.scene.Node;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Label;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.shape.Circle;
import javafx.scene.shape.Line;
import javafx.scene.shape.Rectangle;
import javafx.util.StringConverter;

import org.strandbook.app.ui.sheet.CellFormats;

/** Draws curves in their {@link CurveStyle} and writes the legend the plots share. */
final class ChartStyling {

    /** Tick labels without grouping, independent of the machine's locale (1000, not 1,000 or 1.000). */
    static final StringConverter<Number> ROOT_NUMBERS = new StringConverter<>() {
        @Override
        public String toString(Number n) {
            if (n == null) {
                return "";
            }
            double v = n.doubleValue();
            // ticks land on round numbers; rounding hides the binary noise of 0.1 steps
            return CellFormats.plain(Math.round(v * 1e6) / 1e6);
        }

        @Override
        public Number fromString(String s) {
            return Double.valueOf(s);
        }
    };

    private ChartStyling() {
    }

    static NumberAxis axis() {
        NumberAxis a = new NumberAxis();
        a.setForceZeroInRange(false);
        a.setAnimated(false);
        a.setTickLabelFormatter(ROOT_NUMBERS);
        return a;
    }

    /** Fixes an axis to {@code range}, or lets it follow the data when there is none. */
    static void apply(NumberAxis axis, AxisRange range) {
        if (range == null) {
            axis.setAutoRanging(true);
            return;
        }
        axis.setAutoRanging(false);
        axis.setLowerBound(range.lower());
        axis.setUpperBound(range.upper());
        axis.setTickUnit(range.tick());
    }

    /** Styles a series after it joined its chart (the chart creates its line node then). */
    static void style(XYChart.Series<Number, Number> series, CurveStyle style) {
        Node line = series.getNode();
        if (line != null) {
            line.setStyle(style.markers() ? "-fx-stroke: transparent;" : lineCss(style));
        }
        for (XYChart.Data<Number, Number> d : series.getData()) {
            Node symbol = d.getNode();
            if (symbol == null) {
                continue;
            }
            if (style.markers()) {
                symbol.setStyle("-fx-background-color: " + style.colour() + ", white; -fx-background-insets: 0, 2;"
                        + " -fx-background-radius: 5px; -fx-padding: 4px;");
            } else {
                symbol.setVisible(false);
            }
        }
    }

    private static String lineCss(CurveStyle style) {
        return String.format(Locale.ROOT, "-fx-stroke: %s; -fx-stroke-width: %.1fpx;%s", style.colour(), style.widthPx(),
                style.dashed() ? " -fx-stroke-dash-array: 7 4;" : "");
    }

    /** One legend entry per label, drawn as the curve is; a curve with an empty label has none. */
    static void fillLegend(FlowPane legend, List<String> labels, List<CurveStyle> styles) {
        fillLegend(legend, labels, labels, styles);
    }

    /** As {@link #fillLegend(FlowPane, List, List)}, with the text each entry shows on hover. */
    static void fillLegend(FlowPane legend, List<String> labels, List<String> hover, List<CurveStyle> styles) {
        legend.getChildren().clear();
        for (int i = 0; i < labels.size(); i++) {
            if (labels.get(i).isEmpty()) {
                continue;
            }
            CurveStyle s = styles.get(i);
            Node key;
            if (s.markers()) {
                Circle c = new Circle(4);
                c.setStyle("-fx-fill: white; -fx-stroke: " + s.colour() + "; -fx-stroke-width: 2.5;");
                key = c;
            } else {
                Line l = new Line(0, 0, 22, 0);
                l.setStyle(lineCss(s));
                key = l;
            }
            Label text = new Label(labels.get(i));
            text.getStyleClass().add("plot-legend-text");
            // a legend never widens its plot: in a narrow window an entry ends in "…" and shows in full on hover
            text.setMinWidth(0);
            text.setTooltip(new Tooltip(hover.get(i)));
            HBox entry = new HBox(4, key, text);
            entry.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
            entry.maxWidthProperty().bind(legend.widthProperty());
            legend.getChildren().add(entry);
        }
    }

    /** A legend entry for a shaded band: a filled swatch as translucent as the band. */
    static Node bandLegendEntry(FlowPane legend, String label, String colour) {
        Rectangle key = new Rectangle(22, 10);
        key.setStyle("-fx-fill: " + colour + ";");
        key.setOpacity(ShadedLineChart.BAND_OPACITY);
        Label text = new Label(label);
        text.getStyleClass().add("plot-legend-text");
        text.setMinWidth(0);
        text.setTooltip(new Tooltip(label));
        HBox entry = new HBox(4, key, text);
        entry.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        entry.maxWidthProperty().bind(legend.widthProperty());
        return entry;
    }

    static FlowPane legend(String id) {
        FlowPane legend = new FlowPane(12, 1);
        legend.setMinWidth(0);
        legend.setId(id);
        legend.getStyleClass().add("plot-legend");
        return legend;
    }
}
