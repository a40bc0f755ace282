package org.strandbook.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Comment;
import org.apache.poi.ss.usermodel.DataValidation;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.PaneInformation;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.OhGrade;
import org.strandbook.site.PathDirection;
import org.strandbook.site.ProbeKind;
import org.strandbook.templates.Templates;

/**
 * The committed template is exactly what {@link TemplateBuilder} makes (compared by content, since
 * the ZIP timestamps differ from build to build), and it carries what a contractor needs: units in
 * headers, drop-downs holding the model's own values, a frozen header row, the safety cautions.
 */
class TemplateBuilderTest {

    @Test
    void committedTemplateMatchesTheBuilder() throws IOException {
        List<String> built;
        try (XSSFWorkbook fresh = TemplateBuilder.build(ComponentCatalog.shipped())) {
            built = digest(fresh);
            List<String> committed;
            try (InputStream in = Templates.open(Templates.CABLE_SCHEDULE); XSSFWorkbook wb = new XSSFWorkbook(in)) {
                committed = digest(wb);
            }
            if (!built.equals(committed)) {
                Path fresher = Path.of("target", "cable-schedule.generated.xlsx");
                Files.createDirectories(fresher.getParent());
                try (OutputStream out = Files.newOutputStream(fresher)) {
                    fresh.write(out);
                }
                assertEquals(String.join("\n", built), String.join("\n", committed),
                        "the committed template is stale: regenerate it (see TemplateBuilder) or copy core/"
                                + fresher);
            }
        }
    }

    @Test
    void digestTellsTemplatesApart() throws IOException {
        try (XSSFWorkbook a = TemplateBuilder.build(ComponentCatalog.shipped());
             XSSFWorkbook b = TemplateBuilder.build(ComponentCatalog.empty())) {
            assertTrue(!digest(a).equals(digest(b)), "a different Read me must give a different digest");
        }
    }

    @Test
    void everyNumericHeaderNamesItsUnit() {
        for (ScheduleColumn c : ScheduleColumn.values()) {
            if (c.kind() == ScheduleColumn.Kind.NUMBER || c.kind() == ScheduleColumn.Kind.WHOLE) {
                assertTrue(c.header().matches(".+ \\(.+\\)"), c.header());
            }
        }
    }

    @Test
    void dropDownsOfferTheModelsOwnValues() throws IOException {
        try (InputStream in = Templates.open(Templates.CABLE_SCHEDULE); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            assertEquals(names(PathDirection.values()), dropDown(wb, ScheduleColumn.SEGMENT_DIRECTION));
            assertEquals(names(PathDirection.values()), dropDown(wb, ScheduleColumn.JOINT_DIRECTION));
            assertEquals(names(InspectionGrade.values()), dropDown(wb, ScheduleColumn.JOINT_GRADE));
            assertEquals(names(OhGrade.values()), dropDown(wb, ScheduleColumn.FIBER_OH_GRADE));
            assertEquals(names(ProbeKind.values()), dropDown(wb, ScheduleColumn.PROBE_KIND));
            assertEquals(List.of("YES", "NO"), dropDown(wb, ScheduleColumn.POINT_HAZARDOUS_AREA));
        }
    }

    @Test
    void everyDataSheetFreezesItsHeaderRow() throws IOException {
        try (InputStream in = Templates.open(Templates.CABLE_SCHEDULE); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            for (ScheduleSheet s : ScheduleSheet.values()) {
                PaneInformation pane = wb.getSheet(s.title()).getPaneInformation();
                assertTrue(pane != null && pane.isFreezePane() && pane.getHorizontalSplitPosition() == 1, s.title());
            }
        }
    }

    // The cautions the trade expects beside fiber work: eye safety (IEC 60825-1/-2), glass shards,
    // optical radiation in explosive atmospheres (IEC 60079-28), deferring to local codes.
    @Test
    void readMeCarriesTheSafetyCautions() throws IOException {
        String readme;
        try (InputStream in = Templates.open(Templates.CABLE_SCHEDULE); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            StringBuilder text = new StringBuilder();
            for (Row row : wb.getSheet(ScheduleSheet.README_TITLE)) {
                for (Cell cell : row) {
                    text.append(cell.getStringCellValue()).append('\n');
                }
            }
            readme = text.toString();
        }
        assertTrue(readme.contains("Never look into a fiber end"));
        assertTrue(readme.contains("glass shards"));
        assertTrue(readme.contains("IEC 60079-28"));
        assertTrue(readme.contains("local codes"));
    }

    private static List<String> dropDown(XSSFWorkbook wb, ScheduleColumn column) {
        for (DataValidation v : wb.getSheet(column.sheet().title()).getDataValidations()) {
            CellRangeAddress range = v.getRegions().getCellRangeAddress(0);
            if (range.getFirstColumn() == column.index()) {
                return Arrays.asList(v.getValidationConstraint().getExplicitListValues());
            }
        }
        return List.of();
    }

    private static List<String> names(Enum<?>[] values) {
        return Arrays.stream(values).map(Enum::name).toList();
    }

    /** Everything a user sees or a reader relies on, one line per fact. */
    static List<String> digest(XSSFWorkbook wb) {
        List<String> lines = new ArrayList<>();
        for (int i = 0; i < wb.getNumberOfSheets(); i++) {
            Sheet sheet = wb.getSheetAt(i);
            lines.add("sheet " + i + " '" + sheet.getSheetName() + "'");
            PaneInformation pane = sheet.getPaneInformation();
            lines.add("  pane " + (pane == null ? "none" : pane.isFreezePane() + " " + pane.getHorizontalSplitPosition()
                    + " " + pane.getVerticalSplitPosition()));
            for (int c = 0; c < 16; c++) {
                CellStyle style = sheet.getColumnStyle(c);
                lines.add("  column " + c + " width " + sheet.getColumnWidth(c) + " format "
                        + (style == null ? "-" : style.getDataFormatString()));
            }
            for (Row row : sheet) {
                for (Cell cell : row) {
                    CellStyle style = cell.getCellStyle();
                    Comment comment = cell.getCellComment();
                    lines.add(String.format(Locale.ROOT, "  %s %s '%s' bold=%b wrap=%b fill=%d format=%s comment=%s",
                            cell.getAddress(), cell.getCellType(), cell.toString(),
                            wb.getFontAt(style.getFontIndex()).getBold(), style.getWrapText(),
                            style.getFillForegroundColor(), style.getDataFormatString(),
                            comment == null ? "-" : comment.getString().getString()));
                }
            }
            for (DataValidation v : sheet.getDataValidations()) {
                lines.add("  validation " + Arrays.toString(v.getRegions().getCellRangeAddresses()) + " "
                        + Arrays.toString(v.getValidationConstraint().getExplicitListValues()) + " error="
                        + v.getShowErrorBox() + " '" + v.getErrorBoxTitle() + "' '" + v.getErrorBoxText() + "' blank="
                        + v.getEmptyCellAllowed() + " arrow=" + v.getSuppressDropDownArrow());
            }
        }
        return lines;
    }
}
