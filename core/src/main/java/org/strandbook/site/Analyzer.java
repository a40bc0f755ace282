package org.strandbook.site;

/**
 * A process spectrometer serving one or more measurement points through its channels.
 *
 * @param tag           the analyzer's tag on site, unique within the site
 * @param description   free text
 * @param minNm         shortest usable wavelength, nm
 * @param maxNm         longest usable wavelength, nm
 * @param channels      number of fiber channels (multiplexer positions)
 * @param allowedLossDb round-trip loss the analyzer tolerates (its dynamic range for the job), dB
 * @param detector      detector family
 */
public record Analyzer(String tag, String description, double minNm, double maxNm, int channels,
                       double allowedLossDb, DetectorType detector) {

    public Analyzer {
        tag = Require.text(tag, "analyzer tag");
        description = description == null ? "" : description.strip();
        Require.positive(minNm, "analyzer minimum wavelength (nm)");
        Require.positive(maxNm, "analyzer maximum wavelength (nm)");
        if (maxNm <= minNm) {
            throw new IllegalArgumentException("analyzer " + tag + ": maximum wavelength " + maxNm
                    + " nm must exceed minimum " + minNm + " nm");
        }
        if (channels < 1) {
            throw new IllegalArgumentException("analyzer " + tag + ": needs at least one channel, was " + channels);
        }
        Require.positive(allowedLossDb, "analyzer allowed loss (dB)");
        detector = detector == null ? DetectorType.OTHER : detector;
    }
}
