package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.time.Instant;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.strandbook.site.CableSegment;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.PathElement;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;

/** Stated spreads are kept as entered, on catalog rows and path elements, and audited like the rest. */
class StatedSpreadStoreTest extends PopulatedWorkbookTest {

    StatedSpreadStoreTest() {
        super("spreads.sqlite");
    }

    private static StatedSpreads spreads(String basis, Object... inputAndText) {
        Map<SpreadInput, StatedSpread> m = new java.util.EnumMap<>(SpreadInput.class);
        for (int i = 0; i < inputAndText.length; i += 2) {
            SpreadInput input = (SpreadInput) inputAndText[i];
            m.put(input, StatedSpread.parse((String) inputAndText[i + 1], input));
        }
        return new StatedSpreads(m, basis);
    }

    @Test
    void catalogRowsKeepTheirSpreadsAndBasis() {
        ConnectorType c = new ConnectorType("SMA-SPREAD", "", "SMA 905", 1.0, true,
                spreads("datasheet rev C", SpreadInput.CONNECTOR_LOSS, "±0.3 dB"));
        FiberType f = new FiberType("F-SPREAD", "", 200, 220, 245, 0.22, "FUSED_SILICA", OhGrade.HIGH_OH, 600,
                List.of(), spreads("grade sheet", SpreadInput.OH_CONTENT, "400..1000 ppm",
                SpreadInput.ATTENUATION, "±10 %"));
        ProbeType p = new ProbeType("P-SPREAD", "", ProbeKind.TRANSMISSION, "SAPPHIRE", 2, 5, 1.0,
                spreads("", SpreadInput.PROBE_FIXED_LOSS, "u 0.1 dB"));
        wb.catalog().addConnectorType(c);
        wb.catalog().addFiberType(f);
        wb.catalog().addProbeType(p);
        assertEquals(c, wb.catalog().connectorType("SMA-SPREAD").orElseThrow());
        assertEquals(f, wb.catalog().fiberType("F-SPREAD").orElseThrow());
        assertEquals(p, wb.catalog().probeType("P-SPREAD").orElseThrow());
    }

    @Test
    void clearingASpreadStoresNothingInItsPlace() {
        ConnectorType c = new ConnectorType("SMA-SPREAD", "", "SMA 905", 1.0, true,
                spreads("datasheet rev C", SpreadInput.CONNECTOR_LOSS, "±0.3 dB"));
        wb.catalog().addConnectorType(c);
        wb.catalog().saveConnectorType(c.withSpreads(StatedSpreads.NONE));
        assertEquals(StatedSpreads.NONE, wb.catalog().connectorType("SMA-SPREAD").orElseThrow().spreads());
        assertTrue(wb.audit().verify().intact(), () -> wb.audit().verify().toString());
    }

    @Test
    void pathElementsKeepTheirOwnSpreadsAndTheTrailStillVerifies() {
        PathLeg send = new PathLeg(DemoSite.POINT_A, PathDirection.SEND, List.of(
                new CableSegment("C101-S", DemoSite.FIBER, 40.0, List.of(),
                        spreads("walked", SpreadInput.LENGTH, "±0.5 m", SpreadInput.BEND_RADIUS, "±20 %")),
                new Joint("J1", DemoSite.CONNECTOR, null, InspectionGrade.CLEAN, OptionalDouble.of(0.7),
                        LossBasis.MEASURED, spreads("meter cert 17", SpreadInput.JOINT_LOSS, "u 0.04 dB")),
                new CableSegment("C101-T", DemoSite.FIBER, 10.0, List.of())));
        wb.paths().replaceLegs(DemoSite.POINT_A, List.of(send));
        assertEquals(List.of(send), wb.paths().legs(DemoSite.POINT_A));
        assertTrue(wb.audit().verify().intact(), () -> wb.audit().verify().toString());
    }

    @Test
    void aReplacedJointsOwnSpreadStaysWithThePathItWasJudgedBy() {
        // design choice: the new part starts without the old element's spread; earlier scans keep it
        Instant day1 = Instant.parse("2025-03-04T09:00:00Z");
        Instant day2 = Instant.parse("2025-06-10T14:30:00Z");
        StatedSpreads reading = spreads("meter cert 17", SpreadInput.JOINT_LOSS, "u 0.04 dB");
        List<PathLeg> legs = wb.paths().legs(DemoSite.POINT_A).stream().map(l -> new PathLeg(l.pointTag(),
                l.direction(), l.elements().stream().map(e -> e instanceof Joint j && j.label().equals("J2")
                        ? (PathElement) j.withSpreads(reading) : e).toList())).toList();
        wb.paths().replaceLegs(DemoSite.POINT_A, legs);
        Joint fresh = new Joint("J2", DemoSite.CONNECTOR, null, InspectionGrade.CLEAN, OptionalDouble.of(0.4),
                LossBasis.MEASURED);
        wb.maintenance().add(new MaintenanceAction(DemoSite.POINT_A, MaintenanceKind.REPLACE_CONNECTOR, "J2", day2,
                "k.ashdown", "", "ferrule chipped", Optional.of(fresh)));
        assertEquals(StatedSpreads.NONE, wb.paths().legs(DemoSite.POINT_A).get(1).joints().get(0).spreads());
        assertEquals(reading, wb.paths().legsAt(DemoSite.POINT_A, day1).get(1).joints().get(0).spreads());
        assertTrue(wb.audit().verify().intact(), () -> wb.audit().verify().toString());
    }
}
