package org.strandbook.app.ui.workbook;

/**
 * A point's predicted round-trip loss: the figure at the band centre and the spectrum over the
 * analyzer's range. Arrays are copied in and out.
 *
 * @param pointTag        the point
 * @param centreNm        centre of the point's first band of interest, nm
 * @param predictedLossDb predicted loss at {@code centreNm}, dB
 * @param allowedLossDb   what the analyzer tolerates, dB
 * @param basis           one line saying what the prediction includes
 * @param wavelengthsNm   ascending wavelengths, nm
 * @param lossDb          predicted loss at each wavelength, dB
 */
public record PointBudget(String pointTag, double centreNm, double predictedLossDb, double allowedLossDb,
                          String basis, double[] wavelengthsNm, double[] lossDb) {

    public PointBudget {
        if (wavelengthsNm.length != lossDb.length) {
            throw new IllegalArgumentException("budget spectrum has " + wavelengthsNm.length + " wavelengths but "
                    + lossDb.length + " values");
        }
        wavelengthsNm = wavelengthsNm.clone();
        lossDb = lossDb.clone();
    }

    @Override
    public double[] wavelengthsNm() {
        return wavelengthsNm.clone();
    }

    @Override
    public double[] lossDb() {
        return lossDb.clone();
    }

    /** Allowed minus predicted, dB; negative means the analyzer will not see enough light. */
    public double marginDb() {
        return allowedLossDb - predictedLossDb;
    }
}
