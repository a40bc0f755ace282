package org.strandbook.fit;

import java.util.Arrays;

/**
 * A linear least-squares problem min ‖W(A·x − b)‖₂ with an optional diagonal row weight W and a
 * choice, per column, between a non-negative and a signed (unconstrained) coefficient.
 *
 * <p>In Strandbook the rows are wavelengths and the columns fault signatures (loss spectra in dB
 * per unit of the fault); {@code b} is the measured-minus-predicted loss spectrum. The row weight
 * is 1/σ, σ being the standard uncertainty of the row's {@code b} in the same unit as {@code b},
 * so that the weighted sum of squares is a chi-square. A row of weight 0 takes no part in the fit
 * (a masked wavelength).
 *
 * <p>Three ways to pass the matrix, all copied on the way in:
 * <ul>
 *   <li>{@link #ofRows(double[][], double[])}: {@code rows[i][j]} is row i, column j (m arrays of
 *       length n);</li>
 *   <li>{@link #ofColumns(double[][], double[])}: {@code columns[j][i]} is row i, column j (n arrays
 *       of length m), natural when each column is a spectrum on a wavelength grid;</li>
 *   <li>{@link #ofColumnMajor(double[], int, double[])}: one array, element (i, j) at
 *       {@code i + j·m}, the Fortran/LAPACK layout.</li>
 * </ul>
 * Instances are immutable; the {@code with...} methods return new instances.
 */
public final class LeastSquaresProblem {

    private final double[][] columns;
    private final double[] target;
    private final double[] rowWeights;
    private final boolean[] signed;

    private LeastSquaresProblem(double[][] columns, double[] target, double[] rowWeights, boolean[] signed) {
        this.columns = columns;
        this.target = target;
        this.rowWeights = rowWeights;
        this.signed = signed;
    }

    /**
     * A problem from a row-major matrix ({@code rows[i][j]}: row i, column j) and right-hand side
     * {@code b} (one value per row). All values must be finite; every row the same length ≥ 1.
     */
    public static LeastSquaresProblem ofRows(double[][] rows, double[] b) {
        requireRowCount(rows.length, b);
        if (rows.length == 0) {
            throw new IllegalArgumentException("the matrix has no rows");
        }
        int n = rows[0].length;
        double[][] cols = new double[n][rows.length];
        for (int i = 0; i < rows.length; i++) {
            if (rows[i].length != n) {
                throw new IllegalArgumentException("row " + i + " has " + rows[i].length
                        + " values but row 0 has " + n);
            }
            for (int j = 0; j < n; j++) {
                cols[j][i] = rows[i][j];
            }
        }
        return create(cols, b);
    }

    /**
     * A problem from the columns of the matrix ({@code columns[j][i]}: row i, column j), e.g. one
     * fault signature spectrum per column, and right-hand side {@code b} (one value per row).
     */
    public static LeastSquaresProblem ofColumns(double[][] columns, double[] b) {
        double[][] cols = new double[columns.length][];
        for (int j = 0; j < columns.length; j++) {
            if (columns[j].length != b.length) {
                throw new IllegalArgumentException("column " + j + " has " + columns[j].length
                        + " rows but b has " + b.length);
            }
            cols[j] = columns[j].clone();
        }
        return create(cols, b);
    }

    /**
     * A problem from a column-major matrix of {@code rowCount} rows: element (i, j) at
     * {@code data[i + j·rowCount]}; the column count is {@code data.length / rowCount}.
     */
    public static LeastSquaresProblem ofColumnMajor(double[] data, int rowCount, double[] b) {
        requireRowCount(rowCount, b);
        if (rowCount <= 0 || data.length % rowCount != 0) {
            throw new IllegalArgumentException("column-major data of length " + data.length
                    + " is not a whole number of columns of " + rowCount + " rows");
        }
        int n = data.length / rowCount;
        double[][] cols = new double[n][];
        for (int j = 0; j < n; j++) {
            cols[j] = Arrays.copyOfRange(data, j * rowCount, (j + 1) * rowCount);
        }
        return create(cols, b);
    }

    private static LeastSquaresProblem create(double[][] cols, double[] b) {
        if (cols.length == 0) {
            throw new IllegalArgumentException("the matrix has no columns");
        }
        if (b.length == 0) {
            throw new IllegalArgumentException("the matrix has no rows");
        }
        for (int j = 0; j < cols.length; j++) {
            requireFinite(cols[j], "column " + j);
        }
        requireFinite(b, "b");
        double[] ones = new double[b.length];
        Arrays.fill(ones, 1.0);
        return new LeastSquaresProblem(cols, b.clone(), ones, new boolean[cols.length]);
    }

    /**
     * The same problem with row weights 1/σᵢ (finite, ≥ 0; 0 drops the row). The weighted residual
     * sum of squares is then the chi-square of the fit.
     */
    public LeastSquaresProblem withRowWeights(double[] weights) {
        requireRowCount(weights.length, target);
        for (int i = 0; i < weights.length; i++) {
            if (!Double.isFinite(weights[i]) || weights[i] < 0) {
                throw new IllegalArgumentException("row weight " + weights[i] + " at row " + i
                        + " must be a finite number ≥ 0");
            }
        }
        return new LeastSquaresProblem(columns, target, weights.clone(), signed);
    }

    /**
     * The same problem with row weights 1/σᵢ from standard uncertainties σᵢ (same unit as b):
     * each σ must be &gt; 0; {@code +∞} drops the row.
     */
    public LeastSquaresProblem withRowSigmas(double[] sigmas) {
        requireRowCount(sigmas.length, target);
        double[] weights = new double[sigmas.length];
        for (int i = 0; i < sigmas.length; i++) {
            if (!(sigmas[i] > 0)) {
                throw new IllegalArgumentException("σ " + sigmas[i] + " at row " + i + " must be > 0");
            }
            weights[i] = 1.0 / sigmas[i];
        }
        return new LeastSquaresProblem(columns, target, weights, signed);
    }

    /**
     * The same problem with the given columns (0-based) free to take either sign, e.g. a
     * reference-drift term; all other columns stay constrained to ≥ 0.
     */
    public LeastSquaresProblem withSignedColumns(int... signedColumns) {
        boolean[] s = new boolean[columns.length];
        for (int j : signedColumns) {
            if (j < 0 || j >= columns.length) {
                throw new IllegalArgumentException("signed column " + j + " is outside 0.."
                        + (columns.length - 1));
            }
            s[j] = true;
        }
        return new LeastSquaresProblem(columns, target, rowWeights, s);
    }

    public int rowCount() {
        return target.length;
    }

    public int columnCount() {
        return columns.length;
    }

    /** A copy of column {@code j} (unweighted). */
    public double[] column(int j) {
        return columns[j].clone();
    }

    /** A copy of the right-hand side b (unweighted). */
    public double[] target() {
        return target.clone();
    }

    /** A copy of the row weights 1/σ (all 1 unless set). */
    public double[] rowWeights() {
        return rowWeights.clone();
    }

    /** True when column {@code j} may take either sign. */
    public boolean isSigned(int j) {
        return signed[j];
    }

    /** Element (row, column) of the unweighted matrix. */
    public double element(int row, int column) {
        return columns[column][row];
    }

    /** A·x − b, unweighted, for coefficients x (one per column). */
    public double[] residual(double[] x) {
        if (x.length != columns.length) {
            throw new IllegalArgumentException(x.length + " coefficients for " + columns.length + " columns");
        }
        double[] r = new double[target.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = -target[i];
        }
        for (int j = 0; j < columns.length; j++) {
            if (x[j] != 0) {
                double[] c = columns[j];
                for (int i = 0; i < r.length; i++) {
                    r[i] += c[i] * x[j];
                }
            }
        }
        return r;
    }

    /** Column j multiplied row by row by the weights: the column the solver actually sees. */
    double[] weightedColumn(int j) {
        double[] c = columns[j];
        double[] out = new double[c.length];
        for (int i = 0; i < c.length; i++) {
            out[i] = c[i] * rowWeights[i];
        }
        return out;
    }

    double[] weightedTarget() {
        double[] out = new double[target.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = target[i] * rowWeights[i];
        }
        return out;
    }

    private static void requireRowCount(int rows, double[] b) {
        if (rows != b.length) {
            throw new IllegalArgumentException("the matrix has " + rows + " rows but b has " + b.length + " values");
        }
    }

    private static void requireFinite(double[] values, String what) {
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException(what + " has a non-finite value " + values[i] + " at row " + i);
            }
        }
    }
}
