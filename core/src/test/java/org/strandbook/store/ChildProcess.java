package org.strandbook.store;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;

/** A {@link ScanImportChild} in its own JVM, with its output lines collected as they come. */
final class ChildProcess implements AutoCloseable {

    private final Process process;
    private final LinkedBlockingQueue<String> lines = new LinkedBlockingQueue<>();
    private final List<String> all = new ArrayList<>();

    private ChildProcess(Process process) {
        this.process = process;
        Thread reader = new Thread(() -> {
            try (BufferedReader in = new BufferedReader(
                    new InputStreamReader(process.getInputStream(), StandardCharsets.UTF_8))) {
                for (String line = in.readLine(); line != null; line = in.readLine()) {
                    lines.add(line);
                }
            } catch (IOException ignored) {
                // the process was killed: its output simply ends
            }
        }, "child-output");
        reader.setDaemon(true);
        reader.start();
    }

    /** Starts {@code java -cp <this test's class path> ScanImportChild args...}. */
    static ChildProcess start(Path scratch, String... args) throws IOException {
        List<String> command = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"),
                "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Xshare:auto",
                // the driver unpacks its native library here, so a killed child leaves nothing in /tmp
                "-Dorg.sqlite.tmpdir=" + scratch,
                ScanImportChild.class.getName()));
        command.addAll(List.of(args));
        return new ChildProcess(new ProcessBuilder(command).redirectErrorStream(true).start());
    }

    /** Waits for a line starting with {@code prefix}; fails with the child's output if it does not come. */
    String awaitLine(String prefix, long timeoutSeconds) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(timeoutSeconds);
        while (System.nanoTime() < deadline) {
            String line = lines.poll(100, TimeUnit.MILLISECONDS);
            if (line != null) {
                all.add(line);
                if (line.startsWith(prefix)) {
                    return line;
                }
            } else if (!process.isAlive() && lines.isEmpty()) {
                break;
            }
        }
        throw new AssertionError("child printed no '" + prefix + "' line; its output: " + all);
    }

    /** Lines seen so far that start with {@code prefix}. */
    List<String> seen(String prefix) {
        lines.drainTo(all);
        return all.stream().filter(l -> l.startsWith(prefix)).toList();
    }

    void kill() throws InterruptedException {
        process.destroyForcibly();
        process.waitFor(30, TimeUnit.SECONDS);
    }

    int awaitExit(long timeoutSeconds) throws InterruptedException {
        if (!process.waitFor(timeoutSeconds, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            throw new AssertionError("child did not finish within " + timeoutSeconds + " s; output: " + seen(""));
        }
        return process.exitValue();
    }

    @Override
    public void close() {
        if (process.isAlive()) {
            process.destroyForcibly();
            try {
                process.waitFor(30, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }
}
