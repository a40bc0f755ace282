package org.strandbook.store;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Files nobody may change, not even the superuser the tests may run as: the Linux "immutable"
 * attribute ({@code chattr +i}, chattr(1)). Permission bits would not stop a superuser. Where the
 * attribute cannot be set (another file system, no capability), the test that needs it is skipped.
 */
final class ImmutableFiles implements AutoCloseable {

    private final List<Path> locked;

    private ImmutableFiles(List<Path> locked) {
        this.locked = locked;
    }

    static ImmutableFiles lock(Path... paths) throws IOException, InterruptedException {
        List<Path> done = new ArrayList<>();
        for (Path p : paths) {
            boolean ok = chattr("+i", p);
            if (!ok) {
                new ImmutableFiles(done).close();
            }
            assumeTrue(ok, "the immutable attribute cannot be set here");
            done.add(p);
        }
        return new ImmutableFiles(done);
    }

    @Override
    public void close() throws IOException, InterruptedException {
        for (Path p : locked) {
            chattr("-i", p);
        }
    }

    private static boolean chattr(String flag, Path p) throws IOException, InterruptedException {
        Process process;
        try {
            process = new ProcessBuilder("chattr", flag, p.toString()).redirectErrorStream(true)
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        } catch (IOException e) {
            return false;
        }
        return process.waitFor(10, TimeUnit.SECONDS) && process.exitValue() == 0;
    }
}
