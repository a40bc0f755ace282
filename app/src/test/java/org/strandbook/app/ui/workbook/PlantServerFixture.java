package org.strandbook.app.ui.workbook;

import java.nio.file.Path;

import org.strandbook.server.PlantServer;
import org.strandbook.server.ServerLogin;
import org.strandbook.server.SiteSync;
import org.strandbook.server.SyncProgress;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/**
 * A plant server on the test PostgreSQL and the first laptop of its site, for the window's server
 * tests: the laptop that starts the site holds core's small demo site (a point pair and their paths).
 *
 * @param url  the server
 * @param tech the technician role every laptop of the test logs in as
 */
record PlantServerFixture(String url, String tech) {

    /** A laptop that starts the site on the server. */
    Workbook firstLaptop(Path dir) {
        Workbook a = Workbook.create(dir.resolve("first.strandbook"), DemoSite.site(), "k.ashdown");
        DemoSite.populate(a);
        sync(a);
        return a;
    }

    void sync(Workbook wb) {
        new SiteSync(new PlantServer(new ServerLogin(url, tech, null)), wb, wb.site().get().name(),
                SyncProgress.SILENT).run();
    }

    /** Point A with another service: the field two laptops edit to make a conflict. */
    static MeasurementPoint renamed(MeasurementPoint p, String service) {
        return new MeasurementPoint(p.tag(), service, p.location(), p.analyzerTag(), p.channel(), p.probeTypeCode(),
                p.bands(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService(), p.processTemperatureC());
    }

    static void rename(Workbook wb, String service) {
        wb.points().save(renamed(wb.points().get(DemoSite.POINT_A).orElseThrow(), service));
    }
}
