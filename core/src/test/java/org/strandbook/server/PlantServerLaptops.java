package org.strandbook.server;

import java.nio.file.Path;

import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/**
 * A plant server of a test's own (a new database on the real local PostgreSQL, never a mock) and the
 * laptops' workbooks that sync DemoSite's site through it, as one technician's login.
 */
final class PlantServerLaptops {

    private final Path dir;
    private final String technician;
    private final String url;

    /** A new plant server database that {@code technician} may log in to; workbooks go into {@code dir}. */
    PlantServerLaptops(Path dir, String technician) {
        this.dir = dir;
        this.technician = technician;
        this.url = LocalPostgres.shared().newPlantServer(technician);
    }

    String url() {
        return url;
    }

    PlantServer server() {
        return new PlantServer(new ServerLogin(url, technician, null));
    }

    /** A new laptop: the site cloned from the server into {@code file}, opened as {@code user}. */
    Workbook cloneOf(String file, String user) {
        SiteClone.run(server(), DemoSite.site().name(), dir.resolve(file), user, SyncProgress.SILENT);
        return Workbook.open(dir.resolve(file), user);
    }

    SiteSync.Outcome sync(Workbook wb) {
        return new SiteSync(server(), wb, wb.site().get().name(), SyncProgress.SILENT).run();
    }
}
