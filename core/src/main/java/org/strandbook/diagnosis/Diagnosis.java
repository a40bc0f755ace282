package org.strandbook.diagnosis;

import java.util.List;
import java.util.Optional;

/**
 * What the deviation of one loop scan says is wrong.
 *
 * @param findings        fitted causes above the reporting threshold, the largest effect at any
 *                        measured wavelength first
 * @param residualRmsDb   RMS of what the fit leaves unexplained over the measured points, dB
 * @param collinearNotes  pairs of signatures the measured range cannot tell apart, in words
 * @param fringes         etalon fringes, if any
 * @param fitted          each fitted signature's loss over the whole evaluation grid (dB), for plots
 * @param summary         the finding in plain words, naming the element to check first
 */
public record Diagnosis(List<Finding> findings, double residualRmsDb, List<String> collinearNotes,
                        Optional<FringeReport> fringes, List<FittedSignature> fitted, String summary) {

    public Diagnosis {
        findings = List.copyOf(findings);
        collinearNotes = List.copyOf(collinearNotes);
        fitted = List.copyOf(fitted);
    }

    /** The first-ranked cause, if anything was found. */
    public Optional<Finding> first() {
        return findings.isEmpty() ? Optional.empty() : Optional.of(findings.get(0));
    }
}
