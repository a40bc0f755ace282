package org.strandbook.server;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.Map;

import org.strandbook.files.WorkInProgressFiles;
import org.strandbook.site.Site;
import org.strandbook.store.PortableFields;
import org.strandbook.store.Workbook;

/**
 * Starts a laptop from the server: a new workbook holding everything the server has of one site.
 * Written beside the target under a part name and renamed into place only once the first sync has
 * completed, so that a clone cut off leaves no half-filled workbook under the name asked for.
 */
public final class SiteClone {

    private SiteClone() {
    }

    public static SiteSync.Outcome run(PlantServer server, String siteName, Path target, String user,
                                       SyncProgress progress) {
        if (Files.exists(target)) {
            throw new SyncRefusedException(target + " exists; a clone never overwrites a file");
        }
        Site site = siteRecord(server, siteName);
        Path part = null;
        try {
            // named as the other writers name their part files, so a later run sweeps a killed clone's
            part = WorkInProgressFiles.partBeside(target);
            Files.delete(part);
            SiteSync.Outcome outcome;
            try (Workbook wb = Workbook.create(part, site, user)) {
                outcome = new SiteSync(server, wb, siteName, progress).run();
            }
            Files.move(part, target, StandardCopyOption.ATOMIC_MOVE);
            return outcome;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + target + ": " + e.getMessage(), e);
        } finally {
            try {
                if (part != null) {
                    Files.deleteIfExists(part);
                }
            } catch (IOException e) {
                // a part file left behind is named as one and harmless
            }
        }
    }

    private static Site siteRecord(PlantServer server, String siteName) {
        try (Connection c = server.connect();
             PreparedStatement ps = c.prepareStatement("SELECT r.fields::text FROM site s JOIN site_record r"
                     + " ON r.site_id = s.id AND r.record_key = 'site' WHERE s.name = ?")) {
            ps.setString(1, siteName);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    throw new SyncRefusedException("the server " + server.login().displayUrl() + " holds no site \""
                            + siteName + "\" that " + server.login().user() + " may open");
                }
                Map<String, Object> f = PortableFields.parse(rs.getString(1));
                return new Site((String) f.get("name"), (String) f.get("plant_area"), (String) f.get("revision"),
                        ((Number) f.get("default_tolerance_db")).doubleValue());
            }
        } catch (SQLException e) {
            throw new ServerException("cannot read site \"" + siteName + "\" from " + server.login().displayUrl()
                    + ": " + ServerException.firstLine(e), e);
        }
    }
}
