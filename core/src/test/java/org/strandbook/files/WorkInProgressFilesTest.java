package org.strandbook.files;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Leftovers of a killed run are removed by a later one; the work of a run still going never is.
 * Whether a process id is running comes from the Java runtime (java.lang.ProcessHandle).
 */
class WorkInProgressFilesTest {

    @TempDir
    Path dir;

    @Test
    void aPartOfAFinishedRunOnThisMachineIsRemovedAndOneOfARunningRunIsKept() throws Exception {
        Path dead = part("dossier.xlsx", finishedPid(), WorkInProgressFiles.machine());
        Path alive = part("dossier.xlsx", ProcessHandle.current().pid(), WorkInProgressFiles.machine());
        Path next = WorkInProgressFiles.partBeside(dir.resolve("dossier.xlsx"));
        assertFalse(Files.exists(dead), "the killed run's part is swept");
        assertTrue(Files.exists(alive), "a running export's part is kept");
        assertTrue(next.getFileName().toString().startsWith(".dossier.xlsx." + ProcessHandle.current().pid() + "@"));
    }

    @Test
    void aPartOfAnotherMachineIsKeptUntilItIsOld() throws Exception {
        // design choice: a shared folder's part of another machine cannot be checked by process id
        String other = WorkInProgressFiles.machine().equals("00000000") ? "00000001" : "00000000";
        Path recent = part("a.xlsx", finishedPid(), other);
        Path old = part("b.xlsx", finishedPid(), other);
        Files.setLastModifiedTime(old, FileTime.from(Instant.now().minus(WorkInProgressFiles.FOREIGN_PART_AGE)
                .minusSeconds(60)));
        WorkInProgressFiles.sweepParts(dir);
        assertTrue(Files.exists(recent));
        assertFalse(Files.exists(old));
    }

    @Test
    void aScratchFolderOfAFinishedRunIsRemovedWithItsFiles() throws Exception {
        Path dead = Files.createDirectory(dir.resolve("strandbook-" + finishedPid() + "-42"));
        Files.writeString(dead.resolve("poi-sxssf-sheet1.xml"), "<row/>");
        Path alive = Files.createDirectory(dir.resolve("strandbook-" + ProcessHandle.current().pid() + "-43"));
        Path notOurs = Files.createDirectory(dir.resolve("strandbook-notes"));
        WorkInProgressFiles.sweepScratch(dir);
        assertFalse(Files.exists(dead));
        assertTrue(Files.exists(alive));
        assertTrue(Files.exists(notOurs), "only names of the scratch pattern are touched");
    }

    private Path part(String target, long pid, String machine) throws IOException {
        return Files.writeString(dir.resolve("." + target + "." + pid + "@" + machine + "-123.part"), "PK");
    }

    /** The id of a process that has ended (the system may in principle reuse it; then the test would keep it). */
    private static long finishedPid() throws IOException, InterruptedException {
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-version")
                .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        p.waitFor();
        return p.pid();
    }
}
