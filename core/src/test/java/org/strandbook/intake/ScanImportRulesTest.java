package org.strandbook.intake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.store.Workbook;

/** What the importer asks of a file beyond its format: a signal, a believable time, one spectrum. */
class ScanImportRulesTest {

    @TempDir
    Path dir;

    /** A JCAMP-DX file of ten points, 1000-1009 nm (the ASDF example of McDonald & Wilks 1988). */
    private static String jcamp(String yUnits, String longDate) {
        return "##TITLE= rules\n##JCAMP-DX= 5.01\n##DATA TYPE= NEAR INFRARED SPECTRUM\n##XUNITS= NANOMETERS\n"
                + "##YUNITS= " + yUnits + "\n" + (longDate.isEmpty() ? "" : "##LONGDATE= " + longDate + "\n")
                + "##FIRSTX= 1000\n##LASTX= 1009\n##NPOINTS= 10\n##XYDATA= (X++(Y..Y))\n1000AJT%jX\n1009c\n##END=\n";
    }

    @Test
    void transmittanceAndAbsorbanceAreRefusedAsLoopScansOnTheirUnitLine() throws IOException {
        // T = I/I0 and A = -log10 T (IUPAC Gold Book, "transmittance", "absorbance"): already a ratio to a
        // reference; stored as a loop signal a healthy T = 0.8 would read as a loop that returns no light
        Path t = write("t.jdx", jcamp("TRANSMITTANCE", "2026/03/01 09:30:00"));
        Path a = write("a.csv", "# taken_at: 2026-03-01T09:30:00Z\nWavelength (nm);Absorbance\n1000;0.1\n1001;0.2\n");
        try (Workbook wb = workbook()) {
            ScanFileImporter.Summary s = importInto(wb, List.of(t, a), Optional.empty(), 0);
            assertEquals(0, s.accepted().size());
            assertTrue(s.rejected().get(0).reason().startsWith("t.jdx:5: the values are a transmittance"),
                    s.rejected().get(0).reason());
            assertTrue(s.rejected().get(1).reason().startsWith("a.csv:2: the values are an absorbance"),
                    s.rejected().get(1).reason());
        }
    }

    @Test
    void theUnitOfTheValuesIsStoredWithTheScan() throws IOException {
        // McDonald & Wilks 1988: ##YUNITS= names the ordinate unit
        Path counts = write("c.jdx", jcamp("COUNTS", "2026/03/01 09:30:00"));
        try (Workbook wb = workbook()) {
            importInto(wb, List.of(counts), Optional.empty(), 0);
            ScanRecord r = wb.scans().list("P-1").get(0);
            assertEquals("COUNTS", r.yUnit());
            assertTrue(wb.audit().verify().intact());
        }
    }

    @Test
    void datesBefore1980OrMoreThanADayAheadAreRefusedOnTheirLine() throws IOException {
        // design choice (TakenAtRange): no analyzer wrote spectrum files before 1980; a day covers time zones
        Path year0 = write("y0.jdx", jcamp("COUNTS", "0000/01/01 00:00:00"));
        Path ahead = write("ahead.csv", "# taken_at: 2999-01-01T00:00:00Z\nWavelength (nm);Counts\n1000;1\n1001;2\n");
        try (Workbook wb = workbook()) {
            ScanFileImporter.Summary s = importInto(wb, List.of(year0, ahead), Optional.empty(), 0);
            assertEquals(0, s.accepted().size());
            assertTrue(s.rejected().get(0).reason().startsWith("y0.jdx:6: time taken ") && s.rejected().get(0).reason()
                    .contains("before 1980"), s.rejected().get(0).reason());
            assertTrue(s.rejected().get(1).reason().startsWith("ahead.csv:1: time taken 2999-01-01T00:00:00Z is more "
                    + "than a day in the future"), s.rejected().get(1).reason());
        }
    }

    @Test
    void aTimeGivenOnTheCommandMeansTheFilesOwnIsNotRead() throws IOException {
        // the technician's time overrides the file's: a damaged LONGDATE must not refuse the file (common practice)
        Path damaged = write("d.jdx", jcamp("COUNTS", "2026/13/45 99:99:99"));
        Instant given = Instant.parse("2026-03-01T09:30:00Z");
        try (Workbook wb = workbook()) {
            ScanFileImporter.Summary s = importInto(wb, List.of(damaged), Optional.of(given), 0);
            assertEquals(List.of(), s.rejected());
            assertEquals(given, s.accepted().get(0).takenAt());
        }
        Path other = write("d2.jdx", jcamp("COUNTS", "2026/13/45 99:99:99").replace("rules", "rules 2"));
        try (Workbook wb = Workbook.open(dir.resolve("site.strandbook"), "tester")) {
            ScanFileImporter.Summary s = importInto(wb, List.of(other), Optional.empty(), 0);
            assertTrue(s.rejected().get(0).reason().startsWith("d2.jdx:6: LONGDATE: time '2026/13/45 99:99:99'"),
                    s.rejected().get(0).reason());
        }
    }

    @Test
    void aLinkFileGivesTheBlockChosenAndSaysSoInTheSummary() throws IOException {
        // McDonald & Wilks 1988: blocks of a LINK file, numbered in file order
        String inner = jcamp("COUNTS", "2026/03/01 09:30:00");
        Path link = write("link.jdx", "##TITLE= link\n##JCAMP-DX= 5.01\n##DATA TYPE= LINK\n##BLOCKS= 2\n" + inner
                + inner.replace("1000AJT%jX", "1000BJT%jX").replace("1009c", "1009b") + "##END=\n");
        try (Workbook wb = workbook()) {
            ScanFileImporter.Summary refused = importInto(wb, List.of(link), Optional.empty(), 0);
            assertTrue(refused.rejected().get(0).reason().contains("--block N"), refused.rejected().get(0).reason());
            ScanFileImporter.Summary chosen = importInto(wb, List.of(link), Optional.empty(), 2);
            assertEquals(1, chosen.accepted().size(), chosen.rejected().toString());
            assertTrue(chosen.accepted().get(0).tolerated().get(0).contains("block 2 of 2"),
                    chosen.accepted().get(0).tolerated().toString());
            assertEquals(2, wb.scans().spectrum(chosen.accepted().get(0).scanId()).values()[0]);
        }
    }

    @Test
    void aFileNameWithControlCharactersIsEscapedInItsRefusal() throws IOException {
        // ECMA-48: ESC starts a terminal control sequence; a newline would forge a line of the summary
        Path evil = write("evil\u001B[31m\nred.jdx", jcamp("COUNTS", "2026/03/01 09:30:00"));
        try (Workbook wb = workbook()) {
            importInto(wb, List.of(evil), Optional.empty(), 0);
            ScanFileImporter.Summary again = importInto(wb, List.of(evil), Optional.empty(), 0);
            String reason = again.rejected().get(0).reason();
            assertTrue(reason.startsWith("evil\\e[31m\\nred.jdx:0: the same file is already stored"), reason);
        }
    }

    private Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.write(p, text.getBytes(StandardCharsets.UTF_8));
        return p;
    }

    private Workbook workbook() {
        return OnePointWorkbook.create(dir.resolve("site.strandbook"), "Rules Works");
    }

    private static ScanFileImporter.Summary importInto(Workbook wb, List<Path> files, Optional<Instant> takenAt,
                                                       int block) {
        return new ScanFileImporter().importFiles(wb,
                new ScanFileImporter.Request("P-1", ScanKind.LOOP, files, takenAt, "tester", block),
                ScanFileImporter.Progress.NONE);
    }
}
