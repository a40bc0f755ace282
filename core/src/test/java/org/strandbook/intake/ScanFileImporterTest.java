package org.strandbook.intake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.scanfile.JcampDxWriter;
import org.strandbook.scanfile.SpectrumFile;
import org.strandbook.scanfile.XUnit;
import org.strandbook.site.ScanKind;
import org.strandbook.store.Workbook;

/**
 * A batch of scan files read ahead on several threads is still stored in the order given, each
 * file whole or not at all, and a stop leaves exactly the files before it.
 */
class ScanFileImporterTest {

    @TempDir
    Path dir;

    private final List<Path> files = new ArrayList<>();

    @BeforeEach
    void writeFiles() throws IOException {
        // invented spectra, one per file, each with its own time so that every file is different
        double[] nm = new double[64];
        for (int i = 0; i < nm.length; i++) {
            nm[i] = 1000 + 20 * i;
        }
        for (int f = 0; f < 40; f++) {
            double[] counts = new double[nm.length];
            for (int i = 0; i < counts.length; i++) {
                counts[i] = 1000 + 10 * f + i;
            }
            Path p = dir.resolve(String.format(Locale.ROOT, "scan-%02d.jdx", f));
            JcampDxWriter.difDup().write(SpectrumFile.inMemory("scan " + f, XUnit.NM, "COUNTS", nm, counts,
                    Map.of("LONGDATE", String.format(Locale.ROOT, "2026/03/%02d 08:00:00 +0000", 1 + f % 28))), p);
            files.add(p);
        }
    }

    private Workbook workbook() {
        return OnePointWorkbook.create(dir.resolve("site.strandbook"), "Batch Works");
    }

    private static ScanFileImporter.Summary importInto(Workbook wb, List<Path> batch, ScanFileImporter.Progress progress) {
        return new ScanFileImporter().importFiles(wb,
                new ScanFileImporter.Request("P-1", ScanKind.LOOP, batch, Optional.empty(), "tester"), progress);
    }

    @Test
    void filesAreStoredInTheOrderGivenWithBadAndRepeatedOnesReportedInPlace() throws IOException {
        // design choice for batch imports: all or nothing per file, the batch goes on, the same file twice is refused
        Path broken = dir.resolve("broken.jdx");
        Files.writeString(broken, "##TITLE= cut short\n##JCAMP-DX= 4.24\n");
        List<Path> batch = new ArrayList<>(files);
        batch.add(7, broken);
        batch.add(20, files.get(3));
        try (Workbook wb = workbook()) {
            ScanFileImporter.Summary s = importInto(wb, batch, ScanFileImporter.Progress.NONE);

            assertEquals(files, s.accepted().stream().map(ScanFileImporter.Accepted::file).toList());
            for (int i = 1; i < s.accepted().size(); i++) {
                assertTrue(s.accepted().get(i).scanId() > s.accepted().get(i - 1).scanId(), "ids follow the files");
            }
            assertEquals(List.of(broken, files.get(3)), s.rejected().stream().map(ScanFileImporter.Rejected::file).toList());
            assertTrue(s.rejected().get(0).reason().startsWith("broken.jdx:"), s.rejected().get(0).reason());
            assertTrue(s.rejected().get(1).reason().contains("same SHA-256"), s.rejected().get(1).reason());
            assertEquals(files.size(), wb.scans().count());
            assertTrue(wb.audit().verify().intact());
        }
    }

    @Test
    void aStopAfterTheSeventhFileLeavesExactlyTheFirstSeven() {
        // design choice for a cancelled batch: files read ahead but not reached are not stored
        try (Workbook wb = workbook()) {
            ScanFileImporter.Summary s = importInto(wb, files, (done, total, file) -> done < 7);

            assertTrue(s.stoppedEarly());
            assertEquals(files.subList(0, 7), s.accepted().stream().map(ScanFileImporter.Accepted::file).toList());
            assertEquals(7, wb.scans().count());
            assertTrue(wb.audit().verify().intact());
        }
    }

    @Test
    void aStopAtTheLastFileIsNotAnEarlyStop() {
        // design choice: a stop after the last file is no early stop
        try (Workbook wb = workbook()) {
            ScanFileImporter.Summary s = importInto(wb, files, (done, total, file) -> done < total);

            assertFalse(s.stoppedEarly());
            assertEquals(files.size(), wb.scans().count());
        }
    }
}
