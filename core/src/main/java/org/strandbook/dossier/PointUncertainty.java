package org.strandbook.dossier;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.strandbook.evaluation.BandInterval;
import org.strandbook.evaluation.BandUncertainty;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PredictionSpread;
import org.strandbook.site.WavelengthBand;
import org.strandbook.uncertainty.BudgetInputUncertainties;
import org.strandbook.uncertainty.MonteCarloPropagation;
import org.strandbook.uncertainty.PathUncertainty;

/**
 * A point's prediction with its uncertainty as the dossier shows it: the coverage band over the
 * evaluation grid (Spectra columns and the chart) and the uncertainty budget at each band centre
 * (the Uncertainty sheet). Under the coverage-interval rule the budgets are the ones the verdicts
 * were judged with; under the fixed tolerance they are worked out here, at the site's coverage.
 *
 * @param spread the coverage band, absent when it could not be worked out
 * @param bands the budget per band whose centre the analyzer measures, in band order
 * @param problem why there is none, empty when there is
 */
record PointUncertainty(Optional<PredictionSpread> spread, List<BandUncertainty> bands, String problem) {

    PointUncertainty {
        bands = List.copyOf(bands);
    }

    /** Told after each point; returns false to stop (an export cancelled). */
    @FunctionalInterface
    interface AfterPoint {
        void done(int done, int of);
    }

    /** By point tag, for every evaluated point of {@code content}. */
    static Map<String, PointUncertainty> of(DossierContent content, AfterPoint afterPoint) {
        PathUncertainty engine = new PathUncertainty(BudgetInputUncertainties.SHIPPED, MonteCarloPropagation.standard(),
                content.decisionRule().coverage());
        Map<String, PointUncertainty> out = new LinkedHashMap<>();
        int n = content.points().size();
        int done = 0;
        for (DossierPoint p : content.points()) {
            p.evaluation().ifPresent(e -> out.put(p.tag(), of(e, engine)));
            afterPoint.done(++done, n);
        }
        return out;
    }

    private static PointUncertainty of(PointEvaluation e, PathUncertainty engine) {
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
