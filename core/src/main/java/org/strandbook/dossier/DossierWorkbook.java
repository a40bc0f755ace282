package org.strandbook.dossier;

import java.io.OutputStream;
import java.util.zip.Deflater;

import org.apache.commons.compress.archivers.zip.ZipArchiveOutputStream;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * The streaming workbook of one dossier: rows beyond a window of {@link #ROW_WINDOW} per sheet go to
 * temporary files, and chart caches are filled as the file is written ({@link ChartCacheStream}).
 * Parts are compressed at {@link #DEFLATE_LEVEL}: compressing is most of the time it takes to write
 * a large dossier, and the fastest level halves it for about a fifth more bytes.
 */
final class DossierWorkbook extends SXSSFWorkbook {

    /** Rows per sheet kept in memory; more are flushed to the sheet's temporary file. */
    static final int ROW_WINDOW = 200;

    /** Deflate level of the file's parts. */
    static final int DEFLATE_LEVEL = Deflater.BEST_SPEED;

    private final ChartCaches caches;
    private ChartCacheStream lastStream;

    DossierWorkbook(XSSFWorkbook template, ChartCaches caches) {
        super(template, ROW_WINDOW);
        this.caches = caches;
    }

    @Override
    protected ZipArchiveOutputStream createArchiveOutputStream(OutputStream out) {
        ZipArchiveOutputStream zip = super.createArchiveOutputStream(out);
        zip.setLevel(DEFLATE_LEVEL);
        lastStream = new ChartCacheStream(zip, caches);
        return lastStream;
    }

    /** Values written into chart caches by the last write. */
    long cachedChartPoints() {
        return lastStream == null ? 0 : lastStream.cachedPoints();
    }
}
