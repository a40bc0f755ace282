package org.strandbook.fit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * The cosine similarity of every pair of columns of a least-squares problem over its weighted
 * rows, so that a caller can say "these two signatures are nearly collinear" before trusting
 * their separate coefficients.
 *
 * <p>The cosine is taken about zero (not about the column means): a constant offset is itself a
 * signature shape in a loss fit, so two signatures that differ only by an offset are genuinely
 * distinguishable only through that offset.
 *
 * <p>Pairs miss a column that lies in the span of <em>several</em> others (a darkening edge that
 * flat + tilt nearly make up), so the report also gives each column's variance inflation factor,
 * VIF = 1/(1 − R²) of that column regressed on all the others, which for unit-scaled columns is
 * the diagonal of the inverse cosine (Gram) matrix, and the condition number of the unit-scaled
 * weighted design matrix (Belsley, Kuh and Welsch, "Regression Diagnostics", Wiley 1980, ch. 3).
 */
public final class CollinearityReport {

    /** |cos| above which two columns are called nearly collinear unless a caller says otherwise. */
    public static final double DEFAULT_THRESHOLD = 0.95;

    private final int columnCount;
    private final double[][] cosines;
    private final double[] inflation;
    private final double conditionNumber;

    private CollinearityReport(int columnCount, double[][] cosines, double[] inflation, double conditionNumber) {
        this.columnCount = columnCount;
        this.cosines = cosines;
        this.inflation = inflation;
        this.conditionNumber = conditionNumber;
    }

    /** The report for the columns of {@code problem}, weighted by its row weights. */
    public static CollinearityReport of(LeastSquaresProblem problem) {
        int n = problem.columnCount();
        double[][] weighted = new double[n][];
        double[] norms = new double[n];
        for (int j = 0; j < n; j++) {
            weighted[j] = problem.weightedColumn(j);
            norms[j] = Vectors.norm(weighted[j]);
        }
        double[][] cos = new double[n][n];
        for (int a = 0; a < n; a++) {
            for (int b = a; b < n; b++) {
                double c;
                if (norms[a] == 0 || norms[b] == 0) {
                    c = Double.NaN;
                } else {
                    c = Vectors.dot(weighted[a], weighted[b]) / (norms[a] * norms[b]);
                    c = Math.max(-1.0, Math.min(1.0, c));
                }
                cos[a][b] = c;
                cos[b][a] = c;
            }
        }
        return withInflation(n, weighted, norms, cos);
    }

    private static CollinearityReport withInflation(int n, double[][] weighted, double[] norms, double[][] cos) {
        double[] vif = new double[n];
        java.util.Arrays.fill(vif, Double.NaN);
        int[] live = java.util.stream.IntStream.range(0, n).filter(j -> norms[j] > 0).toArray();
        double condition = Double.NaN;
        if (live.length > 0) {
            int rows = weighted[live[0]].length;
            double[][] unit = new double[rows][live.length];
            for (int c = 0; c < live.length; c++) {
                for (int r = 0; r < rows; r++) {
                    unit[r][c] = weighted[live[c]][r] / norms[live[c]];
                }
            }
            SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(unit, false));
            double[] sv = svd.getSingularValues();
            double smallest = sv[sv.length - 1];
            condition = smallest > 0 ? sv[0] / smallest : Double.POSITIVE_INFINITY;
            // (UᵀU)⁻¹ = V·Σ⁻²·Vᵀ: its diagonal is each column's VIF
            RealMatrix v = svd.getV();
            for (int c = 0; c < live.length; c++) {
                double d = 0;
                for (int k = 0; k < sv.length; k++) {
                    double vk = v.getEntry(c, k);
                    d += sv[k] > 0 ? vk * vk / (sv[k] * sv[k]) : (vk != 0 ? Double.POSITIVE_INFINITY : 0);
                }
                vif[live[c]] = d;
            }
        }
        return new CollinearityReport(n, cos, vif, condition);
    }

    /**
     * Variance inflation factor of column {@code j}: 1/(1 − R²) with R² the (uncentred) share of
     * that column the other columns reproduce. 1 for a column orthogonal to all others, ∞ for one
     * in their span, NaN for a zero column.
     */
    public double varianceInflation(int j) {
        return inflation[j];
    }

    /** Condition number (largest over smallest singular value) of the unit-scaled weighted columns. */
    public double conditionNumber() {
        return conditionNumber;
    }

    public int columnCount() {
        return columnCount;
    }

    /** Cosine similarity of columns {@code a} and {@code b}; {@code NaN} if either is zero. */
    public double cosine(int a, int b) {
        return cosines[a][b];
    }

    /** Every pair (first &lt; second), in index order. */
    public List<ColumnPair> allPairs() {
        List<ColumnPair> pairs = new ArrayList<>();
        for (int a = 0; a < columnCount; a++) {
            for (int b = a + 1; b < columnCount; b++) {
                pairs.add(new ColumnPair(a, b, cosines[a][b]));
            }
        }
        return pairs;
    }

    /**
     * The pairs with |cos| strictly above {@code threshold} (0 ≤ threshold &lt; 1), most collinear
     * first. Pairs involving a zero column are never listed.
     */
    public List<ColumnPair> pairsAbove(double threshold) {
        if (!(threshold >= 0 && threshold < 1)) {
            throw new IllegalArgumentException("collinearity threshold " + threshold + " must be in [0, 1)");
        }
        List<ColumnPair> pairs = new ArrayList<>();
        for (ColumnPair p : allPairs()) {
            if (Math.abs(p.cosine()) > threshold) {
                pairs.add(p);
            }
        }
        pairs.sort(Comparator.comparingDouble((ColumnPair p) -> -Math.abs(p.cosine())));
        return pairs;
    }

    /** The pairs with |cos| above {@link #DEFAULT_THRESHOLD}. */
    public List<ColumnPair> nearlyCollinearPairs() {
        return pairsAbove(DEFAULT_THRESHOLD);
    }
}
