package org.strandbook.fit;

/**
 * Two columns of a least-squares problem and the cosine of the angle between them over the
 * weighted rows: cos = (Wa·Wb)/(‖Wa‖‖Wb‖), in [−1, 1]. |cos| near 1 means the two columns (two
 * fault signatures) have nearly the same shape, so the fit can trade one for the other and their
 * separate coefficients are poorly determined. {@code NaN} when either column is zero on the
 * weighted rows.
 *
 * @param first  0-based index of the first column (the smaller index)
 * @param second 0-based index of the second column
 * @param cosine cosine similarity over the weighted rows
 */
public record ColumnPair(int first, int second, double cosine) {

    public ColumnPair {
        if (first < 0 || second <= first) {
            throw new IllegalArgumentException("column pair (" + first + ", " + second
                    + ") must have 0 ≤ first < second");
        }
    }
}
