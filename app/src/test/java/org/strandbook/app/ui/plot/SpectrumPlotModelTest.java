package org.strandbook.app.ui.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.strandbook.app.ui.MemoryPreferences;

class SpectrumPlotModelTest {

    private static final double RELATIVE_TOLERANCE = 1e-12;

    // Wavenumber σ = 1/λ, ISO 80000-7:2019 item 7-13; 1/(1000 nm) = 10 000 cm⁻¹
    @ParameterizedTest
    @CsvSource(textBlock = """
            1000, 10000
            2500, 4000
            1700, 5882.352941176471
            """)
    void wavenumberAxisIsTheReciprocalWavelength(double nm, double cm) {
        assertEquals(cm, SpectralAxis.WAVENUMBER_CM.fromNm(nm), cm * RELATIVE_TOLERANCE);
    }

    // Power level in dB, IEC 60027-3:2002: T = 10^(−L/10); 10 dB leaves 10 %, 20 dB 1 %, 3 dB 50.12 %
    @ParameterizedTest
    @CsvSource(textBlock = """
            0, 100
            3, 50.11872336272722
            10, 10
            20, 1
            """)
    void transmittanceScaleConvertsLossInDecibels(double lossDb, double percent) {
        assertEquals(percent, LossScale.TRANSMITTANCE_PERCENT.fromLossDb(lossDb), percent * RELATIVE_TOLERANCE);
    }

    @Test
    void axisLabelsCarryTheirUnits() {
        assertEquals("Wavelength (nm)", SpectralAxis.WAVELENGTH_NM.label());
        assertEquals("Wavenumber (cm\u207B\u00B9)", SpectralAxis.WAVENUMBER_CM.label());
        assertEquals("Loss (dB)", LossScale.LOSS_DB.label());
        assertEquals("Transmittance (%)", LossScale.TRANSMITTANCE_PERCENT.label());
    }

    @Test
    void axisChoiceIsRememberedForTheNextSession() {
        MemoryPreferences preferences = new MemoryPreferences();
        SpectrumPlotModel first = new SpectrumPlotModel(preferences);
        first.axisProperty().set(SpectralAxis.WAVENUMBER_CM);
        first.scaleProperty().set(LossScale.TRANSMITTANCE_PERCENT);

        SpectrumPlotModel next = new SpectrumPlotModel(preferences);

        assertEquals(SpectralAxis.WAVENUMBER_CM, next.axisProperty().get());
        assertEquals(LossScale.TRANSMITTANCE_PERCENT, next.scaleProperty().get());
    }

    @Test
    void wavenumberPointsRunAscendingSoTheChartDrawsOneLine() {
        SpectrumPlotModel model = new SpectrumPlotModel(new MemoryPreferences());
        model.show("test", new double[] {1000, 2000}, new double[] {10, 20});
        model.axisProperty().set(SpectralAxis.WAVENUMBER_CM);

        List<SpectrumPlotModel.PlotPoint> points = model.pointsProperty().get();
        assertEquals(5000, points.get(0).x(), 1e-9);
        assertEquals(20, points.get(0).y(), 1e-12);
        assertEquals(10000, points.get(1).x(), 1e-9);
    }
}
