package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Spectrum;

class ScanRepositoryTest extends PopulatedWorkbookTest {

    ScanRepositoryTest() {
        super("scans.sqlite");
    }

    private static final Instant T0 = Instant.parse("2024-03-05T14:07:00Z");

    @Test
    void storedSpectrumComesBackBitForBit() {
        Spectrum s = DemoSite.spectrum(2048, 11);
        long id = wb.scans().insert(DemoSite.POINT_A, ScanKind.REFERENCE, T0, ScanConditions.unknown("k.ashdown"), s,
                "ref.csv", DemoSite.sha256Of("ref"));
        Spectrum back = wb.scans().spectrum(id);
        assertArrayEquals(s.wavelengthsNm(), back.wavelengthsNm());
        assertArrayEquals(s.values(), back.values());
    }

    @Test
    void listingGivesEveryFieldWithoutTheSpectrum() {
        Spectrum s = DemoSite.spectrum(300, 3);
        ScanConditions c = new ScanConditions("k.ashdown", 12.5, 32, OptionalDouble.of(24.0), OptionalDouble.empty());
        String sha = DemoSite.sha256Of("loop-a");
        long id = wb.scans().insert(DemoSite.POINT_A, ScanKind.LOOP, T0, c, s, "loop-a.spc", sha.toUpperCase());
        ScanRecord expected = new ScanRecord(id, DemoSite.POINT_A, ScanKind.LOOP, T0, c, 300, s.minNm(), s.maxNm(),
                "loop-a.spc", sha);
        assertEquals(List.of(expected), wb.scans().list("at-101"));
        assertEquals(expected, wb.scans().get(id).orElseThrow());
        assertEquals(expected, wb.scans().findBySha256(sha).orElseThrow());
    }

    @Test
    void listingIsInTimeOrderWhateverTheInsertOrder() {
        DemoSite.insertScan(wb, DemoSite.POINT_A, 1, T0.plusSeconds(60));
        DemoSite.insertScan(wb, DemoSite.POINT_A, 2, T0);
        DemoSite.insertScan(wb, DemoSite.POINT_A, 3, T0.plusMillis(500));
        DemoSite.insertScan(wb, DemoSite.POINT_B, 4, T0.minusSeconds(60));
        List<Instant> times = wb.scans().list(DemoSite.POINT_A).stream().map(ScanRecord::takenAt).toList();
        assertEquals(List.of(T0, T0.plusMillis(500), T0.plusSeconds(60)), times);
        assertEquals(4, wb.scans().listAll().size());
    }

    @Test
    void theSameFileTwiceIsRefusedNamingTheScanThatHoldsIt() {
        long first = DemoSite.insertScan(wb, DemoSite.POINT_A, 1, T0);
        String sha = DemoSite.sha256Of(DemoSite.POINT_A + "/1");
        DuplicateScanException e = assertThrows(DuplicateScanException.class, () -> wb.scans().insert(DemoSite.POINT_B,
                ScanKind.LOOP, T0, ScanConditions.unknown(""), DemoSite.spectrum(64, 1), "copy-of-loop-1.csv", sha));
        assertEquals(first, e.existingScanId());
        assertEquals("file copy-of-loop-1.csv is already in the workbook as scan " + first
                + " (point AT-101, loop scan taken 2024-03-05T14:07:00Z, imported from loop-1.csv)", e.getMessage());
        assertEquals(1, wb.scans().count());
    }

    @Test
    void aScanOfAnUnknownPointNamesTheTag() {
        UnknownEntryException e = assertThrows(UnknownEntryException.class,
                () -> DemoSite.insertScan(wb, "AT-404", 1, T0));
        assertEquals("unknown point tag 'AT-404'", e.getMessage());
    }

    @Test
    void insertAllStoresAllOrNone() {
        List<NewScan> batch = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            batch.add(new NewScan(DemoSite.POINT_A, ScanKind.LOOP, T0.plusSeconds(i), ScanConditions.unknown(""),
                    DemoSite.spectrum(64, i), "b" + i + ".csv", DemoSite.sha256Of("batch/" + i)));
        }
        batch.add(batch.get(2));
        assertThrows(DuplicateScanException.class, () -> wb.scans().insertAll(batch));
        assertEquals(0, wb.scans().count());
        assertEquals(5, wb.scans().insertAll(batch.subList(0, 5)).size());
        assertEquals(5, wb.scans().count());
    }

    @Test
    void aCaughtDuplicateInsideATransactionUndoesOnlyItself() {
        DemoSite.insertScan(wb, DemoSite.POINT_A, 1, T0);
        int skipped = wb.inTransaction(() -> {
            int dup = 0;
            for (int seq = 0; seq < 3; seq++) {
                try {
                    DemoSite.insertScan(wb, DemoSite.POINT_A, seq, T0.plusSeconds(seq));
                } catch (DuplicateScanException e) {
                    dup++;
                }
            }
            return dup;
        });
        assertEquals(1, skipped);
        assertEquals(3, wb.scans().count());
    }

    @Test
    void aDeletedScanLeavesItsRecordInTheTrail() {
        long id = DemoSite.insertScan(wb, DemoSite.POINT_A, 1, T0);
        wb.scans().delete(id);
        assertFalse(wb.scans().get(id).isPresent());
        assertThrows(UnknownEntryException.class, () -> wb.scans().spectrum(id));
        List<AuditEntry> trail = wb.audit().entries(0, 1000);
        AuditEntry last = trail.get(trail.size() - 1);
        assertEquals("DELETE", last.action());
        assertEquals("scan", last.table());
        assertTrue(last.oldValues().contains("loop-1.csv"), last.oldValues());
    }

    @Test
    void theTrailRecordsTheSpectrumAsHashAndSizeNotItsBytes() {
        Spectrum s = DemoSite.spectrum(500, 5);
        long id = wb.scans().insert(DemoSite.POINT_A, ScanKind.DARK, T0, ScanConditions.unknown(""), s, "dark.csv",
                DemoSite.sha256Of("dark"));
        List<AuditEntry> trail = wb.audit().entries(0, 1000);
        AuditEntry last = trail.get(trail.size() - 1);
        assertEquals("scan", last.table());
        assertEquals(Long.toString(id), last.rowKey());
        String blobHash = Sha256.hex(SpectrumCodec.encode(s));
        assertTrue(last.newValues().endsWith("\"spectrum\":{\"sha256\":\"" + blobHash + "\",\"bytes\":8000}}"),
                last.newValues());
    }

    @Test
    void listingByPointUsesThePointTimeIndex() throws SQLException {
        // EXPLAIN QUERY PLAN output as described at sqlite.org/eqp.html: "SEARCH s USING INDEX <name> (...)".
        try (PreparedStatement ps = wb.session().connection().prepareStatement(
                "EXPLAIN QUERY PLAN " + ScanRepository.LIST_BY_POINT_SQL)) {
            ps.setLong(1, 1);
            StringBuilder plan = new StringBuilder();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    plan.append(rs.getString("detail")).append('\n');
                }
            }
            assertTrue(plan.toString().contains("USING INDEX " + ScanRepository.LISTING_INDEX), plan.toString());
            assertFalse(plan.toString().contains("TEMP B-TREE"), "listing must not sort: " + plan);
        }
    }
}
