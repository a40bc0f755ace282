package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;
import java.util.concurrent.CountDownLatch;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Two writers on one workbook: no corruption; the later one waits, or after the busy timeout is told so. */
class ConcurrentWritersTest {

    private static final int STEPS = 100;

    @TempDir
    Path dir;

    private Path file;

    @BeforeEach
    void buildWorkbook() {
        file = dir.resolve("shared.sqlite");
        try (Workbook wb = Workbook.create(file, DemoSite.site(), DemoSite.USER)) {
            DemoSite.populate(wb);
            wb.paths().replaceLegs(DemoSite.POINT_B, ScanImportChild.legs("start"));
        }
    }

    @Test
    void twoProcessesImportingAtOnceLoseNothingAndCorruptNothing() throws Exception {
        Path scratch = Files.createDirectories(dir.resolve("native"));
        int inserted = 0;
        int busy = 0;
        try (ChildProcess a = ChildProcess.start(scratch, file.toString(), "a", Integer.toString(STEPS), "1");
             ChildProcess b = ChildProcess.start(scratch, file.toString(), "b", Integer.toString(STEPS), "2",
                     "import")) {
            for (ChildProcess child : new ChildProcess[] {a, b}) {
                String[] done = child.awaitLine("done", 120).split(" ");
                assertEquals(0, child.awaitExit(30));
                inserted += Integer.parseInt(done[1]);
                busy += Integer.parseInt(done[2]);
                for (String line : child.seen("busy: ")) {
                    assertTrue(line.startsWith("busy: workbook is busy: another program is writing to "), line);
                }
            }
        }
        // each child does STEPS steps, one in ten replaces legs instead of importing
        assertEquals(2 * STEPS * 9 / 10, inserted + busy);
        assertEquals(inserted, WorkbookChecks.assertWhole(file));
    }

    @Test
    void aWriterWaitsForAnotherWithinTheBusyTimeout() throws Exception {
        CountDownLatch locked = new CountDownLatch(1);
        Thread holder = new Thread(() -> {
            try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
                st.execute("BEGIN IMMEDIATE");
                locked.countDown();
                Thread.sleep(700);
                st.execute("COMMIT");
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
        holder.start();
        locked.await();
        try (Workbook wb = Workbook.open(file, DemoSite.USER)) {
            DemoSite.insertScan(wb, DemoSite.POINT_A, 1, Instant.EPOCH);
            assertEquals(1, wb.scans().count());
        }
        holder.join();
    }

    @Test
    void aWriterHeldUpBeyondTheBusyTimeoutIsToldTheWorkbookIsBusyAndWritesNothing() throws Exception {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement();
             Workbook wb = Workbook.open(file, DemoSite.USER, Duration.ofMillis(200))) {
            st.execute("BEGIN IMMEDIATE");
            WorkbookBusyException e = assertThrows(WorkbookBusyException.class,
                    () -> DemoSite.insertScan(wb, DemoSite.POINT_A, 1, Instant.EPOCH));
            assertEquals("workbook is busy: another program is writing to " + file
                    + "; nothing was changed, try again when it has finished", e.getMessage());
            st.execute("ROLLBACK");
            assertEquals(0, wb.scans().count());
            DemoSite.insertScan(wb, DemoSite.POINT_A, 1, Instant.EPOCH);
            assertEquals(1, wb.scans().count());
        }
        assertEquals(1, WorkbookChecks.assertWhole(file));
    }
}
