package org.strandbook.fit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class NonNegativeLeastSquaresTest {

    private static final double RELATIVE_TOLERANCE = 1e-9;
    /** Half a unit in the last printed digit of a four-decimal published value. */
    private static final double FOUR_DECIMALS = 5e-5;

    private final NonNegativeLeastSquares solver = NonNegativeLeastSquares.withDefaults();

    // Source: SciPy reference guide, scipy.optimize.nnls (v1.5.0), Examples:
    // A = [[1, 0], [1, 0], [0, 1]], b = [2, 1, 1] gives x = [1.5, 1.0], rnorm = 0.7071067811865475.
    @Test
    void solvesSciPyDocumentationExample() {
        NnlsResult r = solver.solve(LeastSquaresProblem.ofRows(
                new double[][] {{1, 0}, {1, 0}, {0, 1}}, new double[] {2, 1, 1}));

        assertArrayEquals(new double[] {1.5, 1.0}, r.coefficients(), 1e-12);
        assertEquals(0.7071067811865475, r.residualNorm(), 1e-12);
        assertTrue(r.converged());
    }

    // Source: SciPy reference guide, scipy.optimize.nnls (v1.5.0), Examples:
    // the same A with b = [-1, -1, -1] gives x = [0, 0], rnorm = 1.7320508075688772.
    @Test
    void returnsZeroWhenEveryColumnPointsAwayFromTarget() {
        NnlsResult r = solver.solve(LeastSquaresProblem.ofRows(
                new double[][] {{1, 0}, {1, 0}, {0, 1}}, new double[] {-1, -1, -1}));

        assertArrayEquals(new double[] {0, 0}, r.coefficients(), 0);
        assertEquals(1.7320508075688772, r.residualNorm(), 1e-12);
        assertEquals(0, r.positiveSet().length);
    }

    // Source: MathWorks documentation of lsqnonneg, example "Nonnegative Linear Least Squares":
    // x = [0; 0.6929], norm(C*x - d) = 0.9118 (values printed to four decimals).
    private static final double[][] LSQNONNEG_C = {
        {0.0372, 0.2869},
        {0.6861, 0.7071},
        {0.6233, 0.6245},
        {0.6344, 0.6170},
    };
    private static final double[] LSQNONNEG_D = {0.8587, 0.1781, 0.0747, 0.8405};

    @Test
    void solvesLsqnonnegDocumentationExample() {
        NnlsResult r = solver.solve(LeastSquaresProblem.ofRows(LSQNONNEG_C, LSQNONNEG_D));

        assertEquals(0.0, r.coefficient(0), 0);
        assertEquals(0.6929, r.coefficient(1), FOUR_DECIMALS);
        assertEquals(0.9118, r.residualNorm(), FOUR_DECIMALS);
    }

    // Source: the same MathWorks example, unconstrained solution C\d = [-2.5627; 3.1108] with
    // norm 0.6674: with both columns signed the solver must reproduce plain least squares.
    @Test
    void signedColumnsReproduceUnconstrainedLeastSquares() {
        NnlsResult r = solver.solve(LeastSquaresProblem.ofRows(LSQNONNEG_C, LSQNONNEG_D).withSignedColumns(0, 1));

        assertEquals(-2.5627, r.coefficient(0), FOUR_DECIMALS);
        assertEquals(3.1108, r.coefficient(1), FOUR_DECIMALS);
        assertEquals(0.6674, r.residualNorm(), FOUR_DECIMALS);
    }

    // Check against an independent method: the optimum of a convex problem lies on the face whose
    // coefficients are the unconstrained least-squares solution on their support, so enumerating
    // every support (Lawson & Hanson 1974, ch. 23: the finite set of candidate active sets) and
    // keeping the best feasible one gives the true minimum for small problems.
    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10})
    void matchesExhaustiveSearchOverActiveSets(long seed) {
        Random random = new Random(seed);
        for (int trial = 0; trial < 40; trial++) {
            LeastSquaresProblem problem = randomProblem(random, 1 + random.nextInt(12), 1 + random.nextInt(6));

            NnlsResult r = solver.solve(problem);
            double best = exhaustiveMinimum(problem);

            double got = chiSquare(problem, r.coefficients());
            // Where the minimum is zero (b inside the cone), rounding of order ε·‖Wb‖² remains.
            double roundingFloor = 1e-14 * chiSquare(problem, new double[problem.columnCount()]);
            String where = "seed " + seed + " trial " + trial;
            assertEquals(best, got, RELATIVE_TOLERANCE * best + roundingFloor, where);
            assertTrue(r.converged(), where);
            for (int j = 0; j < problem.columnCount(); j++) {
                assertTrue(problem.isSigned(j) || r.coefficient(j) >= 0, where + " column " + j);
            }
        }
    }

    // Kuhn–Tucker conditions of min ‖W(Ax − b)‖² with x_j ≥ 0 for constrained columns
    // (Lawson & Hanson 1974, ch. 23): w = AᵀW²(b − Ax) is zero on positive and signed
    // coefficients and ≤ 0 on zero ones. w is recomputed here from the problem, not taken from the
    // solver.
    @ParameterizedTest
    @ValueSource(longs = {11, 12, 13, 14, 15, 16, 17, 18})
    void solutionSatisfiesKuhnTuckerConditions(long seed) {
        Random random = new Random(seed);
        LeastSquaresProblem problem = randomProblem(random, 60, 10);

        NnlsResult r = solver.solve(problem);

        double[] x = r.coefficients();
        double[] weights = problem.rowWeights();
        double[] residual = problem.residual(x);
        double targetNorm = Math.sqrt(chiSquare(problem, new double[x.length]));
        for (int j = 0; j < x.length; j++) {
            double[] a = problem.column(j);
            double w = 0;
            double columnNorm = 0;
            for (int i = 0; i < a.length; i++) {
                w -= a[i] * weights[i] * weights[i] * residual[i];
                columnNorm += a[i] * a[i] * weights[i] * weights[i];
            }
            double tol = 1e-9 * Math.sqrt(columnNorm) * targetNorm;
            String where = "seed " + seed + " column " + j;
            if (problem.isSigned(j) || x[j] > 0) {
                assertEquals(0.0, w, tol, where);
            } else {
                assertEquals(0.0, x[j], 0, where);
                assertTrue(w <= tol, where + ": w = " + w);
            }
            assertEquals(w, r.dualVector()[j], tol, where);
        }
    }

    // Invented check data: a known non-negative mix plus a negative drift term is recovered
    // exactly from noise-free data, which an x ≥ 0 solver alone could not do.
    @Test
    void signedColumnCarriesNegativeDrift() {
        double[] band = {0, 1, 4, 1, 0, 0};
        double[] slope = {0, 0.2, 0.4, 0.6, 0.8, 1.0};
        double[] drift = {1, 1, 1, 1, 1, 1};
        double[] b = new double[6];
        for (int i = 0; i < 6; i++) {
            b[i] = 0.5 * band[i] + 2.0 * slope[i] - 0.3 * drift[i];
        }

        NnlsResult r = solver.solve(LeastSquaresProblem.ofColumns(new double[][] {band, slope, drift}, b)
                .withSignedColumns(2));

        assertArrayEquals(new double[] {0.5, 2.0, -0.3}, r.coefficients(), 1e-12);
        assertArrayEquals(new int[] {0, 1, 2}, r.positiveSet());
    }

    @Test
    void zeroColumnGetsZeroCoefficientAndIsReported() {
        double[][] rows = {{1, 0, 0}, {0, 0, 1}, {1, 0, 1}};

        NnlsResult r = solver.solve(LeastSquaresProblem.ofRows(rows, new double[] {1, 2, 3}));

        assertArrayEquals(new int[] {1}, r.zeroNormColumns());
        assertEquals(0.0, r.coefficient(1), 0);
        assertArrayEquals(new double[] {1, 0, 2}, r.coefficients(), 1e-12);
        assertTrue(Double.isNaN(r.collinearity().cosine(0, 1)));
    }

    @Test
    void zeroWeightRowTakesNoPartInTheFit() {
        double[][] rows = {{1, 0}, {0, 1}, {1, 1}, {5, -7}};
        double[] b = {1, 2, 3.5, 100};

        NnlsResult weighted = solver.solve(LeastSquaresProblem.ofRows(rows, b).withRowWeights(new double[] {1, 1, 1, 0}));
        NnlsResult dropped = solver.solve(LeastSquaresProblem.ofRows(
                new double[][] {{1, 0}, {0, 1}, {1, 1}}, new double[] {1, 2, 3.5}));

        assertArrayEquals(dropped.coefficients(), weighted.coefficients(), 1e-12);
        assertEquals(dropped.chiSquare(), weighted.chiSquare(), 1e-12);
        assertEquals(3, weighted.usedRowCount());
    }

    // Weighted least squares with weights 1/σ minimises Σ((Ax − b)ᵢ/σᵢ)²: scaling every σ by the
    // same factor leaves x unchanged and scales χ² by the inverse square.
    @Test
    void uniformSigmaScalesChiSquareOnly() {
        Random random = new Random(21);
        LeastSquaresProblem base = randomProblem(random, 20, 4).withRowWeights(ones(20));
        double[] sigma = new double[20];
        java.util.Arrays.fill(sigma, 0.5);

        NnlsResult plain = solver.solve(base);
        NnlsResult weighted = solver.solve(base.withRowSigmas(sigma));

        assertArrayEquals(plain.coefficients(), weighted.coefficients(), 1e-12);
        assertEquals(4 * plain.chiSquare(), weighted.chiSquare(), 1e-9 * weighted.chiSquare());
    }

    // b = 2.2·a + 0.2·c exactly, with a given twice: only the sum of the twins is determined.
    @Test
    void exactlyDuplicatedColumnsStillConverge() {
        double[] a = {1, 2, 3, 4};
        double[] c = {4, 3, 2, 1};
        double[] b = {3, 5, 7, 9};

        NnlsResult r = solver.solve(LeastSquaresProblem.ofColumns(new double[][] {a, a.clone(), c}, b));

        assertTrue(r.converged());
        assertEquals(0.0, r.residualNorm(), 1e-12);
        assertEquals(2.2, r.coefficient(0) + r.coefficient(1), 1e-12);
        assertEquals(0.2, r.coefficient(2), 1e-12);
        assertEquals(1.0, r.collinearity().cosine(0, 1), 1e-15);
    }

    @Test
    void linearlyDependentSignedColumnsAreRejected() {
        double[] a = {1, 2, 3};
        double[] twice = {2, 4, 6};

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> solver.solve(
                LeastSquaresProblem.ofColumns(new double[][] {a, twice}, new double[] {1, 1, 1}).withSignedColumns(0, 1)));
        assertTrue(e.getMessage().contains("linearly dependent"), e.getMessage());
    }

    @Test
    void allThreeMatrixLayoutsGiveTheSameFit() {
        double[][] rows = {{1, 2}, {3, 1}, {0, 4}};
        double[] columnMajor = {1, 3, 0, 2, 1, 4};
        double[][] columns = {{1, 3, 0}, {2, 1, 4}};
        double[] b = {1, 2, 3};

        NnlsResult byRows = solver.solve(LeastSquaresProblem.ofRows(rows, b));
        NnlsResult byColumnMajor = solver.solve(LeastSquaresProblem.ofColumnMajor(columnMajor, 3, b));
        NnlsResult byColumns = solver.solve(LeastSquaresProblem.ofColumns(columns, b));

        assertArrayEquals(byRows.coefficients(), byColumnMajor.coefficients(), 0);
        assertArrayEquals(byRows.coefficients(), byColumns.coefficients(), 0);
    }

    @Test
    void iterationLimitIsReportedAsNotConverged() {
        Random random = new Random(5);
        LeastSquaresProblem problem = randomProblem(random, 30, 6);
        while (solver.solve(problem).iterations() < 2) {
            problem = randomProblem(random, 30, 6);
        }

        NnlsResult r = NonNegativeLeastSquares.withDefaults().withMaxIterations(1).solve(problem);

        assertFalse(r.converged());
        for (int j = 0; j < problem.columnCount(); j++) {
            assertTrue(problem.isSigned(j) || r.coefficient(j) >= 0);
        }
    }

    @Test
    void badInputIsRejectedWithTheRowNamed() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LeastSquaresProblem.ofRows(new double[][] {{1}, {Double.NaN}}, new double[] {1, 2}));
        assertTrue(e.getMessage().contains("row 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> LeastSquaresProblem.ofRows(new double[][] {{1}, {2}}, new double[] {1}));
        assertThrows(IllegalArgumentException.class,
                () -> LeastSquaresProblem.ofRows(new double[][] {{1}, {2}}, new double[] {1, 2})
                        .withRowWeights(new double[] {1, -1}));
    }

    /**
     * Random m×n problem: Gaussian matrix and target, weights log-uniform over two decades (some
     * problems unweighted, a few rows dropped), and a random subset of signed columns that stays
     * independent (fewer signed columns than used rows).
     */
    static LeastSquaresProblem randomProblem(Random random, int m, int n) {
        double[][] rows = new double[m][n];
        double[] b = new double[m];
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < n; j++) {
                rows[i][j] = random.nextGaussian();
            }
            b[i] = random.nextGaussian();
        }
        LeastSquaresProblem p = LeastSquaresProblem.ofRows(rows, b);
        int usedRows = m;
        if (random.nextBoolean()) {
            double[] w = new double[m];
            for (int i = 0; i < m; i++) {
                w[i] = Math.pow(10, 2 * random.nextDouble() - 1);
                if (m > 2 && random.nextInt(8) == 0) {
                    w[i] = 0;
                    usedRows--;
                }
            }
            p = p.withRowWeights(w);
        }
        if (random.nextBoolean()) {
            int maxSigned = Math.min(n, usedRows - 1);
            int count = maxSigned > 0 ? random.nextInt(maxSigned + 1) : 0;
            int[] signed = random.ints(0, n).distinct().limit(count).toArray();
            p = p.withSignedColumns(signed);
        }
        return p;
    }

    /** Minimum χ² over every support that gives a feasible unconstrained solution. */
    private static double exhaustiveMinimum(LeastSquaresProblem problem) {
        int n = problem.columnCount();
        double best = Double.POSITIVE_INFINITY;
        for (int mask = 0; mask < (1 << n); mask++) {
            boolean containsAllSigned = true;
            for (int j = 0; j < n; j++) {
                if (problem.isSigned(j) && (mask & (1 << j)) == 0) {
                    containsAllSigned = false;
                }
            }
            if (!containsAllSigned) {
                continue;
            }
            double[] x = leastSquaresOnSupport(problem, mask);
            if (x == null) {
                continue;
            }
            boolean feasible = true;
            for (int j = 0; j < n; j++) {
                if (!problem.isSigned(j) && x[j] < 0) {
                    feasible = false;
                }
            }
            if (feasible) {
                best = Math.min(best, chiSquare(problem, x));
            }
        }
        return best;
    }

    /** Weighted normal equations on the support (LU), a route independent of the solver's QR. */
    private static double[] leastSquaresOnSupport(LeastSquaresProblem problem, int mask) {
        int n = problem.columnCount();
        int m = problem.rowCount();
        int[] support = java.util.stream.IntStream.range(0, n).filter(j -> (mask & (1 << j)) != 0).toArray();
        double[] x = new double[n];
        if (support.length == 0) {
            return x;
        }
        double[] w = problem.rowWeights();
        double[] b = problem.target();
        RealMatrix normal = new Array2DRowRealMatrix(support.length, support.length);
        double[] rhs = new double[support.length];
        for (int p = 0; p < support.length; p++) {
            for (int q = 0; q < support.length; q++) {
                double s = 0;
                for (int i = 0; i < m; i++) {
                    s += w[i] * w[i] * problem.element(i, support[p]) * problem.element(i, support[q]);
                }
                normal.setEntry(p, q, s);
            }
            double s = 0;
            for (int i = 0; i < m; i++) {
                s += w[i] * w[i] * problem.element(i, support[p]) * b[i];
            }
            rhs[p] = s;
        }
        DecompositionSolver lu = new LUDecomposition(normal, 1e-9).getSolver();
        if (!lu.isNonSingular()) {
            return null;
        }
        double[] xs = lu.solve(new ArrayRealVector(rhs)).toArray();
        for (int p = 0; p < support.length; p++) {
            x[support[p]] = xs[p];
        }
        return x;
    }

    static double chiSquare(LeastSquaresProblem problem, double[] x) {
        double[] r = problem.residual(x);
        double[] w = problem.rowWeights();
        double s = 0;
        for (int i = 0; i < r.length; i++) {
            s += r[i] * w[i] * r[i] * w[i];
        }
        return s;
    }

    private static double[] ones(int n) {
        double[] o = new double[n];
        java.util.Arrays.fill(o, 1.0);
        return o;
    }
}
