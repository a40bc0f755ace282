package org.strandbook.evaluation;

import org.strandbook.site.WavelengthBand;

/**
 * The acceptance of one band of interest.
 *
 * @param band                the band
 * @param status              PASS, REVIEW or FAIL
 * @param meanDeviationDb     mean of measured − predicted loss over the band's measured points, dB
 * @param worstDeviationDb    largest measured − predicted loss in the band, dB
 * @param worstAtNm           where the largest deviation lies, nm
 * @param predictedLossDb     mean predicted loss over the band, dB
 * @param worstMeasuredLossDb highest measured loss in the band, dB
 * @param marginDb            the analyzer's allowed loss minus the highest measured loss, dB
 * @param measuredFraction    share of the band's grid points that could be measured (0–1)
 * @param reason              the status in words and numbers
 */
public record BandVerdict(WavelengthBand band, Status status, double meanDeviationDb, double worstDeviationDb,
                          double worstAtNm, double predictedLossDb, double worstMeasuredLossDb, double marginDb,
                          double measuredFraction, String reason) {
}
