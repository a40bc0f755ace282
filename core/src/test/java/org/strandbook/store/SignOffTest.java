package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Note;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;

/**
 * Signatures tied to what they signed. That a signature names the content it covers by a digest,
 * and is void once that content changes, is the principle of electronic records under 21 CFR Part 11
 * (§11.70, signature/record linking); the digest is SHA-256 (FIPS 180-4).
 */
class SignOffTest {

    private static final Instant SCANNED = Instant.parse("2025-03-04T09:00:00Z");
    private static final Instant SIGNED = Instant.parse("2025-03-05T16:00:00Z");

    @TempDir
    Path dir;

    private Path file;
    private Workbook wb;

    @BeforeEach
    void buildWorkbook() {
        file = dir.resolve("site.sqlite");
        wb = Workbook.create(file, DemoSite.site(), DemoSite.USER);
        DemoSite.populate(wb);
        DemoSite.insertScan(wb, DemoSite.POINT_A, 1, SCANNED);
    }

    @AfterEach
    void close() {
        wb.close();
    }

    private static SignOff point(SignOffRole role, String tag) {
        return new SignOff(role, "M. Okonedo", SIGNED, tag, "", "commissioning lead", "", "");
    }

    private static SignOff site(SignOffRole role) {
        return new SignOff(role, "R. Inglenook", SIGNED, "", "", "site engineer", "", "");
    }

    @Test
    void aPointSignatureStaysCurrentUntilThePointChanges() {
        wb.signOffs().add(point(SignOffRole.CHECKED, DemoSite.POINT_A));
        assertEquals(SignatureState.Standing.CURRENT, wb.signOffs().states().get(0).standing());
        // a note is not an evaluation input: the signature still covers the point
        wb.notes().add(new Note(DemoSite.POINT_A, SIGNED, "k.ashdown", "tagged the junction box"));
        assertEquals(SignatureState.Standing.CURRENT, wb.signOffs().states().get(0).standing());

        wb.inspections().add(new Inspection(DemoSite.POINT_A, "J2", SIGNED.plusSeconds(60), "k.ashdown",
                InspectionGrade.DIRTY, ""));
        SignatureState state = wb.signOffs().states().get(0);
        assertEquals(SignatureState.Standing.SUPERSEDED, state.standing());
        assertTrue(state.why().startsWith("point AT-101 changed after it was signed"), state.why());
        assertTrue(wb.audit().verify().intact());
    }

    @Test
    void aSignatureRecordsTheRevisionAndTitle() {
        wb.signOffs().add(point(SignOffRole.PREPARED, DemoSite.POINT_A));
        SignOff stored = wb.signOffs().list().get(0);
        assertEquals("A", stored.revision());
        assertEquals("commissioning lead", stored.jobTitle());
        assertEquals(64, stored.contentSha256().length());
    }

    @Test
    void signingAPointWithoutALoopScanIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> wb.signOffs().add(point(SignOffRole.APPROVED, DemoSite.POINT_B)));
        assertTrue(e.getMessage().startsWith("point AT-102 has no loop scan"), e.getMessage());
        assertEquals(List.of(), wb.signOffs().list());
    }

    @Test
    void signingWithoutANameIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new SignOff(SignOffRole.APPROVED, "  ", SIGNED, DemoSite.POINT_A, ""));
        assertEquals("a sign-off needs the signer's name", e.getMessage());
    }

    @Test
    void aChangeAfterTheSiteWasSignedOpensTheNextRevision() {
        wb.signOffs().add(site(SignOffRole.PREPARED));
        wb.signOffs().add(site(SignOffRole.APPROVED));
        assertEquals("A", wb.signOffs().dossierRevision());
        assertTrue(wb.signOffs().states().stream().allMatch(s -> s.standing() == SignatureState.Standing.CURRENT));

        wb.notes().add(new Note(DemoSite.POINT_A, SIGNED.plusSeconds(3600), "k.ashdown", "re-opened: probe swapped"));
        assertEquals(SignatureState.Standing.SUPERSEDED, wb.signOffs().states().get(0).standing());
        assertEquals("B", wb.signOffs().dossierRevision());

        wb.signOffs().add(site(SignOffRole.PREPARED));
        assertEquals("B", wb.site().get().revision());
        assertEquals("B", wb.signOffs().list().get(2).revision());
        assertEquals(SignatureState.Standing.CURRENT, wb.signOffs().states().get(2).standing());
        assertTrue(wb.audit().verify().intact());
    }

    @Test
    void aSignatureEditedBehindStrandbooksBackIsReported() throws SQLException {
        wb.signOffs().add(site(SignOffRole.APPROVED));
        wb.close();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            st.executeUpdate("UPDATE sign_off SET content_sha256 = '" + "ab".repeat(32) + "'");
        }
        wb = Workbook.open(file, DemoSite.USER);
        AuditReport report = wb.audit().verify();
        assertFalse(report.intact());
        assertTrue(report.unrecordedChanges().get(0).message().startsWith("sign_off row 1 differs from audit row"),
                report.toString());
        assertEquals(SignatureState.Standing.TAMPERED, wb.signOffs().states().get(0).standing());
    }
}
