package org.strandbook.diagnosis;

import java.util.List;

/**
 * One fitted cause of a deviation.
 *
 * @param signature   the fitted shape
 * @param candidates  the causes that shape can mean, most likely first given the workbook's records
 * @param amountDb    the fitted loss at {@code atNm}, dB
 * @param atNm        the wavelength the amount is stated at, nm
 * @param sharePercent this signature's share of the explained deviation, %
 * @param checkFirst  the element to check first (label on site), or empty
 * @param text        the finding in plain words
 * @param atLeast     true when the amount is a lower bound: the shape's own stronger part lies where
 *                    nothing was measured (a dark or masked band), so the fit saw only its weaker part
 */
public record Finding(Signature signature, List<Cause> candidates, double amountDb, double atNm,
                      double sharePercent, String checkFirst, String text, boolean atLeast) {

    public Finding {
        candidates = List.copyOf(candidates);
    }

    /** A finding whose amount was fitted where the shape's own peak was measured. */
    public Finding(Signature signature, List<Cause> candidates, double amountDb, double atNm,
                   double sharePercent, String checkFirst, String text) {
        this(signature, candidates, amountDb, atNm, sharePercent, checkFirst, text, false);
    }

    /** The most likely cause. */
    public Cause cause() {
        return candidates.get(0);
    }
}
