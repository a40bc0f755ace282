package org.strandbook.optics.attenuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.junit.jupiter.api.Test;

class TabulatedAttenuationTest {

    // arbitrary input points (no product data): the oracle below is Commons Math, not these numbers
    private static final double[] NM = {400, 600, 850, 1300, 1550, 2000};
    private static final double[] DB_PER_KM = {60, 12, 4, 1.2, 0.9, 25};

    private final TabulatedAttenuation table = new TabulatedAttenuation("demo table", NM, DB_PER_KM);

    @Test
    void interpolatesLogLinearlyLikeAReferenceLinearInterpolatorOnLogValues() {
        // reference: Apache Commons Math LinearInterpolator applied to ln(dB/km)
        double[] ln = new double[DB_PER_KM.length];
        for (int i = 0; i < ln.length; i++) {
            ln[i] = Math.log(DB_PER_KM[i]);
        }
        PolynomialSplineFunction reference = new LinearInterpolator().interpolate(NM, ln);
        for (double nm = 400; nm <= 2000; nm += 7.5) {
            assertEquals(Math.exp(reference.value(nm)), table.attenuationDbPerKm(nm), 1e-12 * Math.exp(reference.value(nm)));
        }
    }

    @Test
    void returnsTheDatasheetValuesAtTheTablePoints() {
        // interpolation passes through its nodes (definition)
        for (int i = 0; i < NM.length; i++) {
            assertEquals(DB_PER_KM[i], table.attenuationDbPerKm(NM[i]), 0);
        }
    }

    @Test
    void refusesWavelengthsOutsideTheTable() {
        // a table says nothing beyond its points
        assertThrows(IllegalArgumentException.class, () -> table.attenuationDbPerKm(399));
        assertThrows(IllegalArgumentException.class, () -> table.attenuationDbPerKm(2001));
    }

    @Test
    void refusesUnsortedOrNonPositivePointsNamingThePoint() {
        // log-linear interpolation needs ascending wavelengths and positive values
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new TabulatedAttenuation("t", new double[] {500, 400}, new double[] {1, 2}));
        assertEquals(true, e.getMessage().contains("point 2"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> new TabulatedAttenuation("t", new double[] {400, 500}, new double[] {1, 0}));
    }
}
