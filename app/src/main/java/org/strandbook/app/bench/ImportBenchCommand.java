package org.strandbook.app.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;
import java.util.stream.Stream;

import org.strandbook.intake.ScanFileImporter;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.scanfile.JcampDxWriter;
import org.strandbook.scanfile.SpectrumFile;
import org.strandbook.scanfile.XUnit;
import org.strandbook.site.Analyzer;
import org.strandbook.site.DetectorType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanKind;
import org.strandbook.site.Site;
import org.strandbook.site.Spectrum;
import org.strandbook.site.WavelengthBand;
import org.strandbook.store.Workbook;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook bench import}: N JCAMP-DX files of 2,000 points imported into a new workbook
 * (parsing, hashing, validation and the audit trail included), against the floor of inserting the
 * same spectra as BLOBs with a bare prepared statement in one transaction.
 *
 * <p>Trials alternate floor and import, each into new files, so that load from other programs hits
 * both alike; the ratio is of the best trial of each, as in the other benches. Code that runs once
 * per file is called only N times a trial, so the JIT compiler is still compiling it (on one of
 * the cores the import needs) for several trials: the default of 8 lets the import reach the
 * speed of a long session. The first trial runs in a fresh Java VM and is printed as well: it is
 * what a technician's first import of the day costs.
 */
@Command(name = "import", mixinStandardHelpOptions = true,
        description = "Spectra per second imported from N 2000-point JCAMP-DX files into a new workbook, "
            + "against bare BLOB inserts in one transaction; best of T trials of each, the first (cold) "
            + "one shown too; last line 'ratio: R'.")
public final class ImportBenchCommand implements Callable<Integer> {

    private static final int POINTS = 2000;
    private static final DateTimeFormatter LONGDATE = DateTimeFormatter.ofPattern("uuuu/MM/dd HH:mm:ss", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    @Option(names = "--files", defaultValue = "2000", paramLabel = "N",
            description = "Number of files (default: ${DEFAULT-VALUE}).")
    int files;

    @Option(names = "--trials", paramLabel = "T", defaultValue = "8",
            description = "Timed trials of each, floor and import alternating (default: ${DEFAULT-VALUE}).")
    int trials;

    @Option(names = "--warm-up", paramLabel = "PERCENT", defaultValue = "0",
            description = "Untimed warm-up first: this share of the files imported into a throwaway workbook and"
                + " as many BLOBs inserted into a throwaway floor file (default: ${DEFAULT-VALUE}, a cold start).")
    int warmUpPercent;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (files < 1) {
            throw new ParameterException(spec.commandLine(), "--files must be at least 1, was " + files);
        }
        if (trials < 1) {
            throw new ParameterException(spec.commandLine(), "--trials must be at least 1, was " + trials);
        }
        if (warmUpPercent < 0 || warmUpPercent > 100) {
            throw new ParameterException(spec.commandLine(), "--warm-up must be a percentage from 0 to 100, was " + warmUpPercent);
        }
        PrintWriter out = spec.commandLine().getOut();
        Path dir;
        try {
            dir = Files.createTempDirectory("strandbook-bench-import");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot make a scratch folder: " + e.getMessage(), e);
        }
        try {
            out.printf(Locale.ROOT, "import bench: %d JCAMP-DX files of %d points (DIFDUP) in %s%n", files, POINTS, dir);
            out.flush();
            List<Spectrum> spectra = new ArrayList<>(files);
            List<Path> paths = writeFiles(dir, spectra);

            List<byte[]> blobs = BareBlobInsert.encode(spectra);
            int warmUpFiles = (int) Math.round(files * warmUpPercent / 100.0);
            if (warmUpFiles > 0) {
                out.printf(Locale.ROOT, "warm-up (untimed): %d files imported and %d BLOBs inserted into throwaway"
                        + " files%n", warmUpFiles, warmUpFiles);
                out.flush();
                BareBlobInsert.secondsToInsert(dir.resolve("floor-warm-up.sqlite"), blobs.subList(0, warmUpFiles));
                secondsToImport(dir.resolve("warm-up.strandbook"), paths.subList(0, warmUpFiles));
            }
            double floorSeconds = Double.POSITIVE_INFINITY;
            double oursSeconds = Double.POSITIVE_INFINITY;
            for (int t = 1; t <= trials; t++) {
                Path floorFile = dir.resolve("floor-" + t + ".sqlite");
                Path workbookFile = dir.resolve("bench-" + t + ".strandbook");
                double floorTrial = BareBlobInsert.secondsToInsert(floorFile, blobs);
                double oursTrial = secondsToImport(workbookFile, paths);
                out.printf(Locale.ROOT, "trial %d%s: import %.2f s, floor %.2f s%n", t,
                        t == 1 && warmUpFiles == 0 ? " (cold)" : "", oursTrial, floorTrial);
                out.flush();
                floorSeconds = Math.min(floorSeconds, floorTrial);
                oursSeconds = Math.min(oursSeconds, oursTrial);
                // two 64 MB files per trial: remove them before the next
                deleteSqliteFiles(floorFile);
                deleteSqliteFiles(workbookFile);
            }
            double ours = files / oursSeconds;
            double floor = files / floorSeconds;
            out.printf(Locale.ROOT, "import: %.0f spectra per second (%.2f s, best of %d: read, parse, SHA-256,"
                    + " validate, store, audit)%n", ours, oursSeconds, trials);
            out.printf(Locale.ROOT, "floor:  %.0f spectra per second (%.2f s, best of %d: bare BLOB inserts, one"
                    + " transaction)%n", floor, floorSeconds, trials);
            out.printf(Locale.ROOT, "ratio: %.2f%n", ours / floor);
            out.flush();
            return CommandLine.ExitCode.OK;
        } finally {
            deleteTree(dir);
        }
    }

    /** Imports the files into a new workbook and gives the seconds the import took. */
    private static double secondsToImport(Path workbookFile, List<Path> paths) {
        try (Workbook wb = Workbook.create(workbookFile, new Site("Bench Works"), "bench")) {
            wb.inTransaction(() -> {
                wb.site().addAnalyzer(new Analyzer("AZ-B", "", 1000, 2500, 1, 20, DetectorType.EXTENDED_INGAAS));
                wb.catalog().addProbeType(new ProbeType("PT-B", "", ProbeKind.TRANSMISSION, "SAPPHIRE", 2, 1, 1));
                wb.points().add(new MeasurementPoint("BENCH-1", "", "", "AZ-B", 1, "PT-B",
                        List.of(new WavelengthBand("b", 1500, 1600)), OptionalDouble.empty(), false, false,
                        OptionalDouble.empty()));
            });
            long start = System.nanoTime();
            ScanFileImporter.Summary summary = new ScanFileImporter().importFiles(wb,
                    new ScanFileImporter.Request("BENCH-1", ScanKind.LOOP, paths, Optional.empty(), "bench"),
                    ScanFileImporter.Progress.NONE);
            double seconds = (System.nanoTime() - start) * 1e-9;
            if (!summary.rejected().isEmpty()) {
                throw new IllegalStateException("bench file refused: " + summary.rejected().get(0).reason());
            }
            return seconds;
        }
    }

    private List<Path> writeFiles(Path dir, List<Spectrum> spectra) {
        WavelengthGrid axis = WavelengthGrid.uniformWavenumberCm(4000, 10000, POINTS);
        double[] w = axis.wavelengthsNm();
        SplittableRandom random = new SplittableRandom(7);
        JcampDxWriter writer = JcampDxWriter.difDup();
        List<Path> paths = new ArrayList<>(files);
        Instant t0 = Instant.parse("2026-01-05T08:00:00Z");
        for (int f = 0; f < files; f++) {
            double[] v = new double[POINTS];
            for (int i = 0; i < POINTS; i++) {
                v[i] = Math.rint(20_000 * Math.exp(-Math.pow((w[i] - 1700) / 600, 2)) + 800 + 30 * random.nextGaussian());
            }
            spectra.add(new Spectrum(w, v));
            Map<String, String> meta = new LinkedHashMap<>();
            meta.put("LONGDATE", LONGDATE.format(t0.plusSeconds(3600L * f)) + " +0000");
            Path p = dir.resolve(String.format(Locale.ROOT, "scan-%05d.jdx", f));
            try {
                writer.write(SpectrumFile.inMemory("bench " + f, XUnit.WAVENUMBER_CM, "COUNTS", w, v, meta), p);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            paths.add(p);
        }
        return paths;
    }

    private static void deleteSqliteFiles(Path file) {
        for (String suffix : new String[] {"", "-wal", "-shm", "-journal"}) {
            try {
                Files.deleteIfExists(file.resolveSibling(file.getFileName() + suffix));
            } catch (IOException e) {
                // left for deleteTree at the end
            }
        }
    }

    private static void deleteTree(Path dir) {
        try (Stream<Path> walk = Files.walk(dir)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a scratch folder left behind in the temp area is harmless
        }
    }
}
