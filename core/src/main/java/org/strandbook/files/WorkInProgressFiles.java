package org.strandbook.files;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Duration;
import java.time.Instant;
import java.util.Comparator;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * The files a run makes while it works: a part file beside the file it will become, and a private
 * scratch folder in the system's temporary folder. Both names carry the process id (and a part, a
 * tag of the machine, since its folder may be shared), so a later run can tell the leftovers of a
 * run that was killed from the work of one still going, and removes them.
 */
public final class WorkInProgressFiles {

    /**
     * A part on a shared folder may belong to a run on another machine, whose process id means
     * nothing here; it is left alone until it is this old (design choice: far longer than any export).
     */
    static final Duration FOREIGN_PART_AGE = Duration.ofHours(6);

    private static final String SCRATCH_PREFIX = "strandbook-";
    private static final Pattern SCRATCH = Pattern.compile("strandbook-(\\d+)-\\d+");
    private static final Pattern PART = Pattern.compile("\\..+\\.(\\d+)@([0-9a-f]{8})-\\d+\\.part");
    /** Linux gives each boot of a machine its own id (proc(5), /proc/sys/kernel/random/boot_id). */
    private static final Path BOOT_ID = Path.of("/proc/sys/kernel/random/boot_id");
    private static volatile String machine;

    private WorkInProgressFiles() {
    }

    /** A new, empty part file beside {@code target} (hidden, named after it), after removing stale parts there. */
    public static Path partBeside(Path target) throws IOException {
        Path folder = target.toAbsolutePath().getParent();
        sweepParts(folder);
        return Files.createTempFile(folder, "." + target.getFileName() + "." + ProcessHandle.current().pid() + "@"
                + machine() + "-", ".part");
    }

    /**
     * A new scratch folder only this user can enter (Java creates temporary folders owner-only
     * where the file system has POSIX permissions), after removing the scratch folders of runs that
     * are gone. The caller deletes it with {@link #deleteTree(Path)}.
     */
    public static Path scratchFolder() throws IOException {
        Path temp = Path.of(System.getProperty("java.io.tmpdir"));
        sweepScratch(temp);
        return Files.createTempDirectory(temp, SCRATCH_PREFIX + ProcessHandle.current().pid() + "-");
    }

    /**
     * Removes the part files in {@code folder} left by runs of this machine that are gone, and those
     * of other machines once they are {@link #FOREIGN_PART_AGE} old.
     */
    static void sweepParts(Path folder) {
        Instant foreignBefore = Instant.now().minus(FOREIGN_PART_AGE);
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder, ".*.part")) {
            for (Path p : entries) {
                Matcher m = PART.matcher(p.getFileName().toString());
                if (!m.matches() || !Files.isRegularFile(p)) {
                    continue;
                }
                boolean stale = m.group(2).equals(machine()) ? !running(m.group(1)) : olderThan(p, foreignBefore);
                if (stale) {
                    Files.deleteIfExists(p);
                }
            }
        } catch (IOException | RuntimeException e) {
            // leftovers are hidden and harmless; failing to tidy must not stop the work
        }
    }

    /** Removes this user's scratch folders in {@code temp} whose run is gone. */
    static void sweepScratch(Path temp) {
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(temp, SCRATCH_PREFIX + "*")) {
            for (Path p : entries) {
                Matcher m = SCRATCH.matcher(p.getFileName().toString());
                if (m.matches() && !running(m.group(1)) && Files.isDirectory(p) && Files.isWritable(p)) {
                    deleteTree(p);
                }
            }
        } catch (IOException | RuntimeException e) {
            // as above
        }
    }

    /** Deletes a folder and everything in it, as far as it can. */
    public static void deleteTree(Path folder) {
        try (Stream<Path> walk = Files.walk(folder)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException e) {
                    // what cannot be deleted now is swept by a later run
                }
            });
        } catch (IOException | RuntimeException e) {
            // as above
        }
    }

    /** Eight hex digits that tell this machine (this boot of it) from others sharing a folder. */
    static String machine() {
        String m = machine;
        if (m == null) {
            String id;
            try {
                id = Files.readString(BOOT_ID).strip();
            } catch (IOException | RuntimeException e) {
                String host = System.getenv("HOSTNAME") != null ? System.getenv("HOSTNAME") : System.getenv("COMPUTERNAME");
                id = host == null ? "unknown machine" : host;
            }
            m = String.format(Locale.ROOT, "%08x", id.hashCode());
            machine = m;
        }
        return m;
    }

    private static boolean running(String pid) {
        try {
            long id = Long.parseLong(pid);
            return id == ProcessHandle.current().pid() || ProcessHandle.of(id).map(ProcessHandle::isAlive).orElse(false);
        } catch (NumberFormatException e) {
            return true;
        }
    }

    private static boolean olderThan(Path p, Instant before) throws IOException {
        FileTime modified = Files.getLastModifiedTime(p);
        return modified.toInstant().isBefore(before);
    }
}
