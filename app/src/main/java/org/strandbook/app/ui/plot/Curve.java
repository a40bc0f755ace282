package org.strandbook.app.ui.plot;

/**
 * One spectral curve to plot, in nm and dB. Values may be NaN where nothing was measured; the plot
 * leaves a gap there rather than drawing across it. Arrays are copied in.
 *
 * @param label          the legend text when the y axis shows loss (dB)
 * @param percentLabel   the legend text when it shows transmittance (%)
 * @param style          how it is drawn
 * @param wavelengthsNm  ascending wavelengths, nm
 * @param lossDb         loss per wavelength, dB (a difference of losses plots as a ratio in %)
 */
public record Curve(String label, String percentLabel, CurveStyle style, double[] wavelengthsNm, double[] lossDb) {

    public Curve {
        if (wavelengthsNm.length != lossDb.length) {
            throw new IllegalArgumentException("curve '" + label + "' has " + wavelengthsNm.length
                    + " wavelengths but " + lossDb.length + " values");
        }
        percentLabel = percentLabel == null ? label : percentLabel;
        wavelengthsNm = wavelengthsNm.clone();
        lossDb = lossDb.clone();
    }

    public Curve(String label, CurveStyle style, double[] wavelengthsNm, double[] lossDb) {
        this(label, label, style, wavelengthsNm, lossDb);
    }

    public String label(LossScale scale) {
        return scale == LossScale.LOSS_DB ? label : percentLabel;
    }

    double wavelengthNm(int i) {
        return wavelengthsNm[i];
    }

    double lossDb(int i) {
        return lossDb[i];
    }

    int size() {
        return lossDb.length;
    }
}
