package org.strandbook.app.ui.budget;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.strandbook.app.ui.sheet.Verdict;
import org.strandbook.evaluation.PredictedBudget;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.Contribution;
import org.strandbook.site.PathDirection;

/**
 * A point's predicted loop budget as the window shows it: the budget itself (total and each
 * element's contribution on the analyzer's grid), the figures at each band centre, or the reason
 * there is no prediction. Immutable.
 */
public final class PointPrediction {

    private final String pointTag;
    private final PredictedBudget budget;
    private final double[] totalLossDb;
    private final int sendElements;
    private final List<BandPrediction> bands;
    private final String problem;

    PointPrediction(String pointTag, PredictedBudget budget, int sendElements, List<BandPrediction> bands,
                    String problem) {
        this.pointTag = pointTag;
        this.budget = budget;
        this.totalLossDb = budget == null ? new double[0] : budget.totalLossDb();
        this.sendElements = sendElements;
        this.bands = List.copyOf(bands);
        this.problem = problem == null ? "" : problem;
    }

    static PointPrediction failed(String pointTag, String problem) {
        return new PointPrediction(pointTag, null, 0, List.of(), problem);
    }

    public String pointTag() {
        return pointTag;
    }

    public Optional<PredictedBudget> budget() {
        return Optional.ofNullable(budget);
    }

    /** Per band of interest, in the point's order; empty without a budget. */
    public List<BandPrediction> bands() {
        return bands;
    }

    /** Why there is no prediction, or why a band has none; empty when all is well. */
    public String problem() {
        return problem;
    }

    /** The smallest band margin, dB; empty without a prediction. */
    public OptionalDouble leastMarginDb() {
        return bands.stream().mapToDouble(BandPrediction::marginDb).filter(m -> !Double.isNaN(m)).min();
    }

    /** The worst band's status; empty without a prediction. */
    public Optional<Verdict> verdict() {
        return bands.stream().map(BandPrediction::verdict).filter(v -> v != null)
                .max(Enum::compareTo);
    }

    /** Predicted round-trip loss at {@code wavelengthNm} (linear between grid points), dB; NaN without a budget. */
    public double lossDbAt(double wavelengthNm) {
        if (budget == null) {
            return Double.NaN;
        }
        return budget.grid().interpolate(totalLossDb, wavelengthNm);
    }

    /**
     * The loss one element of a leg contributes at {@code wavelengthNm}, dB: the {@code index}-th
     * element (from 0, in the order light meets it) of the send or return leg. NaN without a budget.
     */
    public double elementLossDbAt(PathDirection direction, int index, double wavelengthNm) {
        if (budget == null) {
            return Double.NaN;
        }
        // the budget lists the send leg, then the probe, then the return leg
        int at = direction == PathDirection.SEND ? index : sendElements + 1 + index;
        List<Contribution> parts = budget.contributions();
        if (index < 0 || at >= parts.size()) {
            return Double.NaN;
        }
        WavelengthGrid grid = budget.grid();
        int i = grid.nearestIndex(wavelengthNm);
        if (grid.wavelengthNm(i) == wavelengthNm || grid.size() == 1) {
            return parts.get(at).lossDbAt(i);
        }
        return grid.interpolate(parts.get(at).lossDb(), wavelengthNm);
    }
}
