package org.strandbook.app.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;
import java.util.stream.Stream;

import org.strandbook.site.Analyzer;
import org.strandbook.site.DetectorType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;
import org.strandbook.site.Spectrum;
import org.strandbook.site.WavelengthBand;
import org.strandbook.store.NewScan;
import org.strandbook.store.ScanImport;
import org.strandbook.store.Workbook;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook bench listing}: a workbook of P points with a loop scan every week for W weeks
 * is built and closed; then opening it and listing one point's scans is timed (best of 5), and the
 * listing on the open workbook against the floor of the bare SELECT of that point's scan rows on a
 * connection already open (best of 5 each).
 */
@Command(name = "listing", mixinStandardHelpOptions = true,
        description = "Opening a workbook of P points with weekly scans for W weeks and listing one point's "
            + "scans, against a bare SELECT of the same rows on an open connection; last line 'ratio: "
            + "R'.")
public final class ListingBenchCommand implements Callable<Integer> {

    /** Spectrum points per scan: the listing never reads spectra, so small ones keep the build short. */
    static final int SPECTRUM_POINTS = 64;
    private static final int TRIALS = 5;
    private static final int CHANNELS_PER_ANALYZER = 8;
    private static final int SPECTRUM_VARIANTS = 16;
    private static final Instant FIRST_WEEK = Instant.parse("2016-01-04T07:00:00Z");

    @Option(names = "--points", defaultValue = "100", paramLabel = "P",
            description = "Measurement points (default: ${DEFAULT-VALUE}).")
    int points;

    @Option(names = "--weeks", defaultValue = "520", paramLabel = "W",
            description = "Weeks of one loop scan per point (default: ${DEFAULT-VALUE}, ten years).")
    int weeks;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (points < 1 || weeks < 1) {
            throw new ParameterException(spec.commandLine(), "--points and --weeks must be at least 1");
        }
        PrintWriter out = spec.commandLine().getOut();
        Path dir;
        try {
            dir = Files.createTempDirectory("strandbook-bench-listing");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot make a scratch folder: " + e.getMessage(), e);
        }
        try {
            long total = (long) points * weeks;
            Path file = dir.resolve("listing.strandbook");
            out.printf(Locale.ROOT, "listing bench: %d points x %d weekly scans = %d scans in %s%n", points, weeks,
                    total, file);
            out.printf(Locale.ROOT, "spectra of %d points only (1 KiB each): the listing never reads spectra, and"
                    + " small ones keep the build short%n", SPECTRUM_POINTS);
            out.flush();
            double buildSeconds = build(file, points, weeks, out);
            out.printf(Locale.ROOT, "built in %.1f s (%.0f scans per second, audit trail included); workbook closed,"
                    + " %.1f MB%n", buildSeconds, total / buildSeconds, sizeMb(file));
            out.flush();

            String tag = tag((points + 1) / 2);
            // what a user waits for: open the file, list a point (SQLite's page cache empty each time)
            double bestOpen = Double.MAX_VALUE;
            double bestFirstList = Double.MAX_VALUE;
            double bestBoth = Double.MAX_VALUE;
            for (int t = 0; t < TRIALS; t++) {
                long start = System.nanoTime();
                try (Workbook wb = Workbook.open(file, "bench")) {
                    long opened = System.nanoTime();
                    wb.scans().list(tag);
                    long done = System.nanoTime();
                    bestOpen = Math.min(bestOpen, (opened - start) * 1e-9);
                    bestFirstList = Math.min(bestFirstList, (done - opened) * 1e-9);
                    bestBoth = Math.min(bestBoth, (done - start) * 1e-9);
                }
            }
            // the listing itself against the floor, both on a connection already open
            double bestList = Double.MAX_VALUE;
            List<ScanRecord> listed = List.of();
            try (Workbook wb = Workbook.open(file, "bench")) {
                for (int t = 0; t < TRIALS; t++) {
                    long start = System.nanoTime();
                    listed = wb.scans().list(tag);
                    bestList = Math.min(bestList, (System.nanoTime() - start) * 1e-9);
                }
            }
            // what a session's first write pays before it writes (PRAGMA quick_check of the whole file)
            double firstCheck = 0;
            double bestCheck = Double.MAX_VALUE;
            for (int t = 0; t < TRIALS; t++) {
                try (Workbook wb = Workbook.open(file, "bench")) {
                    long start = System.nanoTime();
                    wb.checkIntegrity();
                    double seconds = (System.nanoTime() - start) * 1e-9;
                    firstCheck = t == 0 ? seconds : firstCheck;
                    bestCheck = Math.min(bestCheck, seconds);
                }
            }
            BareScanListing.Timing floor = BareScanListing.bestOf(file, tag, TRIALS);
            if (!sameScans(listed, floor.scanIds())) {
                throw new IllegalStateException("the workbook's listing and the bare SELECT disagree for " + tag);
            }
            out.printf(Locale.ROOT, "open:                 %8.2f ms (best of %d)%n", bestOpen * 1e3, TRIALS);
            out.printf(Locale.ROOT, "first listing:        %8.2f ms for the %d scans of %s, just opened (best of %d)%n",
                    bestFirstList * 1e3, listed.size(), tag, TRIALS);
            out.printf(Locale.ROOT, "open + listing:       %8.2f ms (best of %d; target: well under 1 s)%n",
                    bestBoth * 1e3, TRIALS);
            out.printf(Locale.ROOT, "listing, open file:   %8.2f ms (best of %d)%n", bestList * 1e3, TRIALS);
            out.printf(Locale.ROOT, "check before writing: %8.2f ms (PRAGMA quick_check of the %.1f MB file, best of %d;"
                    + " first %.2f ms)%n", bestCheck * 1e3, sizeMb(file), TRIALS, firstCheck * 1e3);
            out.printf(Locale.ROOT, "floor:                %8.2f ms (bare SELECT ... WHERE point_id = ? ORDER BY"
                    + " taken_at on an open connection, best of %d)%n", floor.bestSeconds() * 1e3, TRIALS);
            out.printf(Locale.ROOT, "ratio: %.2f%n", floor.bestSeconds() / bestList);
            out.flush();
            return CommandLine.ExitCode.OK;
        } finally {
            deleteTree(dir);
        }
    }

    /**
     * Builds the workbook week by week, every point scanned each week, as a site's history grows;
     * {@code bench sync} pushes the same workbook.
     */
    static double build(Path file, int points, int weeks, PrintWriter out) {
        List<Spectrum> spectra = spectra();
        ScanConditions conditions = new ScanConditions("bench", 250, 16, OptionalDouble.of(21), OptionalDouble.empty());
        long start = System.nanoTime();
        try (Workbook wb = Workbook.create(file, new Site("Bench Works"), "bench")) {
            wb.inTransaction(() -> {
                for (int a = 0; a * CHANNELS_PER_ANALYZER < points; a++) {
                    wb.site().addAnalyzer(new Analyzer(String.format(Locale.ROOT, "LZ-%02d", a + 1), "", 1000, 2500,
                            CHANNELS_PER_ANALYZER, 20, DetectorType.EXTENDED_INGAAS));
                }
                wb.catalog().addProbeType(new ProbeType("PT-L", "", ProbeKind.TRANSMISSION, "SAPPHIRE", 2, 1, 1));
                for (int p = 1; p <= points; p++) {
                    wb.points().add(new MeasurementPoint(tag(p), "", "", String.format(Locale.ROOT, "LZ-%02d",
                            (p - 1) / CHANNELS_PER_ANALYZER + 1), (p - 1) % CHANNELS_PER_ANALYZER + 1, "PT-L",
                            List.of(new WavelengthBand("b", 1500, 1600)), OptionalDouble.empty(), false, false,
                            OptionalDouble.empty()));
                }
            });
            int reportEvery = Math.max(1, weeks / 10);
            try (ScanImport batch = wb.scans().startImport(1000, Duration.ofSeconds(2))) {
                for (int w = 0; w < weeks; w++) {
                    Instant week = FIRST_WEEK.plus(Duration.ofDays(7L * w));
                    for (int p = 1; p <= points; p++) {
                        String name = String.format(Locale.ROOT, "%s-w%04d.jdx", tag(p), w + 1);
                        batch.add(new NewScan(tag(p), ScanKind.LOOP, week.plusSeconds(60L * p), conditions,
                                spectra.get((w + p) % SPECTRUM_VARIANTS), name, sha256(name)));
                    }
                    if ((w + 1) % reportEvery == 0 || w + 1 == weeks) {
                        out.printf(Locale.ROOT, "  %d of %d weeks stored%n", w + 1, weeks);
                        out.flush();
                    }
                }
            }
        }
        return (System.nanoTime() - start) * 1e-9;
    }

    private static List<Spectrum> spectra() {
        SplittableRandom random = new SplittableRandom(11);
        double[] wavelengthsNm = new double[SPECTRUM_POINTS];
        for (int i = 0; i < SPECTRUM_POINTS; i++) {
            wavelengthsNm[i] = 1000 + 1500.0 * i / (SPECTRUM_POINTS - 1);
        }
        List<Spectrum> out = new ArrayList<>(SPECTRUM_VARIANTS);
        for (int k = 0; k < SPECTRUM_VARIANTS; k++) {
            double[] v = new double[SPECTRUM_POINTS];
            for (int i = 0; i < SPECTRUM_POINTS; i++) {
                v[i] = Math.rint(20_000 * Math.exp(-Math.pow((wavelengthsNm[i] - 1700) / 600, 2)) + 800
                        + 30 * random.nextGaussian());
            }
            out.add(new Spectrum(wavelengthsNm, v));
        }
        return out;
    }

    private static boolean sameScans(List<ScanRecord> listed, long[] ids) {
        if (listed.size() != ids.length) {
            return false;
        }
        for (int i = 0; i < ids.length; i++) {
            if (listed.get(i).id() != ids[i]) {
                return false;
            }
        }
        return true;
    }

    static String tag(int point) {
        return String.format(Locale.ROOT, "LP-%03d", point);
    }

    private static String sha256(String fileName) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(("bench scan file " + fileName).getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime provides SHA-256", e);
        }
    }

    private static double sizeMb(Path file) {
        try {
            return Files.size(file) / 1e6;
        } catch (IOException e) {
            return Double.NaN;
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
