package org.strandbook.samplesite;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CancellationException;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DemoSiteBuildTest {

    @TempDir
    Path dir;

    @Test
    void aStoppedBuildLeavesNoWorkbookForTheNextOpenToFind() throws IOException {
        // design choice: a file appears under its own name only when whole, so an interrupted
        // build is redone rather than opened half-filled
        DemoSite.Progress stopOnceImportStarts = new DemoSite.Progress() {
            private boolean importing;

            @Override
            public void step(String what) {
                importing |= what.startsWith("imported");
            }

            @Override
            public boolean stopRequested() {
                return importing;
            }
        };

        assertThrows(CancellationException.class,
                () -> DemoSite.build(dir, ScanGenerator.DEMO_SEED, stopOnceImportStarts));

        assertFalse(Files.exists(dir.resolve(DemoSite.WORKBOOK_NAME)));
        try (Stream<Path> left = Files.list(dir)) {
            assertTrue(left.noneMatch(p -> p.getFileName().toString().contains(".building")), "no draft left");
        }
    }
}
