package org.strandbook.app.ui.plot;

import java.util.List;

import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

/**
 * What every plot of a point exposes to its view: a title, a placeholder message for when there
 * is nothing to draw, its lines, and the two axis ranges; all recomputed when the user switches
 * the axes (nm/cm⁻¹, dB/%).
 *
 * @param <L> the kind of line the plot draws
 */
public abstract class PlotModel<L> {

    private final PlotAxes axes;
    protected final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "");
    protected final ReadOnlyStringWrapper placeholder = new ReadOnlyStringWrapper(this, "placeholder",
            "No point selected");
    protected final ReadOnlyObjectWrapper<List<L>> lines = new ReadOnlyObjectWrapper<>(this, "lines", List.of());
    protected final ReadOnlyObjectWrapper<AxisRange> xRange = new ReadOnlyObjectWrapper<>(this, "xRange");
    protected final ReadOnlyObjectWrapper<AxisRange> yRange = new ReadOnlyObjectWrapper<>(this, "yRange");

    protected PlotModel(PlotAxes axes) {
        this.axes = axes;
        axes.axisProperty().addListener((o, was, is) -> recompute());
        axes.scaleProperty().addListener((o, was, is) -> recompute());
    }

    /** Rebuilds the lines and ranges from the plot's data in the current axes. */
    protected abstract void recompute();

    public PlotAxes axes() {
        return axes;
    }

    public ReadOnlyStringProperty titleProperty() {
        return title.getReadOnlyProperty();
    }

    /** What to say where the plot would be when there is nothing to draw. */
    public ReadOnlyStringProperty placeholderProperty() {
        return placeholder.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<List<L>> linesProperty() {
        return lines.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<AxisRange> xRangeProperty() {
        return xRange.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<AxisRange> yRangeProperty() {
        return yRange.getReadOnlyProperty();
    }
}
