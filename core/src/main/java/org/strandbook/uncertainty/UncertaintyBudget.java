package org.strandbook.uncertainty;

import java.util.Comparator;
import java.util.List;

/**
 * The result of propagating input uncertainties through a measurement model: the estimate, its
 * combined standard uncertainty, the budget rows and a coverage interval.
 *
 * @param estimate y
 * @param combinedStandardUncertainty u_c(y)
 * @param rows one per input, in model order
 * @param interval the coverage interval
 */
public record UncertaintyBudget(double estimate, double combinedStandardUncertainty, List<BudgetRow> rows,
        CoverageInterval interval) {

    public UncertaintyBudget {
        rows = List.copyOf(rows);
    }

    /** The rows, largest contribution first: which inputs dominate the width. */
    public List<BudgetRow> rowsByContribution() {
        return rows.stream().sorted(Comparator.comparingDouble(BudgetRow::contribution).reversed()).toList();
    }

    /** The same budget with another interval, e.g. a Monte Carlo one for the same model. */
    public UncertaintyBudget withInterval(CoverageInterval other) {
        return new UncertaintyBudget(estimate, combinedStandardUncertainty, rows, other);
    }
}
