package org.strandbook.evaluation;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.Analyzer;

/**
 * The common grid measured and predicted spectra meet on: the analyzer's range in even steps of
 * wavelength. 2 nm resolves the OH and hydrogen bands (widths of tens of nm) with room to spare.
 */
public final class EvaluationGrid {

    public static final double STEP_NM = 2.0;

    private EvaluationGrid() {
    }

    public static WavelengthGrid forAnalyzer(Analyzer analyzer) {
        int count = (int) Math.round((analyzer.maxNm() - analyzer.minNm()) / STEP_NM) + 1;
        return WavelengthGrid.uniformNm(analyzer.minNm(), analyzer.maxNm(), Math.max(count, 2));
    }
}
