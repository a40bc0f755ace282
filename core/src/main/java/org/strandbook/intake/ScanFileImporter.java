package org.strandbook.intake;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.FutureTask;

import org.strandbook.scanfile.SpectrumFile;
import org.strandbook.scanfile.SpectrumFileException;
import org.strandbook.scanfile.SpectrumFiles;
import org.strandbook.scanfile.PrintableName;
import org.strandbook.scanfile.YUnit;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.Spectrum;
import org.strandbook.store.EncodedScan;
import org.strandbook.store.NewScan;
import org.strandbook.store.ScanImport;
import org.strandbook.store.Workbook;

/**
 * Imports analyzer scan files into a workbook for one point and one kind of scan. A file is stored
 * whole or not at all; a bad file is rejected with {@code file:line: what is wrong} and the batch
 * goes on; the same file twice (same SHA-256) is refused.
 */
public final class ScanFileImporter {

    /** Beyond a few readers the disk and the one writing thread set the pace. */
    private static final int MAX_READERS = 4;
    /** Parsed files waiting to be stored, at most: about 100 kB each at 2,000 points. */
    private static final int READ_AHEAD_FILES = 128;

    /** Told after each file; returns false to stop before the next. */
    @FunctionalInterface
    public interface Progress {
        boolean fileDone(int done, int total, Path file);

        Progress NONE = (done, total, file) -> true;
    }

    /**
     * What to import.
     *
     * @param pointTag the measurement point the scans belong to
     * @param kind     reference, loop or dark
     * @param files    the files, in the order given
     * @param takenAt  a time for every file, overriding what the files say
     * @param operator the operator when a file names none
     * @param block    the block to take from multi-block JCAMP-DX files (1-based), or
     *                 {@link SpectrumFiles#WHOLE_FILE} for each file's one optical spectrum
     */
    public record Request(String pointTag, ScanKind kind, List<Path> files, Optional<Instant> takenAt,
                          String operator, int block) {
        public Request {
            files = List.copyOf(files);
            if (block < 0) {
                throw new IllegalArgumentException("block number must be 1 or more, was " + block);
            }
        }

        /** Each file's one spectrum. */
        public Request(String pointTag, ScanKind kind, List<Path> files, Optional<Instant> takenAt, String operator) {
            this(pointTag, kind, files, takenAt, operator, SpectrumFiles.WHOLE_FILE);
        }
    }

    /**
     * A stored file.
     *
     * @param tolerated what the file's reading accepted although it departs from its format, for the summary
     */
    public record Accepted(Path file, long scanId, Instant takenAt, String timeSource, List<String> tolerated) {
        public Accepted {
            tolerated = List.copyOf(tolerated);
        }
    }

    /** A refused file and why. */
    public record Rejected(Path file, String reason) {
    }

    /** The batch's outcome, file by file. */
    public record Summary(List<Accepted> accepted, List<Rejected> rejected, boolean stoppedEarly) {
        public Summary {
            accepted = List.copyOf(accepted);
            rejected = List.copyOf(rejected);
        }
    }

    /**
     * @throws IllegalArgumentException when the point is not in the workbook (nothing is read then)
     */
    public Summary importFiles(Workbook workbook, Request request, Progress progress) {
        if (workbook.points().get(request.pointTag()).isEmpty()) {
            throw new IllegalArgumentException("no point tagged '" + request.pointTag() + "' in this workbook");
        }
        List<Accepted> accepted = new ArrayList<>();
        List<Rejected> rejected = new ArrayList<>();
        boolean stopped = false;
        List<Path> files = request.files();
        // files are read, parsed, encoded and digested ahead on one reader per core while this thread
        // stores them in order; when the next file is not ready it reads that one itself rather than wait
        int threads = Math.max(1, Math.min(MAX_READERS, Runtime.getRuntime().availableProcessors()));
        ExecutorService readers = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "scan-file-reader");
            t.setDaemon(true);
            return t;
        });
        try (ScanImport batch = workbook.scans().startImport()) {
            Deque<FutureTask<Parsed>> ahead = new ArrayDeque<>();
            int submitted = 0;
            for (int i = 0; i < files.size(); i++) {
                while (submitted < files.size() && ahead.size() < READ_AHEAD_FILES) {
                    Path next = files.get(submitted++);
                    FutureTask<Parsed> task = new FutureTask<>(() -> parse(next, request));
                    readers.execute(task);
                    ahead.add(task);
                }
                Path file = files.get(i);
                FutureTask<Parsed> head = ahead.removeFirst();
                // runs the task here if no reader has started it, and returns at once if one has
                head.run();
                Parsed parsed = await(head);
                if (parsed.problem() != null) {
                    rejected.add(new Rejected(file, parsed.problem()));
                } else {
                    EncodedScan encoded = parsed.prepared().scan();
                    NewScan scan = encoded.scan();
                    ScanImport.Outcome outcome = batch.add(encoded);
                    if (outcome.result() == ScanImport.Result.ALREADY_STORED) {
                        rejected.add(new Rejected(file, displayName(file) + ":0: the same file is already stored as"
                                + " scan " + outcome.scanId() + " (same SHA-256)"));
                    } else {
                        accepted.add(new Accepted(file, outcome.scanId(), scan.takenAt(), parsed.prepared().timeSource(),
                                parsed.prepared().tolerated()));
                    }
                }
                if (!progress.fileDone(i + 1, files.size(), file)) {
                    stopped = i + 1 < files.size();
                    ahead.forEach(f -> f.cancel(true));
                    break;
                }
            }
        } finally {
            readers.shutdownNow();
        }
        return new Summary(accepted, rejected, stopped);
    }

    /** A scan ready to store: its spectrum is encoded and digested on the reading thread. */
    private record Prepared(EncodedScan scan, String timeSource, List<String> tolerated) {
    }

    /** A file read and parsed, or why it cannot be stored. */
    private record Parsed(Prepared prepared, String problem) {
    }

    private static Parsed parse(Path file, Request request) {
        try {
            return new Parsed(prepare(file, request), null);
        } catch (SpectrumFileException e) {
            return new Parsed(null, e.getMessage());
        } catch (IllegalArgumentException e) {
            return new Parsed(null, displayName(file) + ":0: " + e.getMessage());
        }
    }

    private static Parsed await(Future<Parsed> future) {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("import interrupted", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(cause);
        }
    }

    private static Prepared prepare(Path file, Request request) throws SpectrumFileException {
        SpectrumFile read = SpectrumFiles.read(file, request.block());
        requireSignal(read, request.kind());
        ScanFileFacts facts;
        Optional<Instant> fileTime;
        try {
            facts = ScanFileFacts.of(read.metadata());
            // the file's own time is not even read when the command gives one: a damaged date must not
            // refuse a file whose time the technician has supplied
            fileTime = request.takenAt().isPresent() ? Optional.empty() : facts.takenAt();
        } catch (ScanFileFacts.FactProblem e) {
            throw new SpectrumFileException(read.sourceName(), read.metadataLines().getOrDefault(e.key(), 0),
                    e.getMessage());
        }
        Instant takenAt;
        String timeSource;
        int timeLine = 0;
        if (request.takenAt().isPresent()) {
            takenAt = request.takenAt().get();
            timeSource = "given on the command";
        } else if (fileTime.isPresent()) {
            takenAt = fileTime.get();
            timeSource = "from the file";
            timeLine = read.metadataLines().getOrDefault(facts.takenAtText().orElseThrow().getKey(), 0);
        } else {
            takenAt = modified(file);
            timeSource = "file modification time (the file names none)";
        }
        Optional<String> badTime = TakenAtRange.problem(takenAt, Instant.now());
        if (badTime.isPresent()) {
            throw new SpectrumFileException(read.sourceName(), timeLine, badTime.get() + " (" + timeSource + ")");
        }
        ScanConditions conditions = new ScanConditions(facts.operator().orElse(request.operator()),
                facts.integrationMs().orElse(0), facts.coAdded().orElse(1), OptionalDouble.empty(),
                OptionalDouble.empty());
        Spectrum spectrum = read.spectrum();
        return new Prepared(EncodedScan.of(new NewScan(request.pointTag(), request.kind(), takenAt, conditions,
                spectrum, file.getFileName().toString(), read.sha256Hex(), read.yLabel())), timeSource,
                read.tolerated());
    }

    /**
     * Refuses values that are a ratio to a reference (transmittance, absorbance, reflectance): every
     * kind of scan Strandbook stores is the detector's own signal, from which it computes the loss.
     */
    private static void requireSignal(SpectrumFile read, ScanKind kind) throws SpectrumFileException {
        YUnit unit = YUnit.of(read.yLabel());
        if (unit != YUnit.SIGNAL) {
            throw new SpectrumFileException(read.sourceName(), read.metadataLines().getOrDefault(
                    SpectrumFile.Y_LABEL_LINE_KEY, 0), "the values are " + unit.phrase() + " ('" + read.yLabel()
                    + "'), not a detector signal: a " + kind.word() + " scan must be the analyzer's raw signal "
                    + "(counts); Strandbook computes the loss from loop, reference and dark scans itself. Export "
                    + "the raw scan from the analyzer");
        }
    }

    /** The file's name as a summary shows it: control characters (ESC, line breaks) escaped. */
    static String displayName(Path file) {
        Path name = file.getFileName();
        return PrintableName.of(name == null ? file.toString() : name.toString());
    }

    private static Instant modified(Path file) {
        try {
            return Files.getLastModifiedTime(file).toInstant();
        } catch (IOException e) {
            throw new IllegalArgumentException("the file names no time taken and its modification time cannot be read");
        }
    }
}
