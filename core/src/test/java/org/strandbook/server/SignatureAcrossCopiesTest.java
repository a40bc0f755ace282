package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;
import org.strandbook.store.DemoSite;
import org.strandbook.store.PortableFields;
import org.strandbook.store.PortableTable;
import org.strandbook.store.SignatureState;
import org.strandbook.store.Workbook;

/**
 * A signature given in one workbook, judged in another that it reached through a real PostgreSQL
 * plant server. The issue asks that "each side's audit trail stays verifiable" and that a sync loses
 * nothing: a signature must neither turn into "tampered" in a clone nor stand there when the records
 * it signed differ from what the clone holds.
 */
class SignatureAcrossCopiesTest {

    private static final Instant T0 = Instant.parse("2026-03-01T09:00:00Z");
    private static final String TECH = "sig_tech";

    @TempDir
    Path dir;

    private String url;

    @BeforeEach
    void startServer() {
        url = LocalPostgres.shared().newPlantServer(TECH);
    }

    private PlantServer server() {
        return new PlantServer(new ServerLogin(url, TECH, null));
    }

    private Workbook laptop(String file) {
        Workbook wb = Workbook.create(dir.resolve(file), DemoSite.site(), "k.ashdown");
        DemoSite.populate(wb);
        DemoSite.insertScan(wb, DemoSite.POINT_A, 1, T0);
        DemoSite.insertScan(wb, DemoSite.POINT_B, 2, T0);
        return wb;
    }

    private Workbook cloneOf(String file) {
        SiteClone.run(server(), DemoSite.site().name(), dir.resolve(file), TECH, SyncProgress.SILENT);
        return Workbook.open(dir.resolve(file), TECH);
    }

    private void sync(Workbook wb) {
        new SiteSync(server(), wb, wb.site().get().name(), SyncProgress.SILENT).run();
    }

    private static SignOff siteApproval(Instant at) {
        return new SignOff(SignOffRole.APPROVED, "R. Fairbairn", at, "", "", "site engineer", "", "");
    }

    private static SignatureState.Standing standing(Workbook wb, int index) {
        return wb.signOffs().states().get(index).standing();
    }

    @Test
    void aSiteSignatureStandsInACloneAndIsNotTakenForTampering() {
        try (Workbook a = laptop("a.strandbook")) {
            a.signOffs().add(siteApproval(T0.plusSeconds(7200)));
            sync(a);
            try (Workbook b = cloneOf("b.strandbook")) {
                assertEquals(SignatureState.Standing.CURRENT, standing(b, 0), () -> b.signOffs().states().toString());
                assertTrue(b.audit().verify().intact());
            }
        }
    }

    @Test
    void aRecordAddedInTheCloneAfterwardsSupersedesTheSiteSignatureThere() {
        try (Workbook a = laptop("a.strandbook")) {
            a.signOffs().add(siteApproval(T0.plusSeconds(7200)));
            sync(a);
            try (Workbook b = cloneOf("b.strandbook")) {
                b.inspections().add(new Inspection(DemoSite.POINT_A, "J1", T0.plusSeconds(9000), "j.pell",
                        InspectionGrade.DIRTY, ""));
                assertEquals(SignatureState.Standing.SUPERSEDED, standing(b, 0));
            }
        }
    }

    @Test
    void whatTheSigningLaptopRecordedAfterSigningAndBeforeItsSyncSupersedesTheSignatureInTheCloneToo() {
        // the same records, in the same order, whether read in the signing copy or in a clone
        try (Workbook a = laptop("a.strandbook")) {
            a.signOffs().add(siteApproval(T0.plusSeconds(7200)));
            a.inspections().add(new Inspection(DemoSite.POINT_B, "J1", T0.plusSeconds(9000), "k.ashdown",
                    InspectionGrade.DIRTY, ""));
            assertEquals(SignatureState.Standing.SUPERSEDED, standing(a, 0));
            sync(a);
            try (Workbook b = cloneOf("b.strandbook")) {
                assertEquals(SignatureState.Standing.SUPERSEDED, standing(b, 0));
            }
        }
    }

    @Test
    void aPointSignatureStandsInACloneUntilThatPointChangesThere() {
        try (Workbook a = laptop("a.strandbook")) {
            a.signOffs().add(new SignOff(SignOffRole.CHECKED, "M. Okonedo", T0.plusSeconds(7200), DemoSite.POINT_A,
                    "", "commissioning lead", "", ""));
            sync(a);
            try (Workbook b = cloneOf("b.strandbook")) {
                assertEquals(SignatureState.Standing.CURRENT, standing(b, 0), () -> b.signOffs().states().toString());
                b.inspections().add(new Inspection(DemoSite.POINT_B, "J1", T0.plusSeconds(9000), "j.pell",
                        InspectionGrade.DIRTY, ""));
                assertEquals(SignatureState.Standing.CURRENT, standing(b, 0), "another point's record does not touch it");
                b.inspections().add(new Inspection(DemoSite.POINT_A, "J1", T0.plusSeconds(9600), "j.pell",
                        InspectionGrade.DIRTY, ""));
                assertEquals(SignatureState.Standing.SUPERSEDED, standing(b, 0));
            }
        }
    }

    @Test
    void aSiteSignatureFromAnOlderWorkbookIsSaidToBeGivenElsewhereAndJudgedFromItsArrival() throws SQLException {
        // a workbook of schema 8 pushes a signature without the portable digest: the clone cannot
        // recompute what it signed, so it says where it was given and watches what changes after
        try (Workbook a = laptop("a.strandbook"); Workbook signing = laptop("signing.strandbook")) {
            sync(a);
            signing.signOffs().add(siteApproval(T0.plusSeconds(7200)));
            Map<String, Object> fields = new LinkedHashMap<>(
                    signing.records().readAll().get(PortableTable.SIGN_OFF).values().iterator().next());
            fields.remove("portable_sha256");
            pushAsAnOlderWorkbookWould(fields);
            try (Workbook b = cloneOf("b.strandbook")) {
                List<SignatureState> states = b.signOffs().states();
                assertEquals(SignatureState.Standing.SIGNED_ELSEWHERE, states.get(0).standing(), states::toString);
                assertTrue(b.audit().verify().intact());
                b.inspections().add(new Inspection(DemoSite.POINT_A, "J1", T0.plusSeconds(9000), "j.pell",
                        InspectionGrade.DIRTY, ""));
                assertEquals(SignatureState.Standing.SUPERSEDED, standing(b, 0));
            }
        }
    }

    private void pushAsAnOlderWorkbookWould(Map<String, Object> fields) throws SQLException {
        try (Connection c = LocalPostgres.shared().superuser(url); PreparedStatement ps = c.prepareStatement(
                "INSERT INTO sign_off (site_id, record_key, fields) SELECT id, ?, ?::jsonb FROM site WHERE name = ?")) {
            ps.setString(1, PortableFields.sha256(fields));
            ps.setString(2, PortableFields.json(fields));
            ps.setString(3, DemoSite.site().name());
            assertEquals(1, ps.executeUpdate());
        }
    }
}
