package org.strandbook.app.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.strandbook.files.WorkInProgressFiles;
import org.strandbook.server.LocalPostgres;
import org.strandbook.server.PlantServer;
import org.strandbook.server.ServerLogin;
import org.strandbook.server.SiteSync;
import org.strandbook.server.SyncProgress;
import org.strandbook.store.Workbook;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook bench sync}: the listing bench's workbook (P points, a weekly scan for W weeks:
 * 52,000 scans by default) pushed by a first sync into an empty plant server, against the floor of
 * a bare JDBC batch insert of the same scan rows into a table of the same shape (and, printed beside
 * it, a bare COPY of them), in the same run on the same
 * server. Reports the server's bytes per scan and what that means for one server's capacity.
 */
@Command(name = "sync", mixinStandardHelpOptions = true,
        description = "A first sync of P points x W weekly scans into an empty plant server (a scratch PostgreSQL "
            + "started from the OS package's binaries), against a bare JDBC batch insert of the same rows (and a bare COPY); bytes per "
            + "scan on the server; last line 'ratio: R'.")
public final class SyncBenchCommand implements Callable<Integer> {

    /** Scans a point gets in a year in the capacity estimate: a weekly loop, reference and dark (design choice). */
    private static final int SCANS_PER_POINT_YEAR = 3 * 52;
    /** Spectrum points of a real scan in the estimate (the demo analyzers' 2 nm grid over 1000-2500 nm). */
    private static final int REAL_SPECTRUM_POINTS = 751;
    /**
     * Size of the scan table past which partitioning by site pays (design choice): beyond it, vacuum,
     * backup and index rebuilds of one table take hours, while a site's queries touch one partition.
     */
    private static final double PARTITION_AT_BYTES = 500e9;

    @Option(names = "--points", defaultValue = "100", paramLabel = "P",
            description = "Measurement points (default: ${DEFAULT-VALUE}).")
    int points;

    @Option(names = "--weeks", defaultValue = "520", paramLabel = "W",
            description = "Weeks of one loop scan per point (default: ${DEFAULT-VALUE}).")
    int weeks;

    @Option(names = "--trials", defaultValue = "2", paramLabel = "N",
            description = "Pushes and floors, each into a fresh database; the best of each is compared (default: ${DEFAULT-VALUE}).")
    int trials;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (points < 1 || weeks < 1 || trials < 1) {
            throw new ParameterException(spec.commandLine(), "--points, --weeks and --trials must be at least 1");
        }
        PrintWriter out = spec.commandLine().getOut();
        Path dir;
        try {
            dir = WorkInProgressFiles.scratchFolder();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot make a scratch folder: " + e.getMessage(), e);
        }
        try (LocalPostgres pg = LocalPostgres.start()) {
            long scans = (long) points * weeks;
            Path built = dir.resolve("built.strandbook");
            out.printf(Locale.ROOT, "sync bench: %d points x %d weekly scans = %d scans (the listing bench's"
                    + " workbook), scratch PostgreSQL on 127.0.0.1:%d%n", points, weeks, scans, pg.port());
            out.flush();
            ListingBenchCommand.build(built, points, weeks, out);
            double workbookBytes = Files.size(built);
            double bestPush = Double.MAX_VALUE;
            double bestFloor = Double.MAX_VALUE;
            double bestCopy = Double.MAX_VALUE;
            double scanBytes = 0;
            double auditBytes = 0;
            for (int t = 0; t < trials; t++) {
                // a technician, as in the field: row-level security and the audit triggers paid in full
                String url = pg.newPlantServer("bench_technician");
                PlantServer server = new PlantServer(new ServerLogin(url, "bench_technician", null));
                Path copy = dir.resolve("trial-" + t + ".strandbook");
                try (Workbook wb = Workbook.open(built, "bench")) {
                    wb.copyTo(copy);
                }
                double push;
                try (Workbook wb = Workbook.open(copy, "bench")) {
                    long start = System.nanoTime();
                    SiteSync.Outcome o = new SiteSync(server, wb, wb.site().get().name(), SyncProgress.SILENT).run();
                    push = (System.nanoTime() - start) * 1e-9;
                    if (o.pushed() != scans) {
                        throw new IllegalStateException("pushed " + o.pushed() + " records, expected " + scans);
                    }
                }
                try (Connection c = pg.superuser(url)) {
                    scanBytes = bytes(c, "scan");
                    auditBytes = bytes(c, "audit_entry");
                }
                double floor = BareServerInsert.secondsToInsert(copy, url, LocalPostgres.SUPERUSER, null,
                        "bench_floor_insert");
                double copyFloor = BareServerCopy.secondsToCopy(copy, url, LocalPostgres.SUPERUSER, null,
                        "bench_floor_copy");
                out.printf(Locale.ROOT, "trial %d: push %.1f s (%.0f scans/s, audit verify, portable form, server"
                        + " audit trail and sync state included); floor %.1f s (%.0f scans/s, bare JDBC batch"
                        + " insert); COPY %.1f s (%.0f scans/s)%n", t + 1, push, scans / push, floor, scans / floor,
                        copyFloor, scans / copyFloor);
                out.flush();
                bestPush = Math.min(bestPush, push);
                bestFloor = Math.min(bestFloor, floor);
                bestCopy = Math.min(bestCopy, copyFloor);
                Files.deleteIfExists(copy);
            }
            double perScan = scanBytes / scans;
            double auditPerScan = auditBytes / scans;
            int spectrumBytes = 16 * ListingBenchCommand.SPECTRUM_POINTS;
            double realPerScan = perScan - spectrumBytes + 16.0 * REAL_SPECTRUM_POINTS + auditPerScan;
            out.printf(Locale.ROOT, "server: %.0f bytes per scan in the scan table (spectrum %d B of them, indexes"
                    + " and TOAST included) + %.0f bytes of audit trail; workbook %.0f bytes per scan%n",
                    perScan, spectrumBytes, auditPerScan, workbookBytes / scans);
            double perPointYear = realPerScan * SCANS_PER_POINT_YEAR;
            out.printf(Locale.ROOT, "estimate: with %d-point spectra (%.0f bytes per scan with its audit row) and %d"
                    + " scans per point-year, a point adds %.1f MB a year; the scan table reaches %.0f GB (where"
                    + " partitioning by site begins to pay) at %.0f point-years, e.g. 20 plants x 200 points for"
                    + " %.0f years%n", REAL_SPECTRUM_POINTS, realPerScan, SCANS_PER_POINT_YEAR, perPointYear / 1e6,
                    PARTITION_AT_BYTES / 1e9, PARTITION_AT_BYTES / perPointYear,
                    PARTITION_AT_BYTES / perPointYear / (20 * 200));
            out.printf(Locale.ROOT, "best push %.1f s, best floor %.1f s (bare JDBC batch insert), best COPY %.1f s"
                    + " (best of %d); against COPY, which a technician's login cannot use under row-level security,"
                    + " the ratio is %.2f%n", bestPush, bestFloor, bestCopy, trials, bestCopy / bestPush);
            out.printf(Locale.ROOT, "ratio: %.2f%n", bestFloor / bestPush);
            out.flush();
            return CommandLine.ExitCode.OK;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot measure the server: " + e.getMessage(), e);
        } finally {
            WorkInProgressFiles.deleteTree(dir);
        }
    }

    private static double bytes(Connection c, String table) throws SQLException {
        try (Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT pg_total_relation_size('" + table + "')")) {
            rs.next();
            return rs.getLong(1);
        }
    }
}
