package org.strandbook.app.ui.plot;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.prefs.Preferences;

import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;

/**
 * What the detail plot shows: one loss spectrum (nm, dB) and the user's choice of axes, which is
 * kept in {@link Preferences} so the next session opens the same way. The preferences node is
 * injected so that tests never touch the user's own settings.
 */
public final class SpectrumPlotModel {

    static final String AXIS_KEY = "plot.xAxis";
    static final String SCALE_KEY = "plot.yScale";

    /** Points to draw, in the chosen axes; x ascending. */
    public record PlotPoint(double x, double y) {
    }

    private final Preferences preferences;
    private final ObjectProperty<SpectralAxis> axis = new SimpleObjectProperty<>(this, "axis");
    private final ObjectProperty<LossScale> scale = new SimpleObjectProperty<>(this, "scale");
    private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "No point selected");
    private final ReadOnlyObjectWrapper<List<PlotPoint>> points = new ReadOnlyObjectWrapper<>(this, "points", List.of());
    private double[] wavelengthsNm = new double[0];
    private double[] lossDb = new double[0];

    public SpectrumPlotModel(Preferences preferences) {
        this.preferences = preferences;
        axis.set(read(AXIS_KEY, SpectralAxis.class, SpectralAxis.WAVELENGTH_NM));
        scale.set(read(SCALE_KEY, LossScale.class, LossScale.LOSS_DB));
        axis.addListener((o, was, is) -> {
            preferences.put(AXIS_KEY, is.name());
            recompute();
        });
        scale.addListener((o, was, is) -> {
            preferences.put(SCALE_KEY, is.name());
            recompute();
        });
    }

    public ObjectProperty<SpectralAxis> axisProperty() {
        return axis;
    }

    public ObjectProperty<LossScale> scaleProperty() {
        return scale;
    }

    public ReadOnlyStringProperty titleProperty() {
        return title.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<List<PlotPoint>> pointsProperty() {
        return points.getReadOnlyProperty();
    }

    /** Shows a loss spectrum: ascending wavelengths (nm) and loss (dB) of the same length. */
    public void show(String caption, double[] wavelengthsNm, double[] lossDb) {
        if (wavelengthsNm.length != lossDb.length) {
            throw new IllegalArgumentException("spectrum has " + wavelengthsNm.length + " wavelengths but " + lossDb.length + " values");
        }
        this.wavelengthsNm = wavelengthsNm.clone();
        this.lossDb = lossDb.clone();
        title.set(caption);
        recompute();
    }

    public void clear(String caption) {
        show(caption, new double[0], new double[0]);
    }

    private void recompute() {
        SpectralAxis x = axis.get();
        LossScale y = scale.get();
        List<PlotPoint> out = new ArrayList<>(wavelengthsNm.length);
        for (int i = 0; i < wavelengthsNm.length; i++) {
            out.add(new PlotPoint(x.fromNm(wavelengthsNm[i]), y.fromLossDb(lossDb[i])));
        }
        if (x == SpectralAxis.WAVENUMBER_CM) {
            Collections.reverse(out);
        }
        points.set(List.copyOf(out));
    }

    private <E extends Enum<E>> E read(String key, Class<E> type, E fallback) {
        String stored = preferences.get(key, fallback.name());
        for (E e : type.getEnumConstants()) {
            if (e.name().equals(stored)) {
                return e;
            }
        }
        return fallback;
    }
}
