package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.app.Launcher;
import org.strandbook.server.LocalPostgres;
import org.strandbook.server.PlantServer;
import org.strandbook.server.ServerException;
import org.strandbook.server.ServerLogin;
import org.strandbook.server.SiteClone;
import org.strandbook.server.SiteSync;
import org.strandbook.server.SyncProgress;
import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/**
 * A sync cut off anywhere loses nothing and duplicates nothing, and the next one completes: `sync`
 * processes killed with SIGKILL at random moments, a server stopped in the middle of a push, two
 * laptops syncing one site at once. All against a real PostgreSQL.
 */
class SyncReliabilityTest {

    private static final String TECH = "reliability_tech";
    private static final int KILLS = 20;
    private static final long SEED = 15_2026L;
    private static final Instant T0 = Instant.parse("2026-04-01T08:00:00Z");

    @TempDir
    Path dir;

    @Test
    void syncsKilledAtRandomMomentsLoseNothingAndTheNextSyncCompletes() throws Exception {
        String url = LocalPostgres.shared().newPlantServer(TECH);
        Path file = dir.resolve("killed.strandbook");
        int seq = 0;
        try (Workbook wb = Workbook.create(file, DemoSite.site(), "k.ashdown")) {
            DemoSite.populate(wb);
        }
        Random delays = new Random(SEED);
        int killedMidSync = 0;
        for (int round = 0; round < KILLS; round++) {
            try (Workbook wb = Workbook.open(file, "k.ashdown")) {
                int until = seq + 20;
                wb.inTransaction(() -> {
                    for (int s = until - 20; s < until; s++) {
                        DemoSite.insertScan(wb, s % 2 == 0 ? DemoSite.POINT_A : DemoSite.POINT_B, s,
                                T0.plusSeconds(60L * s));
                    }
                });
                seq = until;
            }
            Process child = startSync(file, url);
            AtomicBoolean comparing = new AtomicBoolean();
            CountDownLatch started = new CountDownLatch(1);
            Thread reader = readLines(child, line -> {
                if (line.startsWith("comparing with the server")) {
                    comparing.set(true);
                    started.countDown();
                }
            });
            started.await(60, TimeUnit.SECONDS);
            Thread.sleep(delays.nextInt(300));
            boolean alive = child.isAlive();
            child.destroyForcibly();
            child.waitFor(30, TimeUnit.SECONDS);
            reader.join(5_000);
            killedMidSync += alive && comparing.get() ? 1 : 0;
            try (Workbook wb = Workbook.open(file, "k.ashdown")) {
                assertTrue(wb.audit().verify().intact(), "round " + round + ": the workbook's trail still verifies");
            }
            assertNoDuplicateOnServer(url);
        }
        assertTrue(killedMidSync >= KILLS / 4, "only " + killedMidSync + " of " + KILLS
                + " kills came while a sync was running: the test would prove little");

        PlantServer server = new PlantServer(new ServerLogin(url, TECH, null));
        try (Workbook wb = Workbook.open(file, "k.ashdown")) {
            new SiteSync(server, wb, wb.site().get().name(), SyncProgress.SILENT).run();
            SiteSync.Outcome again = new SiteSync(server, wb, wb.site().get().name(), SyncProgress.SILENT).run();
            assertEquals(0, again.pushed() + again.pulled() + again.changedHere() + again.changedThere());
            SiteClone.run(server, wb.site().get().name(), dir.resolve("check.strandbook"), TECH, SyncProgress.SILENT);
            try (Workbook check = Workbook.open(dir.resolve("check.strandbook"), TECH)) {
                assertEquals(wb.records().readAll(), check.records().readAll(), "nothing lost, nothing added");
            }
        }
        assertEquals(KILLS * 20L, count(url, "SELECT count(*) FROM scan"));
        assertNoDuplicateOnServer(url);
        assertEquals(0, count(url, "SELECT count(*) FROM workbook_push a JOIN workbook_push b ON a.id < b.id"
                + " AND a.workbook_id = b.workbook_id AND b.first_entry_id <= a.last_entry_id"),
                "no audit entry of the workbook is recorded as taken twice");
    }

    @Test
    void aServerStoppedMidPushChangesNothingAndTheNextSyncCompletes() throws Exception {
        try (LocalPostgres own = LocalPostgres.start()) {
            String url = own.newPlantServer(TECH);
            PlantServer server = new PlantServer(new ServerLogin(url, TECH, null));
            Path file = dir.resolve("stopped.strandbook");
            try (Workbook wb = Workbook.create(file, DemoSite.site(), "k.ashdown")) {
                DemoSite.populate(wb);
                wb.inTransaction(() -> {
                    for (int s = 0; s < 600; s++) {
                        DemoSite.insertScan(wb, DemoSite.POINT_A, s, T0.plusSeconds(60L * s));
                    }
                });
                SyncProgress stopper = new SyncProgress() {
                    @Override
                    public void step(String what) {
                    }

                    @Override
                    public void done(long count, long of) {
                        if (count > 0 && count < of) {
                            own.stopNow();
                        }
                    }
                };
                assertThrows(ServerException.class,
                        () -> new SiteSync(server, wb, wb.site().get().name(), stopper).run());
                own.restart();
                assertEquals(0, count(url, LocalPostgres.SUPERUSER, own, "SELECT count(*) FROM scan"),
                        "the push was one transaction: nothing of it stayed");
                assertTrue(wb.syncLedger().peek().orElseThrow().syncedAt() == null, "the workbook did not note a sync");
                SiteSync.Outcome done = new SiteSync(server, wb, wb.site().get().name(), SyncProgress.SILENT).run();
                assertTrue(done.pushed() >= 600);
                assertEquals(600, count(url, LocalPostgres.SUPERUSER, own, "SELECT count(*) FROM scan"));
            }
        }
    }

    @Test
    void twoLaptopsSyncingOneSiteAtOnceBothLand() throws Exception {
        String url = LocalPostgres.shared().newPlantServer(TECH);
        PlantServer server = new PlantServer(new ServerLogin(url, TECH, null));
        Path a = dir.resolve("a.strandbook");
        try (Workbook wb = Workbook.create(a, DemoSite.site(), "k.ashdown")) {
            DemoSite.populate(wb);
            new SiteSync(server, wb, wb.site().get().name(), SyncProgress.SILENT).run();
        }
        Path b = dir.resolve("b.strandbook");
        SiteClone.run(server, DemoSite.site().name(), b, TECH, SyncProgress.SILENT);
        addScans(a, 0, 150);
        addScans(b, 1000, 150);
        List<CompletableFuture<SiteSync.Outcome>> both = new ArrayList<>();
        for (Path laptop : List.of(a, b)) {
            both.add(CompletableFuture.supplyAsync(() -> {
                try (Workbook wb = Workbook.open(laptop, "k.ashdown")) {
                    return new SiteSync(server, wb, wb.site().get().name(), SyncProgress.SILENT).run();
                }
            }));
        }
        for (CompletableFuture<SiteSync.Outcome> f : both) {
            assertEquals(150, f.get(120, TimeUnit.SECONDS).pushed());
        }
        for (Path laptop : List.of(a, b)) {
            try (Workbook wb = Workbook.open(laptop, "k.ashdown")) {
                new SiteSync(server, wb, wb.site().get().name(), SyncProgress.SILENT).run();
            }
        }
        try (Workbook wa = Workbook.open(a, "k.ashdown"); Workbook wb = Workbook.open(b, "k.ashdown")) {
            assertEquals(wa.records().readAll(), wb.records().readAll());
            assertEquals(300, wa.scans().list(DemoSite.POINT_A).size());
        }
        assertEquals(300, count(url, "SELECT count(*) FROM scan"));
    }

    private static void addScans(Path file, int from, int n) {
        try (Workbook wb = Workbook.open(file, "k.ashdown")) {
            wb.inTransaction(() -> {
                for (int s = from; s < from + n; s++) {
                    DemoSite.insertScan(wb, DemoSite.POINT_A, s, T0.plusSeconds(60L * s));
                }
            });
        }
    }

    private static void assertNoDuplicateOnServer(String url) throws SQLException {
        // an immutable batch's audit row names its records in new_fields.keys; any other row by its record_key
        assertEquals(0, count(url, "SELECT count(*) FROM (SELECT k FROM audit_entry a CROSS JOIN LATERAL"
                + " jsonb_array_elements_text(CASE WHEN a.new_fields ? 'keys' AND a.new_fields ? 'sha256'"
                + " THEN a.new_fields -> 'keys' ELSE jsonb_build_array(a.record_key) END) k WHERE action = 'INSERT'"
                + " GROUP BY site_id, table_name, k HAVING count(*) > 1) d"), "a record added twice");
    }

    private static long count(String url, String sql) throws SQLException {
        return count(url, LocalPostgres.SUPERUSER, LocalPostgres.shared(), sql);
    }

    private static long count(String url, String user, LocalPostgres pg, String sql) throws SQLException {
        try (Connection c = pg.superuser(url); Statement st = c.createStatement(); ResultSet rs = st.executeQuery(sql)) {
            rs.next();
            return rs.getLong(1);
        }
    }

    private Process startSync(Path file, String url) throws IOException {
        List<String> command = List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"),
                "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Xshare:auto",
                "-Dorg.sqlite.tmpdir=" + dir,
                Launcher.class.getName(), "sync", file.toString(), "--server", url, "--server-user", TECH);
        return new ProcessBuilder(command).redirectErrorStream(true).start();
    }

    private static Thread readLines(Process p, java.util.function.Consumer<String> onLine) {
        Thread t = new Thread(() -> {
            try (BufferedReader in = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
                for (String line = in.readLine(); line != null; line = in.readLine()) {
                    onLine.accept(line);
                }
            } catch (IOException e) {
                // killed: the output ends
            }
        }, "sync-child-output");
        t.setDaemon(true);
        t.start();
        return t;
    }
}
