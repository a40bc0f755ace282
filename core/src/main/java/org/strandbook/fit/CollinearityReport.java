package org.strandbook.fit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The cosine similarity of every pair of columns of a least-squares problem over its weighted
 * rows, so that a caller can say "these two signatures are nearly collinear" before trusting
 * their separate coefficients.
 *
 * <p>The cosine is taken about zero (not about the column means): a constant offset is itself a
 * signature shape in a loss fit, so two signatures that differ only by an offset are genuinely
 * distinguishable only through that offset.
 */
public final class CollinearityReport {

    /** |cos| above which two columns are called nearly collinear unless a caller says otherwise. */
    public static final double DEFAULT_THRESHOLD = 0.95;

    private final int columnCount;
    private final double[][] cosines;

    private CollinearityReport(int columnCount, double[][] cosines) {
        this.columnCount = columnCount;
        this.cosines = cosines;
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
        return new CollinearityReport(n, cos);
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
