package org.strandbook.app.ui.plot;

/**
 * A shaded band between two loss spectra, in nm and dB: the coverage interval of a prediction.
 * Arrays are copied in.
 *
 * @param label         the legend text
 * @param colour        CSS colour of the fill (drawn translucent)
 * @param wavelengthsNm ascending wavelengths, nm
 * @param lowDb         lower end per wavelength, dB
 * @param highDb        upper end per wavelength, dB
 */
public record CoverageBand(String label, String colour, double[] wavelengthsNm, double[] lowDb, double[] highDb) {

    public CoverageBand {
        if (wavelengthsNm.length != lowDb.length || wavelengthsNm.length != highDb.length) {
            throw new IllegalArgumentException("band '" + label + "' has " + wavelengthsNm.length + " wavelengths but "
                    + lowDb.length + " low and " + highDb.length + " high values");
        }
        wavelengthsNm = wavelengthsNm.clone();
        lowDb = lowDb.clone();
        highDb = highDb.clone();
    }
}
