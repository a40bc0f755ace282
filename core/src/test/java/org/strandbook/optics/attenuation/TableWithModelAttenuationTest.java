package org.strandbook.optics.attenuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A datasheet table joined to the silica model. The table points are invented inputs (no product
 * data); what is checked is the joining rule, documented in {@link TableWithModelAttenuation}.
 */
class TableWithModelAttenuationTest {

    private static final SilicaAttenuation GLASS = SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 0.5);

    // a datasheet that stops at 1700 nm at 3.2 dB/km, several dB/km above the model there
    private static final TabulatedAttenuation TO_1700 = new TabulatedAttenuation("sheet to 1700 nm",
            new double[] {500, 800, 1000, 1300, 1700}, new double[] {14, 5.5, 3.6, 2.4, 3.2});

    private final TableWithModelAttenuation joined = new TableWithModelAttenuation(TO_1700, GLASS);

    @Test
    void predictedLossAt2350IsWithinThirtyPercentOfTheModelForTheSameGlass() {
        // the infrared edge of silica, ~1 dB/m near 2350 nm (common practice), belongs to the glass, not
        // to the datasheet: a table ending at 1700 nm must not scale it (its ratio there is ~7.5)
        double model = GLASS.attenuationDbPerKm(2350);
        assertEquals(model, joined.attenuationDbPerKm(2350), 0.30 * model);
        assertTrue(joined.attenuationDbPerKm(2350) < 2000, "under 2 dB/m, was " + joined.attenuationDbPerKm(2350));
    }

    @ParameterizedTest
    @ValueSource(doubles = {1750, 1900, 2100, 2350, 2600, 3000})
    void aboveTheTableTheExcessOverTheModelIsTheConstantFoundAtTheLastPoint(double nm) {
        // additive join: model + (table − model at 1700 nm) (design choice, documented in the class)
        double excess = 3.2 - GLASS.attenuationDbPerKm(1700);
        assertTrue(excess > 2.5, "the table lies above the model at its end: " + excess);
        assertEquals(excess, joined.attenuationDbPerKm(nm) - GLASS.attenuationDbPerKm(nm), 1e-9 * (1 + GLASS.attenuationDbPerKm(nm)));
        assertEquals(excess, joined.highExcessDbPerKm(), 1e-12);
    }

    @Test
    void belowTheTableTheExcessIsTheOneFoundAtTheFirstPoint() {
        // the same rule at the short-wavelength end (design choice)
        double excess = 14 - GLASS.attenuationDbPerKm(500);
        for (double nm : new double[] {300, 400, 499}) {
            assertEquals(excess, joined.attenuationDbPerKm(nm) - GLASS.attenuationDbPerKm(nm), 1e-9);
        }
        assertEquals(excess, joined.lowExcessDbPerKm(), 1e-12);
    }

    @Test
    void insideTheTableTheDatasheetIsUsedAndBothJoinsAreContinuous() {
        // a join is continuous; inside its range the datasheet is the authority (definition of the rule)
        assertEquals(TO_1700.attenuationDbPerKm(1200), joined.attenuationDbPerKm(1200), 0);
        assertEquals(3.2, joined.attenuationDbPerKm(1700), 0);
        assertEquals(3.2, joined.attenuationDbPerKm(1700 + 1e-6), 1e-6);
        assertEquals(14, joined.attenuationDbPerKm(500 - 1e-6), 1e-5);
    }

    @Test
    void aTableBelowTheModelNeverDrivesTheCurveBelowTheModelScaledAtTheJoin() {
        // negative excess: limited by table/model × model so the curve stays positive where the model
        // dips between OH bands (design choice, documented in the class)
        SilicaAttenuation wet = SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 10);
        double atPeak = wet.attenuationDbPerKm(1383);
        TabulatedAttenuation low = new TabulatedAttenuation("sheet ending on the 1383 nm band",
                new double[] {900, 1100, 1383}, new double[] {3, 2, atPeak / 2});
        TableWithModelAttenuation j = new TableWithModelAttenuation(low, wet);
        double scale = 0.5;
        for (double nm = 1384; nm <= 2500; nm += 7) {
            double a = j.attenuationDbPerKm(nm);
            double m = wet.attenuationDbPerKm(nm);
            assertTrue(a > 0, "positive at " + nm);
            assertTrue(a >= scale * m - 1e-9, "not below the scaled model at " + nm);
            assertTrue(a <= m, "never above the model when the table is below it, at " + nm);
        }
        // where the model has climbed past its join value the constant (negative) excess applies
        double far = 2400;
        assertEquals(wet.attenuationDbPerKm(far) + (atPeak / 2 - atPeak), j.attenuationDbPerKm(far), 1e-9 * atPeak);
    }

    @Test
    void outsideTheModelRangeIsRefused() {
        // the silica model is declared valid 210–3000 nm
        assertThrows(IllegalArgumentException.class, () -> joined.attenuationDbPerKm(3200));
    }
}
