package org.strandbook.schedule;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Enumeration;
import java.util.Locale;
import java.util.regex.Pattern;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;

import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.poifs.filesystem.FileMagic;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Reads a filled cable schedule (the template {@code cable-schedule.xlsx}) and checks it against
 * every schedule rule before anything is written anywhere.
 *
 * <p>The result is either an accepted {@link CableSchedule} or the full list of
 * {@link ScheduleProblem}s, each with its sheet, row and column. A file that is not a readable XLSX
 * workbook (empty, truncated, encrypted, an old .xls, a renamed CSV, a ZIP bomb, too large) gives
 * one file-level problem; no exception escapes {@link #read}.
 *
 * <p>Guards, in order: the file size ({@link #DEFAULT_MAX_FILE_BYTES}); the first bytes (a ZIP
 * archive, as ECMA-376 Part 2 packages are); a pass over the archive that counts the bytes it
 * actually unpacks ({@link #DEFAULT_MAX_UNPACKED_BYTES}), so a small file cannot expand into
 * gigabytes; then POI with its own ZIP-bomb and record-size limits left at their defaults (this
 * class never changes {@code ZipSecureFile} or {@code IOUtils} settings). Sheets are capped at
 * {@value SheetTable#MAX_ROWS} rows and the problem list at {@value ProblemLog#LIMIT} entries.
 *
 * <p>Instances are immutable and may be shared between threads.
 */
public final class CableScheduleReader {

    /** A filled schedule is tens of kilobytes; 10 MiB leaves room for pictures someone pasted in. */
    public static final long DEFAULT_MAX_FILE_BYTES = 10L * 1024 * 1024;

    /** Unpacked size of all parts together. */
    public static final long DEFAULT_MAX_UNPACKED_BYTES = 64L * 1024 * 1024;

    static final int MAX_PARTS = 1000;

    /** An empty ZIP archive is its 22-byte end-of-central-directory record alone (PKWARE APPNOTE.TXT). */
    private static final int SMALLEST_ZIP_BYTES = 22;

    private static final byte[] ZIP_ENTRY = {'P', 'K', 3, 4};
    private static final byte[] ZIP_EMPTY = {'P', 'K', 5, 6};
    private static final byte[] OLE2 = {(byte) 0xD0, (byte) 0xCF, 0x11, (byte) 0xE0, (byte) 0xA1, (byte) 0xB1, 0x1A, (byte) 0xE1};

    private static final Pattern JAVA_CLASS_PREFIX = Pattern.compile("^([a-z_][\\w]*\\.)+[A-Z]\\w*: ");

    private final ComponentCatalog known;
    private final long maxFileBytes;
    private final long maxUnpackedBytes;

    /** A reader that resolves codes against the shipped catalog. */
    public CableScheduleReader() {
        this(ComponentCatalog.shipped());
    }

    /**
     * A reader that resolves fiber, connector and probe codes against {@code known} (typically the
     * shipped catalog plus the site's own) and the schedule's catalog sheets.
     */
    public CableScheduleReader(ComponentCatalog known) {
        this(known, DEFAULT_MAX_FILE_BYTES, DEFAULT_MAX_UNPACKED_BYTES);
    }

    private CableScheduleReader(ComponentCatalog known, long maxFileBytes, long maxUnpackedBytes) {
        if (known == null) {
            throw new IllegalArgumentException("the known catalog must not be null");
        }
        if (maxFileBytes < 1 || maxUnpackedBytes < 1) {
            throw new IllegalArgumentException("size limits must be positive");
        }
        this.known = known;
        this.maxFileBytes = maxFileBytes;
        this.maxUnpackedBytes = maxUnpackedBytes;
    }

    /** The same reader with other size limits, in bytes (a caller may tighten them, or loosen them knowingly). */
    public CableScheduleReader withLimits(long maxFileBytes, long maxUnpackedBytes) {
        return new CableScheduleReader(known, maxFileBytes, maxUnpackedBytes);
    }

    /** Reads and checks the schedule in {@code file}; never throws for bad content. */
    public ScheduleReadResult read(Path file) {
        String name = "'" + (file.getFileName() == null ? file : file.getFileName()) + "'";
        try {
            String fileProblem = checkFile(file, name);
            if (fileProblem != null) {
                return rejected(fileProblem);
            }
            return readWorkbook(file, name);
        } catch (IOException | RuntimeException | StackOverflowError e) {
            return rejected(name + " could not be read: " + describe(e));
        }
    }

    /** The reason the file cannot be a schedule, or null when it is a ZIP archive within the limits. */
    private String checkFile(Path file, String name) throws IOException {
        if (!Files.isRegularFile(file)) {
            return name + " does not exist or is not a file";
        }
        long size = Files.size(file);
        if (size == 0) {
            return name + " is empty (0 bytes), not an XLSX workbook";
        }
        if (size < SMALLEST_ZIP_BYTES) {
            return name + " is only " + size + " bytes, too short for an XLSX workbook";
        }
        if (size > maxFileBytes) {
            return name + " is " + megabytes(size) + "; a cable schedule may be at most " + megabytes(maxFileBytes);
        }
        byte[] head = new byte[512];
        int n;
        try (InputStream in = Files.newInputStream(file)) {
            n = in.readNBytes(head, 0, head.length);
        }
        if (startsWith(head, n, ZIP_EMPTY)) {
            return name + " is an empty ZIP archive, not an XLSX workbook";
        }
        if (startsWith(head, n, OLE2)) {
            return describeOle2(file, name);
        }
        if (!startsWith(head, n, ZIP_ENTRY)) {
            return describeNonZip(head, n, name);
        }
        return checkArchive(file, name);
    }

    private String checkArchive(Path file, String name) {
        try (ZipFile zip = new ZipFile(file.toFile())) {
            int parts = 0;
            long unpacked = 0;
            boolean contentTypes = false;
            byte[] buffer = new byte[8192];
            for (Enumeration<? extends ZipEntry> en = zip.entries(); en.hasMoreElements(); ) {
                ZipEntry entry = en.nextElement();
                if (++parts > MAX_PARTS) {
                    return name + " holds more than " + MAX_PARTS + " parts; that is not a cable schedule";
                }
                contentTypes |= entry.getName().equals("[Content_Types].xml");
                try (InputStream in = zip.getInputStream(entry)) {
                    for (int r = in.read(buffer); r > 0; r = in.read(buffer)) {
                        unpacked += r;
                        if (unpacked > maxUnpackedBytes) {
                            return name + " unpacks to more than " + megabytes(maxUnpackedBytes)
                                    + " (a ZIP bomb, or not a cable schedule); it was not opened";
                        }
                    }
                }
            }
            if (parts == 0) {
                return name + " is an empty ZIP archive, not an XLSX workbook";
            }
            if (!contentTypes) {
                return name + " is a ZIP archive but not an XLSX workbook (it has no [Content_Types].xml part)";
            }
            return null;
        } catch (IOException | RuntimeException e) {
            return name + " is damaged or truncated: it is not a complete ZIP archive, which every XLSX workbook is ("
                    + describe(e) + ")";
        }
    }

    private ScheduleReadResult readWorkbook(Path file, String name) {
        OPCPackage pkg = null;
        try {
            pkg = OPCPackage.open(file.toFile(), PackageAccess.READ);
            XSSFWorkbook workbook = new XSSFWorkbook(pkg);
            return ScheduleWorkbook.check(workbook, known);
        } catch (Exception | StackOverflowError e) {
            return rejected(name + " could not be read as an XLSX workbook: " + describe(e));
        } finally {
            if (pkg != null) {
                // read-only: revert() releases the file; close() would try to save it
                pkg.revert();
            }
        }
    }

    private static String describeOle2(Path file, String name) {
        try (POIFSFileSystem fs = new POIFSFileSystem(file.toFile(), true)) {
            if (fs.getRoot().hasEntry("EncryptionInfo")) {
                return name + " is encrypted (password protected); save an unprotected copy as .xlsx and import that";
            }
        } catch (IOException | RuntimeException e) {
            return name + " is a damaged OLE2 compound file, not an XLSX workbook";
        }
        return name + " is an old binary spreadsheet (.xls) or another OLE2 document;"
                + " save it as an XLSX workbook and import that";
    }

    private static String describeNonZip(byte[] head, int n, String name) {
        String kind = switch (FileMagic.valueOf(Arrays.copyOf(head, n))) {
            case PDF -> "a PDF document";
            case PNG, JPEG, GIF, TIFF, BMP, WMF, EMF -> "an image";
            case RTF, WORD2, MSWRITE -> "a word-processor document";
            case BIFF2, BIFF3, BIFF4 -> "a very old binary worksheet";
            default -> null;
        };
        if (kind != null) {
            return name + " is " + kind + ", not an XLSX workbook";
        }
        int start = 0;
        if (n >= 3 && (head[0] & 0xFF) == 0xEF && (head[1] & 0xFF) == 0xBB && (head[2] & 0xFF) == 0xBF) {
            start = 3;
        }
        boolean text = true;
        for (int i = start; i < n; i++) {
            int b = head[i] & 0xFF;
            if (b < 0x09 || (b > 0x0D && b < 0x20) || b == 0x7F) {
                text = false;
                break;
            }
        }
        if (text && n > start && head[start] == '<') {
            return name + " is a web page or XML file, not an XLSX workbook; open it in a spreadsheet program"
                    + " and save it as an XLSX workbook";
        }
        if (text) {
            return name + " is a text file (CSV or similar), not an XLSX workbook; open it in a spreadsheet program"
                    + " and save it as an XLSX workbook";
        }
        return name + " is not an XLSX workbook (its content is neither a ZIP archive nor text)";
    }

    private static boolean startsWith(byte[] head, int n, byte[] magic) {
        if (n < magic.length) {
            return false;
        }
        for (int i = 0; i < magic.length; i++) {
            if (head[i] != magic[i]) {
                return false;
            }
        }
        return true;
    }

    private static String megabytes(long bytes) {
        return String.format(Locale.ROOT, "%.1f MiB", bytes / (1024.0 * 1024.0));
    }

    /** A library's reason in one short line, for the end of a message. */
    static String describe(Throwable e) {
        String message = e.getMessage();
        if (message == null || message.isBlank()) {
            return e.getClass().getSimpleName();
        }
        String line = message.strip().lines().findFirst().orElse("");
        // a wrapped exception repeats its class name; the user needs only the reason
        line = JAVA_CLASS_PREFIX.matcher(line).replaceFirst("").replaceFirst("^error: ", "");
        return line.length() > 200 ? line.substring(0, 200) + "..." : line;
    }

    private static ScheduleReadResult rejected(String message) {
        return new ScheduleReadResult.Rejected(java.util.List.of(ScheduleProblem.ofFile(message)));
    }
}
