package org.strandbook.app.ui.plot;

import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.RadioButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.HBox;

/** The axis switches every plot of the window follows: nm or cm⁻¹ across, dB or % transmittance up. */
public final class PlotAxesBar {

    private final HBox root;

    public PlotAxesBar(PlotAxes axes) {
        ToggleGroup xGroup = new ToggleGroup();
        RadioButton nm = radio("nm", "plot-axis-nm", xGroup, axes.axisProperty().get() == SpectralAxis.WAVELENGTH_NM);
        RadioButton cm = radio("cm\u207B\u00B9", "plot-axis-cm", xGroup, axes.axisProperty().get() == SpectralAxis.WAVENUMBER_CM);
        nm.setOnAction(e -> axes.axisProperty().set(SpectralAxis.WAVELENGTH_NM));
        cm.setOnAction(e -> axes.axisProperty().set(SpectralAxis.WAVENUMBER_CM));
        ToggleGroup yGroup = new ToggleGroup();
        RadioButton db = radio("loss (dB)", "plot-scale-db", yGroup, axes.scaleProperty().get() == LossScale.LOSS_DB);
        RadioButton pct = radio("transmittance (%)", "plot-scale-percent", yGroup,
                axes.scaleProperty().get() == LossScale.TRANSMITTANCE_PERCENT);
        db.setOnAction(e -> axes.scaleProperty().set(LossScale.LOSS_DB));
        pct.setOnAction(e -> axes.scaleProperty().set(LossScale.TRANSMITTANCE_PERCENT));
        axes.axisProperty().addListener((o, was, is) -> (is == SpectralAxis.WAVELENGTH_NM ? nm : cm).setSelected(true));
        axes.scaleProperty().addListener((o, was, is) -> (is == LossScale.LOSS_DB ? db : pct).setSelected(true));
        root = new HBox(8, new Label("Spectra across:"), nm, cm, new Label("   Up:"), db, pct);
        root.setAlignment(Pos.CENTER_LEFT);
        root.getStyleClass().add("plot-toolbar");
    }

    public Node node() {
        return root;
    }

    private static RadioButton radio(String text, String id, ToggleGroup group, boolean selected) {
        RadioButton b = new RadioButton(text);
        b.setId(id);
        b.setToggleGroup(group);
        b.setSelected(selected);
        return b;
    }
}
