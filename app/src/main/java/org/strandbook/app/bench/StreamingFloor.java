package org.strandbook.app.bench;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;

import org.apache.commons.compress.archivers.zip.ZipArchiveOutputStream;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.strandbook.dossier.DossierSummary;
import org.strandbook.dossier.DossierWriter;

/**
 * The floor the export benchmark measures the dossier writer against: the bare streaming workbook
 * of the spreadsheet library, at the dossier's deflate level, writing as many text and number
 * cells in as many rows as a dossier did (a new sheet at each million rows), with no template,
 * style, chart or layout. Texts have the dossier's mean length and numbers four decimals like its
 * losses, neither repeating, so the file compresses no better than the dossier.
 */
final class StreamingFloor {

    private static final long ROWS_PER_SHEET = 1_000_000;
    private static final int TEXTS = 997;
    private static final long SEED = 20_251_202L;

    private StreamingFloor() {
    }

    /** Writes the floor's file for the cells {@code like} counted. */
    public static void write(DossierSummary like, Path file) throws IOException {
        long rows = Math.max(1, like.rows());
        int meanChars = (int) Math.max(1, like.textChars() / Math.max(1, like.textCells()));
        SplittableRandom random = new SplittableRandom(SEED);
        String[] texts = new String[TEXTS];
        for (int i = 0; i < texts.length; i++) {
            StringBuilder t = new StringBuilder(meanChars + 16);
            while (t.length() < meanChars) {
                t.append(Long.toString(random.nextLong() & Long.MAX_VALUE, 36));
            }
            texts[i] = t.substring(0, meanChars);
        }
        try (SXSSFWorkbook wb = new SXSSFWorkbook(DossierWriter.ROWS_IN_MEMORY_PER_SHEET) {
            @Override
            protected ZipArchiveOutputStream createArchiveOutputStream(OutputStream out) {
                ZipArchiveOutputStream zip = super.createArchiveOutputStream(out);
                zip.setLevel(DossierWriter.DEFLATE_LEVEL);
                return zip;
            }
        }; OutputStream os = Files.newOutputStream(file)) {
            Sheet sheet = null;
            for (long r = 0; r < rows; r++) {
                if (r % ROWS_PER_SHEET == 0) {
                    sheet = wb.createSheet("floor " + (r / ROWS_PER_SHEET + 1));
                }
                Row row = sheet.createRow((int) (r % ROWS_PER_SHEET));
                long textCount = like.textCells() * (r + 1) / rows - like.textCells() * r / rows;
                long numberCount = like.numberCells() * (r + 1) / rows - like.numberCells() * r / rows;
                int c = 0;
                for (long t = 0; t < textCount; t++) {
                    row.createCell(c++).setCellValue(texts[(int) ((r + t) % TEXTS)]);
                }
                for (long k = 0; k < numberCount; k++) {
                    row.createCell(c++).setCellValue(Math.rint(random.nextDouble(50) * 1e4) / 1e4);
                }
            }
            wb.write(os);
        }
    }
}
