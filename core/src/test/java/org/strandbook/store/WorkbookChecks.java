package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.strandbook.site.CableSegment;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanRecord;

/** What the reliability tests demand of a workbook after any interruption. */
final class WorkbookChecks {

    private WorkbookChecks() {
    }

    /**
     * SQLite's own integrity check passes, the audit trail verifies (so every scan has its audit row
     * with a matching spectrum digest), every spectrum decodes to its point count, and AT-102's legs
     * are one generation. Gives the number of scans.
     */
    static long assertWhole(Path file) throws SQLException {
        try (Workbook wb = Workbook.open(file, "checker")) {
            try (Statement st = wb.session().connection().createStatement();
                 ResultSet rs = st.executeQuery("PRAGMA integrity_check")) {
                rs.next();
                // sqlite.org/pragma.html#pragma_integrity_check: a sound file gives the single row "ok"
                assertEquals("ok", rs.getString(1));
            }
            try (Statement st = wb.session().connection().createStatement();
                 ResultSet rs = st.executeQuery("SELECT (SELECT count(*) FROM scan), (SELECT count(*) FROM scan_spectrum)")) {
                rs.next();
                assertEquals(rs.getLong(1), rs.getLong(2), "every scan row has its spectrum and no spectrum is orphaned");
            }
            AuditReport report = wb.audit().verify();
            assertTrue(report.intact(), report::toString);
            List<ScanRecord> scans = wb.scans().listAll();
            for (ScanRecord s : scans) {
                assertEquals(s.nPoints(), wb.scans().spectrum(s.id()).size(), "scan " + s.id());
            }
            Set<String> generations = new HashSet<>();
            for (PathLeg leg : wb.paths().legs(DemoSite.POINT_B)) {
                for (CableSegment segment : leg.segments()) {
                    generations.add(segment.label().replaceAll("-\\d+$", ""));
                }
            }
            assertEquals(1, generations.size(), "AT-102's legs mix generations: " + generations);
            return scans.size();
        }
    }
}
