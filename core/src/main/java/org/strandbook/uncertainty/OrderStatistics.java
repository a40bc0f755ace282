package org.strandbook.uncertainty;

/**
 * The k-th smallest of an array's range in linear expected time, by Hoare's FIND (C. A. R. Hoare,
 * "Algorithm 65: Find", Commun. ACM 4 (1961) 321): a Monte Carlo interval needs two order
 * statistics of M values, a dark scan's noise one median, and neither needs the values sorted.
 */
public final class OrderStatistics {

    private OrderStatistics() {
    }

    /**
     * The k-th smallest (0-based, {@code from ≤ k ≤ to}) of {@code a[from..to]}, which is reordered so
     * that afterwards {@code a[from..k-1] ≤ a[k] ≤ a[k+1..to]}. Values must not be NaN.
     */
    public static double select(double[] a, int from, int to, int k) {
        int lo = from;
        int hi = to;
        while (lo < hi) {
            double pivot = a[(lo + hi) >>> 1];
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (a[i] < pivot) {
                    i++;
                }
                while (a[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    double t = a[i];
                    a[i] = a[j];
                    a[j] = t;
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                return a[k];
            }
        }
        return a[k];
    }
}
