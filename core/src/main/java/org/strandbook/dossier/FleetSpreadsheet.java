package org.strandbook.dossier;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.util.List;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.PrintSetup;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.strandbook.files.FileReplacement;
import org.strandbook.files.WorkInProgressFiles;
import org.strandbook.server.FleetView;
import org.strandbook.server.PointStanding;

/**
 * The fleet view as an XLSX file, with the dossier's conventions: every value a typed cell (text
 * never a formula, text that looks like one quote-prefixed), units in the headers, times in UTC,
 * styles made once per workbook, written to a part file beside the target and moved into place whole,
 * never over an SQLite workbook.
 */
public final class FleetSpreadsheet {

    private FleetSpreadsheet() {
    }

    public static void write(FleetView.Fleet fleet, Path target, boolean replace) throws IOException {
        if (Files.exists(target) && !replace) {
            throw new IOException(target + ": a file is already there (give --replace to replace it)");
        }
        DossierWriter.requireReplaceable(target);
        Path part = WorkInProgressFiles.partBeside(target);
        try {
            try (OutputStream out = Files.newOutputStream(part)) {
                write(fleet, out);
            }
            FileReplacement.moveOver(part, target);
        } finally {
            Files.deleteIfExists(part);
        }
    }

    static void write(FleetView.Fleet fleet, OutputStream out) throws IOException {
        try (XSSFWorkbook wb = new XSSFWorkbook()) {
            Cells cells = new Cells(wb);
            Sheet sites = wb.createSheet("Sites");
            cells.header(sites, "Site", "PASS (points)", "REVIEW (points)", "FAIL (points)",
                    "Not evaluated (points)", "Last sync (UTC)");
            int r = 1;
            for (FleetView.SiteCounts s : fleet.sites()) {
                Row row = sites.createRow(r++);
                cells.text(row, 0, s.site());
                cells.number(row, 1, s.pass());
                cells.number(row, 2, s.review());
                cells.number(row, 3, s.fail());
                cells.number(row, 4, s.notEvaluated());
                cells.time(row, 5, s.lastSync() == null ? null : LocalDateTime.ofInstant(s.lastSync(), ZoneOffset.UTC));
            }
            Sheet ranking = wb.createSheet("Urgency");
            cells.header(ranking, "Rank", "Site", "Point", "Status", "Worst band", "Margin (dB)",
                    "Margin runs out (date)", "Evaluated (UTC)");
            r = 1;
            for (PointStanding p : fleet.ranking()) {
                Row row = ranking.createRow(r);
                cells.number(row, 0, r++);
                cells.text(row, 1, p.site());
                cells.text(row, 2, p.tag());
                cells.text(row, 3, p.status());
                cells.text(row, 4, p.worstBand() == null ? "" : p.worstBand());
                if (p.marginDb() != null) {
                    cells.decimal(row, 5, p.marginDb());
                }
                cells.date(row, 6, p.runOutDate() == null ? null : p.runOutDate().atStartOfDay());
                cells.time(row, 7, LocalDateTime.ofInstant(p.evaluatedAt(), ZoneOffset.UTC));
            }
            Sheet changes = wb.createSheet("Status changes");
            cells.header(changes, "Site", "Point", "Status before", "Status now", "Evaluated (UTC)");
            r = 1;
            if (fleet.since() != null) {
                Row note = changes.createRow(r++);
                cells.text(note, 0, "since " + fleet.since());
            }
            for (FleetView.StatusChange ch : fleet.changes()) {
                Row row = changes.createRow(r++);
                cells.text(row, 0, ch.site());
                cells.text(row, 1, ch.tag());
                cells.text(row, 2, ch.before() == null ? "(first report)" : ch.before());
                cells.text(row, 3, ch.after());
                cells.time(row, 4, LocalDateTime.ofInstant(ch.at(), ZoneOffset.UTC));
            }
            for (Sheet s : List.of(sites, ranking, changes)) {
                fitColumns(s);
                s.createFreezePane(0, 1);
                printable(s);
            }
            wb.write(out);
        }
    }

    /**
     * Each column as wide as its longest text (a number or time counts as 16 characters), so that a
     * sheet printed one page wide keeps a readable type size.
     */
    private static void fitColumns(Sheet sheet) {
        int[] chars = new int[16];
        for (Row row : sheet) {
            for (Cell cell : row) {
                int c = cell.getColumnIndex();
                if (c < chars.length) {
                    int length = cell.getCellType() == CellType.STRING ? cell.getStringCellValue().length() : 16;
                    chars[c] = Math.max(chars[c], length);
                }
            }
        }
        for (int c = 0; c < chars.length; c++) {
            if (chars[c] > 0) {
                sheet.setColumnWidth(c, Math.min(60, chars[c] + 2) * 256);
            }
        }
    }

    /**
     * As the dossier prints: landscape A4, one page wide (a row is never split over two pages), the
     * header row on every page, the sheet and page number in the footer.
     */
    private static void printable(Sheet sheet) {
        sheet.setFitToPage(true);
        PrintSetup print = sheet.getPrintSetup();
        print.setLandscape(true);
        print.setPaperSize(PrintSetup.A4_PAPERSIZE);
        print.setFitWidth((short) 1);
        print.setFitHeight((short) 0);
        sheet.setRepeatingRows(new CellRangeAddress(0, 0, -1, -1));
        sheet.getFooter().setLeft("Fleet view, " + sheet.getSheetName());
        sheet.getFooter().setRight("Page &P of &N");
    }

    /** The cell styles of one workbook, made once. */
    private static final class Cells {
        private final DossierStyles styles;
        private final CellStyle plain;
        private final CellStyle header;
        private final CellStyle decimal;
        private final CellStyle date;
        private final CellStyle time;

        Cells(XSSFWorkbook wb) {
            styles = new DossierStyles(wb);
            plain = wb.createCellStyle();
            header = wb.createCellStyle();
            Font bold = wb.createFont();
            bold.setBold(true);
            header.setFont(bold);
            decimal = wb.createCellStyle();
            decimal.setDataFormat(wb.createDataFormat().getFormat("0.00"));
            date = wb.createCellStyle();
            date.setDataFormat(wb.createDataFormat().getFormat("yyyy-mm-dd"));
            time = wb.createCellStyle();
            time.setDataFormat(wb.createDataFormat().getFormat("yyyy-mm-dd hh:mm"));
        }

        void header(Sheet sheet, String... names) {
            Row row = sheet.createRow(0);
            for (int i = 0; i < names.length; i++) {
                Cell c = row.createCell(i);
                c.setCellValue(names[i]);
                c.setCellStyle(header);
            }
        }

        void text(Row row, int col, String value) {
            Cell c = row.createCell(col);
            c.setCellValue(value);
            c.setCellStyle(styles.forText(plain, DossierStyles.Look.PLAIN, value));
        }

        void number(Row row, int col, long value) {
            row.createCell(col).setCellValue(value);
        }

        void decimal(Row row, int col, double value) {
            Cell c = row.createCell(col);
            c.setCellValue(value);
            c.setCellStyle(decimal);
        }

        void date(Row row, int col, LocalDateTime value) {
            if (value != null) {
                Cell c = row.createCell(col);
                c.setCellValue(value);
                c.setCellStyle(date);
            }
        }

        void time(Row row, int col, LocalDateTime value) {
            if (value != null) {
                Cell c = row.createCell(col);
                c.setCellValue(value);
                c.setCellStyle(time);
            }
        }
    }
}
