package org.strandbook.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.MeasurementPoint;

/**
 * Writer and reader together: what the writer puts into the template the reader gives back equal,
 * and the cell conventions a contractor relies on (decimal comma, trimmed text, blank rows) hold.
 */
class CableScheduleRoundTripTest {

    @TempDir
    Path folder;

    private final CableScheduleReader reader = new CableScheduleReader();

    @Test
    void writtenScheduleReadsBackEqual() throws IOException {
        CableSchedule original = ScheduleFixture.plant();
        Path file = ScheduleFixture.write(original, folder);

        ScheduleReadResult result = reader.read(file);

        assertEquals(List.of(), ScheduleFixture.lines(result));
        assertEquals(original, assertInstanceOf(ScheduleReadResult.Accepted.class, result).schedule());
    }

    @Test
    void acceptedScheduleKnowsTheCellEachItemCameFrom() throws IOException {
        ScheduleReadResult.Accepted accepted = assertInstanceOf(ScheduleReadResult.Accepted.class,
                reader.read(ScheduleFixture.write(ScheduleFixture.plant(), folder)));
        ScheduleOrigins origins = accepted.origins();

        assertEquals("Segments!D3", origins.cable("C-101S-2").orElseThrow().address());
        assertEquals("Joints!D3", origins.joint("P-101", "J2").orElseThrow().address());
        assertEquals("Points!A4", origins.point("P-201").orElseThrow().address());
        assertEquals("Analyzers!A3", origins.analyzer("AN-02").orElseThrow().address());
        assertEquals("'Fiber types'!A2", origins.fiberType("SI300-HOH-T").orElseThrow().address());
        assertTrue(origins.fiberType("SI200-LOH").isEmpty(), "shipped types were entered nowhere");
        assertEquals("Segments!D3: cable ID C-101S-2 is already used at this site",
                origins.cable("C-101S-2").orElseThrow().problem("cable ID C-101S-2 is already used at this site")
                        .toString());
    }

    @Test
    void writerLeavesNoPartialFileBehind() throws IOException {
        ScheduleFixture.write(ScheduleFixture.plant(), folder);

        try (var files = Files.list(folder)) {
            assertEquals(List.of("schedule.xlsx"), files.map(p -> p.getFileName().toString()).toList());
        }
    }

    // OWASP "CSV Injection": text starting with = + - @ tab or CR may be run as a formula.
    @Test
    void formulaLikeNoteIsWrittenAsStringCellAndReadBackAsText() throws IOException {
        String note = "=HYPERLINK(\"http://example.invalid/x\",\"click\")";
        CableSchedule original = withFirstPointService(ScheduleFixture.plant(), note);
        Path file = ScheduleFixture.write(original, folder);

        try (InputStream in = Files.newInputStream(file); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            Cell cell = wb.getSheet("Points").getRow(1).getCell(ScheduleColumn.POINT_SERVICE.index());
            assertEquals(CellType.STRING, cell.getCellType());
            assertEquals(note, cell.getStringCellValue());
            assertTrue(cell.getCellStyle().getQuotePrefixed(), "formula-like text gets the quote-prefix style");
        }
        ScheduleReadResult result = reader.read(file);
        CableSchedule back = assertInstanceOf(ScheduleReadResult.Accepted.class, result).schedule();
        assertEquals(note, back.points().get(0).service());
        assertEquals(original, back);
    }

    // ISO 80000-1:2009 (numbers): the decimal sign is a comma or a point on the line.
    @Test
    void lengthTypedAsTextWithDecimalCommaOrPointIsAccepted() throws IOException {
        Path file = ScheduleFixture.writeEdited(folder, ScheduleFixture.set("Segments", "F2", "12,5")
                .andThen(ScheduleFixture.set("Segments", "F3", " 35.0 ")));

        CableSchedule back = assertInstanceOf(ScheduleReadResult.Accepted.class, reader.read(file)).schedule();

        assertEquals(ScheduleFixture.plant(), back);
    }

    @Test
    void blankRowsAreSkippedAndSpacesTrimmed() throws IOException {
        Path file = ScheduleFixture.writeEdited(folder, wb -> {
            // move the last analyzer down, leaving blank rows (one holding only spaces) between
            var sheet = wb.getSheet("Analyzers");
            sheet.shiftRows(2, 2, 3);
            ScheduleFixture.cell(wb, "Analyzers", "A4").setCellValue("   ");
            ScheduleFixture.cell(wb, "Points", "A2").setCellValue("P-101\u00A0 ");
            ScheduleFixture.cell(wb, "Points", "D2").setCellValue(" AN-01");
        });

        CableSchedule back = assertInstanceOf(ScheduleReadResult.Accepted.class, reader.read(file)).schedule();

        assertEquals(ScheduleFixture.plant(), back);
    }

    @Test
    void numberInATextColumnReadsAsTyped() throws IOException {
        Path file = ScheduleFixture.writeEdited(folder, ScheduleFixture.set("Segments", "D2", 101.0)
                .andThen(ScheduleFixture.set("Bends", "A2", 101.0))
                .andThen(ScheduleFixture.set("Bends", "A3", 101.0)));

        CableSchedule back = assertInstanceOf(ScheduleReadResult.Accepted.class, reader.read(file)).schedule();

        assertEquals("101", back.legs().get(0).segments().get(0).label());
    }

    @Test
    void writerFillsTheTemplateKeepingItsReadMeAndDropDowns() throws IOException {
        Path file = ScheduleFixture.write(ScheduleFixture.plant(), folder);

        try (InputStream in = Files.newInputStream(file); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            assertEquals(ScheduleSheet.README_TITLE, wb.getSheetName(0));
            assertEquals(1, wb.getSheet("Segments").getDataValidations().size());
            assertEquals(12.5, wb.getSheet("Segments").getRow(1).getCell(5).getNumericCellValue());
        }
    }

    private static CableSchedule withFirstPointService(CableSchedule s, String service) {
        MeasurementPoint p = s.points().get(0);
        MeasurementPoint changed = new MeasurementPoint(p.tag(), service, p.location(), p.analyzerTag(), p.channel(),
                p.probeTypeCode(), p.bands(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService(),
                p.processTemperatureC());
        List<MeasurementPoint> points = new java.util.ArrayList<>(s.points());
        points.set(0, changed);
        return new CableSchedule(s.analyzers(), points, s.legs(), s.addedCatalog());
    }
}
