package org.strandbook.app.ui.workbook;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.SheetColumn;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.site.ScanRecord;

/** The "Scans" sheet of one point: a read-only listing (spectra are fetched only when plotted). */
public final class ScanSheet {

    private static final DateTimeFormatter TAKEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private ScanSheet() {
    }

    public static SheetModel<ScanRecord> create() {
        return SheetModel.<ScanRecord>builder()
                .column(SheetColumn.derived("id", "Scan", true, s -> Figure.text(Long.toString(s.id()))))
                .column(SheetColumn.derived("kind", "Kind", false, s -> Figure.text(s.kind().word())))
                .column(SheetColumn.derived("taken", "Taken", false, s -> Figure.text(TAKEN.format(s.takenAt()))))
                .column(SheetColumn.derived("operator", "Operator", false, s -> Figure.text(s.conditions().operator())))
                .column(SheetColumn.derived("points", "Points", true, s -> Figure.text(s.nPoints() == 0 ? "" : Integer.toString(s.nPoints()))))
                .column(SheetColumn.derived("range", "Range (nm)", false, s -> Figure.text(
                        Double.isFinite(s.minNm()) && Double.isFinite(s.maxNm())
                                ? CellFormats.plain(s.minNm()) + "\u2013" + CellFormats.plain(s.maxNm()) : "not read yet")))
                .column(SheetColumn.derived("file", "Source file", false, s -> Figure.text(s.sourceFile())))
                .build();
    }
}
