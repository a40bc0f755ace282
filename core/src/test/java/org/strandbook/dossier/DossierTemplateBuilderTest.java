package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.ConditionalFormatting;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.util.PaneInformation;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.strandbook.templates.Templates;

/**
 * The committed {@code dossier-template.xlsx} is exactly what {@link DossierTemplateBuilder} makes
 * (compared by content, since ZIP timestamps differ from build to build), and it carries what the
 * writer and a plant rely on: a key for every column, a placeholder for every value, the cautions.
 */
class DossierTemplateBuilderTest {

    @Test
    void committedTemplateMatchesTheBuilder() throws IOException {
        try (XSSFWorkbook fresh = DossierTemplateBuilder.build(); XSSFWorkbook committed = shipped()) {
            List<String> built = digest(fresh);
            List<String> shipped = digest(committed);
            if (!built.equals(shipped)) {
                Path fresher = Path.of("target", "dossier-template.generated.xlsx");
                Files.createDirectories(fresher.getParent());
                try (OutputStream out = Files.newOutputStream(fresher)) {
                    fresh.write(out);
                }
                assertEquals(String.join("\n", built), String.join("\n", shipped),
                        "the committed template is stale: regenerate it (see DossierTemplateBuilder) or copy core/"
                                + fresher);
            }
        }
    }

    @Test
    void digestTellsTemplatesApart() throws IOException {
        try (XSSFWorkbook a = DossierTemplateBuilder.build(); XSSFWorkbook b = DossierTemplateBuilder.build()) {
            b.getSheet("Acceptance").getRow(2).getCell(0).setCellValue("Tag");
            assertFalse(digest(a).equals(digest(b)), "a changed header must change the digest");
        }
    }

    @Test
    void everyColumnHasItsKeyInTheHiddenRowAboveItsHeader() throws IOException {
        try (XSSFWorkbook wb = shipped()) {
            for (DossierSheet s : DossierSheet.values()) {
                if (s.layout() != DossierSheet.Layout.TABLE) {
                    continue;
                }
                XSSFSheet sheet = wb.getSheet(s.title());
                List<String> keys = new ArrayList<>();
                sheet.getRow(1).forEach(c -> keys.add(c.getStringCellValue()));
                assertEquals(s.columns().stream().map(DossierColumn::key).toList(), keys, s.title());
                assertTrue(sheet.getRow(1).getZeroHeight(), s.title());
                Set<String> unique = new HashSet<>(keys);
                assertEquals(keys.size(), unique.size(), s.title() + ": keys are unique");
            }
        }
    }

    @Test
    void noHeaderWordIsBrokenAcrossLines() {
        // design choice: a header wraps between words, never inside one; bold letters need a little room
        for (DossierColumn c : DossierColumn.values()) {
            for (String word : c.header().split("[ /,-]")) {
                assertTrue(word.length() + 2 <= c.widthChars(), () -> c + ": '" + word + "' in " + c.widthChars());
            }
        }
    }

    @Test
    void everyPlaceholderAppearsSomewhereInTheTemplate() throws IOException {
        StringBuilder all = new StringBuilder();
        try (XSSFWorkbook wb = shipped()) {
            for (int i = 0; i < wb.getNumberOfSheets(); i++) {
                XSSFSheet sheet = wb.getSheetAt(i);
                sheet.forEach(r -> r.forEach(c -> all.append(c.toString()).append('\n')));
                all.append(sheet.getHeader().getLeft()).append(sheet.getHeader().getCenter())
                        .append(sheet.getFooter().getLeft()).append(sheet.getFooter().getCenter());
            }
        }
        for (Placeholder p : Placeholder.values()) {
            assertTrue(all.indexOf(p.token()) >= 0, p.token());
        }
    }

    // The cautions the trade expects beside fiber work: eye safety (IEC 60825-1/-2 lasers and fiber
    // systems, IEC 62471 lamps), glass shards, optical radiation in explosive atmospheres
    // (IEC 60079-28), pressurised process connections, deferring to local codes and licensed
    // practice; and the method: the one-cord reference method of the IEC 61280-4-1 family.
    @Test
    void cautionsAndMethodCarryTheSafetyCautionsAndTheMeasurementMethod() throws IOException {
        StringBuilder text = new StringBuilder();
        try (XSSFWorkbook wb = shipped()) {
            wb.getSheet(DossierSheet.CAUTIONS.title()).forEach(r -> r.forEach(c -> text.append(c).append('\n')));
        }
        for (String must : List.of("Never look into a fiber end", "IEC 60825-1", "IEC 60825-2", "IEC 62471",
                "glass shards", "IEC 60079-28", "under pressure", "local codes", "licensed practice",
                "one-cord reference method", "IEC 61280-4-1", Placeholder.PAIRING_RULE.token(), "Theil–Sen",
                "SHA-256")) {
            assertTrue(text.indexOf(must) >= 0, must);
        }
    }

    @Test
    void statusColumnsAreColouredByTheirSymbol() throws IOException {
        try (XSSFWorkbook wb = shipped()) {
            for (DossierSheet s : DossierSheet.values()) {
                for (DossierColumn c : s.columns()) {
                    if (c.format() != DossierColumn.Format.STATUS) {
                        continue;
                    }
                    int column = s.columns().indexOf(c);
                    var cf = wb.getSheet(s.title()).getSheetConditionalFormatting();
                    boolean found = false;
                    for (int i = 0; i < cf.getNumConditionalFormattings(); i++) {
                        ConditionalFormatting f = cf.getConditionalFormattingAt(i);
                        if (f.getFormattingRanges()[0].isInRange(DossierTemplateBuilder.FIRST_DATA_ROW, column)) {
                            found = f.getNumberOfRules() == 3;
                        }
                    }
                    assertTrue(found, s.title() + " " + c.key());
                }
            }
        }
    }

    private static XSSFWorkbook shipped() throws IOException {
        try (InputStream in = Templates.open(DossierTemplateBuilder.RESOURCE)) {
            return new XSSFWorkbook(in);
        }
    }

    /** Everything a user sees or the writer relies on, one line per fact. */
    static List<String> digest(XSSFWorkbook wb) {
        List<String> lines = new ArrayList<>();
        for (int i = 0; i < wb.getNumberOfSheets(); i++) {
            XSSFSheet sheet = wb.getSheetAt(i);
            lines.add("sheet " + i + " '" + sheet.getSheetName() + "'");
            PaneInformation pane = sheet.getPaneInformation();
            lines.add("  pane " + (pane == null ? "none" : pane.isFreezePane() + " " + pane.getHorizontalSplitPosition()));
            lines.add("  print landscape=" + sheet.getPrintSetup().getLandscape() + " fit=" + sheet.getFitToPage() + " "
                    + sheet.getPrintSetup().getFitWidth() + "x" + sheet.getPrintSetup().getFitHeight() + " repeat="
                    + sheet.getRepeatingRows());
            lines.add("  header '" + sheet.getHeader().getLeft() + "' '" + sheet.getHeader().getCenter() + "' '"
                    + sheet.getHeader().getRight() + "' footer '" + sheet.getFooter().getLeft() + "' '"
                    + sheet.getFooter().getCenter() + "' '" + sheet.getFooter().getRight() + "'");
            lines.add("  merged " + sheet.getMergedRegions());
            for (int c = 0; c < 24; c++) {
                lines.add("  column " + c + " width " + sheet.getColumnWidth(c));
            }
            var cf = sheet.getSheetConditionalFormatting();
            for (int k = 0; k < cf.getNumConditionalFormattings(); k++) {
                ConditionalFormatting f = cf.getConditionalFormattingAt(k);
                for (int r = 0; r < f.getNumberOfRules(); r++) {
                    lines.add("  cf " + Arrays.toString(f.getFormattingRanges()) + " " + f.getRule(r).getFormula1());
                }
            }
            for (Row row : sheet) {
                lines.add(String.format(Locale.ROOT, "  row %d height %.1f hidden %b", row.getRowNum(),
                        row.getHeightInPoints(), row.getZeroHeight()));
                for (Cell cell : row) {
                    CellStyle style = cell.getCellStyle();
                    lines.add(String.format(Locale.ROOT, "  %s %s '%s' bold=%b size=%d wrap=%b fill=%d format=%s",
                            cell.getAddress(), cell.getCellType(), cell.toString(),
                            wb.getFontAt(style.getFontIndex()).getBold(),
                            wb.getFontAt(style.getFontIndex()).getFontHeightInPoints(), style.getWrapText(),
                            style.getFillForegroundColor(), style.getDataFormatString()));
                }
            }
        }
        return lines;
    }
}
