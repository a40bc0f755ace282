package org.strandbook.dossier;

import java.util.List;
import java.util.Optional;

import org.strandbook.evaluation.BandInterval;
import org.strandbook.evaluation.BandUncertainty;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PredictionSpread;
import org.strandbook.site.WavelengthBand;
import org.strandbook.uncertainty.PathUncertainty;

/**
 * A point's prediction with its uncertainty as the dossier shows it: the coverage band over the
 * evaluation grid (Spectra columns and the chart) and the uncertainty budget at each band centre
 * (the Uncertainty sheet). Under the coverage-interval rule the budgets are the ones the verdicts
 * were judged with; under the fixed tolerance they are worked out here, at the site's coverage. Worked
 * out with the evaluation ({@link WorkbookDossier}), before the writer starts.
 *
 * @param spread the coverage band, absent when it could not be worked out
 * @param bands the budget per band whose centre the analyzer measures, in band order
 * @param problem why there is none, empty when there is
 */
public record PointUncertainty(Optional<PredictionSpread> spread, List<BandUncertainty> bands, String problem) {

    public PointUncertainty {
        bands = List.copyOf(bands);
    }

    /** The engine of the intervals at {@code coverage}: the one the evaluation and the window use. */
    public static PathUncertainty engine(double coverage) {
        return PathUncertainty.standard().withCoverage(coverage);
    }

    /**
     * The uncertainty of {@code e}'s prediction: the budgets its verdicts were judged with when there
     * are any, else worked out at each band centre the analyzer measures; and the coverage band.
     */
    public static PointUncertainty of(PointEvaluation e, PathUncertainty engine) {
        try {
            List<BandUncertainty> bands;
            if (!e.intervals().isEmpty()) {
                bands = e.intervals().stream().map(BandInterval::prediction).toList();
            } else {
                List<WavelengthBand> measurable = e.point().bands().stream()
                        .filter(b -> e.predicted().grid().covers(b.centreNm())).toList();
                bands = BandUncertainty.of(e.predicted(), measurable, engine);
            }
            return new PointUncertainty(Optional.of(PredictionSpread.of(e.predicted(), engine)), bands, "");
        } catch (IllegalArgumentException ex) {
            return new PointUncertainty(Optional.empty(), List.of(), ex.getMessage());
        }
    }
}
