package org.strandbook.app.ui.budget;

import org.strandbook.app.ui.sheet.Verdict;
import org.strandbook.site.WavelengthBand;

/**
 * The predicted loop loss of a point at the centre of one band of interest, against what its
 * analyzer allows.
 *
 * @param band            the band
 * @param predictedLossDb predicted round-trip loss at the band centre, dB; NaN when the band lies
 *                        outside the analyzer's range
 * @param allowedLossDb   the analyzer's allowed loss, dB
 * @param marginDb        allowed minus predicted, dB (NaN with the prediction)
 * @param verdict         the margin's status, null when there is no prediction
 */
public record BandPrediction(WavelengthBand band, double predictedLossDb, double allowedLossDb, double marginDb,
                             Verdict verdict) {

    public double centreNm() {
        return band.centreNm();
    }
}
