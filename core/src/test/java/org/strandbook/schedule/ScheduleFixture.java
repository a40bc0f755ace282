package org.strandbook.schedule;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Consumer;
import java.util.stream.Collectors;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;
import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.DetectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.WavelengthBand;

/**
 * An invented test plant (no real site, person or brand) and helpers to write it as a filled
 * schedule and edit single cells, so each validation test changes exactly one thing.
 *
 * <p>Rows the writer gives this schedule (tests address cells by these literal addresses):
 * <pre>
 * Analyzers  2 AN-01, 3 AN-02
 * Points     2 P-101 (AN-01 ch 1), 3 P-102 (AN-01 ch 2), 4 P-201 (AN-02 ch 1)
 * Bands      2-3 P-101, 4 P-102, 5 P-201
 * Segments   2 C-101S-1, 3 C-101S-2 (P-101 SEND, positions 2 and 4), 4 C-101R-1, 5 C-101R-2 (P-101 RETURN),
 *            6 C-102S-1, 7 C-102S-2 (P-102 SEND, positions 1 and 3), 8 C-102R-1 (P-102 RETURN, position 1),
 *            9 C-201S-1 (P-201 SEND, position 2), 10 C-201R-1 (P-201 RETURN, position 2)
 * Bends      2-3 C-101S-1, 4 C-201S-1
 * Joints     2 J1, 3 J2, 4 J3 (P-101 SEND, positions 1, 3, 5), 5 J4, 6 J5, 7 J6 (P-101 RETURN),
 *            8 J1 (P-102 SEND, position 2), 9 J1, 10 J2 (P-201 SEND, 1 and 3), 11 J3, 12 J4 (P-201 RETURN)
 * Fiber types 2 SI300-HOH-T (datasheet rows 2-4 on 'Fiber attenuation')
 * Connector types 2 FC-PC-MM-T; Probe types 2 TX-FS-10-T
 * </pre>
 */
final class ScheduleFixture {

    private ScheduleFixture() {
    }

    static CableSchedule plant() {
        List<Analyzer> analyzers = List.of(
                new Analyzer("AN-01", "Shelter north, near-infrared", 1000, 2200, 4, 20, DetectorType.INGAAS),
                new Analyzer("AN-02", "Shelter north, visible", 400, 1000, 2, 15, DetectorType.SILICON));
        List<MeasurementPoint> points = List.of(
                new MeasurementPoint("P-101", "Reactor outlet", "Unit 1, line 4, +12 m", "AN-01", 1, "TX-SAPPHIRE",
                        List.of(new WavelengthBand("C-H first overtone", 1650, 1800),
                                new WavelengthBand("", 2000, 2150)),
                        OptionalDouble.empty(), true, false, OptionalDouble.of(85.5)),
                new MeasurementPoint("P-102", "Stripper bottoms", "Unit 1, line 7", "AN-01", 2, "TF-SAPPHIRE",
                        List.of(new WavelengthBand("O-H combination", 1900, 2000)),
                        OptionalDouble.of(1.5), false, true, OptionalDouble.empty()),
                new MeasurementPoint("P-201", "Dye bath colour", "Unit 2, tank 3", "AN-02", 1, "TX-FS-10-T",
                        List.of(new WavelengthBand("visible", 450, 700)),
                        OptionalDouble.empty(), false, false, OptionalDouble.of(-5)));
        List<PathLeg> legs = List.of(
                leg("P-101", PathDirection.SEND,
                        joint("J1", "SMA905-AIR"),
                        new CableSegment("C-101S-1", "SI400-LOH", 12.5, List.of(new Bend(80, 2), new Bend(120, 1)),
                                spreads("tape measure on the drum", SpreadInput.LENGTH, "±0.5 m")),
                        new Joint("J2", "SMA905-AIR", "SMA905-GEL", InspectionGrade.CLEAN, OptionalDouble.of(0.8),
                                LossBasis.MEASURED, spreads("meter certificate 0412", SpreadInput.JOINT_LOSS,
                                "u 0.05 dB")),
                        new CableSegment("C-101S-2", "SI400-LOH", 35, List.of()),
                        joint("J3", "SMA905-AIR")),
                leg("P-101", PathDirection.RETURN,
                        joint("J4", "SMA905-AIR"),
                        new CableSegment("C-101R-1", "SI400-LOH", 35.25, List.of()),
                        joint("J5", "SMA905-AIR"),
                        new CableSegment("C-101R-2", "SI400-LOH", 12.5, List.of()),
                        new Joint("J6", "SMA905-AIR", "SMA905-AIR", InspectionGrade.DIRTY, OptionalDouble.of(2.1),
                                LossBasis.ASSUMED)),
                leg("P-102", PathDirection.SEND,
                        new CableSegment("C-102S-1", "SI200-LOH", 3, List.of()),
                        joint("J1", "SMA905-AIR"),
                        new CableSegment("C-102S-2", "SI200-LOH", 80.125, List.of())),
                leg("P-102", PathDirection.RETURN,
                        new CableSegment("C-102R-1", "SI200-LOH", 83.125, List.of())),
                leg("P-201", PathDirection.SEND,
                        joint("J1", "FC-PC-MM"),
                        new CableSegment("C-201S-1", "SI300-HOH-T", 20, List.of(new Bend(45, 3))),
                        new Joint("J2", "FC-PC-MM", "FC-PC-MM-T", InspectionGrade.ACCEPTABLE, OptionalDouble.empty(),
                                LossBasis.ASSUMED)),
                leg("P-201", PathDirection.RETURN,
                        joint("J3", "FC-PC-MM-T"),
                        new CableSegment("C-201R-1", "SI300-HOH-T", 20, List.of()),
                        joint("J4", "FC-PC-MM")));
        ComponentCatalog added = new ComponentCatalog(
                List.of(new FiberType("SI300-HOH-T", "Step index 300/330 high-OH, test type", 300, 330, 0, 0.22,
                        "FUSED_SILICA", OhGrade.HIGH_OH, 900,
                        List.of(new AttenuationPoint(450, 60), new AttenuationPoint(550, 25),
                                new AttenuationPoint(650, 12)),
                        spreads("grade sheet", SpreadInput.OH_CONTENT, "600..1200 ppm"))),
                List.of(new ConnectorType("FC-PC-MM-T", "FC physical contact, test type", "FC", 0.6, false,
                        spreads("", SpreadInput.CONNECTOR_LOSS, "±0.2 dB"))),
                List.of(new ProbeType("TX-FS-10-T", "Transmission probe, fused silica windows, 10 mm gap",
                        ProbeKind.TRANSMISSION, "FUSED_SILICA", 4, 10, 3.5,
                        spreads("maker's test sheet", SpreadInput.PROBE_FIXED_LOSS, "±10 %"))));
        return new CableSchedule(analyzers, points, legs, added);
    }

    /** One stated spread and its basis, in the invented plant's words. */
    static StatedSpreads spreads(String basis, SpreadInput input, String text) {
        return new StatedSpreads(java.util.Map.of(input, StatedSpread.parse(text, input)), basis);
    }

    static Path write(CableSchedule schedule, Path folder) throws IOException {
        Path file = folder.resolve("schedule.xlsx");
        CableScheduleWriter.write(schedule, file);
        return file;
    }

    private static byte[] plantBytes;

    /** The fixture plant as written by the writer, made once per test run. */
    static synchronized byte[] plantBytes() throws IOException {
        if (plantBytes == null) {
            java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
            CableScheduleWriter.write(plant(), out);
            plantBytes = out.toByteArray();
        }
        return plantBytes.clone();
    }

    /** Writes the fixture plant, applies {@code edit} to the workbook and saves it again. */
    static Path writeEdited(Path folder, Consumer<XSSFWorkbook> edit) throws IOException {
        Path file = folder.resolve("schedule.xlsx");
        Files.write(file, plantBytes());
        edit(file, edit);
        return file;
    }

    static void edit(Path file, Consumer<XSSFWorkbook> edit) throws IOException {
        XSSFWorkbook workbook;
        try (InputStream in = Files.newInputStream(file)) {
            workbook = new XSSFWorkbook(in);
        }
        edit.accept(workbook);
        try (OutputStream out = Files.newOutputStream(file)) {
            workbook.write(out);
        }
        workbook.close();
    }

    /** The cell at an address such as "F3" on the named sheet, created when absent. */
    static Cell cell(XSSFWorkbook workbook, String sheet, String address) {
        CellReference ref = new CellReference(address);
        Sheet s = workbook.getSheet(sheet);
        Row row = s.getRow(ref.getRow()) == null ? s.createRow(ref.getRow()) : s.getRow(ref.getRow());
        return row.getCell(ref.getCol()) == null ? row.createCell(ref.getCol()) : row.getCell(ref.getCol());
    }

    static Consumer<XSSFWorkbook> set(String sheet, String address, String value) {
        return wb -> cell(wb, sheet, address).setCellValue(value);
    }

    static Consumer<XSSFWorkbook> set(String sheet, String address, double value) {
        return wb -> cell(wb, sheet, address).setCellValue(value);
    }

    static Consumer<XSSFWorkbook> blank(String sheet, String address) {
        return wb -> cell(wb, sheet, address).setBlank();
    }

    static List<String> lines(ScheduleReadResult result) {
        return result.problems().stream().map(ScheduleProblem::toString).collect(Collectors.toList());
    }

    private static PathLeg leg(String point, PathDirection direction, PathElement... elements) {
        return new PathLeg(point, direction, List.of(elements));
    }

    private static Joint joint(String label, String connector) {
        return new Joint(label, connector, connector, InspectionGrade.NOT_INSPECTED, OptionalDouble.empty(),
                LossBasis.ASSUMED);
    }
}
