package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.server.LocalPostgres;
import org.strandbook.server.PlantServer;
import org.strandbook.server.ServerLogin;
import org.strandbook.server.SiteClone;
import org.strandbook.server.SiteSync;
import org.strandbook.server.SyncProgress;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/** What the window's status bar says of a workbook's plant server, against a real PostgreSQL. */
class SyncStateTest {

    @TempDir
    Path dir;

    @Test
    void theStatusSaysNeverSyncedThenWhenAndWithWhatAndTheConflictsWaiting() {
        String url = LocalPostgres.shared().newPlantServer("window_tech");
        PlantServer server = new PlantServer(new ServerLogin(url, "window_tech", null));
        try (Workbook a = Workbook.create(dir.resolve("a.strandbook"), DemoSite.site(), "k.ashdown")) {
            DemoSite.populate(a);
            assertEquals("Plant server: never synced", SqliteWorkbookService.syncState(a));
            new SiteSync(server, a, a.site().get().name(), SyncProgress.SILENT).run();
            assertTrue(SqliteWorkbookService.syncState(a).matches(
                    "Plant server: synced \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d UTC with .*"), SqliteWorkbookService.syncState(a));
            assertTrue(SqliteWorkbookService.syncState(a).endsWith(" with " + url), SqliteWorkbookService.syncState(a));
            SiteClone.run(server, a.site().get().name(), dir.resolve("b.strandbook"), "window_tech", SyncProgress.SILENT);
            try (Workbook b = Workbook.open(dir.resolve("b.strandbook"), "window_tech")) {
                rename(a, "feed one");
                rename(b, "feed two");
                new SiteSync(server, a, a.site().get().name(), SyncProgress.SILENT).run();
                new SiteSync(server, b, b.site().get().name(), SyncProgress.SILENT).run();
                assertTrue(SqliteWorkbookService.syncState(b).endsWith("; 1 conflict(s) wait in Edits to settle"),
                        SqliteWorkbookService.syncState(b));
            }
        }
    }

    private static void rename(Workbook wb, String service) {
        MeasurementPoint p = wb.points().get(DemoSite.POINT_A).orElseThrow();
        wb.points().save(new MeasurementPoint(p.tag(), service, p.location(), p.analyzerTag(), p.channel(),
                p.probeTypeCode(), p.bands(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService(),
                p.processTemperatureC()));
    }
}
