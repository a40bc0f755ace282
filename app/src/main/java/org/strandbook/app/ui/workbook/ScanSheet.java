package org.strandbook.app.ui.workbook;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.SheetColumn;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.site.ScanRecord;

/** The "Scans" sheet of one point: a read-only listing, newest first (spectra are fetched only to evaluate). */
public final class ScanSheet {

    private static final DateTimeFormatter TAKEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private ScanSheet() {
    }

    public static SheetModel<ScanRecord> create() {
        return SheetModel.<ScanRecord>builder()
                .column(SheetColumn.derived("id", "Scan", true, s -> Figure.text(Long.toString(s.id()))))
                .column(SheetColumn.derived("kind", "Kind", false, s -> Figure.text(s.kind().word())))
                .column(SheetColumn.derived("taken", "Taken (UTC)", false, s -> Figure.text(TAKEN.format(s.takenAt()))))
                .column(SheetColumn.derived("operator", "Operator", false, s -> Figure.text(s.conditions().operator())))
                .column(SheetColumn.derived("integration", "Integration (ms)", true, s -> Figure.text(
                        s.conditions().integrationMs() == 0 ? "" : CellFormats.plain(s.conditions().integrationMs()))))
                .column(SheetColumn.derived("points", "Points", true, s -> Figure.text(Integer.toString(s.nPoints()))))
                .column(SheetColumn.derived("range", "Range (nm)", false, s -> Figure.text(
                        String.format(Locale.ROOT, "%.0f\u2013%.0f", s.minNm(), s.maxNm()))))
                .column(SheetColumn.derived("file", "Source file", false, s -> Figure.text(s.sourceFile())))
                .column(SheetColumn.derived("sha", "SHA-256 (first 12)", false, s -> Figure.text(
                        s.sha256().substring(0, Math.min(12, s.sha256().length())))))
                .build();
    }
}
