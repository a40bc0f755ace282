package org.strandbook.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class CollinearityReportTest {

    // Elementary geometry: vectors 45° apart have cos = √2/2, opposite vectors cos = −1,
    // perpendicular ones cos = 0.
    @Test
    void cosineIsTheAngleBetweenColumns() {
        double[][] columns = {{1, 0}, {1, 1}, {-2, 0}, {0, 3}};

        CollinearityReport report = CollinearityReport.of(LeastSquaresProblem.ofColumns(columns, new double[] {0, 0}));

        assertEquals(Math.sqrt(0.5), report.cosine(0, 1), 1e-15);
        assertEquals(-1.0, report.cosine(0, 2), 1e-15);
        assertEquals(0.0, report.cosine(0, 3), 1e-15);
        assertEquals(report.cosine(1, 0), report.cosine(0, 1), 0);
    }

    // With weight 1/σ = (1, 0) only the first row counts, where (1, 0) and (1, 1) coincide.
    @Test
    void cosineIsTakenOverWeightedRows() {
        double[][] columns = {{1, 0}, {1, 1}};

        CollinearityReport report = CollinearityReport.of(LeastSquaresProblem.ofColumns(columns, new double[] {0, 0})
                .withRowWeights(new double[] {1, 0}));

        assertEquals(1.0, report.cosine(0, 1), 1e-15);
    }

    @Test
    void listsNearlyCollinearPairsMostCollinearFirst() {
        double[][] columns = {
            {1, 0, 0},
            {1, 0.1, 0},      // cos with column 0 = 1/√1.01 ≈ 0.995
            {0, 0, 1},
            {0, 0.2, -1},     // cos with column 2 = −1/√1.04 ≈ −0.981
            {0, 0, 0},
        };

        List<ColumnPair> pairs = CollinearityReport.of(LeastSquaresProblem.ofColumns(columns, new double[3]))
                .nearlyCollinearPairs();

        assertEquals(2, pairs.size());
        assertEquals(0, pairs.get(0).first());
        assertEquals(1, pairs.get(0).second());
        assertEquals(1 / Math.sqrt(1.01), pairs.get(0).cosine(), 1e-15);
        assertEquals(2, pairs.get(1).first());
        assertEquals(3, pairs.get(1).second());
        assertEquals(-1 / Math.sqrt(1.04), pairs.get(1).cosine(), 1e-15);
    }

    @Test
    void zeroColumnIsNeverListedAsCollinear() {
        double[][] columns = {{0, 0}, {0, 0}};

        CollinearityReport report = CollinearityReport.of(LeastSquaresProblem.ofColumns(columns, new double[2]));

        assertTrue(Double.isNaN(report.cosine(0, 1)));
        assertTrue(report.pairsAbove(0.0).isEmpty());
    }

    // With two regressors, VIF = 1/(1 − r²) for both (Kutner, Nachtsheim, Neter and Li, "Applied
    // Linear Statistical Models", 5th ed. 2005, §10.5); here r = cos 45° = √2/2, so VIF = 2.
    @Test
    void twoColumnsInflateEachOtherByOneOverOneMinusRSquared() {
        double[][] columns = {{1, 0, 0}, {1, 1, 0}};

        CollinearityReport report = CollinearityReport.of(LeastSquaresProblem.ofColumns(columns, new double[3]));

        assertEquals(2.0, report.varianceInflation(0), 1e-12);
        assertEquals(2.0, report.varianceInflation(1), 1e-12);
        // singular values of the unit columns are √(1 ± cos): condition √((1 + c)/(1 − c)) = 1 + √2
        assertEquals(1 + Math.sqrt(2), report.conditionNumber(), 1e-12);
    }

    // A column almost the sum of two others: no pair reaches the 0.95 cosine, but R² of the third on
    // the first two is 2/2.01, so VIF = 1/(1 − R²) = 201 (same source as above).
    @Test
    void aColumnInTheSpanOfSeveralOthersIsInflatedThoughNoPairIsCollinear() {
        double[][] columns = {{1, 0, 0}, {0, 1, 0}, {1, 1, 0.1}};

        CollinearityReport report = CollinearityReport.of(LeastSquaresProblem.ofColumns(columns, new double[3]));

        assertTrue(report.nearlyCollinearPairs().isEmpty());
        assertEquals(201, report.varianceInflation(2), 1e-9);
    }

    @Test
    void orthogonalColumnsAreNotInflated() {
        // VIF of a column orthogonal to the rest is 1 (R² = 0), whatever the columns' lengths
        double[][] columns = {{3, 0}, {0, 0.5}};

        CollinearityReport report = CollinearityReport.of(LeastSquaresProblem.ofColumns(columns, new double[2]));

        assertEquals(1.0, report.varianceInflation(0), 1e-12);
        assertEquals(1.0, report.conditionNumber(), 1e-12);
    }
}
