package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.HexFormat;
import java.util.List;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.Note;
import org.strandbook.site.Site;

/**
 * The audit trail records who changed what, and any edit made behind Strandbook's back, to the trail
 * or to the data, is found. Tampering goes through a plain SQLite connection, as another program would.
 */
class AuditTrailTest {

    @TempDir
    Path dir;

    private Path file;

    @BeforeEach
    void buildWorkbook() {
        file = dir.resolve("audited.sqlite");
        try (Workbook wb = Workbook.create(file, DemoSite.site(), DemoSite.USER)) {
            DemoSite.populate(wb);
            DemoSite.insertScan(wb, DemoSite.POINT_A, 1, Instant.parse("2024-03-05T14:07:00Z"));
            DemoSite.insertScan(wb, DemoSite.POINT_B, 2, Instant.parse("2024-03-05T14:09:00Z"));
            wb.site().update(new Site("Fennwick Basin Works", "Unit 3 aromatics", "B", 1.0));
        }
    }

    @Test
    void anUntouchedTrailVerifiesAndReportsItsHead() {
        try (Workbook wb = Workbook.open(file, DemoSite.USER)) {
            AuditReport report = wb.audit().verify();
            List<AuditEntry> all = wb.audit().entries(0, 10_000);
            assertTrue(report.intact(), report::toString);
            assertEquals(all.size(), report.rows());
            assertEquals(all.get(all.size() - 1).hash(), report.headHash());
        }
    }

    @Test
    void eachRowNamesUserTimeTableKeyAndBothValues() {
        try (Workbook wb = Workbook.open(file, "m.okonedo")) {
            Instant before = Instant.now().minusSeconds(1);
            wb.site().update(new Site("Fennwick Basin Works", "Unit 3 aromatics", "C", 1.0));
            List<AuditEntry> all = wb.audit().entries(0, 10_000);
            AuditEntry last = all.get(all.size() - 1);
            assertEquals("m.okonedo", last.user());
            assertEquals("UPDATE", last.action());
            assertEquals("site", last.table());
            assertEquals("1", last.rowKey());
            assertTrue(last.oldValues().contains("\"revision\":\"B\""), last.oldValues());
            assertTrue(last.newValues().contains("\"revision\":\"C\""), last.newValues());
            assertFalse(last.at().isBefore(before));
        }
    }

    @Test
    void theChainIsTheDocumentedFormula() throws NoSuchAlgorithmException {
        // An independent implementation of the formula in AuditLog's documentation, on FIPS 180-4 SHA-256.
        try (Workbook wb = Workbook.open(file, DemoSite.USER)) {
            String prev = "0".repeat(64);
            for (AuditEntry e : wb.audit().entries(0, 10_000)) {
                MessageDigest md = MessageDigest.getInstance("SHA-256");
                for (String f : new String[] {e.prevHash(), Long.toString(e.id()), StoredTime.format(e.at()), e.user(),
                        e.action(), e.table(), e.rowKey(), e.oldValues(), e.newValues(), e.rowSha256()}) {
                    if (f == null) {
                        md.update((byte) '-');
                    } else {
                        byte[] b = f.getBytes(StandardCharsets.UTF_8);
                        md.update((b.length + ":").getBytes(StandardCharsets.US_ASCII));
                        md.update(b);
                    }
                }
                assertEquals(prev, e.prevHash(), "row " + e.id());
                assertEquals(HexFormat.of().formatHex(md.digest()), e.hash(), "row " + e.id());
                prev = e.hash();
            }
        }
    }

    @Test
    void aNewScanIsRecordedWithTheImageTheVerifierReadsBack() throws SQLException {
        // the insert builds the spectrum's digest from the bytes it writes; the verifier hashes the stored BLOB
        try (Workbook wb = Workbook.open(file, DemoSite.USER)) {
            long id = DemoSite.insertScan(wb, DemoSite.POINT_A, 3, Instant.parse("2024-03-06T09:00:00Z"));
            AuditEntry recorded = last(wb);
            RowImage stored = wb.session().read(() -> wb.audit().capture(AuditedTable.SCAN, id)).orElseThrow();
            assertEquals(stored.json(), recorded.newValues());
            assertEquals(stored.sha256(), recorded.rowSha256());
        }
    }

    @Test
    void aChangeUndoneInsideATransactionLeavesNoGapInTheChain() {
        try (Workbook wb = Workbook.open(file, DemoSite.USER)) {
            long before = last(wb).id();
            wb.inTransaction(() -> {
                assertThrows(IllegalStateException.class, () -> wb.inTransaction((Runnable) () -> {
                    wb.notes().add(new Note(DemoSite.POINT_A, Instant.parse("2024-03-07T08:00:00Z"), "x", "undone"));
                    throw new IllegalStateException("given up after the note was written");
                }));
                wb.notes().add(new Note(DemoSite.POINT_A, Instant.parse("2024-03-07T08:05:00Z"), "x", "kept"));
            });
            assertEquals(before + 1, last(wb).id(), "the undone note's audit row went with it");
            AuditReport report = wb.audit().verify();
            assertTrue(report.intact(), report::toString);
        }
    }

    @Test
    void changesOfAnotherConnectionBetweenOursKeepTheChainWhole() {
        try (Workbook mine = Workbook.open(file, DemoSite.USER);
             Workbook theirs = Workbook.open(file, "m.okonedo")) {
            for (int i = 0; i < 3; i++) {
                mine.notes().add(new Note(DemoSite.POINT_A, Instant.parse("2024-03-08T08:00:00Z"), "x", "mine " + i));
                theirs.notes().add(new Note(DemoSite.POINT_B, Instant.parse("2024-03-08T08:00:00Z"), "y", "theirs " + i));
            }
            AuditReport report = mine.audit().verify();
            assertTrue(report.intact(), report::toString);
        }
    }

    @Test
    void theTriggersRefuseAPlainEditOfTheTrail() throws SQLException {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            SQLException e = assertThrows(SQLException.class, () -> st.executeUpdate("DELETE FROM audit_entry WHERE id = 3"));
            assertTrue(e.getMessage().contains("audit entries cannot be deleted"), e.getMessage());
        }
    }

    @Test
    void anEditedAuditValueIsFoundAtItsRow() throws SQLException {
        long row = tamper("UPDATE audit_entry SET new_values = replace(new_values, '\"revision\":\"B\"', '\"revision\":\"A\"') "
                + "WHERE action = 'UPDATE' AND table_name = 'site' RETURNING id");
        AuditFinding f = verify().chainBreak().orElseThrow();
        assertEquals(row, f.auditRowId());
        assertTrue(f.message().contains("no longer matches its hash"), f.message());
    }

    @Test
    void aRemovedMiddleRowIsFoundAtTheRowAfterIt() throws SQLException {
        tamper("DELETE FROM audit_entry WHERE id = 5 RETURNING id");
        AuditFinding f = verify().chainBreak().orElseThrow();
        assertEquals(6, f.auditRowId());
        assertTrue(f.message().contains("row ids jump from 4 to 6"), f.message());
    }

    @Test
    void aRowRewrittenWithAValidFreshHashIsFoundByTheNextLink() throws SQLException {
        AuditEntry five;
        try (Workbook wb = Workbook.open(file, DemoSite.USER)) {
            five = wb.audit().entries(4, 1).get(0);
        }
        String forged = AuditLog.chainHash(five.prevHash(), five.id(), StoredTime.format(five.at()), "someone.else",
                five.action(), five.table(), five.rowKey(), five.oldValues(), five.newValues(), five.rowSha256());
        tamper("UPDATE audit_entry SET user_name = 'someone.else', hash = '" + forged + "' WHERE id = 5 RETURNING id");
        AuditFinding f = verify().chainBreak().orElseThrow();
        assertEquals(6, f.auditRowId());
        assertTrue(f.message().contains("row 5 was changed or replaced"), f.message());
    }

    @Test
    void aDataRowChangedWithoutStrandbookIsFound() throws SQLException {
        tamper("UPDATE point SET location = 'pipe rack 9' WHERE tag = 'AT-102' RETURNING id");
        AuditReport r = verify();
        assertTrue(r.chainBreak().isEmpty());
        assertEquals(1, r.unrecordedChanges().size(), r::toString);
        assertTrue(r.unrecordedChanges().get(0).message().matches("point row 2 differs from audit row \\d+: it was changed "
                + "without Strandbook"), r.unrecordedChanges().get(0).message());
    }

    @Test
    void aSpectrumChangedWithoutStrandbookIsFound() throws SQLException {
        tamper("UPDATE scan_spectrum SET data = zeroblob(length(data)) WHERE scan_id = 1 RETURNING scan_id");
        List<AuditFinding> found = verify().unrecordedChanges();
        assertEquals(1, found.size());
        assertTrue(found.get(0).message().startsWith("scan row 1 differs"), found.get(0).message());
    }

    @Test
    void aDataRowAddedWithoutStrandbookIsFound() throws SQLException {
        tamper("INSERT INTO note (point_id, written_at, author, text) VALUES (1, '2024-03-09T00:00:00.000Z', 'x', 'y') "
                + "RETURNING id");
        List<AuditFinding> found = verify().unrecordedChanges();
        assertEquals(List.of("note row 1 has no audit entry: it was added without Strandbook"),
                found.stream().map(AuditFinding::message).toList());
    }

    @Test
    void aDataRowDeletedWithoutStrandbookIsFound() throws SQLException {
        tamper("DELETE FROM segment_bend WHERE id = 1 RETURNING id");
        List<AuditFinding> found = verify().unrecordedChanges();
        assertEquals(1, found.size());
        assertTrue(found.get(0).message().matches("segment_bend row 1 recorded by audit row \\d+ is missing: it was "
                + "deleted without Strandbook"), found.get(0).message());
    }

    @Test
    void aScanRemovedWithForeignKeysOffLeavesItsSpectrumAccusingIt() throws SQLException {
        tamper("DELETE FROM scan WHERE id = 2 RETURNING id");
        List<String> found = verify().unrecordedChanges().stream().map(AuditFinding::message).toList();
        assertTrue(found.contains("scan_spectrum row 2 refers to a missing scan row: it was changed without Strandbook"),
                found::toString);
        assertTrue(found.stream().anyMatch(m -> m.startsWith("scan row 2 recorded by audit row")), found::toString);
    }

    @Test
    void cuttingOffTheNewestRowsLeavesTheirDataUnaccountedFor() throws SQLException {
        tamper("DELETE FROM audit_entry WHERE id >= (SELECT max(id) - 1 FROM audit_entry) RETURNING id");
        AuditReport r = verify();
        assertTrue(r.chainBreak().isEmpty(), "the chain itself stays whole when its end is cut");
        assertFalse(r.unrecordedChanges().isEmpty(), r::toString);
    }

    private static AuditEntry last(Workbook wb) {
        List<AuditEntry> all = wb.audit().entries(0, 10_000);
        return all.get(all.size() - 1);
    }

    /** Runs one statement as another program would: triggers dropped, no audit row. Gives a changed key. */
    private long tamper(String sql) throws SQLException {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            st.execute("DROP TRIGGER audit_entry_append_only_update");
            st.execute("DROP TRIGGER audit_entry_append_only_delete");
            try (ResultSet rs = st.executeQuery(sql)) {
                assertTrue(rs.next(), "the tampering statement changed nothing: " + sql);
                return rs.getLong(1);
            }
        }
    }

    private AuditReport verify() {
        try (Workbook wb = Workbook.open(file, DemoSite.USER)) {
            AuditReport report = wb.audit().verify();
            assertFalse(report.intact(), report::toString);
            return report;
        }
    }
}
