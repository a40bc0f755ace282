package org.strandbook.app.ui.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
        PlotAxes first = new PlotAxes(preferences);
        first.axisProperty().set(SpectralAxis.WAVENUMBER_CM);
        first.scaleProperty().set(LossScale.TRANSMITTANCE_PERCENT);

        PlotAxes next = new PlotAxes(preferences);

        assertEquals(SpectralAxis.WAVENUMBER_CM, next.axisProperty().get());
        assertEquals(LossScale.TRANSMITTANCE_PERCENT, next.scaleProperty().get());
    }

    @Test
    void wavenumberPointsRunAscendingSoTheChartDrawsOneLine() {
        SpectrumPlotModel model = new SpectrumPlotModel(new PlotAxes(new MemoryPreferences()));
        model.show("test", List.of(new Curve("loss", CurveStyle.line(CurveStyle.BLACK, 1), new double[] {1000, 2000},
                new double[] {10, 20})));
        model.axes().axisProperty().set(SpectralAxis.WAVENUMBER_CM);

        List<SpectrumPlotModel.PlotPoint> points = model.linesProperty().get().get(0).runs().get(0);
        assertEquals(5000, points.get(0).x(), 1e-9);
        assertEquals(20, points.get(0).y(), 1e-12);
        assertEquals(10000, points.get(1).x(), 1e-9);
    }

    @Test
    void unmeasuredStretchesLeaveAGapInsteadOfALineAcrossThem() {
        SpectrumPlotModel model = new SpectrumPlotModel(new PlotAxes(new MemoryPreferences()));
        model.show("test", List.of(new Curve("measured", CurveStyle.line(CurveStyle.BLUE, 1),
                new double[] {1000, 1002, 1004, 1006, 1008}, new double[] {1, 2, Double.NaN, Double.NaN, 3})));

        List<List<SpectrumPlotModel.PlotPoint>> runs = model.linesProperty().get().get(0).runs();
        assertEquals(2, runs.size());
        assertEquals(1002, runs.get(0).get(1).x());
        assertEquals(1008, runs.get(1).get(0).x());
    }

    @Test
    void lossAxisStopsAtTheCeilingSoTheFewDecibelsThatMatterStayReadable() {
        SpectrumPlotModel model = new SpectrumPlotModel(new PlotAxes(new MemoryPreferences()));
        model.show("test", List.of(new Curve("loss", CurveStyle.line(CurveStyle.BLACK, 1), new double[] {1000, 2000, 2500},
                new double[] {10, 12, 180})), 40);

        assertEquals(40, model.yRangeProperty().get().upper(), 1e-9);
        assertEquals(0, model.yRangeProperty().get().lower(), 1e-9);
        assertEquals(1000, model.xRangeProperty().get().lower(), 1e-9);
        assertEquals(2500, model.xRangeProperty().get().upper(), 1e-9);
    }

    @Test
    void longCurvesAreThinnedButKeepBothEnds() {
        int n = 751;
        double[] nm = new double[n];
        double[] db = new double[n];
        for (int i = 0; i < n; i++) {
            nm[i] = 1000 + 2 * i;
            db[i] = i;
        }
        SpectrumPlotModel model = new SpectrumPlotModel(new PlotAxes(new MemoryPreferences()));
        model.show("test", List.of(new Curve("loss", CurveStyle.line(CurveStyle.BLACK, 1), nm, db)));

        List<SpectrumPlotModel.PlotPoint> run = model.linesProperty().get().get(0).runs().get(0);
        assertTrue(run.size() <= SpectrumPlotModel.MAX_POINTS + 2, "points: " + run.size());
        assertEquals(1000, run.get(0).x());
        assertEquals(2500, run.get(run.size() - 1).x());
    }

    @Test
    void coverageBandFollowsTheChosenAxesAndGoesWithClear() {
        // σ = 1/λ (ISO 80000-7:2019, 7-13) and T = 10^(−L/10) (IEC 60027-3:2002) apply to both ends of the band
        SpectrumPlotModel model = new SpectrumPlotModel(new PlotAxes(new MemoryPreferences()));
        double[] nm = {1000, 2000};
        model.show("p", List.of(new Curve("predicted", CurveStyle.line(CurveStyle.BLACK, 2), nm, new double[] {10, 11})));
        model.showBand(new CoverageBand("95 %", CurveStyle.GREY, nm, new double[] {9, 10}, new double[] {11, 13}));
        SpectrumPlotModel.BandPoint first = model.bandsProperty().get().get(0).points().get(0);
        assertEquals(new SpectrumPlotModel.BandPoint(1000, 9, 11), first);
        model.axes().axisProperty().set(SpectralAxis.WAVENUMBER_CM);
        model.axes().scaleProperty().set(LossScale.TRANSMITTANCE_PERCENT);
        List<SpectrumPlotModel.BandPoint> points = model.bandsProperty().get().get(0).points();
        // read left to right: 2000 nm (5000 cm⁻¹) first, its 10 and 13 dB as 10 % and 5.01 %
        assertEquals(5000, points.get(0).x(), 5000 * RELATIVE_TOLERANCE);
        assertEquals(10, points.get(0).y1(), 10 * RELATIVE_TOLERANCE);
        assertEquals(100 * Math.pow(10, -1.3), points.get(0).y2(), RELATIVE_TOLERANCE);
        model.clear("p", "nothing");
        assertTrue(model.bandsProperty().get().isEmpty());
    }
}
