package org.strandbook.schedule;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.apache.poi.ss.usermodel.BorderStyle;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.ClientAnchor;
import org.apache.poi.ss.usermodel.Comment;
import org.apache.poi.ss.usermodel.CreationHelper;
import org.apache.poi.ss.usermodel.DataValidation;
import org.apache.poi.ss.usermodel.DataValidationConstraint;
import org.apache.poi.ss.usermodel.DataValidationHelper;
import org.apache.poi.ss.usermodel.Drawing;
import org.apache.poi.ss.usermodel.FillPatternType;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.IndexedColors;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.VerticalAlignment;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.CellRangeAddressList;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Builds the cable schedule template from {@link ScheduleSheet} and {@link ScheduleColumn}, so the
 * committed {@code cable-schedule.xlsx}, the reader and the writer share one layout. A test
 * (TemplateBuilderTest) checks that the committed file matches what this class builds; when it does
 * not, the test leaves the fresh build in {@code core/target/cable-schedule.generated.xlsx} to review
 * and copy over the committed one. Or regenerate it directly:
 *
 * <pre>
 * mvn -q -pl core -am install -DskipTests
 * mvn -q -pl core dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp core/target/classes:$(cat core/target/cp.txt) org.strandbook.schedule.TemplateBuilder \
 *      templates/src/main/resources/org/strandbook/templates/cable-schedule.xlsx
 * </pre>
 *
 * <p>The template: a "Read me" sheet (safety cautions, how to fill it in, units, allowed values,
 * the shipped catalog codes, every column explained), then one sheet per {@link ScheduleSheet} with
 * a frozen header row, the unit in each header, the hint as a header comment, text-formatted
 * identifier columns (so a tag such as 0101 or 3-1 stays as typed) and drop-downs for list columns.
 */
public final class TemplateBuilder {

    /** Bumped whenever a sheet or header changes. */
    public static final int TEMPLATE_VERSION = 1;

    /** Rows offered with drop-downs; the reader accepts rows beyond these. */
    static final int DROP_DOWN_ROWS = 2000;

    private static final int README_WIDTH_CHARS = 110;

    /**
     * Spreadsheet programs do not grow a row for wrapped text on opening, so the builder sets each
     * Read me row's height: a line of the column holds at least this many characters of body text.
     */
    private static final int README_CHARS_PER_LINE = 100;

    private static final float LINE_HEIGHT_POINTS = 15f;

    private final XSSFWorkbook workbook = new XSSFWorkbook();
    private final CellStyle header;
    private final CellStyle textColumn;
    private final CellStyle title;
    private final CellStyle heading;
    private final CellStyle body;

    private TemplateBuilder() {
        Font bold = workbook.createFont();
        bold.setBold(true);
        Font large = workbook.createFont();
        large.setBold(true);
        large.setFontHeightInPoints((short) 14);

        header = workbook.createCellStyle();
        header.setFont(bold);
        header.setBorderBottom(BorderStyle.THIN);
        header.setFillForegroundColor(IndexedColors.GREY_25_PERCENT.getIndex());
        header.setFillPattern(FillPatternType.SOLID_FOREGROUND);
        header.setVerticalAlignment(VerticalAlignment.CENTER);

        textColumn = workbook.createCellStyle();
        textColumn.setDataFormat(workbook.createDataFormat().getFormat("@"));

        title = workbook.createCellStyle();
        title.setFont(large);
        heading = workbook.createCellStyle();
        heading.setFont(bold);
        body = workbook.createCellStyle();
        body.setWrapText(true);
        body.setVerticalAlignment(VerticalAlignment.TOP);
    }

    /** The template as a fresh workbook; {@code shipped} supplies the catalog codes the Read me lists. */
    public static XSSFWorkbook build(ComponentCatalog shipped) {
        TemplateBuilder b = new TemplateBuilder();
        b.readme(shipped);
        for (ScheduleSheet sheet : ScheduleSheet.values()) {
            b.dataSheet(sheet);
        }
        b.workbook.getProperties().getCoreProperties().setCreator("Strandbook");
        b.workbook.getProperties().getCoreProperties().setTitle("Strandbook cable schedule");
        b.workbook.setActiveSheet(0);
        return b.workbook;
    }

    /** Writes the template built from the shipped catalog to the path given as the only argument. */
    public static void main(String[] args) throws IOException {
        if (args.length != 1) {
            throw new IllegalArgumentException("usage: TemplateBuilder TARGET.xlsx");
        }
        try (XSSFWorkbook wb = build(ComponentCatalog.shipped());
             OutputStream out = Files.newOutputStream(Path.of(args[0]))) {
            wb.write(out);
        }
    }

    private void dataSheet(ScheduleSheet layout) {
        Sheet sheet = workbook.createSheet(layout.title());
        Row row = sheet.createRow(0);
        CreationHelper helper = workbook.getCreationHelper();
        Drawing<?> drawing = sheet.createDrawingPatriarch();
        DataValidationHelper validations = sheet.getDataValidationHelper();
        for (ScheduleColumn column : layout.columns()) {
            int i = column.index();
            sheet.setColumnWidth(i, column.widthChars() * 256);
            if (column.kind() == ScheduleColumn.Kind.TEXT) {
                sheet.setDefaultColumnStyle(i, textColumn);
            }
            Cell cell = row.createCell(i);
            cell.setCellValue(column.header());
            cell.setCellStyle(header);

            ClientAnchor anchor = helper.createClientAnchor();
            anchor.setCol1(i);
            anchor.setCol2(i + 3);
            anchor.setRow1(0);
            anchor.setRow2(4);
            Comment comment = drawing.createCellComment(anchor);
            comment.setString(helper.createRichTextString(column.hint()));
            comment.setAuthor("Strandbook");
            cell.setCellComment(comment);

            if (column.kind() == ScheduleColumn.Kind.CHOICE) {
                DataValidationConstraint list = validations.createExplicitListConstraint(
                        column.choices().toArray(String[]::new));
                DataValidation v = validations.createValidation(list,
                        new CellRangeAddressList(1, DROP_DOWN_ROWS, i, i));
                v.setErrorStyle(DataValidation.ErrorStyle.STOP);
                v.createErrorBox("Not in the list", "Choose one of: " + String.join(", ", column.choices()));
                v.setShowErrorBox(true);
                v.setEmptyCellAllowed(true);
                // XSSF inverts this flag: true shows the drop-down arrow
                v.setSuppressDropDownArrow(true);
                sheet.addValidationData(v);
            }
        }
        sheet.createFreezePane(0, 1);
        printFitToWidth(sheet, true);
    }

    /** Prints the sheet one page wide, as many pages long as it needs; the header row repeats on each. */
    private static void printFitToWidth(Sheet sheet, boolean landscape) {
        sheet.setFitToPage(true);
        sheet.getPrintSetup().setFitWidth((short) 1);
        sheet.getPrintSetup().setFitHeight((short) 0);
        sheet.getPrintSetup().setLandscape(landscape);
        if (landscape) {
            sheet.setRepeatingRows(CellRangeAddress.valueOf("1:1"));
        }
    }

    private enum Look { TITLE, HEADING, BODY, GAP }

    private record Line(Look look, String text) {
    }

    private void readme(ComponentCatalog shipped) {
        List<Line> lines = new ArrayList<>();
        lines.add(new Line(Look.TITLE, "Strandbook cable schedule, template version " + TEMPLATE_VERSION));
        lines.add(new Line(Look.BODY, "The installation contractor fills in this workbook; Strandbook imports it and"
                + " checks every row before anything is stored. Fill in the data sheets; this sheet is not read."));
        section(lines, "Safety first", CAUTIONS);
        section(lines, "How to fill it in", FILLING_RULES);
        section(lines, "Numbers and units", NUMBER_RULES);
        List<String> choices = new ArrayList<>();
        for (ScheduleColumn c : ScheduleColumn.values()) {
            String line = c.header() + ": " + String.join(", ", c.choices());
            if (c.kind() == ScheduleColumn.Kind.CHOICE && !choices.contains(line)) {
                choices.add(line);
            }
        }
        section(lines, "Allowed values of the list columns", choices);
        List<String> catalog = new ArrayList<>();
        shipped.fiberTypes().forEach(f -> catalog.add("Fiber type " + f.code() + ": " + f.description()));
        shipped.connectorTypes().forEach(c -> catalog.add("Connector type " + c.code() + ": " + c.description()));
        shipped.probeTypes().forEach(p -> catalog.add("Probe type " + p.code() + ": " + p.description()));
        section(lines, "Shipped catalog (these codes need no row on the catalog sheets)", catalog);
        for (ScheduleSheet s : ScheduleSheet.values()) {
            section(lines, "Sheet '" + s.title() + "': " + s.purpose(),
                    s.columns().stream().map(c -> c.letter() + "  " + c.header() + ": " + c.hint()).toList());
        }

        Sheet sheet = workbook.createSheet(ScheduleSheet.README_TITLE);
        sheet.setColumnWidth(0, README_WIDTH_CHARS * 256);
        printFitToWidth(sheet, false);
        for (int i = 0; i < lines.size(); i++) {
            Line line = lines.get(i);
            Row row = sheet.createRow(i);
            if (line.look() == Look.GAP) {
                continue;
            }
            Cell cell = row.createCell(0);
            cell.setCellValue(line.text());
            int textLines = Math.max(1, (line.text().length() + README_CHARS_PER_LINE - 1) / README_CHARS_PER_LINE);
            if (line.look() == Look.BODY && textLines > 1) {
                row.setHeightInPoints(textLines * LINE_HEIGHT_POINTS);
            }
            cell.setCellStyle(switch (line.look()) {
                case TITLE -> title;
                case HEADING -> heading;
                default -> body;
            });
        }
    }

    private static void section(List<Line> lines, String heading, List<String> paragraphs) {
        lines.add(new Line(Look.GAP, ""));
        lines.add(new Line(Look.HEADING, heading));
        paragraphs.forEach(p -> lines.add(new Line(Look.BODY, p)));
    }

    private static final List<String> CAUTIONS = List.of(
            "Never look into a fiber end, connector, adapter or probe window while a light source may be on:"
                    + " treat every fiber as live. Lamps and lasers that feed analyzers can harm the eye"
                    + " (IEC 60825-1 and IEC 60825-2 for lasers and fiber systems, IEC 62471 for lamps).",
            "Cleaved and broken fiber leaves glass shards that pierce the skin and are hard to see: wear safety"
                    + " glasses, work over a dark mat, pick up offcuts with tweezers into a sharps container, and keep"
                    + " food and drink away from the work area.",
            "In a classified hazardous area, light in a fiber can ignite an explosive atmosphere. IEC 60079-28 sets"
                    + " the protection types and power limits for optical radiation; follow it, the site's"
                    + " hazardous-area rules and permits to work, and local codes. Mark such points YES in 'Hazardous"
                    + " area'.",
            "Never open a probe or a process connection while the line is under pressure or hot: that is work for"
                    + " the plant's licensed fitters under a permit.",
            "This schedule records the installation; it does not replace local codes, the equipment makers'"
                    + " instructions or licensed practice.");

    private static final List<String> FILLING_RULES = List.of(
            "Enter one item per row from row 2. Keep row 1 (the headers) as it is; do not rename, reorder or delete"
                    + " the sheets or their columns. Extra columns right of the last header and extra sheets are"
                    + " ignored.",
            "Blank rows are skipped; spaces at the start and end of a cell are ignored.",
            "Tags, cable IDs, joint labels and codes are at most 64 characters and must match exactly (letter case"
                    + " too) where another sheet refers to them. Analyzer tags, point tags, cable IDs and new codes"
                    + " must be unique; joint labels unique within their point.",
            "Every measurement point needs at least one band on 'Bands' and two legs: SEND, from the analyzer to"
                    + " the probe, and RETURN, from the probe back to the analyzer.",
            "A leg is listed on 'Segments' (its cable segments, one row per fiber) and 'Joints' (its joints), each"
                    + " row with the point tag, the direction and a position. Positions count 1, 2, 3 ... in the"
                    + " order light meets the elements and are shared by the segments and joints of one leg, for"
                    + " example joint J1 at 1, cable at 2, joint J2 at 3, cable at 4, joint J3 at 5.",
            "A leg runs from position 1 without gaps or repeats, holds at least one cable segment, and alternates: a"
                    + " joint between any two cable segments and a cable segment between any two joints. It may start"
                    + " and end with a joint (a connection at the analyzer port, a patch panel or the probe) or with a"
                    + " cable segment (a pigtail fixed to the analyzer or the probe).",
            "A joint's downstream connector must mate with its upstream one (the same mating family). Leave the"
                    + " downstream connector blank when both halves are of one type.",
            "A point's channel must exist on its analyzer and serve no other point; its bands must lie within the"
                    + " analyzer's wavelength range.",
            "List on 'Bends' only bends tighter than the cable's own rating, by cable ID.",
            "Fiber, connector and probe types are known by code: use the shipped codes listed below, or add new"
                    + " types with codes of your own on 'Fiber types', 'Connector types' and 'Probe types'.");

    private static final List<String> NUMBER_RULES = List.of(
            "Each header gives its unit: lengths in metres (m), wavelengths in nanometres (nm), losses in"
                    + " decibels (dB), bend radii and optical paths in millimetres (mm), diameters in micrometres"
                    + " (µm), temperatures in degrees Celsius (°C), attenuation in dB/km, OH content in ppm by"
                    + " weight.",
            "Enter numbers as numbers, without a unit. A number stored as text is also read, with a decimal point"
                    + " or a decimal comma (12.5 and 12,5 both mean twelve and a half, as ISO 80000-1 allows either)."
                    + " Write no thousands separators: as text, 1,234 or 1.234 is rejected as ambiguous; spaces"
                    + " between groups of digits are allowed.",
            "Channels, positions and counts are whole numbers. Formulas are read by their last calculated value.",
            "Lengths must be more than 0 and at most 10000 m; NA lies between 0 and 1; losses are zero or more.");
}
