package org.strandbook.optics.attenuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.strandbook.optics.WavelengthGrid;

class SilicaAttenuationTest {

    private final SilicaAttenuation lowOh = SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 5);

    @Test
    void infraredEdgeLosesAboutOneDecibelPerMetreNear2350Nanometres() {
        // standard silica fiber loses on the order of 1 dB/m near 2350 nm (common practice)
        double edge = lowOh.infraredEdgeDbPerKm(2350);
        assertTrue(edge > 300 && edge < 3000, "IR edge " + edge + " dB/km");
        double total = lowOh.attenuationDbPerKm(2350);
        assertTrue(total > 300 && total < 3000, "total " + total + " dB/km");
    }

    @Test
    void infraredEdgeAgreesWithTheOtherPublishedFitWithinAFactorOfTwo() {
        // A = 6e11 dB/km, B = 47.8 µm (from memory: M. Sørensen, PhD thesis, DTU Fotonik 2013)
        double other = 6e11 * Math.exp(-47.8 / 2.35);
        double ratio = lowOh.infraredEdgeDbPerKm(2350) / other;
        assertTrue(ratio > 0.5 && ratio < 2, "ratio " + ratio);
    }

    @Test
    void ohLossIsLinearInOhContent() {
        // OH absorption is linear in OH concentration (Beer–Lambert law)
        SilicaAttenuation dry = SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 0);
        for (double nm : new double[] {945, 1240, 1383, 2210}) {
            double five = lowOh.attenuationDbPerKm(nm) - dry.attenuationDbPerKm(nm);
            double ten = lowOh.withOhPpm(10).attenuationDbPerKm(nm) - dry.attenuationDbPerKm(nm);
            assertEquals(2 * five, ten, 1e-9 * ten, "at " + nm + " nm");
        }
    }

    @Test
    void firstOvertoneBandAddsSixtyTwoPointSevenDecibelsPerKilometrePerPpm() {
        // 1383 nm first overtone: 62.7 dB/km per ppm OH (from memory: Humbach et al., J. Non-Cryst.
        // Solids 203, 19 (1996), not re-read); the other bands' wings add a few hundredths there
        SilicaAttenuation dry = SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 0);
        double perPpm = (lowOh.withOhPpm(1).attenuationDbPerKm(1383) - dry.attenuationDbPerKm(1383));
        assertEquals(62.7, perPpm, 0.05);
    }

    @Test
    void fundamentalPeakFollowsFromTheQuotedMolarAbsorptivity() {
        // ε = 77.5 L·mol⁻¹·cm⁻¹ at the 2.72 µm band (Stevenson and Jack, as quoted in Appl. Spectrosc.
        // 25, 378 (1971)); fused silica 2.20 g/cm³ (from memory: handbook density); M(OH) = 15.999 +
        // 1.008 g/mol (IUPAC standard atomic weights). Beer–Lambert: A = ε·c·l, loss = 10·A dB.
        double molPerLitrePerPpm = 2.20 * 1000 * 1e-6 / (15.999 + 1.008);
        double absorbancePerCm = 77.5 * molPerLitrePerPpm;
        double dbPerKmPerPpm = 10 * absorbancePerCm * 1e5;
        SilicaAttenuation dry = SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 0);
        double modelled = lowOh.withOhPpm(1).attenuationDbPerKm(2720) - dry.attenuationDbPerKm(2720);
        assertEquals(dbPerKmPerPpm, modelled, 0.002 * dbPerKmPerPpm);
    }

    @ParameterizedTest
    @ValueSource(doubles = {2300, 2400})
    void wetFiberIsOpaqueBetweenTheCombinationBandAndTheFundamental(double nm) {
        // high-OH (wet) silica fiber is unusable from 2.2 to 2.5 µm, more than 3 dB/m at 800 ppm
        // (common practice); the span holds OH combination bands at 3750–4510 cm⁻¹ (Efimov and
        // Pogareva, Chem. Geol. 229, 198 (2006)). No published absolute value at these wavelengths
        // was at hand: this checks the trade's figure, and that the fundamental's wing, not the
        // glass's own edge, is what closes the span.
        SilicaAttenuation wet = SilicaAttenuation.of(SilicaFiberGrade.HIGH_OH, 800);
        assertTrue(wet.attenuationDbPerKm(nm) > 3000, "at " + nm + " nm: " + wet.attenuationDbPerKm(nm) + " dB/km");
        assertTrue(wet.infraredEdgeDbPerKm(nm) < 1500, "the edge alone stays under 1.5 dB/m at " + nm + " nm");
    }

    @Test
    void bandWingsStayOutOfTheLowLossWindowOfDryFiber() {
        // OH wings must not spoil the 1.55 µm window: under 0.1 dB/km per ppm there (design choice,
        // documented with AttenuationShapes.SILICA_OH_BANDS)
        SilicaAttenuation dry = SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 0);
        double perPpm = lowOh.withOhPpm(1).attenuationDbPerKm(1550) - dry.attenuationDbPerKm(1550);
        assertTrue(perPpm > 0 && perPpm < 0.1, "per ppm at 1550 nm: " + perPpm);
    }

    @Test
    void secondOvertoneBandAddsAboutOneDecibelPerKilometrePerPpm() {
        // 945 nm band ≈ 1 dB/km per ppm OH (from memory; usually attributed to Keck, Maurer and Schultz,
        // Appl. Phys. Lett. 22, 307 (1973), whose abstract says only that OH accounts for the absorption
        // between 700 and 1100 nm to within ±0.7 dB/km)
        SilicaAttenuation dry = SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 0);
        double perPpm = lowOh.withOhPpm(1).attenuationDbPerKm(945) - dry.attenuationDbPerKm(945);
        assertEquals(1.0, perPpm, 0.2);
    }

    @Test
    void rayleighScatteringFallsWithTheFourthPowerOfWavelength() {
        // Rayleigh scattering ∝ λ⁻⁴ (Lord Rayleigh, 1871; any optics text)
        assertEquals(16.0, lowOh.rayleighDbPerKm(600) / lowOh.rayleighDbPerKm(1200), 1e-12);
    }

    @ParameterizedTest
    @ValueSource(doubles = {800, 1000, 1300})
    void ultravioletTailIsNegligibleBeyondTheVisible(double nm) {
        // intrinsic UV absorption has no effect beyond ~700 nm (Keck, Maurer and Schultz 1973):
        // under 1 dB/km and below the Rayleigh term there
        assertTrue(lowOh.ultravioletTailDbPerKm(nm) < 1.0);
        assertTrue(lowOh.ultravioletTailDbPerKm(nm) < lowOh.rayleighDbPerKm(nm));
    }

    @Test
    void highOhFiberIsFarLossierAtTheCombinationBand() {
        // high-OH (UV/VIS) fiber is opaque near 2.2 µm (common practice)
        SilicaAttenuation wet = SilicaAttenuation.of(SilicaFiberGrade.HIGH_OH);
        assertTrue(wet.attenuationDbPerKm(2210) > 100 * lowOh.attenuationDbPerKm(1100));
        assertTrue(wet.attenuationDbPerKm(2210) / 1000 > 10, "more than 10 dB/m");
    }

    @Test
    void hydrogenAddsLossLinearInPartialPressure() {
        // H2 loss is linear in partial pressure (IEC TR 62690 summary); magnitude is a parameter, not checked
        SilicaAttenuation one = lowOh.withHydrogen(new HydrogenLoading(1, 0.5, 1));
        SilicaAttenuation three = lowOh.withHydrogen(new HydrogenLoading(3, 0.5, 1));
        double d1 = one.attenuationDbPerKm(1240) - lowOh.attenuationDbPerKm(1240);
        double d3 = three.attenuationDbPerKm(1240) - lowOh.attenuationDbPerKm(1240);
        assertTrue(d1 > 0, "hydrogen adds loss at its 1240 nm band");
        assertEquals(3 * d1, d3, 1e-9);
    }

    @Test
    void wavelengthOutsideTheModelRangeIsRefusedWithAClearMessage() {
        // model range declared 210–3000 nm
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> lowOh.attenuationDbPerKm(3100));
        assertTrue(e.getMessage().contains("3100 nm") && e.getMessage().contains("210–3000 nm"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> lowOh.attenuationDbPerKm(WavelengthGrid.uniformNm(150, 1000, 10)));
    }

    @Test
    void equalParametersMakeEqualModels() {
        // the loss-budget cache keys on model equality
        assertEquals(SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 5), lowOh);
        assertEquals(SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 5).hashCode(), lowOh.hashCode());
    }
}
