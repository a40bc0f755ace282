package org.strandbook.optics.path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.strandbook.optics.Fresnel;
import org.strandbook.optics.SellmeierMaterial;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.attenuation.SilicaAttenuation;
import org.strandbook.optics.attenuation.SilicaFiberGrade;
import org.strandbook.optics.joint.ConnectorAllowance;
import org.strandbook.optics.joint.JointEfficiency;
import org.strandbook.optics.joint.JointGeometry;

class LossBudgetTest {

    private static final WavelengthGrid GRID = WavelengthGrid.uniformNm(800, 2200, 141);
    private static final FiberSpec FIBER = FiberSpec.silicaCore(200, 220, 0.22, SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 5));
    private static final FiberSpec SMALL = FiberSpec.silicaCore(100, 110, 0.22, SilicaAttenuation.of(SilicaFiberGrade.LOW_OH, 5));

    private static LightPath typicalPath(double forwardM) {
        ReferenceMedium solvent = ReferenceMedium.constant("reference medium", 0.05);
        return LightPath.of("MP-1",
                FaceElement.inAir("launch face", FIBER),
                FiberSegment.bent("forward", FIBER, forwardM, 80, 2),
                new JointElement("panel", FIBER, FIBER, ConnectorAllowance.DEFAULT),
                new JointElement("probe in", FIBER, FIBER, JointGeometry.airGap(5, 20, 0.5)),
                new ProbeElement("probe", List.of(ProbeWindow.inAir(SellmeierMaterial.SAPPHIRE_ORDINARY, 2)), 1.0,
                        Optional.of(new MediumPath(solvent, 2))),
                new JointElement("probe out", FIBER, SMALL, JointGeometry.indexMatched(0, 0, 0, 1.46)),
                FiberSegment.straight("return", SMALL, 40),
                FaceElement.inAir("detector face", SMALL));
    }

    @Test
    void contributionsAddUpToTheTotal() {
        // dB of elements in series add (IEC 60027-3 logarithmic quantities: a product of transmittances)
        LossBudget budget = LossBudget.of(typicalPath(60), GRID);
        assertEquals(8, budget.contributions().size());
        for (int i = 0; i < GRID.size(); i++) {
            double sum = 0;
            for (Contribution c : budget.contributions()) {
                sum += c.lossDb()[i];
            }
            assertEquals(budget.totalLossDbAt(i), sum, 1e-12);
        }
    }

    @Test
    void totalTransmittanceIsTheProductOfTheElementTransmittances() {
        // T = 10^(−L/10) and losses in series multiply transmittances (definition of the decibel)
        LossBudget budget = LossBudget.of(typicalPath(60), GRID);
        double[] t = budget.totalTransmittance();
        int i = 70;
        double product = 1;
        for (Contribution c : budget.contributions()) {
            product *= Math.pow(10, -c.lossDbAt(i) / 10);
        }
        assertEquals(product, t[i], 1e-12);
    }

    @Test
    void lossRisesWithFiberLength() {
        // attenuation × length: a longer fiber never loses less (Beer–Lambert for a guided beam)
        double[] previous = LossBudget.of(typicalPath(0), GRID).totalLossDb();
        for (double m = 10; m <= 500; m += 70) {
            double[] now = LossBudget.of(typicalPath(m), GRID).totalLossDb();
            for (int i = 0; i < now.length; i++) {
                assertTrue(now[i] > previous[i]);
            }
            previous = now;
        }
    }

    @Test
    void elementContributionsFollowTheirFormulas() {
        // per-element checks against the published formulas each element uses
        LossBudget budget = LossBudget.of(typicalPath(60), GRID);
        int i = GRID.nearestIndex(1000);
        double nm = GRID.wavelengthNm(i);
        double nSilica = SellmeierMaterial.FUSED_SILICA.refractiveIndex(nm);
        double nSapphire = SellmeierMaterial.SAPPHIRE_ORDINARY.refractiveIndex(nm);
        List<Contribution> c = budget.contributions();
        // Fresnel one face
        assertEquals(Fresnel.faceLossDb(nSilica, 1.0), c.get(0).lossDbAt(i), 1e-12);
        // entered allowance, equal fibers: no mismatch
        assertEquals(ConnectorAllowance.DEFAULT.lossDb(), c.get(2).lossDbAt(i), 1e-12);
        // probe: fixed 1 dB + sapphire window pair (1 − R)/(1 + R) (series summed in FresnelTest) + Beer–Lambert
        // 10·A, A = 0.05/mm × 2 mm
        double r = Fresnel.reflectance(nSapphire, 1.0);
        assertEquals(1.0 - 10 * Math.log10((1 - r) / (1 + r)) + 10 * 0.1, c.get(4).lossDbAt(i), 1e-9);
        // 200 → 100 µm core, gel-filled, aligned: (d2/d1)² = 1/4, about 6.02 dB, plus nearly no Fresnel
        assertEquals(6.02, c.get(5).lossDbAt(i), 0.01);
        assertEquals(ElementKind.PROBE, c.get(4).kind());
    }

    @Test
    void computedJointAddsMisalignmentAndGapFresnel() {
        // product of the JointEfficiency factors plus the air-gap face pair (documented in JointElement)
        LossBudget budget = LossBudget.of(typicalPath(60), GRID);
        int i = GRID.nearestIndex(1300);
        double n = SellmeierMaterial.FUSED_SILICA.refractiveIndex(GRID.wavelengthNm(i));
        double eta = JointEfficiency.lateralOffset(5, 200) * JointEfficiency.endGap(20, 200, 0.22, 1.0)
                * JointEfficiency.tilt(0.5, 0.22, 1.0);
        assertEquals(JointEfficiency.lossDb(eta) + Fresnel.gapLossDb(n, 1.0), budget.contributions().get(3).lossDbAt(i), 1e-9);
    }

    @Test
    void repeatedBendsAtOneRadiusAreChargedOnce() {
        // the first bend strips the modes the radius cannot guide; later ones find them gone
        // (Gloge, Bell Syst. Tech. J. 51, 1767 (1972): weak mode coupling; FED-STD-1037C "mandrel wrapping")
        double one = LossBudget.of(LightPath.of("one", FiberSegment.bent("cord", FIBER, 5, 40, 1)), GRID).totalLossDbAt(30);
        double five = LossBudget.of(LightPath.of("five", FiberSegment.bent("cord", FIBER, 5, 40, 5)), GRID).totalLossDbAt(30);
        double straight = LossBudget.of(LightPath.of("none", FiberSegment.straight("cord", FIBER, 5)), GRID).totalLossDbAt(30);
        assertTrue(one - straight > 0.5, "a 40 mm bend costs something: " + (one - straight));
        assertEquals(one, five, 1e-12);
    }

    @Test
    void tightBendIsNotedWithTheMinimumRadius() {
        // long-term minimum 200× cladding radius = 22 mm for 220 µm cladding (common practice)
        LightPath path = LightPath.of("tight", FiberSegment.bent("patch cord", FIBER, 2, 15, 1));
        LossBudget budget = LossBudget.of(path, GRID);
        assertEquals(1, budget.notes().size());
        assertTrue(budget.notes().get(0).contains("patch cord") && budget.notes().get(0).contains("22.0 mm"));
    }

    @Test
    void gridOutsideAModelRangeIsRefusedNamingTheElement() {
        // the silica model is declared valid 210–3000 nm
        WavelengthGrid tooLong = WavelengthGrid.uniformNm(1000, 3500, 11);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LossBudget.of(typicalPath(10), tooLong));
        assertTrue(e.getMessage().contains("'"), e.getMessage());
    }

    @Test
    void cacheIsReusedAcrossPathsOnTheSameGrid() {
        // equal catalog items share one cached spectrum (OpticsCache contract)
        OpticsCache cache = new OpticsCache(GRID);
        LossBudget first = LossBudget.of(typicalPath(10), cache);
        int entries = cache.entries();
        LossBudget second = LossBudget.of(typicalPath(90), cache);
        assertEquals(entries, cache.entries());
        assertEquals(first.contributions().get(3).lossDbAt(5), second.contributions().get(3).lossDbAt(5), 0);
        assertEquals(LossBudget.of(typicalPath(90), GRID).totalLossDbAt(7), second.totalLossDbAt(7), 1e-12);
        assertEquals(second.contributions().get(1).lossDbAt(9), cache.lossDb(typicalPath(90).elements().get(1))[9], 1e-12);
    }
}
