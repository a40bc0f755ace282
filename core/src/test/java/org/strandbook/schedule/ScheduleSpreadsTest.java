package org.strandbook.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.PathDirection;

/** The optional spread columns: read when present, refused by cell when wrong, absent in older files. */
class ScheduleSpreadsTest {

    @TempDir
    Path folder;

    private final CableScheduleReader reader = new CableScheduleReader();

    @Test
    void aSpreadThatIsNoSpreadIsRefusedAtItsCellWithAnExample() throws IOException {
        String cell = ScheduleColumn.JOINT_LOSS_SPREAD.letter() + "3";
        List<String> problems = ScheduleFixture.lines(reader.read(ScheduleFixture.writeEdited(folder,
                ScheduleFixture.set("Joints", cell, "0.05"))));
        assertEquals(List.of("Joints!" + cell + ": joint loss spread '0.05' is not one; write it like ±0.3 dB or"
                + " u 0.1 dB"), problems);
    }

    @Test
    void aSpreadInAUnitTheInputDoesNotTakeIsRefused() throws IOException {
        String cell = ScheduleColumn.SEGMENT_LENGTH_SPREAD.letter() + "3";
        List<String> problems = ScheduleFixture.lines(reader.read(ScheduleFixture.writeEdited(folder,
                ScheduleFixture.set("Segments", cell, "±3 dB"))));
        assertEquals(1, problems.size());
        assertEquals("Segments!" + cell + ": length spread '±3 dB': unit 'dB' is not one of m, %; write it like"
                + " ±0.5 m or ±2 %", problems.get(0));
    }

    @Test
    void aScheduleWrittenBeforeTheSpreadColumnsStillReads() throws IOException {
        // design choice: the spread columns are optional; an older layout reads with every spread blank
        Path old = ScheduleFixture.writeEdited(folder, ScheduleSpreadsTest::dropSpreadColumns);
        ScheduleReadResult.Accepted read = assertInstanceOf(ScheduleReadResult.Accepted.class, reader.read(old));
        assertEquals(ScheduleFixture.plant().leg("P-102", PathDirection.SEND), read.schedule().leg("P-102",
                PathDirection.SEND));
        assertEquals(0, read.schedule().legs().stream().flatMap(l -> l.elements().stream())
                .filter(e -> e instanceof org.strandbook.site.Joint j && !j.spreads().isEmpty()).count());
    }

    private static void dropSpreadColumns(XSSFWorkbook wb) {
        for (ScheduleColumn column : ScheduleColumn.values()) {
            if (column.optional()) {
                Sheet s = wb.getSheet(column.sheet().title());
                for (Row row : s) {
                    if (row.getCell(column.index()) != null) {
                        row.removeCell(row.getCell(column.index()));
                    }
                }
            }
        }
    }
}
