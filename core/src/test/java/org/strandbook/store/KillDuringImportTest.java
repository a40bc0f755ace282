package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An import killed at any moment leaves a sound workbook in which every scan is wholly present or
 * absent. The kills come from a fixed-seed random delay after the child has opened the workbook;
 * children alternate between one transaction per scan and a {@link ScanImport}.
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
}
