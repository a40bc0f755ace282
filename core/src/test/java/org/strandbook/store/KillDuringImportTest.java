package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sqlite.SQLiteConfig;

/**
 * An import killed at any moment leaves a sound workbook in which every scan is wholly present or
 * absent. The kills come from a fixed-seed random delay after the child has opened the workbook;
 * children alternate between one transaction per scan and a {@link ScanImport}. On a loaded machine
 * a child may commit nothing within the delay, so every fourth round first waits for the child's
 * first commit: kills then also land in the middle of a running import, not only at its start.
 */
class KillDuringImportTest {

    private static final int KILLS = 24;
    private static final long SEED = 61_300L;

    @TempDir
    Path dir;

    @Test
    void killedImportsLeaveEveryScanWhollyPresentOrAbsent() throws Exception {
        Path file = dir.resolve("killed.sqlite");
        try (Workbook wb = Workbook.create(file, DemoSite.site(), DemoSite.USER)) {
            DemoSite.populate(wb);
            wb.paths().replaceLegs(DemoSite.POINT_B, ScanImportChild.legs("start"));
        }
        Path scratch = Files.createDirectories(dir.resolve("native"));
        Random delays = new Random(SEED);
        long scans = 0;
        int roundsThatCommitted = 0;
        for (int round = 0; round < KILLS; round++) {
            try (ChildProcess child = ChildProcess.start(scratch, file.toString(), "k" + round, "0",
                    Long.toString(round), round % 2 == 0 ? "single" : "import")) {
                child.awaitLine("ready", 60);
                if (round % 4 == 3) {
                    awaitMoreScansThan(file, scans, 60);
                }
                Thread.sleep(delays.nextInt(250));
                child.kill();
            }
            long now = WorkbookChecks.assertWhole(file);
            assertTrue(now >= scans, "round " + round + " lost committed scans");
            roundsThatCommitted += now > scans ? 1 : 0;
            scans = now;
        }
        assertTrue(roundsThatCommitted >= KILLS / 4, "only " + roundsThatCommitted + " of " + KILLS
                + " children committed a scan before the kill: most kills came too early to test anything");
    }

    /** Polls the file read-only (WAL lets a reader in beside the writer) until it holds more than {@code scans}. */
    private static void awaitMoreScansThan(Path file, long scans, int timeoutSeconds) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(timeoutSeconds);
        SQLiteConfig readOnly = new SQLiteConfig();
        readOnly.setReadOnly(true);
        readOnly.setBusyTimeout(1_000);
        while (System.nanoTime() < deadline) {
            try (Connection c = readOnly.createConnection("jdbc:sqlite:" + file);
                 Statement st = c.createStatement();
                 ResultSet rs = st.executeQuery("SELECT count(*) FROM scan")) {
                if (rs.next() && rs.getLong(1) > scans) {
                    return;
                }
            } catch (SQLException busy) {
                // the writer held the file for longer than the busy timeout: ask again
            }
            Thread.sleep(20);
        }
        throw new AssertionError("the child committed no scan in " + timeoutSeconds + " s");
    }
}
