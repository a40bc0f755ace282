package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.Joint;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;
import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/**
 * The spreads of workbook schema 8 travel through a real PostgreSQL plant server: the server keeps
 * a row's fields as one JSON object, so new columns need no server step, and this proves it.
 */
class SpreadSyncTest {

    @TempDir
    Path dir;

    private String url;

    @BeforeEach
    void startServer() {
        url = LocalPostgres.shared().newPlantServer("spread_tech_a");
    }

    private PlantServer server() {
        return new PlantServer(new ServerLogin(url, "spread_tech_a", null));
    }

    private static StatedSpreads spreads(String basis, SpreadInput input, String text) {
        return new StatedSpreads(Map.of(input, StatedSpread.parse(text, input)), basis);
    }

    private static SiteSync.Outcome sync(PlantServer server, Workbook wb) {
        return new SiteSync(server, wb, wb.site().get().name(), SyncProgress.SILENT).run();
    }

    @Test
    void aConnectorTypesSpreadAndAJointsOwnReachAClone() {
        try (Workbook a = Workbook.create(dir.resolve("a.strandbook"), DemoSite.site(), "k.ashdown")) {
            DemoSite.populate(a);
            ConnectorType type = a.catalog().connectorType(DemoSite.CONNECTOR).orElseThrow();
            a.catalog().saveConnectorType(type.withSpreads(spreads("datasheet rev C", SpreadInput.CONNECTOR_LOSS,
                    "±0.3 dB")));
            List<PathLeg> legs = a.paths().legs(DemoSite.POINT_A).stream().map(SpreadSyncTest::measuredJ1).toList();
            a.paths().replaceLegs(DemoSite.POINT_A, legs);
            sync(server(), a);
            SiteClone.run(server(), DemoSite.site().name(), dir.resolve("b.strandbook"), "spread_tech_a",
                    SyncProgress.SILENT);
            try (Workbook b = Workbook.open(dir.resolve("b.strandbook"), "spread_tech_a")) {
                assertEquals(a.catalog().connectorType(DemoSite.CONNECTOR), b.catalog().connectorType(DemoSite.CONNECTOR));
                assertEquals(a.paths().legs(DemoSite.POINT_A), b.paths().legs(DemoSite.POINT_A));
                assertTrue(b.audit().verify().intact(), "the clone's own trail verifies");
            }
        }
    }

    private static PathLeg measuredJ1(PathLeg leg) {
        List<PathElement> elements = leg.elements().stream().map(e -> e instanceof Joint j && j.label().equals("J1")
                ? (PathElement) j.withSpreads(spreads("meter certificate 0412", SpreadInput.JOINT_LOSS, "u 0.05 dB"))
                : e).toList();
        return new PathLeg(leg.pointTag(), leg.direction(), elements);
    }
}
