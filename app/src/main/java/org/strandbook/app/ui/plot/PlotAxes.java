package org.strandbook.app.ui.plot;

import java.util.prefs.Preferences;

import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;

/**
 * The user's choice of axes for every loss plot of the window: wavelength or wavenumber across,
 * loss or transmittance up. Kept in {@link Preferences} so the next session opens the same way;
 * the preferences node is injected so that tests never touch the user's own settings.
 */
public final class PlotAxes {

    static final String AXIS_KEY = "plot.xAxis";
    static final String SCALE_KEY = "plot.yScale";

    private final ObjectProperty<SpectralAxis> axis = new SimpleObjectProperty<>(this, "axis");
    private final ObjectProperty<LossScale> scale = new SimpleObjectProperty<>(this, "scale");

    public PlotAxes(Preferences preferences) {
        axis.set(read(preferences, AXIS_KEY, SpectralAxis.class, SpectralAxis.WAVELENGTH_NM));
        scale.set(read(preferences, SCALE_KEY, LossScale.class, LossScale.LOSS_DB));
        axis.addListener((o, was, is) -> preferences.put(AXIS_KEY, is.name()));
        scale.addListener((o, was, is) -> preferences.put(SCALE_KEY, is.name()));
    }

    public ObjectProperty<SpectralAxis> axisProperty() {
        return axis;
    }

    public ObjectProperty<LossScale> scaleProperty() {
        return scale;
    }

    private static <E extends Enum<E>> E read(Preferences preferences, String key, Class<E> type, E fallback) {
        String stored = preferences.get(key, fallback.name());
        for (E e : type.getEnumConstants()) {
            if (e.name().equals(stored)) {
                return e;
            }
        }
        return fallback;
    }
}
