package org.strandbook.intake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Named;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.scanfile.MalformedSpectrumCorpusTest;
import org.strandbook.site.Analyzer;
import org.strandbook.site.DetectorType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanKind;
import org.strandbook.site.Site;
import org.strandbook.site.WavelengthBand;
import org.strandbook.store.AuditReport;
import org.strandbook.store.Workbook;

/**
 * The whole malformed corpus of the spectrum readers (truncations, wrong encodings, NaN/Inf, huge
 * numbers, binary junk, mismatched NPOINTS ...) offered to a workbook in one batch: every file
 * rejected with {@code file:line: what}, and the workbook's content unchanged, as its audit trail
 * and scan count show.
 */
class MalformedScanImportTest {

    @TempDir
    Path dir;

    @Test
    void everyMalformedFileIsRejectedAndTheWorkbookIsUnchanged() throws Exception {
        List<Path> files = new ArrayList<>();
        int n = 0;
        for (Named<byte[]> c : (Iterable<Named<byte[]>>) MalformedSpectrumCorpusTest.corpus()::iterator) {
            Path f = dir.resolve(String.format("case-%03d.%s", n++, looksLikeJcamp(c.getPayload()) ? "jdx" : "csv"));
            Files.write(f, c.getPayload());
            files.add(f);
        }
        assertTrue(files.size() >= 200, "corpus of " + files.size());
        Path site = dir.resolve("site.strandbook");
        try (Workbook wb = Workbook.create(site, new Site("Corpus Works"), "tester")) {
            wb.site().addAnalyzer(new Analyzer("AZ", "", 1000, 2500, 1, 20, DetectorType.EXTENDED_INGAAS));
            wb.catalog().addProbeType(new ProbeType("PT", "", ProbeKind.TRANSMISSION, "SAPPHIRE", 2, 1, 1));
            wb.points().add(new MeasurementPoint("P-1", "", "", "AZ", 1, "PT", List.of(new WavelengthBand("b", 1500, 1600)),
                    OptionalDouble.empty(), false, false, OptionalDouble.empty()));
            AuditReport before = wb.audit().verify();
            long scansBefore = wb.scans().count();

            ScanFileImporter.Summary summary = new ScanFileImporter().importFiles(wb,
                    new ScanFileImporter.Request("P-1", ScanKind.LOOP, files, Optional.empty(), "tester"),
                    ScanFileImporter.Progress.NONE);

            assertEquals(List.of(), summary.accepted());
            assertEquals(files.size(), summary.rejected().size());
            for (ScanFileImporter.Rejected r : summary.rejected()) {
                assertTrue(r.reason().matches("(?s)^.+:\\d+: .+"), r.reason());
            }
            AuditReport after = wb.audit().verify();
            assertTrue(after.intact());
            assertEquals(before.rows(), after.rows());
            assertEquals(before.headHash(), after.headHash());
            assertEquals(scansBefore, wb.scans().count());
        }
    }

    private static boolean looksLikeJcamp(byte[] b) {
        return new String(b, 0, Math.min(b.length, 64), java.nio.charset.StandardCharsets.ISO_8859_1).contains("##");
    }
}
