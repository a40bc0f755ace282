package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OpenCommandTest {

    @Test
    void openingAWorkbookThatIsNotThereIsRefusedInOneLineBeforeAnyWindow(@TempDir Path dir) {
        // exit status 1 for rejected input, one line on standard error (Strandbook command-line rule)
        Path missing = dir.resolve("unit-41.strandbook");

        CliRun run = CliRun.of("open", missing.toString());

        assertEquals(1, run.exitCode());
        assertEquals("strandbook: no workbook at " + missing, run.err().strip());
    }

    @Test
    void openingWithoutAWorkbookIsWrongUsage() {
        assertEquals(2, CliRun.of("open").exitCode());
    }
}
