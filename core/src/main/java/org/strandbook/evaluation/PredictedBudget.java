package org.strandbook.evaluation;

import java.util.List;
import java.util.Objects;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.Contribution;
import org.strandbook.optics.path.LossBudget;
import org.strandbook.uncertainty.PathAllowances;

/**
 * The predicted loss of one measurement point's loop (send leg, probe, return leg) on the
 * evaluation grid, with each element's own contribution.
 *
 * @param pointTag the point
 * @param budget   the optics engine's budget of the loop
 * @param notes    what the prediction assumed or flagged (bend radii, missing data), in words
 * @param allowances every element's input allowances (its own, its catalog row's or the shipped
 *        default), in path order, for the prediction's uncertainty
 */
public record PredictedBudget(String pointTag, LossBudget budget, List<String> notes, PathAllowances allowances) {

    public PredictedBudget {
        notes = List.copyOf(notes);
        Objects.requireNonNull(allowances, "allowances");
    }

    public WavelengthGrid grid() {
        return budget.grid();
    }

    public double[] totalLossDb() {
        return budget.totalLossDb();
    }

    public List<Contribution> contributions() {
        return budget.contributions();
    }
}
