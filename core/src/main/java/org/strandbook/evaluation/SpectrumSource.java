package org.strandbook.evaluation;

import org.strandbook.site.Spectrum;

/** Fetches a stored scan's spectrum by its workbook id. */
@FunctionalInterface
public interface SpectrumSource {

    Spectrum spectrum(long scanId);
}
