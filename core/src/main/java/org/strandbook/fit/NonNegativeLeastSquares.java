package org.strandbook.fit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.QRDecomposition;

/**
 * Solves min ‖W(A·x − b)‖₂ subject to x_j ≥ 0 for every constrained column, by the active-set
 * algorithm NNLS of C. L. Lawson and R. J. Hanson, <i>Solving Least Squares Problems</i>
 * (Prentice-Hall 1974; SIAM reprint 1995), chapter 23 (Algorithm NNLS, p. 161).
 *
 * <p>Signed columns (a reference-drift term that may be negative) are handled by a documented
 * modification rather than by splitting a column into ± copies, which would put two exactly
 * collinear columns into the problem: a signed column starts in the positive set P and never
 * leaves it. Only constrained coefficients take part in the step-length rule of the inner loop
 * and in the choice of the entering column. Because every subproblem is still an unconstrained
 * least-squares problem on P, the strict decrease of the objective from one outer iteration to the
 * next, and hence Lawson &amp; Hanson's finite-termination argument, carry over unchanged; the
 * stopping test is then the Kuhn–Tucker condition of the mixed problem (w_j = 0 for signed and
 * positive coefficients, w_j ≤ 0 for zero ones).
 *
 * <p>Numerical details, all following the original FORTRAN NNLS of the book where it has one:
 * <ul>
 *   <li>columns are scaled to unit weighted norm inside the solver (which changes neither the
 *       solution nor the sign constraints) so that the tolerances below are relative;</li>
 *   <li>a column enters P only if its dual component exceeds {@code tolerance·‖W·b‖}, its
 *       component orthogonal to the columns already in P is larger than
 *       {@link #DEPENDENCE_THRESHOLD} (it is not linearly dependent on them), and its trial
 *       coefficient is positive; otherwise it is skipped for this round, as the book's code does;</li>
 *   <li>columns that are zero on the weighted rows never enter and are reported.</li>
 * </ul>
 * The least-squares subproblems are solved by Householder QR (Commons Math
 * {@link QRDecomposition}), re-factored from scratch each time: signature matrices are small
 * (tens of columns), so the book's updating of the factorisation is not worth its complexity.
 *
 * <p>Instances are immutable and thread-safe.
 */
public final class NonNegativeLeastSquares {

    /** Relative size of the dual vector below which the solution counts as optimal. */
    public static final double DEFAULT_TOLERANCE = 1e-10;

    /**
     * Smallest distance (relative to its own norm) of an entering column from the span of the
     * columns already in P; closer means linearly dependent for the purpose of the fit.
     */
    public static final double DEPENDENCE_THRESHOLD = 1e-11;

    private final double tolerance;
    private final int maxIterations;

    private NonNegativeLeastSquares(double tolerance, int maxIterations) {
        this.tolerance = tolerance;
        this.maxIterations = maxIterations;
    }

    /**
     * Tolerance {@link #DEFAULT_TOLERANCE} and an iteration limit of 10·n + 50 subproblems for n
     * columns (Lawson &amp; Hanson's code allows 3·n outer iterations; the limit here also counts the
     * inner loop and skipped trials).
     */
    public static NonNegativeLeastSquares withDefaults() {
        return new NonNegativeLeastSquares(DEFAULT_TOLERANCE, 0);
    }

    /** The same solver with relative tolerance {@code tolerance} (0 &lt; tolerance &lt; 1). */
    public NonNegativeLeastSquares withTolerance(double tolerance) {
        if (!(tolerance > 0 && tolerance < 1)) {
            throw new IllegalArgumentException("tolerance " + tolerance + " must be in (0, 1)");
        }
        return new NonNegativeLeastSquares(tolerance, maxIterations);
    }

    /** The same solver stopping after {@code maxIterations} least-squares subproblems (≥ 1). */
    public NonNegativeLeastSquares withMaxIterations(int maxIterations) {
        if (maxIterations < 1) {
            throw new IllegalArgumentException("iteration limit " + maxIterations + " must be at least 1");
        }
        return new NonNegativeLeastSquares(tolerance, maxIterations);
    }

    /**
     * Solves the problem.
     *
     * @throws IllegalArgumentException when the signed columns are linearly dependent over the
     *                                  weighted rows (their coefficients would not be determined)
     */
    public NnlsResult solve(LeastSquaresProblem problem) {
        int m = problem.rowCount();
        int n = problem.columnCount();
        int limit = maxIterations > 0 ? maxIterations : 10 * n + 50;

        double[][] unit = new double[n][];
        double[] scale = new double[n];
        List<Integer> zeroColumns = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            double[] c = problem.weightedColumn(j);
            scale[j] = Vectors.norm(c);
            if (scale[j] == 0) {
                zeroColumns.add(j);
                continue;
            }
            for (int i = 0; i < m; i++) {
                c[i] /= scale[j];
            }
            unit[j] = c;
        }
        double[] wb = problem.weightedTarget();
        double dualThreshold = tolerance * Vectors.norm(wb);

        // y is the coefficient vector of the unit-norm columns: x_j = y_j / scale_j
        double[] y = new double[n];
        List<Integer> positive = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            if (problem.isSigned(j) && scale[j] > 0) {
                positive.add(j);
            }
        }
        int iterations = 0;
        if (!positive.isEmpty()) {
            double[] z = solveSubproblem(unit, positive, wb, m);
            iterations++;
            if (z == null) {
                throw new IllegalArgumentException("the signed columns " + positive
                        + " are linearly dependent over the weighted rows");
            }
            scatter(z, positive, y);
        }

        boolean converged = false;
        boolean[] skipped = new boolean[n];
        outer:
        while (true) {
            double[] w = dual(unit, wb, y, m);
            int entering = -1;
            double best = dualThreshold;
            for (int j = 0; j < n; j++) {
                if (unit[j] != null && !problem.isSigned(j) && !positive.contains(j) && !skipped[j] && w[j] > best) {
                    best = w[j];
                    entering = j;
                }
            }
            if (entering < 0) {
                converged = true;
                break;
            }
            if (iterations >= limit) {
                break;
            }
            List<Integer> trial = new ArrayList<>(positive);
            trial.add(entering);
            double[] z = solveSubproblem(unit, trial, wb, m);
            iterations++;
            if (z == null || z[z.length - 1] <= 0) {
                // Dependent on P, or rounding made the trial coefficient non-positive: the book's
                // code sets w_j = 0 and looks for another column.
                skipped[entering] = true;
                continue;
            }
            Arrays.fill(skipped, false);
            positive = trial;

            while (true) {
                boolean feasible = true;
                for (int k = 0; k < positive.size(); k++) {
                    if (!problem.isSigned(positive.get(k)) && z[k] <= 0) {
                        feasible = false;
                        break;
                    }
                }
                if (feasible) {
                    Arrays.fill(y, 0);
                    scatter(z, positive, y);
                    break;
                }
                if (iterations >= limit) {
                    break outer;
                }
                // Move from y toward z only as far as every constrained coefficient stays ≥ 0.
                double alpha = Double.POSITIVE_INFINITY;
                int blocking = -1;
                for (int k = 0; k < positive.size(); k++) {
                    int j = positive.get(k);
                    if (!problem.isSigned(j) && z[k] <= 0) {
                        double a = y[j] / (y[j] - z[k]);
                        if (a < alpha) {
                            alpha = a;
                            blocking = j;
                        }
                    }
                }
                for (int k = 0; k < positive.size(); k++) {
                    int j = positive.get(k);
                    y[j] += alpha * (z[k] - y[j]);
                }
                y[blocking] = 0;
                List<Integer> kept = new ArrayList<>();
                for (int j : positive) {
                    if (problem.isSigned(j) || y[j] > 0) {
                        kept.add(j);
                    } else {
                        y[j] = 0;
                    }
                }
                positive = kept;
                z = solveSubproblem(unit, positive, wb, m);
                iterations++;
                if (z == null) {
                    // A subset of independent columns stays independent; reaching this means the
                    // factorisation lost accuracy, so stop with the feasible point reached so far.
                    break outer;
                }
            }
        }

        double[] x = new double[n];
        for (int j = 0; j < n; j++) {
            x[j] = unit[j] == null ? 0 : y[j] / scale[j];
        }
        return result(problem, x, iterations, converged, positive, zeroColumns);
    }

    private static NnlsResult result(LeastSquaresProblem problem, double[] x, int iterations, boolean converged,
                                     List<Integer> positive, List<Integer> zeroColumns) {
        double[] r = problem.residual(x);
        double[] weights = problem.rowWeights();
        double chiSquare = 0;
        int used = 0;
        double[] wr = new double[r.length];
        for (int i = 0; i < r.length; i++) {
            wr[i] = -r[i] * weights[i] * weights[i];
            double q = r[i] * weights[i];
            chiSquare += q * q;
            if (weights[i] > 0) {
                used++;
            }
        }
        double[] dual = new double[x.length];
        for (int j = 0; j < x.length; j++) {
            dual[j] = Vectors.dot(problem.column(j), wr);
        }
        int[] positiveSet = positive.stream().mapToInt(Integer::intValue).sorted().toArray();
        int[] zeros = zeroColumns.stream().mapToInt(Integer::intValue).toArray();
        return new NnlsResult(x, Vectors.norm(r), chiSquare, used, dual, iterations, converged, positiveSet, zeros,
                CollinearityReport.of(problem));
    }

    /** w = Uᵀ(Wb − U·y) over the unit-norm columns. */
    private static double[] dual(double[][] unit, double[] wb, double[] y, int m) {
        double[] r = wb.clone();
        for (int j = 0; j < unit.length; j++) {
            if (unit[j] != null && y[j] != 0) {
                for (int i = 0; i < m; i++) {
                    r[i] -= unit[j][i] * y[j];
                }
            }
        }
        double[] w = new double[unit.length];
        for (int j = 0; j < unit.length; j++) {
            w[j] = unit[j] == null ? 0 : Vectors.dot(unit[j], r);
        }
        return w;
    }

    /**
     * Unconstrained least squares on the listed columns, in list order; {@code null} when the last
     * listed column (or any) lies within {@link #DEPENDENCE_THRESHOLD} of the span of those before.
     */
    private static double[] solveSubproblem(double[][] unit, List<Integer> columns, double[] wb, int m) {
        int k = columns.size();
        if (k == 0) {
            return new double[0];
        }
        if (k > m) {
            return null;
        }
        double[][] data = new double[m][k];
        for (int c = 0; c < k; c++) {
            double[] col = unit[columns.get(c)];
            for (int i = 0; i < m; i++) {
                data[i][c] = col[i];
            }
        }
        // With unit-norm columns and Householder QR in column order, |R_kk| is the distance of
        // column k from the span of the columns before it: the threshold is a dependence test.
        DecompositionSolver solver = new QRDecomposition(new Array2DRowRealMatrix(data, false), DEPENDENCE_THRESHOLD)
                .getSolver();
        try {
            return solver.solve(new ArrayRealVector(wb, false)).toArray();
        } catch (MathIllegalArgumentException singularOrTooFewRows) {
            return null;
        }
    }

    private static void scatter(double[] z, List<Integer> columns, double[] y) {
        for (int k = 0; k < columns.size(); k++) {
            y[columns.get(k)] = z[k];
        }
    }
}
