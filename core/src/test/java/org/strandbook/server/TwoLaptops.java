package org.strandbook.server;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;

import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/**
 * The demo site on a new plant server (a real PostgreSQL) and two laptops that sync it: laptop A
 * made the site and pushed it, laptop B is a clone of what A pushed. Closing it closes both.
 */
final class TwoLaptops implements AutoCloseable {

    static final Instant T0 = Instant.parse("2026-03-01T09:00:00Z");

    private final String url;
    private final String technician;
    final Workbook a;
    final Workbook b;

    TwoLaptops(Path dir, String technician) {
        this.technician = technician;
        this.url = LocalPostgres.shared().newPlantServer(technician);
        a = Workbook.create(dir.resolve("a.strandbook"), DemoSite.site(), "k.ashdown");
        DemoSite.populate(a);
        DemoSite.insertScan(a, DemoSite.POINT_A, 1, T0);
        sync(a);
        SiteClone.run(server(), DemoSite.site().name(), dir.resolve("b.strandbook"), "j.pell", SyncProgress.SILENT);
        b = Workbook.open(dir.resolve("b.strandbook"), "j.pell");
    }

    PlantServer server() {
        return new PlantServer(new ServerLogin(url, technician, null));
    }

    SiteSync.Outcome sync(Workbook wb) {
        return new SiteSync(server(), wb, DemoSite.site().name(), SyncProgress.SILENT).run();
    }

    /** The first column of the first row of a query run on the server as its superuser. */
    long count(String sql) throws SQLException {
        try (Connection c = LocalPostgres.shared().superuser(url); PreparedStatement ps = c.prepareStatement(sql);
             ResultSet rs = ps.executeQuery()) {
            rs.next();
            return rs.getLong(1);
        }
    }

    @Override
    public void close() {
        try (Workbook first = a; Workbook second = b) {
            // both closed, the second even when the first fails to
        }
    }
}
