package org.strandbook.store;

import java.io.IOException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.time.Duration;
import java.util.List;
import java.util.Locale;
import java.util.UUID;
import java.util.function.Supplier;

import org.sqlite.SQLiteConfig;
import org.sqlite.SQLiteOpenMode;
import org.strandbook.files.FileReplacement;
import org.strandbook.site.Site;

/**
 * One site's workbook: a single SQLite file holding the site, its catalogs, points, light paths,
 * scans, inspections, sign-offs, notes and the audit trail of every change.
 *
 * <p>Each connection runs with foreign keys on, a write-ahead log and a busy timeout (default
 * {@link #DEFAULT_BUSY_TIMEOUT}): readers never wait for a writer, and a writer waits that long for
 * another before giving up with {@link WorkbookBusyException}. Every change is one transaction, so
 * a change is wholly in the file or not at all, even if the program is killed. Synchronous mode is
 * NORMAL, which SQLite documents as corruption-proof in WAL mode: a kill loses nothing committed;
 * a power cut may lose the last commits since the latest checkpoint, never corrupt the file. That
 * keeps per-file import transactions near the speed of a bare insert.
 *
 * <p>A workbook is used from one thread at a time (calls are serialised); UI code calls it from a
 * background task. It is opened for one user, whose name the audit trail records.
 */
public final class Workbook implements AutoCloseable {

    public static final Duration DEFAULT_BUSY_TIMEOUT = Duration.ofSeconds(5);

    /** SQLite page cache per open workbook, KiB; taken only as pages are read or written. */
    private static final int CACHE_KIB = 32 * 1024;
    /** SQLite's own default: the write-ahead log is copied into the file when it passes 1000 pages. */
    static final int AUTO_CHECKPOINT_PAGES = 1000;

    /** Names of spreadsheet and delimited-text files: a workbook never takes one (design choice). */
    private static final List<String> SPREADSHEET_EXTENSIONS = List.of(".xlsx", ".xlsm", ".xltx", ".xltm", ".xls",
            ".xlsb", ".ods", ".csv");

    private final Session session;
    private final AuditLog audit;
    private final SiteRepository site;
    private final CatalogRepository catalog;
    private final PointRepository points;
    private final PathRepository paths;
    private final ScanRepository scans;
    private final InspectionRepository inspections;
    private final SignOffRepository signOffs;
    private final NoteRepository notes;
    private final MaintenanceRepository maintenance;
    private final RecordWithdrawal withdrawal;

    private Workbook(Session session, AuditLog audit) {
        this.session = session;
        this.audit = audit;
        this.site = new SiteRepository(session, audit);
        this.catalog = new CatalogRepository(session, audit);
        this.points = new PointRepository(session, audit);
        this.paths = new PathRepository(session, audit);
        this.scans = new ScanRepository(session, audit);
        this.inspections = new InspectionRepository(session, audit);
        this.signOffs = new SignOffRepository(session, audit, site);
        this.notes = new NoteRepository(session, audit);
        this.maintenance = new MaintenanceRepository(session, audit, paths);
        this.withdrawal = new RecordWithdrawal(session, audit, paths);
    }

    /**
     * Creates a workbook for {@code site} at {@code file}, which must not exist. The file appears
     * complete or not at all: it is built under a temporary name beside it and then linked into place.
     *
     * @param user who creates it, for the audit trail
     * @throws WorkbookException when a file is already there or the folder is missing
     */
    public static Workbook create(Path file, Site site, String user) {
        String who = requireUser(user);
        if (site == null) {
            throw new IllegalArgumentException("site missing");
        }
        Path target = file.toAbsolutePath().normalize();
        refuseSpreadsheetName(file);
        if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
            throw refuseOverwrite(file);
        }
        Path folder = target.getParent();
        if (folder == null || !Files.isDirectory(folder)) {
            throw new WorkbookException("cannot create " + file + ": folder " + folder + " does not exist");
        }
        Path draft = folder.resolve("." + target.getFileName() + "." + UUID.randomUUID() + ".creating");
        try {
            try (Workbook wb = connect(draft, who, DEFAULT_BUSY_TIMEOUT, true)) {
                wb.site.create(site);
            }
            publish(draft, target, file);
        } finally {
            for (String suffix : new String[] {"", "-wal", "-shm", "-journal"}) {
                deleteQuietly(Path.of(draft + suffix));
            }
        }
        return open(file, who);
    }

    /**
     * Opens an existing workbook, upgrading an older schema first (each step audited).
     *
     * @param user who works on it, for the audit trail
     * @throws WorkbookMissingException when there is no file
     * @throws NotAWorkbookException    when the file is not a Strandbook workbook (it is left unchanged)
     * @throws NewerWorkbookException   when a newer Strandbook wrote it (it is left unchanged)
     * @throws WorkbookBusyException    when another program holds it longer than the busy timeout
     * @throws WorkbookException        when the file or its folder cannot be written ("read-only"); see
     *                                  {@link #openForReading(Path, String)}
     */
    public static Workbook open(Path file, String user) {
        return open(file, user, DEFAULT_BUSY_TIMEOUT);
    }

    /** As {@link #open(Path, String)}, waiting at most {@code busyTimeout} for another writer. */
    public static Workbook open(Path file, String user, Duration busyTimeout) {
        String who = requireUser(user);
        WorkbookFile.checkHeader(file);
        if (!isWritable(file)) {
            throw SqlFailures.readOnly(file, null);
        }
        return connect(file, who, busyTimeout, false);
    }

    /**
     * Opens an existing workbook for commands that only read it. A workbook that can be written is
     * opened as by {@link #open(Path, String)} (its write-ahead log goes when it closes). One that
     * cannot (a handed-over workbook on a read-only share, a file another user owns) is opened
     * read-only at SQLite's level ({@code SQLITE_OPEN_READONLY}, the flag behind a URI's
     * {@code mode=ro}) with no journal setting, so nothing is written and no {@code -wal} or
     * {@code -shm} file is left beside it: when no write-ahead log is there, no writer is at work
     * (a WAL writer always keeps one), and SQLite could not read without making one, so the file
     * is opened {@code immutable=1} (sqlite.org/uri.html; sqlite.org/wal.html, "Read-Only
     * Databases"); when a log is there, SQLite reads it as it is. A write through such a workbook
     * fails with "read-only".
     *
     * @throws WorkbookMissingException when there is no file
     * @throws NotAWorkbookException    when the file is not a Strandbook workbook
     * @throws NewerWorkbookException   when a newer Strandbook wrote it
     */
    public static Workbook openForReading(Path file, String user) {
        String who = requireUser(user);
        int schema = WorkbookFile.checkHeader(file);
        if (schema < SchemaMigrator.LATEST || isWritable(file)) {
            // an older schema is upgraded first, which is a write: refused as read-only if it cannot be
            return open(file, who);
        }
        return connectReadOnly(file, who, !Files.exists(Path.of(file.toAbsolutePath() + "-wal")));
    }

    /** Whether the file and its folder (where SQLite keeps the write-ahead log) can be written. */
    private static boolean isWritable(Path file) {
        Path absolute = file.toAbsolutePath();
        Path folder = absolute.getParent();
        return Files.isWritable(absolute) && folder != null && Files.isWritable(folder);
    }

    /** Reads only; {@code immutable} also tells SQLite that nothing can change the file (no locks). */
    static Workbook connectReadOnly(Path file, String user, boolean immutable) {
        SQLiteConfig config = new SQLiteConfig();
        config.setReadOnly(true);
        config.resetOpenMode(SQLiteOpenMode.CREATE);
        config.setCacheSize(-CACHE_KIB);
        String url = "jdbc:sqlite:" + file.toAbsolutePath();
        if (immutable) {
            config.setOpenMode(SQLiteOpenMode.OPEN_URI);
            url = "jdbc:sqlite:" + file.toAbsolutePath().toUri() + "?immutable=1";
        }
        Connection connection;
        try {
            connection = config.createConnection(url);
        } catch (SQLException e) {
            throw SqlFailures.translate(e, file);
        }
        Session session = new Session(connection, file, user);
        try {
            AuditLog audit = new AuditLog(session);
            SchemaMigrator.checkCurrent(session);
            return new Workbook(session, audit);
        } catch (RuntimeException e) {
            session.close();
            throw e;
        }
    }

    /**
     * SQLite's structural check of the whole file ({@code PRAGMA quick_check}): b-tree pages,
     * records and free list, without comparing indexes to their tables, which would cost a full
     * integrity check (sqlite.org/pragma.html#pragma_quick_check). A workbook runs it by itself
     * before its first write, unless it was called and passed before.
     *
     * @throws DamagedWorkbookException when the file is damaged
     */
    public void checkIntegrity() {
        session.checkIntegrity();
    }

    /**
     * Counts the quick check that {@code checked}, another connection to this same file, passed as
     * this workbook's own check before its first write: a sync checks the file on the connection
     * that verifies its audit trail, alongside the exchange with the server rather than before it.
     *
     * @throws IllegalArgumentException when {@code checked} is open on another file or passed no check
     */
    public void acceptIntegrityCheck(Workbook checked) {
        if (!checked.file().toAbsolutePath().normalize().equals(file().toAbsolutePath().normalize())) {
            throw new IllegalArgumentException("a check of " + checked.file() + " says nothing of " + file());
        }
        if (!checked.session.integrityChecked()) {
            throw new IllegalArgumentException("no quick check of " + file() + " has passed on that connection");
        }
        session.integrityCheckedElsewhere();
    }

    /** The schema version this Strandbook writes. */
    public static int latestSchemaVersion() {
        return SchemaMigrator.LATEST;
    }

    static Workbook connect(Path file, String user, Duration busyTimeout, boolean create) {
        return connect(file, user, busyTimeout, create, SchemaMigrator.LATEST);
    }

    /** Opens without the header check and migrates up to {@code schemaVersion}: tests build old workbooks so. */
    static Workbook connect(Path file, String user, Duration busyTimeout, boolean create, int schemaVersion) {
        SQLiteConfig config = new SQLiteConfig();
        config.enforceForeignKeys(true);
        config.setJournalMode(SQLiteConfig.JournalMode.WAL);
        config.setSynchronous(SQLiteConfig.SynchronousMode.NORMAL);
        config.setBusyTimeout((int) Math.min(Integer.MAX_VALUE, busyTimeout.toMillis()));
        // keys come from INSERT ... RETURNING; the driver's emulation would prepare a query per insert
        config.setGetGeneratedKeys(false);
        // a batch of imports in one transaction stays in memory instead of spilling pages early
        config.setCacheSize(-CACHE_KIB);
        if (!create) {
            config.resetOpenMode(SQLiteOpenMode.CREATE);
        }
        Connection connection;
        try {
            connection = config.createConnection("jdbc:sqlite:" + file.toAbsolutePath());
        } catch (SQLException e) {
            throw SqlFailures.translate(e, file);
        }
        Session session = new Session(connection, file, user);
        try {
            AuditLog audit = new AuditLog(session);
            SchemaMigrator.migrateTo(session, audit, schemaVersion);
            return new Workbook(session, audit);
        } catch (RuntimeException e) {
            session.close();
            throw e;
        }
    }

    private static void publish(Path draft, Path target, Path asGiven) {
        try {
            // a hard link is atomic and fails if the name is taken, unlike a rename
            Files.createLink(target, draft);
        } catch (FileAlreadyExistsException e) {
            throw refuseOverwrite(asGiven);
        } catch (UnsupportedOperationException | IOException e) {
            // file systems without hard links (FAT on a USB stick): a rename that refuses to replace
            try {
                Files.move(draft, target);
            } catch (FileAlreadyExistsException e2) {
                throw refuseOverwrite(asGiven);
            } catch (IOException e2) {
                throw new WorkbookException("cannot create " + asGiven + " (" + e2.getMessage() + ")", e2);
            }
        }
    }

    /**
     * A workbook named like a spreadsheet is easily taken for the dossier or a schedule, and written
     * over by whatever writes those; the names are refused at the start.
     */
    private static void refuseSpreadsheetName(Path file) {
        Path name = file.getFileName();
        String lower = name == null ? "" : name.toString().toLowerCase(Locale.ROOT);
        for (String extension : SPREADSHEET_EXTENSIONS) {
            if (lower.endsWith(extension)) {
                throw new WorkbookException("a workbook is not a spreadsheet: give " + file + " a name that does not"
                        + " end in " + extension + " (for example " + name.toString().substring(0,
                        name.toString().length() - extension.length()) + ".strandbook)");
            }
        }
    }

    private static WorkbookException refuseOverwrite(Path file) {
        return new WorkbookException("a file already exists at " + file + "; Strandbook never overwrites a file");
    }

    private static void deleteQuietly(Path p) {
        try {
            Files.deleteIfExists(p);
        } catch (IOException ignored) {
            // a leftover draft under a hidden name does no harm
        }
    }

    private static String requireUser(String user) {
        if (user == null || user.isBlank()) {
            throw new IllegalArgumentException("user name must not be empty: the audit trail records who changed what");
        }
        return user.strip();
    }

    public Path file() {
        return session.file();
    }

    /**
     * Writes a copy of the whole workbook to {@code target}, replacing a file there, while this
     * workbook stays open. The copy is one consistent snapshot, compacted, taken even while other
     * programs use the workbook (SQLite {@code VACUUM INTO}); it is written under a hidden name
     * beside the target and moved into place only when complete, so a failure leaves the target
     * as it was.
     *
     * @throws WorkbookException when the target is this workbook's own file or cannot be written
     */
    public void copyTo(Path target) {
        Path to = target.toAbsolutePath().normalize();
        if (to.equals(file().toAbsolutePath().normalize())) {
            throw new WorkbookException("a workbook cannot be copied onto itself (" + to + ")");
        }
        Path folder = to.getParent();
        if (folder == null || !Files.isDirectory(folder)) {
            throw new WorkbookException("cannot write the copy " + to + ": the folder " + folder + " does not exist");
        }
        Path draft = to.resolveSibling("." + to.getFileName() + "." + UUID.randomUUID() + ".copying");
        try {
            try {
                session.vacuumInto(draft);
            } catch (WorkbookException e) {
                throw new WorkbookException("cannot write the copy " + to + " (" + e.getMessage() + ")", e);
            }
            FileReplacement.moveOver(draft, to);
        } catch (IOException e) {
            throw new WorkbookException("cannot write the copy " + to + " (" + e.getMessage() + ")", e);
        } finally {
            try {
                Files.deleteIfExists(draft);
            } catch (IOException ignored) {
                // a leftover draft under a hidden name does no harm
            }
        }
    }

    /** Who this workbook was opened for: the name the audit trail records. */
    public String user() {
        return session.user();
    }

    /** The schema version of the open file. */
    public int schemaVersion() {
        return SchemaMigrator.schemaVersion(session);
    }

    public SiteRepository site() {
        return site;
    }

    public CatalogRepository catalog() {
        return catalog;
    }

    public PointRepository points() {
        return points;
    }

    public PathRepository paths() {
        return paths;
    }

    public ScanRepository scans() {
        return scans;
    }

    public InspectionRepository inspections() {
        return inspections;
    }

    public SignOffRepository signOffs() {
        return signOffs;
    }

    public NoteRepository notes() {
        return notes;
    }

    /** Withdrawing a point's latest record (the history panel's undo). */
    public RecordWithdrawal withdrawal() {
        return withdrawal;
    }

    public MaintenanceRepository maintenance() {
        return maintenance;
    }

    public AuditLog audit() {
        return audit;
    }

    /** The records in the form they travel to a plant server. */
    public WorkbookRecords records() {
        return new WorkbookRecords(session, audit);
    }

    /** What this workbook knows of its plant server. */
    public SyncLedger syncLedger() {
        return new SyncLedger(session);
    }

    /**
     * Runs {@code work} as one transaction: every repository call inside it commits together or,
     * if {@code work} throws, not at all. A repository call that fails inside undoes only itself,
     * so work that catches, for example, a {@link DuplicateScanException} can go on.
     */
    public void inTransaction(Runnable work) {
        session.write(() -> {
            work.run();
            return null;
        });
    }

    /** As {@link #inTransaction(Runnable)}, returning what {@code work} gives. */
    public <T> T inTransaction(Supplier<T> work) {
        return session.write(work::get);
    }

    /** Closes the file; SQLite folds the write-ahead log back into it. */
    @Override
    public void close() {
        session.close();
    }

    Session session() {
        return session;
    }
}
