package org.strandbook.dossier;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.apache.poi.ss.usermodel.BorderStyle;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.FillPatternType;
import org.apache.poi.ss.usermodel.HorizontalAlignment;
import org.apache.poi.ss.usermodel.IndexedColors;
import org.apache.poi.ss.usermodel.PageMargin;
import org.apache.poi.ss.usermodel.PrintSetup;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.VerticalAlignment;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.usermodel.XSSFCellStyle;
import org.apache.poi.xssf.usermodel.XSSFColor;
import org.apache.poi.xssf.usermodel.XSSFConditionalFormattingRule;
import org.apache.poi.xssf.usermodel.XSSFFont;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFSheetConditionalFormatting;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.strandbook.evaluation.Status;

/**
 * Builds the dossier template from {@link DossierSheet}, {@link DossierColumn} and
 * {@link Placeholder}, so the committed {@code dossier-template.xlsx} and the writer share one
 * layout. The template holds everything a plant may want to restyle without code: sheet order and
 * names, column order, widths, headers and data styles, number and date formats, the cover layout,
 * the cautions text, the conditional formatting of status cells, print setup, page headers and
 * footers. A test (DossierTemplateBuilderTest) checks that the committed file matches what this
 * class builds; when it does not, it leaves a fresh build in {@code core/target/} to review. Or
 * regenerate it directly:
 *
 * <pre>
 * mvn -q -pl core -am install -DskipTests
 * mvn -q -pl core dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp core/target/classes:$(cat core/target/cp.txt) org.strandbook.dossier.DossierTemplateBuilder \
 *      templates/src/main/resources/org/strandbook/templates/dossier-template.xlsx
 * </pre>
 *
 * <p>How the writer reads a table sheet: the row whose cells all hold field keys of the sheet (row
 * 2, hidden) tells which column shows which field, and each key cell's style is the style of that
 * column's data; the row below it is the header. Keep a key with its column when moving columns;
 * delete both to drop a column. Rows are added below the template's last row.
 */
public final class DossierTemplateBuilder {

    /** The template's resource name beside {@link org.strandbook.templates.Templates}. */
    public static final String RESOURCE = "dossier-template.xlsx";

    /** Bumped whenever a sheet, column or placeholder changes. */
    public static final int TEMPLATE_VERSION = 1;

    /** Index of the first row the writer adds to a table sheet of the shipped template. */
    static final int FIRST_DATA_ROW = 3;

    /** Conditional formatting of status columns reaches this far down (1-based row). */
    static final int STATUS_FORMAT_LAST_ROW = 100_000;

    private static final int CAUTIONS_WIDTH_CHARS = 120;
    private static final int CAUTIONS_CHARS_PER_LINE = 110;
    private static final float LINE_HEIGHT_POINTS = 15f;
    /** Bold header letters per unit of column width (widths count digits of the default font). */
    private static final double BOLD_CHARS_PER_WIDTH = 0.9;

    private final XSSFWorkbook workbook = new XSSFWorkbook();
    private final XSSFCellStyle title;
    private final XSSFCellStyle subtitle;
    private final XSSFCellStyle header;
    private final XSSFCellStyle label;
    private final XSSFCellStyle value;
    private final XSSFCellStyle valueWrap;
    private final XSSFCellStyle valueCode;
    private final XSSFCellStyle documentStatus;
    private final XSSFCellStyle result;
    private final XSSFCellStyle signature;
    private final XSSFCellStyle heading;
    private final XSSFCellStyle body;
    private final Map<DossierColumn.Format, XSSFCellStyle> dataStyles = new EnumMap<>(DossierColumn.Format.class);

    private DossierTemplateBuilder() {
        XSSFFont bold = font(11, true);
        title = workbook.createCellStyle();
        title.setFont(font(16, true));
        subtitle = workbook.createCellStyle();
        XSSFFont grey = font(10, false);
        grey.setItalic(true);
        subtitle.setFont(grey);

        header = workbook.createCellStyle();
        header.setFont(bold);
        header.setWrapText(true);
        header.setVerticalAlignment(VerticalAlignment.CENTER);
        header.setFillForegroundColor(IndexedColors.GREY_25_PERCENT.getIndex());
        header.setFillPattern(FillPatternType.SOLID_FOREGROUND);
        borders(header);

        label = workbook.createCellStyle();
        label.setFont(bold);
        label.setVerticalAlignment(VerticalAlignment.TOP);
        value = workbook.createCellStyle();
        value.setVerticalAlignment(VerticalAlignment.TOP);
        valueWrap = workbook.createCellStyle();
        valueWrap.cloneStyleFrom(value);
        valueWrap.setWrapText(true);
        valueCode = workbook.createCellStyle();
        valueCode.cloneStyleFrom(valueWrap);
        valueCode.setFont(monospace(10));

        documentStatus = workbook.createCellStyle();
        documentStatus.setFont(font(20, true));
        documentStatus.setAlignment(HorizontalAlignment.CENTER);
        documentStatus.setVerticalAlignment(VerticalAlignment.CENTER);
        documentStatus.setBorderTop(BorderStyle.THICK);
        documentStatus.setBorderBottom(BorderStyle.THICK);
        documentStatus.setBorderLeft(BorderStyle.THICK);
        documentStatus.setBorderRight(BorderStyle.THICK);
        result = workbook.createCellStyle();
        result.setFont(font(13, true));
        result.setVerticalAlignment(VerticalAlignment.CENTER);
        result.setWrapText(true);
        borders(result);
        signature = workbook.createCellStyle();
        signature.setVerticalAlignment(VerticalAlignment.CENTER);
        borders(signature);

        heading = workbook.createCellStyle();
        heading.setFont(font(12, true));
        body = workbook.createCellStyle();
        body.setWrapText(true);
        body.setVerticalAlignment(VerticalAlignment.TOP);

        for (DossierColumn.Format f : DossierColumn.Format.values()) {
            dataStyles.put(f, dataStyle(f));
        }
    }

    /** The template as a fresh workbook. */
    public static XSSFWorkbook build() {
        DossierTemplateBuilder b = new DossierTemplateBuilder();
        for (DossierSheet sheet : DossierSheet.values()) {
            switch (sheet) {
                case COVER -> b.cover();
                case CAUTIONS -> b.cautions();
                case CHARTS -> b.chartSheet(sheet);
                default -> b.tableSheet(sheet);
            }
        }
        var core = b.workbook.getProperties().getCoreProperties();
        core.setCreator("Strandbook");
        core.setTitle("Strandbook commissioning dossier template, version " + TEMPLATE_VERSION);
        b.workbook.setActiveSheet(0);
        return b.workbook;
    }

    /** Writes the template to the path given as the only argument. */
    public static void main(String[] args) throws IOException {
        if (args.length != 1) {
            throw new IllegalArgumentException("usage: DossierTemplateBuilder TARGET.xlsx");
        }
        try (XSSFWorkbook wb = build(); OutputStream out = Files.newOutputStream(Path.of(args[0]))) {
            wb.write(out);
        }
    }

    private void tableSheet(DossierSheet layout) {
        XSSFSheet sheet = workbook.createSheet(layout.title());
        Row titleRow = sheet.createRow(0);
        titleRow.setHeightInPoints(24);
        cell(titleRow, 0, tableTitle(layout), title);
        Row keys = sheet.createRow(1);
        keys.setZeroHeight(true);
        Row heads = sheet.createRow(2);
        int headerLines = layout.columns().stream()
                .mapToInt(c -> DossierText.wrappedLines(c.header(), c.widthChars() * BOLD_CHARS_PER_WIDTH))
                .max().orElse(1);
        heads.setHeightInPoints(headerLines * LINE_HEIGHT_POINTS + 4);
        for (DossierColumn column : layout.columns()) {
            int i = column.ordinal() - layout.columns().get(0).ordinal();
            sheet.setColumnWidth(i, column.widthChars() * 256);
            cell(keys, i, column.key(), dataStyles.get(column.format()));
            cell(heads, i, column.header(), header);
            if (column.format() == DossierColumn.Format.STATUS) {
                statusColours(sheet, new CellRangeAddress(FIRST_DATA_ROW, STATUS_FORMAT_LAST_ROW - 1, i, i));
            }
        }
        sheet.createFreezePane(0, FIRST_DATA_ROW);
        sheet.setRepeatingRows(new CellRangeAddress(0, FIRST_DATA_ROW - 1, -1, -1));
        page(sheet, false);
    }

    private static String tableTitle(DossierSheet sheet) {
        return switch (sheet) {
            case AUDIT -> "Audit log: " + Placeholder.AUDIT_ROWS.token() + " rows, head "
                    + Placeholder.AUDIT_HEAD.token() + ", " + Placeholder.AUDIT_CHECK.token();
            case SPECTRA -> "Spectra: predicted and measured loop loss of the latest paired scan, every wavelength";
            case HISTORY -> "Trend history: highest loss in each band's driving range, every paired loop scan";
            case BUDGET -> "Loss budget: predicted one-pass loop loss at the centre of each band of interest";
            case UNCERTAINTY -> "Uncertainty of the prediction at the centre of each band: inputs, basis and "
                    + "contributions (JCGM 100:2008), coverage interval by Monte Carlo (JCGM 101:2008)";
            default -> sheet.title() + " · " + Placeholder.SITE.token() + " · revision " + Placeholder.REVISION.token();
        };
    }

    private void chartSheet(DossierSheet layout) {
        XSSFSheet sheet = workbook.createSheet(layout.title());
        Row titleRow = sheet.createRow(0);
        titleRow.setHeightInPoints(24);
        cell(titleRow, 0, "Measured against predicted loop loss, latest paired scan of each point", title);
        cell(sheet.createRow(1), 0, "Data: sheet '" + DossierSheet.SPECTRA.title() + "'. Deviation is measured minus"
                + " predicted loss; the thin dashed lines either side of the prediction are its coverage interval; a gap"
                + " in the measured line is a wavelength that could not be measured.", subtitle);
        for (int c = 0; c < ChartPlacement.COLUMNS; c++) {
            sheet.setColumnWidth(c, 12 * 256);
        }
        sheet.setRepeatingRows(new CellRangeAddress(0, 0, -1, -1));
        page(sheet, false);
    }

    private void cover() {
        XSSFSheet sheet = workbook.createSheet(DossierSheet.COVER.title());
        int[] widths = {3, 26, 26, 18, 18, 14, 14, 14};
        for (int c = 0; c < widths.length; c++) {
            sheet.setColumnWidth(c, widths[c] * 256);
        }
        int last = widths.length - 1;
        Row r0 = sheet.createRow(0);
        r0.setHeightInPoints(30);
        XSSFCellStyle big = workbook.createCellStyle();
        big.setFont(font(22, true));
        cell(r0, 1, "COMMISSIONING DOSSIER", big);
        cell(sheet.createRow(1), 1, "Fiber-optic light paths of process spectrometers · " + Placeholder.SITE.token(),
                heading);

        Row status = sheet.createRow(3);
        status.setHeightInPoints(36);
        cell(status, 1, "Document status", label);
        cell(status, 2, Placeholder.DOCUMENT_STATUS.token(), documentStatus);
        cell(status, 3, "", documentStatus);
        sheet.addMergedRegion(new CellRangeAddress(3, 3, 2, 3));
        cell(status, 4, "Complete export of the workbook for the scope below; issued, not a draft.", valueWrap);
        sheet.addMergedRegion(new CellRangeAddress(3, 3, 4, last));

        Row res = sheet.createRow(4);
        res.setHeightInPoints(36);
        cell(res, 1, "Result", label);
        cell(res, 2, Placeholder.RESULT.token(), result);
        for (int c = 3; c <= last; c++) {
            cell(res, c, "", result);
        }
        sheet.addMergedRegion(new CellRangeAddress(4, 4, 2, last));
        statusColours(sheet, new CellRangeAddress(4, 4, 2, last));

        int row = 6;
        String[][] facts = {
            {"Site", Placeholder.SITE.token()},
            {"Plant area", Placeholder.PLANT_AREA.token()},
            {"Analyzers", Placeholder.ANALYZERS.token()},
            {"Dossier revision", Placeholder.REVISION.token()},
            {"Earlier revisions", Placeholder.EARLIER_REVISIONS.token()},
            {"Issued (UTC)", Placeholder.ISSUED.token()},
            {"Points in scope", Placeholder.SCOPE_POINTS.token()},
            {"Scans in scope", Placeholder.SCOPE_DATES.token()},
            {"Points by status", Placeholder.STATUS_COUNTS.token()},
        };
        for (String[] fact : facts) {
            Row r = sheet.createRow(row);
            cell(r, 1, fact[0], label);
            cell(r, 2, fact[1], valueWrap);
            sheet.addMergedRegion(new CellRangeAddress(row, row, 2, last));
            if (fact[1].equals(Placeholder.ANALYZERS.token())) {
                r.setHeightInPoints(2 * LINE_HEIGHT_POINTS);
            }
            row++;
        }

        row++;
        cell(sheet.createRow(row++), 1, "Sign-off", heading);
        Row signHead = sheet.createRow(row);
        String[] signHeaders = {"Role", "Name", "Date (UTC)", "Signature"};
        for (int c = 0; c < signHeaders.length; c++) {
            cell(signHead, c + 1, signHeaders[c], header);
        }
        for (int c = 5; c <= last; c++) {
            cell(signHead, c, "", header);
        }
        sheet.addMergedRegion(new CellRangeAddress(row, row, 4, last));
        row++;
        Placeholder[][] signers = {
            {Placeholder.PREPARED_NAME, Placeholder.PREPARED_DATE},
            {Placeholder.CHECKED_NAME, Placeholder.CHECKED_DATE},
            {Placeholder.APPROVED_NAME, Placeholder.APPROVED_DATE},
        };
        String[] roles = {"Prepared", "Checked", "Approved"};
        for (int s = 0; s < roles.length; s++) {
            Row r = sheet.createRow(row);
            r.setHeightInPoints(34);
            cell(r, 1, roles[s], signature);
            cell(r, 2, signers[s][0].token(), signature);
            cell(r, 3, signers[s][1].token(), signature);
            for (int c = 4; c <= last; c++) {
                cell(r, c, "", signature);
            }
            sheet.addMergedRegion(new CellRangeAddress(row, row, 4, last));
            row++;
        }

        row++;
        String[][] provenance = {
            {"Software", Placeholder.SOFTWARE.token()},
            {"Workbook", Placeholder.WORKBOOK.token()},
            {"Audit trail", Placeholder.AUDIT_ROWS.token() + " rows; " + Placeholder.AUDIT_CHECK.token()},
            {"Audit head (SHA-256)", Placeholder.AUDIT_HEAD.token()},
        };
        for (String[] fact : provenance) {
            Row r = sheet.createRow(row);
            cell(r, 1, fact[0], label);
            cell(r, 2, fact[1], fact[1].equals(Placeholder.AUDIT_HEAD.token()) ? valueCode : valueWrap);
            sheet.addMergedRegion(new CellRangeAddress(row, row, 2, last));
            row++;
        }

        row++;
        cell(sheet.createRow(row++), 1, "Contents", heading);
        for (DossierSheet s : DossierSheet.values()) {
            Row r = sheet.createRow(row);
            cell(r, 1, s.title(), value);
            cell(r, 2, s.purpose(), valueWrap);
            sheet.addMergedRegion(new CellRangeAddress(row, row, 2, last));
            row++;
        }
        row++;
        Row note = sheet.createRow(row);
        note.setHeightInPoints(3 * LINE_HEIGHT_POINTS);
        cell(note, 1, "Every page carries the site, revision and document status in its header and its page number"
                + " in its footer. Times are UTC. Numbers use a decimal point; units are in every column header."
                + " Status is written as symbol and word (" + Status.PASS.label() + ", " + Status.REVIEW.label()
                + ", " + Status.FAIL.label() + "); colour only repeats it. The last three sheets are appendices of"
                + " full tables: print them only when needed, their charts and summaries come before them.", valueWrap);
        sheet.addMergedRegion(new CellRangeAddress(row, row, 1, last));
        page(sheet, true);
    }

    private void cautions() {
        XSSFSheet sheet = workbook.createSheet(DossierSheet.CAUTIONS.title());
        sheet.setColumnWidth(0, 3 * 256);
        sheet.setColumnWidth(1, CAUTIONS_WIDTH_CHARS * 256);
        List<String[]> lines = new ArrayList<>();
        lines.add(new String[] {"T", "Cautions and method"});
        section(lines, "Safety first", DossierText.CAUTIONS);
        section(lines, "What was measured and how", DossierText.METHOD);
        section(lines, "Acceptance rules", DossierText.ACCEPTANCE_RULES);
        section(lines, "Trend and forecast", DossierText.TREND_METHOD);
        section(lines, "Limits of this dossier", DossierText.LIMITS);
        section(lines, "Checking the audit trail", DossierText.AUDIT_CHECK);
        for (int i = 0; i < lines.size(); i++) {
            String[] line = lines.get(i);
            Row r = sheet.createRow(i);
            if (line[0].equals("G")) {
                continue;
            }
            XSSFCellStyle style = switch (line[0]) {
                case "T" -> title;
                case "H" -> heading;
                default -> body;
            };
            cell(r, 1, line[1], style);
            int textLines = Math.max(1, (line[1].length() + CAUTIONS_CHARS_PER_LINE - 1) / CAUTIONS_CHARS_PER_LINE);
            if (line[0].equals("B") && textLines > 1) {
                r.setHeightInPoints(textLines * LINE_HEIGHT_POINTS);
            }
        }
        page(sheet, false);
        sheet.getPrintSetup().setLandscape(false);
    }

    private static void section(List<String[]> lines, String heading, List<String> paragraphs) {
        lines.add(new String[] {"G", ""});
        lines.add(new String[] {"H", heading});
        paragraphs.forEach(p -> lines.add(new String[] {"B", p}));
    }

    /** Landscape, one page wide, page header and footer with the document's identity. */
    private static void page(XSSFSheet sheet, boolean onePage) {
        sheet.setFitToPage(true);
        PrintSetup print = sheet.getPrintSetup();
        print.setLandscape(true);
        print.setPaperSize(PrintSetup.A4_PAPERSIZE);
        print.setFitWidth((short) 1);
        print.setFitHeight((short) (onePage ? 1 : 0));
        sheet.setMargin(PageMargin.LEFT, 0.5);
        sheet.setMargin(PageMargin.RIGHT, 0.5);
        sheet.setMargin(PageMargin.TOP, 0.75);
        sheet.setMargin(PageMargin.BOTTOM, 0.75);
        sheet.setMargin(PageMargin.HEADER, 0.3);
        sheet.setMargin(PageMargin.FOOTER, 0.3);
        sheet.getHeader().setLeft(Placeholder.SITE.token());
        sheet.getHeader().setCenter("&BCommissioning dossier · revision " + Placeholder.REVISION.token() + " · "
                + Placeholder.DOCUMENT_STATUS.token() + "&B");
        sheet.getHeader().setRight("&A");
        sheet.getFooter().setLeft("Issued " + Placeholder.ISSUED.token());
        sheet.getFooter().setCenter(Placeholder.SOFTWARE.token());
        sheet.getFooter().setRight("Page &P of &N");
    }

    /** Fill and font colour by the status symbol in the cell: the word stays the message, colour repeats it. */
    private void statusColours(XSSFSheet sheet, CellRangeAddress range) {
        XSSFSheetConditionalFormatting cf = sheet.getSheetConditionalFormatting();
        String topLeft = new CellReference(range.getFirstRow(), range.getFirstColumn(), false, false).formatAsString();
        List<XSSFConditionalFormattingRule> rules = new ArrayList<>();
        for (Status s : Status.values()) {
            XSSFConditionalFormattingRule rule = cf.createConditionalFormattingRule(
                    "LEFT(" + topLeft + ",1)=\"" + s.symbol() + "\"");
            String[] colours = switch (s) {
                case PASS -> new String[] {"DDF2E3", "1B5E20"};
                case REVIEW -> new String[] {"FFF1C2", "7A5200"};
                case FAIL -> new String[] {"F9D6D5", "8E1B14"};
            };
            rule.createPatternFormatting().setFillBackgroundColor(rgb(colours[0]));
            var font = rule.createFontFormatting();
            font.setFontColor(rgb(colours[1]));
            font.setFontStyle(false, true);
            rules.add(rule);
        }
        cf.addConditionalFormatting(new CellRangeAddress[] {range},
                rules.toArray(XSSFConditionalFormattingRule[]::new));
    }

    private XSSFCellStyle dataStyle(DossierColumn.Format format) {
        XSSFCellStyle s = workbook.createCellStyle();
        s.setVerticalAlignment(VerticalAlignment.TOP);
        s.setBorderBottom(BorderStyle.HAIR);
        s.setBottomBorderColor(IndexedColors.GREY_40_PERCENT.getIndex());
        var formats = workbook.createDataFormat();
        switch (format) {
            case WRAP -> s.setWrapText(true);
            case CODE -> {
                s.setWrapText(true);
                s.setFont(monospace(8));
            }
            case WHOLE -> s.setDataFormat(formats.getFormat("0"));
            case DECIMAL_1 -> s.setDataFormat(formats.getFormat("0.0"));
            case DECIMAL_2 -> s.setDataFormat(formats.getFormat("0.00"));
            case DECIMAL_3 -> s.setDataFormat(formats.getFormat("0.000"));
            case TIME -> s.setDataFormat(formats.getFormat("yyyy-mm-dd hh:mm"));
            case DATE -> s.setDataFormat(formats.getFormat("yyyy-mm-dd"));
            case STATUS -> {
                s.setFont(font(11, true));
                s.setAlignment(HorizontalAlignment.CENTER);
            }
            case TEXT -> {
                // plain text, the default look
            }
        }
        return s;
    }

    private XSSFFont font(int points, boolean bold) {
        XSSFFont f = workbook.createFont();
        f.setFontHeightInPoints((short) points);
        f.setBold(bold);
        return f;
    }

    private XSSFFont monospace(int points) {
        XSSFFont f = font(points, false);
        f.setFontName("Courier New");
        return f;
    }

    private static void borders(CellStyle style) {
        style.setBorderTop(BorderStyle.THIN);
        style.setBorderBottom(BorderStyle.THIN);
        style.setBorderLeft(BorderStyle.THIN);
        style.setBorderRight(BorderStyle.THIN);
    }

    private static XSSFColor rgb(String hex) {
        return new XSSFColor(java.util.HexFormat.of().parseHex(hex));
    }

    private static void cell(Row row, int column, String text, CellStyle style) {
        Cell c = row.createCell(column);
        c.setCellValue(text);
        c.setCellStyle(style);
    }
}
