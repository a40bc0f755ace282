package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TimeZone;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.util.DefaultTempFileCreationStrategy;
import org.apache.poi.util.TempFile;
import org.apache.poi.util.TempFileCreationStrategy;
import org.apache.poi.xssf.usermodel.XSSFCellStyle;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.store.Workbook;
import org.strandbook.templates.Templates;

/** How the writer behaves around the file: atomic, cancellable, independent of the machine, template-driven. */
class DossierWriterTest {

    @TempDir
    static Path shared;

    @TempDir
    Path dir;

    private static Workbook workbook;
    private static DossierContent content;

    @BeforeAll
    static void read() {
        workbook = DossierFixture.create(shared.resolve("site.sqlite"), Map.of());
        content = DossierFixture.content(workbook, DossierScope.everything());
    }

    @AfterAll
    static void close() {
        workbook.close();
    }

    @Test
    void numbersAndTimesDoNotDependOnTheMachinesLocaleOrZone() throws IOException {
        Locale locale = Locale.getDefault();
        TimeZone zone = TimeZone.getDefault();
        Path out = dir.resolve("dossier.xlsx");
        try {
            // a decimal comma and a zone 13 h 45 min from UTC: neither may reach the file
            Locale.setDefault(Locale.GERMANY);
            TimeZone.setDefault(TimeZone.getTimeZone("Pacific/Chatham"));
            DossierWriter.withShippedTemplate().write(content, out, false, DossierProgress.NONE);
        } finally {
            Locale.setDefault(locale);
            TimeZone.setDefault(zone);
        }
        try (DossierFile f = new DossierFile(out)) {
            assertTrue(f.text("Cover").contains("Issued (UTC)\t2025-12-01 09:30 UTC"), f.text("Cover"));
            String reason = DossierFile.string(f.rowsOf("Acceptance", DossierFixture.GOOD).get(0), "reason");
            assertTrue(reason.startsWith("within 1.00 dB of prediction"), reason);
            Cell taken = f.rowsOf("Acceptance", DossierFixture.GOOD).get(0).get("loop_taken");
            // 2025-08-04 08:03 UTC is day 45873 of the 1900 date system, 08:03 is 0.33542 of a day
            assertEquals(45873 + (8 * 60 + 3) / 1440.0, taken.getNumericCellValue(), 1e-6);
        }
    }

    @Test
    void aCancelledExportLeavesNothingBehind() throws IOException {
        Path out = dir.resolve("dossier.xlsx");
        DossierProgress stopAtSpectra = (stage, done, total) -> !stage.contains("Spectra");
        assertThrows(DossierCancelledException.class,
                () -> DossierWriter.withShippedTemplate().write(content, out, false, stopAtSpectra));
        try (var files = Files.list(dir)) {
            assertEquals(List.of(), files.toList());
        }
    }

    @Test
    void theStreamedRowsNeverGoToTheLibrarysSharedTemporaryFolder() throws IOException {
        // POI's default puts every user's streamed sheets in one "poifiles" folder (POI API
        // documentation, org.apache.poi.util.DefaultTempFileCreationStrategy); a second user's
        // export then fails on its permissions. Here the shared folder is made unusable outright.
        TempFile.setTempFileCreationStrategy(new TempFileCreationStrategy() {
            @Override
            public File createTempFile(String prefix, String suffix) throws IOException {
                throw new IOException("the shared temporary folder belongs to another user");
            }

            @Override
            public File createTempDirectory(String prefix) throws IOException {
                throw new IOException("the shared temporary folder belongs to another user");
            }
        });
        try {
            Path out = dir.resolve("dossier.xlsx");
            DossierWriter.withShippedTemplate().write(content, out, false, DossierProgress.NONE);
            assertTrue(Files.size(out) > 0);
        } finally {
            TempFile.setTempFileCreationStrategy(new DefaultTempFileCreationStrategy());
        }
    }

    @Test
    void anExistingFileIsKeptUnlessReplacingWasAskedFor() throws IOException {
        Path out = dir.resolve("dossier.xlsx");
        Files.writeString(out, "an earlier revision", StandardCharsets.UTF_8);
        assertThrows(FileAlreadyExistsException.class,
                () -> DossierWriter.withShippedTemplate().write(content, out, false, DossierProgress.NONE));
        assertEquals("an earlier revision", Files.readString(out, StandardCharsets.UTF_8));
        DossierWriter.withShippedTemplate().write(content, out, true, DossierProgress.NONE);
        try (DossierFile f = new DossierFile(out)) {
            assertEquals(13, f.workbook().getNumberOfSheets());
        }
        try (var files = Files.list(dir)) {
            assertEquals(List.of(out), files.toList(), "no temporary file left beside it");
        }
    }

    @Test
    void aPlantsTemplateWithColumnsMovedDroppedAndRestyledIsFilledByKey() throws IOException {
        Path template = dir.resolve("plant-template.xlsx");
        try (InputStream in = Templates.open(DossierTemplateBuilder.RESOURCE); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            XSSFSheet acceptance = wb.getSheet("Acceptance");
            Row keys = acceptance.getRow(1);
            Row headers = acceptance.getRow(2);
            swap(keys, 0, 2);
            swap(headers, 0, 2);
            keys.removeCell(keys.getCell(1));
            headers.removeCell(headers.getCell(1));
            XSSFCellStyle finer = wb.createCellStyle();
            finer.cloneStyleFrom(keys.getCell(14).getCellStyle());
            finer.setDataFormat(wb.createDataFormat().getFormat("0.000"));
            keys.getCell(14).setCellStyle(finer);
            try (OutputStream out = Files.newOutputStream(template)) {
                wb.write(out);
            }
        }
        Path out = dir.resolve("dossier.xlsx");
        DossierWriter.withTemplate(template).write(content, out, false, DossierProgress.NONE);
        try (DossierFile f = new DossierFile(out)) {
            XSSFSheet s = f.sheet("Acceptance");
            Row first = s.getRow(DossierFile.FIRST_DATA_ROW);
            assertEquals("QA-9", first.getCell(0).getStringCellValue(), "the analyzer moved to column A");
            assertEquals(DossierFixture.GOOD, first.getCell(2).getStringCellValue(), "the tag moved to column C");
            assertEquals(null, first.getCell(1), "the dropped service column stays empty");
            assertEquals("margin_db", s.getRow(1).getCell(14).getStringCellValue());
            assertEquals("0.000", first.getCell(14).getCellStyle().getDataFormatString(), "the plant's format");
        }
    }

    private static void swap(Row row, int a, int b) {
        String first = row.getCell(a).getStringCellValue();
        row.getCell(a).setCellValue(row.getCell(b).getStringCellValue());
        row.getCell(b).setCellValue(first);
    }

    @Test
    void aDateRangeJudgesTheLatestScanWithinItAndTrendsOnlyItsScans() throws IOException {
        LocalDate firstVisit = LocalDate.of(2024, 11, 4);
        DossierContent early = DossierFixture.content(workbook,
                new DossierScope(List.of(DossierFixture.DIRTY), Optional.empty(), Optional.of(firstVisit)));
        Path out = dir.resolve("dossier.xlsx");
        DossierWriter.withShippedTemplate().write(early, out, false, DossierProgress.NONE);
        try (DossierFile f = new DossierFile(out)) {
            String cover = f.text("Cover");
            assertTrue(cover.contains("1 selected: AT-202"), cover);
            assertTrue(cover.contains("scans taken up to 2024-11-04 (UTC days, inclusive)"), cover);
            assertEquals(2, f.rowsOf("Trend history", DossierFixture.DIRTY).size(), "one reading for each band");
            // the first visit's loop scan, 2024-11-04 08:03 UTC: day 45600 of the 1900 date system
            assertEquals(45600 + (8 * 60 + 3) / 1440.0,
                    DossierFile.number(f.rowsOf("Acceptance", DossierFixture.DIRTY).get(0), "loop_taken"), 1e-6);
        }
    }

    @Test
    void anUnknownPointIsRefusedByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DossierFixture.content(
                workbook, new DossierScope(List.of("AT-999"), Optional.empty(), Optional.empty())));
        assertEquals("no point tagged 'AT-999' in this workbook", e.getMessage());
    }

    @Test
    void aTemplateWithoutASheetIsRefusedBeforeAnythingIsWritten() throws IOException {
        Path template = dir.resolve("plant-template.xlsx");
        try (InputStream in = Templates.open(DossierTemplateBuilder.RESOURCE); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            wb.removeSheetAt(wb.getSheetIndex("Trend"));
            try (OutputStream o = Files.newOutputStream(template)) {
                wb.write(o);
            }
        }
        DossierTemplateException e = assertThrows(DossierTemplateException.class, () -> DossierWriter
                .withTemplate(template).write(content, dir.resolve("dossier.xlsx"), false, DossierProgress.NONE));
        assertEquals("the dossier template has no sheet 'Trend'", e.getMessage());
        assertTrue(Files.notExists(dir.resolve("dossier.xlsx")));
    }
}
