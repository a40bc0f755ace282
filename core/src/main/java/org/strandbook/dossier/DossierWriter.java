package org.strandbook.dossier;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Date;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.apache.poi.ooxml.POIXMLProperties;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.util.DefaultTempFileCreationStrategy;
import org.apache.poi.util.TempFile;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.strandbook.files.FileReplacement;
import org.strandbook.files.WorkInProgressFiles;
import org.strandbook.templates.Templates;

/**
 * Writes a commissioning dossier (XLSX) from a {@link DossierContent} by filling the dossier
 * template: the template's own rows get their {@link Placeholder} values, table sheets get rows
 * streamed below their header (so memory stays bounded however long the tables), chart sheets get
 * native charts whose series refer to the appendix tables.
 *
 * <p>Nothing half-written: a file is written under a temporary name in the target's folder and
 * moved into place only when complete; a failure or a cancel deletes it. Every text goes into a
 * string cell, never a formula, and text that looks like a formula gets a quote-prefixed style
 * ({@link org.strandbook.spreadsheet.FormulaText}). Times are UTC, numbers written with a decimal point, whatever the machine's
 * locale and zone.
 */
public final class DossierWriter {

    /** Rows of a sheet held in memory while writing; the rest are already on disk. */
    public static final int ROWS_IN_MEMORY_PER_SHEET = DossierWorkbook.ROW_WINDOW;

    /** Deflate level of the file's parts. */
    public static final int DEFLATE_LEVEL = DossierWorkbook.DEFLATE_LEVEL;

    /** "Database File Format", sqlite.org/fileformat.html, section 1.3: the 16-byte header string. */
    private static final byte[] SQLITE_HEADER = "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);

    /** Opens a template; the caller closes the stream. */
    @FunctionalInterface
    public interface TemplateSource {
        InputStream open() throws IOException;
    }

    private final TemplateSource template;

    private DossierWriter(TemplateSource template) {
        this.template = template;
    }

    /** A writer filling the shipped template. */
    public static DossierWriter withShippedTemplate() {
        return new DossierWriter(() -> Templates.open(DossierTemplateBuilder.RESOURCE));
    }

    /** A writer filling a plant's own copy of the template (restyled, columns moved or dropped). */
    public static DossierWriter withTemplate(Path templateFile) {
        return new DossierWriter(() -> Files.newInputStream(templateFile));
    }

    /**
     * Writes the dossier to {@code target} through a temporary file beside it.
     *
     * @param replace whether an existing file at {@code target} may be replaced
     * @throws FileAlreadyExistsException when {@code target} exists and {@code replace} is false
     * @throws DossierCancelledException  when {@code progress} cancels; nothing is left behind
     */
    public DossierSummary write(DossierContent content, Path target, boolean replace, DossierProgress progress)
            throws IOException {
        Path absolute = target.toAbsolutePath().normalize();
        Path folder = absolute.getParent();
        if (folder == null || !Files.isDirectory(folder)) {
            throw new IOException("cannot write " + target + ": folder " + folder + " does not exist");
        }
        if (!replace && Files.exists(absolute)) {
            throw new FileAlreadyExistsException(target.toString(), null, "a file is already there");
        }
        requireReplaceable(target);
        Path partial = WorkInProgressFiles.partBeside(absolute);
        try {
            DossierSummary summary;
            try (OutputStream out = Files.newOutputStream(partial)) {
                summary = write(content, out, progress);
            }
            publish(partial, absolute, replace, target);
            return summary;
        } finally {
            Files.deleteIfExists(partial);
        }
    }

    /**
     * Refuses to replace a workbook, whatever its name: a dossier may replace an earlier dossier or
     * any other file the user names with {@code replace}, never an SQLite database, which is what a
     * workbook is. The content decides, recognised by the 16-byte header string of "Database File
     * Format" (sqlite.org/fileformat.html, section 1.3).
     *
     * @throws IOException naming the file when it is a database or not a file at all
     */
    public static void requireReplaceable(Path target) throws IOException {
        if (!Files.exists(target)) {
            return;
        }
        if (!Files.isRegularFile(target)) {
            throw new IOException(target + " is not a file, so no dossier can replace it");
        }
        byte[] head;
        try (InputStream in = Files.newInputStream(target)) {
            head = in.readNBytes(SQLITE_HEADER.length);
        }
        if (Arrays.equals(head, SQLITE_HEADER)) {
            throw new IOException(target + " is an SQLite database, perhaps a Strandbook workbook; a dossier never"
                    + " replaces one, so it was left as it is");
        }
    }

    private static void publish(Path partial, Path target, boolean replace, Path asGiven) throws IOException {
        if (replace) {
            FileReplacement.moveOver(partial, target);
            return;
        }
        try {
            // a hard link fails if the name was taken meanwhile, where a rename would replace it
            Files.createLink(target, partial);
        } catch (FileAlreadyExistsException e) {
            throw new FileAlreadyExistsException(asGiven.toString(), null, "a file is already there");
        } catch (UnsupportedOperationException | IOException e) {
            Files.move(partial, target);
        }
    }

    /**
     * Writes the dossier to {@code out}, which the caller closes. The streaming workbook keeps the
     * rows beyond its window in temporary files; they go to a scratch folder of this run only, not
     * to the spreadsheet library's folder shared by every user of the machine, and the folder goes
     * when the dossier is written (TempFile.withStrategy, POI's API documentation of
     * org.apache.poi.util.TempFile).
     */
    public DossierSummary write(DossierContent content, OutputStream out, DossierProgress progress)
            throws IOException {
        Path scratch = WorkInProgressFiles.scratchFolder();
        try {
            return TempFile.withStrategy(new DefaultTempFileCreationStrategy(scratch.toFile()), () -> {
                try {
                    return fill(content, out, progress);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        } finally {
            WorkInProgressFiles.deleteTree(scratch);
        }
    }

    private DossierSummary fill(DossierContent content, OutputStream out, DossierProgress progress)
            throws IOException {
        XSSFWorkbook xssf;
        try (InputStream in = template.open()) {
            xssf = new XSSFWorkbook(in);
        }
        ChartCaches caches = new ChartCaches();
        DossierWorkbook workbook;
        DossierStyles styles;
        try {
            requireSheets(xssf);
            ContinuationSheets.add(xssf, content);
            styles = new DossierStyles(xssf);
            Placeholders.fill(xssf, PlaceholderValues.of(content), styles);
            properties(xssf, content);
            workbook = new DossierWorkbook(xssf, caches);
        } catch (RuntimeException e) {
            xssf.close();
            throw e;
        }
        try (DossierWorkbook wb = workbook) {
            Filling filling = new Filling(wb, content, styles, caches, progress);
            filling.fill();
            wb.write(out);
            return new DossierSummary(wb.getNumberOfSheets(), filling.rows(), filling.textCells(), filling.textChars(),
                    filling.numberCells(), filling.charts, wb.cachedChartPoints(), styles.derivedCount());
        }
    }

    private static void requireSheets(XSSFWorkbook xssf) {
        for (DossierSheet s : DossierSheet.values()) {
            if (xssf.getSheet(s.title()) == null) {
                throw new DossierTemplateException("the dossier template has no sheet '" + s.title() + "'");
            }
        }
    }

    private static void properties(XSSFWorkbook xssf, DossierContent c) {
        POIXMLProperties.CoreProperties core = xssf.getProperties().getCoreProperties();
        core.setTitle("Commissioning dossier, " + c.site().name() + ", revision " + c.site().revision());
        core.setSubjectProperty("Fiber-optic light paths of process spectrometers: installation, measurements, acceptance,"
                + " findings and sign-off");
        core.setCreator("Strandbook");
        core.setKeywords("commissioning dossier; fiber optics; loss budget; insertion loss; process spectrometer; "
                + c.site().name() + "; revision " + c.site().revision());
        core.setDescription(PlaceholderValues.result(c) + ". Audit head " + c.audit().headHash() + ".");
        core.setCategory("Commissioning dossier");
        core.setContentStatus(PlaceholderValues.FINAL);
        core.setRevision(c.site().revision());
        core.setCreated(Optional.of(Date.from(c.issuedAt())));
        core.setModified(Optional.of(Date.from(c.issuedAt())));
        xssf.getProperties().getExtendedProperties().getUnderlyingProperties().setApplication("Strandbook");
    }

    /** One filling of one workbook. */
    private static final class Filling {

        private final DossierWorkbook workbook;
        private final DossierContent content;
        private final DossierStyles styles;
        private final ChartCaches caches;
        private final DossierProgress progress;
        private final Map<DossierSheet, TableSheet> sheets = new EnumMap<>(DossierSheet.class);
        private int charts;

        Filling(DossierWorkbook workbook, DossierContent content, DossierStyles styles, ChartCaches caches,
                DossierProgress progress) {
            this.workbook = workbook;
            this.content = content;
            this.styles = styles;
            this.caches = caches;
            this.progress = progress;
        }

        void fill() {
            for (DossierSheet s : DossierSheet.values()) {
                sheets.put(s, TableSheet.open(workbook, s, styles));
            }
            int n = content.points().size();
            int[] done = {0};
            Map<String, PointUncertainty> uncertainties = content.uncertainties();
            List<SpectraRows.Block> spectra = SpectraRows.fill(sheets.get(DossierSheet.SPECTRA), content, uncertainties,
                    () -> step("writing " + DossierSheet.SPECTRA.title(), ++done[0], n));
            done[0] = 0;
            List<HistoryRows.Block> history = HistoryRows.fill(sheets.get(DossierSheet.HISTORY), content,
                    () -> step("writing " + DossierSheet.HISTORY.title(), ++done[0], n));
            charts += SpectrumChartRows.fill(sheets.get(DossierSheet.CHARTS), content, spectra, caches);
            charts += TrendRows.fill(sheets.get(DossierSheet.TREND), content, history, caches);
            AcceptanceRows.fill(sheets.get(DossierSheet.ACCEPTANCE), content);
            FindingRows.fill(sheets.get(DossierSheet.FINDINGS), content);
            PointRegisterRows.fill(sheets.get(DossierSheet.POINTS), content);
            CableScheduleRows.fill(sheets.get(DossierSheet.CABLES), content);
            LossBudgetRows.fill(sheets.get(DossierSheet.BUDGET), content);
            UncertaintyRows.fill(sheets.get(DossierSheet.UNCERTAINTY), content, uncertainties);
            step("writing the record sheets", 1, 1);
            long pages = Math.max(1, (content.audit().rows() + AuditRows.PAGE - 1) / AuditRows.PAGE);
            int[] page = {0};
            AuditRows.fill(sheets.get(DossierSheet.AUDIT), content.audit(),
                    () -> step("writing " + DossierSheet.AUDIT.title(), ++page[0], (int) Math.min(Integer.MAX_VALUE,
                            pages)));
            for (DossierSheet s : List.of(DossierSheet.ACCEPTANCE, DossierSheet.FINDINGS, DossierSheet.POINTS,
                    DossierSheet.CABLES, DossierSheet.UNCERTAINTY, DossierSheet.SPECTRA, DossierSheet.HISTORY, DossierSheet.AUDIT)) {
                filter(sheets.get(s));
            }
            step("saving", 0, 1);
        }

        /** A filter on the header row over the written rows of every part, so a reader can pick one point. */
        private static void filter(TableSheet t) {
            int header = t.headerRow();
            int lastColumn = t.columnCount() - 1;
            List<SXSSFSheet> parts = t.parts();
            for (int p = 0; p < parts.size(); p++) {
                int lastRow = t.lastRowOf(p);
                if (header >= 0 && lastRow > header) {
                    parts.get(p).setAutoFilter(new CellRangeAddress(header, lastRow, 0, lastColumn));
                }
            }
        }

        private void step(String stage, int done, int total) {
            if (!progress.advance(stage, done, total)) {
                throw new DossierCancelledException("export cancelled while " + stage);
            }
        }

        long rows() {
            return sheets.values().stream().mapToLong(TableSheet::rowsWritten).sum();
        }

        long textCells() {
            return sheets.values().stream().mapToLong(TableSheet::textCells).sum();
        }

        long textChars() {
            return sheets.values().stream().mapToLong(TableSheet::textChars).sum();
        }

        long numberCells() {
            return sheets.values().stream().mapToLong(TableSheet::numberCells).sum();
        }
    }
}
