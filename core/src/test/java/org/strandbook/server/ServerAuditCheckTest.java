package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.store.AuditReport;
import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/**
 * A site's trail on a real PostgreSQL server, checked from outside it. The hashes are recomputed by
 * the Java runtime's SHA-256 (FIPS 180-4) and must agree with those PostgreSQL's own sha256() wrote:
 * two independent implementations of one standard. The tampering is what only the database's owner
 * can do, past the triggers; the issue asks that each side's audit trail stay verifiable.
 */
class ServerAuditCheckTest {

    private static final Instant T0 = Instant.parse("2026-03-01T09:00:00Z");
    private static final String TECH = "check_tech";

    @TempDir
    Path dir;

    private String url;

    @BeforeEach
    void aSyncedSite() {
        url = LocalPostgres.shared().newPlantServer(TECH);
        try (Workbook wb = Workbook.create(dir.resolve("a.strandbook"), DemoSite.site(), "k.ashdown")) {
            DemoSite.populate(wb);
            DemoSite.insertScan(wb, DemoSite.POINT_A, 1, T0);
            DemoSite.insertScan(wb, DemoSite.POINT_B, 2, T0);
            new SiteSync(server(), wb, DemoSite.site().name(), SyncProgress.SILENT).run();
        }
    }

    private PlantServer server() {
        return new PlantServer(new ServerLogin(url, TECH, null));
    }

    private AuditReport check() {
        return ServerAuditCheck.verify(server(), DemoSite.site().name());
    }

    private void asOwner(String... statements) throws SQLException {
        try (Connection c = LocalPostgres.shared().superuser(url); Statement st = c.createStatement()) {
            for (String sql : statements) {
                st.execute(sql);
            }
        }
    }

    @Test
    void aSyncedSitesTrailRecomputesHereToTheHeadTheServerWrote() throws SQLException {
        AuditReport report = check();
        assertTrue(report.intact(), report.toString());
        try (Connection c = LocalPostgres.shared().superuser(url); Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT hash FROM audit_entry ORDER BY id DESC LIMIT 1")) {
            rs.next();
            assertEquals(rs.getString(1), report.headHash(), "the same chain, end to end");
        }
    }

    @Test
    void aPointEditedPastTheTriggersIsNamed() throws SQLException {
        asOwner("ALTER TABLE point DISABLE TRIGGER USER",
                "UPDATE point SET fields = fields || '{\"service\":\"forged\"}' WHERE record_key = '" + DemoSite.POINT_A + "'",
                "ALTER TABLE point ENABLE TRIGGER USER");
        AuditReport report = check();
        assertTrue(report.chainBreak().isEmpty(), "the trail itself was not touched");
        assertEquals(1, report.unrecordedChanges().size(), report.toString());
        assertTrue(report.unrecordedChanges().get(0).message().startsWith("point " + DemoSite.POINT_A + " differs"),
                report.toString());
    }

    @Test
    void aPointDeletedPastTheTriggersIsMissedByName() throws SQLException {
        // nothing leaves the server (a removal is a flag): a row gone is the owner's doing
        asOwner("ALTER TABLE point_band DISABLE TRIGGER USER", "ALTER TABLE point DISABLE TRIGGER USER",
                "DELETE FROM point_band", "DELETE FROM point WHERE record_key = '" + DemoSite.POINT_B + "'",
                "ALTER TABLE point ENABLE TRIGGER USER", "ALTER TABLE point_band ENABLE TRIGGER USER");
        AuditReport report = check();
        assertTrue(report.unrecordedChanges().stream().anyMatch(f -> f.message().startsWith("point " + DemoSite.POINT_B
                + " recorded by server audit row") && f.message().endsWith("is missing: it was deleted past the server's"
                + " triggers")), report.toString());
    }

    @Test
    void aSpectrumChangedPastTheTriggersFailsItsBatchDigest() throws SQLException {
        asOwner("ALTER TABLE scan DISABLE TRIGGER USER",
                "UPDATE scan SET spectrum = spectrum || '\\x00'::bytea WHERE record_key = (SELECT min(record_key) FROM scan)",
                "ALTER TABLE scan ENABLE TRIGGER USER");
        AuditReport report = check();
        assertEquals(1, report.unrecordedChanges().size(), report.toString());
        assertTrue(report.unrecordedChanges().get(0).message().startsWith("scan: the 2 record(s)"), report.toString());
    }

    @Test
    void anAuditRowRewrittenByTheOwnerBreaksTheChainThere() throws SQLException {
        long id;
        try (Connection c = LocalPostgres.shared().superuser(url); Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT min(id) FROM audit_entry WHERE table_name = 'point'")) {
            rs.next();
            id = rs.getLong(1);
        }
        asOwner("ALTER TABLE audit_entry DISABLE TRIGGER USER",
                "UPDATE audit_entry SET db_user = 'someone_else' WHERE id = " + id,
                "ALTER TABLE audit_entry ENABLE TRIGGER USER");
        AuditReport report = check();
        assertEquals(id, report.chainBreak().orElseThrow().auditRowId());
        assertTrue(report.chainBreak().get().message().contains("changed after it was written"), report.toString());
    }

    @Test
    void aLoginThatIsNoMemberOfTheSiteIsToldItCannotReadIt() {
        String outsider = "check_outsider";
        LocalPostgres.shared().newPlantServer(outsider);
        SyncRefusedException e = assertThrows(SyncRefusedException.class, () -> ServerAuditCheck.verify(
                new PlantServer(new ServerLogin(url, outsider, null)), DemoSite.site().name()));
        assertTrue(e.getMessage().contains("that this login may read"), e.getMessage());
    }
}
