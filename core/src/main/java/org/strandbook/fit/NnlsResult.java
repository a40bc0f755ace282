package org.strandbook.fit;

import java.util.Arrays;
import java.util.Objects;

/**
 * The solution of a {@link LeastSquaresProblem} by {@link NonNegativeLeastSquares} and the
 * diagnostics a caller needs to judge it.
 *
 * @param coefficients    x, one per column, in the unit of b per unit of the column; ≥ 0 for
 *                        constrained columns
 * @param residualNorm    ‖A·x − b‖₂ without weights, in the unit of b
 * @param chiSquare       ‖W(A·x − b)‖₂², the weighted residual sum of squares; a chi-square when
 *                        the weights are 1/σ
 * @param usedRowCount    rows with a weight &gt; 0
 * @param dualVector      w = Aᵀ·W²·(b − A·x), one per column (Lawson &amp; Hanson's dual vector, the
 *                        negative half-gradient of the objective). At a solution w ≈ 0 where a
 *                        column is in the positive set and w ≤ 0 where a constrained coefficient
 *                        is 0 (the Kuhn–Tucker conditions, Lawson &amp; Hanson ch. 23)
 * @param iterations      least-squares subproblems solved
 * @param converged       true when the Kuhn–Tucker conditions hold within the solver's tolerance;
 *                        false when the iteration limit stopped it (x is then feasible but not
 *                        optimal)
 * @param positiveSet     ascending indices of the columns in the final positive ("passive") set:
 *                        constrained columns with x &gt; 0 and every non-zero signed column
 * @param zeroNormColumns ascending indices of columns that are zero on the weighted rows; their
 *                        coefficient is 0 and says nothing about the data
 * @param collinearity    pairwise cosine similarity of the columns over the weighted rows
 */
public record NnlsResult(double[] coefficients, double residualNorm, double chiSquare, int usedRowCount,
                         double[] dualVector, int iterations, boolean converged, int[] positiveSet,
                         int[] zeroNormColumns, CollinearityReport collinearity) {

    public NnlsResult {
        coefficients = coefficients.clone();
        dualVector = dualVector.clone();
        positiveSet = positiveSet.clone();
        zeroNormColumns = zeroNormColumns.clone();
        Objects.requireNonNull(collinearity, "collinearity");
    }

    @Override
    public double[] coefficients() {
        return coefficients.clone();
    }

    @Override
    public double[] dualVector() {
        return dualVector.clone();
    }

    @Override
    public int[] positiveSet() {
        return positiveSet.clone();
    }

    @Override
    public int[] zeroNormColumns() {
        return zeroNormColumns.clone();
    }

    /** Coefficient of column {@code j}. */
    public double coefficient(int j) {
        return coefficients[j];
    }

    /** Used rows minus the number of non-zero coefficients. */
    public int degreesOfFreedom() {
        int nonZero = 0;
        for (double c : coefficients) {
            if (c != 0) {
                nonZero++;
            }
        }
        return usedRowCount - nonZero;
    }

    /**
     * χ² per degree of freedom; near 1 when the model explains the data to within the stated σ.
     * {@code NaN} without degrees of freedom. With bounds active this is the usual approximate
     * reading, not an exact distribution.
     */
    public double reducedChiSquare() {
        int dof = degreesOfFreedom();
        return dof > 0 ? chiSquare / dof : Double.NaN;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof NnlsResult r
                && Arrays.equals(coefficients, r.coefficients)
                && Double.compare(residualNorm, r.residualNorm) == 0
                && Double.compare(chiSquare, r.chiSquare) == 0
                && usedRowCount == r.usedRowCount
                && Arrays.equals(dualVector, r.dualVector)
                && iterations == r.iterations
                && converged == r.converged
                && Arrays.equals(positiveSet, r.positiveSet)
                && Arrays.equals(zeroNormColumns, r.zeroNormColumns);
    }

    @Override
    public int hashCode() {
        return Objects.hash(Arrays.hashCode(coefficients), residualNorm, chiSquare, iterations, converged,
                Arrays.hashCode(positiveSet));
    }

    @Override
    public String toString() {
        return "NnlsResult[coefficients=" + Arrays.toString(coefficients)
                + ", residualNorm=" + residualNorm
                + ", chiSquare=" + chiSquare
                + ", iterations=" + iterations
                + ", converged=" + converged
                + ", positiveSet=" + Arrays.toString(positiveSet)
                + ", zeroNormColumns=" + Arrays.toString(zeroNormColumns) + "]";
    }
}
