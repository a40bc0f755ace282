package org.strandbook.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.OhGrade;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;

/** The shipped catalog loads and its generic figures agree with the trade's rules of thumb. */
class ComponentCatalogTest {

    private final ComponentCatalog shipped = ComponentCatalog.shipped();

    @Test
    void shippedCatalogHoldsFiveFibersFourConnectorsAndOneProbeOfEachBasicKind() {
        assertEquals(5, shipped.fiberTypes().size());
        assertEquals(4, shipped.connectorTypes().size());
        assertEquals(Set.of(ProbeKind.TRANSMISSION, ProbeKind.TRANSFLECTANCE, ProbeKind.DIFFUSE_REFLECTANCE),
                shipped.probeTypes().stream().map(ProbeType::kind).collect(Collectors.toSet()));
    }

    // Common practice: generic step-index silica fibers come as core/cladding 100/110, 200/220,
    // 400/440, 600/660 µm, cladding 1.1 times the core.
    @ParameterizedTest(name = "{0}")
    @CsvSource(textBlock = """
            SI100-LOH, 100, 110, LOW_OH
            SI200-LOH, 200, 220, LOW_OH
            SI200-HOH, 200, 220, HIGH_OH
            SI400-LOH, 400, 440, LOW_OH
            SI600-LOH, 600, 660, LOW_OH
            """)
    void genericFiberHasItsTradeGeometry(String code, double coreUm, double claddingUm, OhGrade grade) {
        FiberType f = shipped.fiberType(code).orElseThrow();
        assertEquals(coreUm, f.coreUm());
        assertEquals(claddingUm, f.claddingUm());
        assertEquals(grade, f.ohGrade());
    }

    // Common practice: an NA 0.22 fiber accepts a full cone of about 25° in air, 2·asin(NA/n₀).
    @Test
    void shippedFibersAcceptTheUsualTwentyFiveDegreeCone() {
        for (FiberType f : shipped.fiberTypes()) {
            double fullConeDeg = Math.toDegrees(2 * Math.asin(f.na() / 1.0));
            assertEquals(25.0, fullConeDeg, 1.0, f.code());
        }
    }

    // Common practice: good low-OH fiber stays below about 15 ppm OH; high-OH fiber carries
    // hundreds of ppm (from memory), which is what makes it transparent into the UV.
    @Test
    void ohContentMatchesTheGrade() {
        for (FiberType f : shipped.fiberTypes()) {
            if (f.ohGrade() == OhGrade.LOW_OH) {
                assertTrue(f.ohPpm() < 15, f.code());
            } else {
                assertTrue(f.ohPpm() >= 100, f.code());
            }
        }
    }

    // From memory: a clean mated large-core SMA 905 pair with its air gap loses about 0.5-1.5 dB.
    @Test
    void airGapSmaPairLossLiesInTheUsualRange() {
        ConnectorType sma = shipped.connectorType("SMA905-AIR").orElseThrow();
        assertTrue(sma.airGap());
        assertTrue(sma.typicalLossDb() >= 0.5 && sma.typicalLossDb() <= 1.5, () -> "" + sma.typicalLossDb());
    }

    // From memory: ANSI/TIA-568.3-D budgets 0.75 dB per mated connector pair.
    @Test
    void physicalContactConnectorUsesTheCablingBudgetFigure() {
        assertEquals(0.75, shipped.connectorType("FC-PC-MM").orElseThrow().typicalLossDb());
    }

    @Test
    void smaConnectorsMateWithEachOtherButNotWithFc() {
        ConnectorType air = shipped.connectorType("SMA905-AIR").orElseThrow();
        ConnectorType gel = shipped.connectorType("SMA905-GEL").orElseThrow();
        ConnectorType fc = shipped.connectorType("FC-PC-MM").orElseThrow();
        assertTrue(air.matesWith(gel));
        assertFalse(air.matesWith(fc));
    }

    @Test
    void shippedProbesLookThroughSapphire() {
        for (ProbeType p : shipped.probeTypes()) {
            assertEquals("SAPPHIRE", p.windowMaterial(), p.code());
        }
    }

    @Test
    void lookupsMatchTheExactCode() {
        assertTrue(shipped.fiberType("SI200-LOH").isPresent());
        assertTrue(shipped.fiberType("si200-loh").isEmpty());
    }

    @Test
    void joiningCatalogsRefusesACodeInBoth() {
        ComponentCatalog again = new ComponentCatalog(List.of(shipped.fiberTypes().get(0)), List.of(), List.of());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> shipped.plus(again));
        assertEquals("fiber type code 'SI100-LOH' appears twice in one catalog", e.getMessage());
    }
}
