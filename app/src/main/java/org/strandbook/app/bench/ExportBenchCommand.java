package org.strandbook.app.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.strandbook.dossier.DossierContent;
import org.strandbook.dossier.DossierProgress;
import org.strandbook.dossier.DossierSummary;
import org.strandbook.dossier.DossierWriter;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook bench export}: seconds and heap to write the dossier of a synthetic site of N
 * points (2,000-point spectra, 50 scans each), against the floor of the bare streaming workbook
 * writing as many cells ({@link StreamingFloor}). Each size runs its dossier and its floor in turn,
 * best of {@code --trials}, so that load from other programs hits both alike.
 */
@Command(name = "export",
        mixinStandardHelpOptions = true,
        description = "Seconds and peak heap to export the dossier of a synthetic site of N points (20, 200 and "
            + "1000 unless --points picks one), against a bare streaming workbook filling the same "
            + "cells; last line 'ratio: R' (our speed over the floor's, for the largest N).")
public final class ExportBenchCommand implements Callable<Integer> {

    static final List<Integer> DEFAULT_SIZES = List.of(20, 200, 1000);
    private static final int WARM_UPS = 2;
    private static final double MB = 1024.0 * 1024.0;

    @Spec
    CommandSpec spec;

    @Option(names = "--points", paramLabel = "N", description = "Only this site size (default: 20, 200 and 1000).")
    Integer points;

    @Option(names = "--scans", defaultValue = "50", paramLabel = "M",
            description = "Paired loop scans per point (default: ${DEFAULT-VALUE}).")
    int scans;

    @Option(names = "--wavelengths", defaultValue = "2000", paramLabel = "W",
            description = "Points per spectrum (default: ${DEFAULT-VALUE}).")
    int wavelengths;

    @Option(names = "--trials", defaultValue = "3", paramLabel = "T",
            description = "Runs of each size, the best counts (default: ${DEFAULT-VALUE}).")
    int trials;

    /** The best of a size's trials: wall and CPU seconds, and the largest heap any trial used. */
    private record Run(int points, double seconds, double cpuSeconds, long cells, long bytes, HeapWatch.Use heap,
                       DossierSummary summary) {

        Run best(Run other) {
            HeapWatch.Use h = new HeapWatch.Use(Math.max(heap.baselineBytes(), other.heap.baselineBytes()),
                    Math.max(heap.poolPeakBytes(), other.heap.poolPeakBytes()),
                    Math.max(heap.afterGcPeakBytes(), other.heap.afterGcPeakBytes()));
            Run faster = other.seconds < seconds ? other : this;
            return new Run(points, faster.seconds, Math.min(cpuSeconds, other.cpuSeconds), cells, bytes, h, summary);
        }
    }

    @Override
    public Integer call() throws IOException {
        if ((points != null && points < 1) || scans < 1 || wavelengths < 2 || trials < 1) {
            throw new ParameterException(spec.commandLine(), "--points, --scans and --trials must be at least 1, --wavelengths at least 2");
        }
        List<Integer> sizes = points == null ? DEFAULT_SIZES : List.of(points);
        PrintWriter out = spec.commandLine().getOut();
        out.printf(Locale.ROOT, "export bench: synthetic site, %d-point spectra, %d scans per point, shipped template;"
                + " best of %d; heap max %.0f MB%n", wavelengths, scans, trials, Runtime.getRuntime().maxMemory() / MB);
        out.println("warming up both ...");
        out.flush();
        Path dir = Files.createTempDirectory("strandbook-bench-export");
        try {
            DossierContent warm = SyntheticDossier.build(Math.min(20, sizes.get(0)), scans, wavelengths);
            for (int w = 0; w < Math.min(WARM_UPS, trials); w++) {
                floor(0, ours(warm, dir).summary(), dir);
            }
            Run first = null;
            Run lastOurs = null;
            Run lastFloor = null;
            for (int n : sizes) {
                DossierContent content = SyntheticDossier.build(n, scans, wavelengths);
                Run o = null;
                Run f = null;
                for (int t = 0; t < trials; t++) {
                    Run oi = ours(content, dir);
                    Run fi = floor(n, oi.summary(), dir);
                    o = o == null ? oi : o.best(oi);
                    f = f == null ? fi : f.best(fi);
                }
                print(out, "dossier", o);
                print(out, "floor  ", f);
                out.flush();
                first = first == null ? o : first;
                lastOurs = o;
                lastFloor = f;
            }
            if (first != lastOurs) {
                double grownMb = (lastOurs.heap().afterGcPeakBytes() - first.heap().afterGcPeakBytes()) / MB;
                double perChartKb = grownMb * 1024 / Math.max(1, lastOurs.summary().charts() - first.summary().charts());
                out.printf(Locale.ROOT, "heap: from N=%d to N=%d the cells grow %.0f-fold and the peak heap in use after"
                                + " a collection grows by %.0f MB, %.0f KB per chart: the charts (two per point) are held"
                                + " as XML until the file is written, their cached values are not (they are written"
                                + " from the site's data as the file is); rows stream to disk, %d rows per sheet in"
                                + " memory%n", first.points(), lastOurs.points(), (double) lastOurs.cells() / first.cells(),
                        grownMb, perChartKb, DossierWriter.ROWS_IN_MEMORY_PER_SHEET);
            }
            out.printf(Locale.ROOT, "CPU-time ratio (less sensitive to other programs on the machine): %.3f%n",
                    lastFloor.cpuSeconds() / lastOurs.cpuSeconds());
            out.printf(Locale.ROOT, "ratio: %.3f%n", lastFloor.seconds() / lastOurs.seconds());
            out.flush();
        } finally {
            try (var files = Files.list(dir)) {
                for (Path p : files.toList()) {
                    Files.deleteIfExists(p);
                }
            }
            Files.deleteIfExists(dir);
        }
        return CommandLine.ExitCode.OK;
    }

    /** CPU time of the whole process, collector and compiler threads included. */
    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    private static void print(PrintWriter out, String what, Run r) {
        out.printf(Locale.ROOT, "%s N=%-5d %7.2f s (CPU %6.2f s)  %,12d cells  %,9.0f cells/s  file %6.1f MB"
                        + "  peak heap %5.0f MB (after GC %4.0f MB, before %3.0f MB)%s%n", what, r.points(), r.seconds(),
                r.cpuSeconds(), r.cells(), r.cells() / r.seconds(), r.bytes() / MB, r.heap().poolPeakBytes() / MB,
                r.heap().afterGcPeakBytes() / MB, r.heap().baselineBytes() / MB,
                r.summary() == null ? "" : String.format(Locale.ROOT, "  %d charts, %,d cached chart values",
                        r.summary().charts(), r.summary().chartPoints()));
    }

    private static Run ours(DossierContent content, Path dir) throws IOException {
        Path file = dir.resolve("dossier.xlsx");
        HeapWatch watch = HeapWatch.start();
        long cpu = processCpuNanos();
        long start = System.nanoTime();
        DossierSummary summary = DossierWriter.withShippedTemplate().write(content, file, true, DossierProgress.NONE);
        double seconds = (System.nanoTime() - start) * 1e-9;
        double cpuSeconds = (processCpuNanos() - cpu) * 1e-9;
        HeapWatch.Use heap = watch.stop();
        long bytes = Files.size(file);
        Files.delete(file);
        return new Run(content.points().size(), seconds, cpuSeconds, summary.cells(), bytes, heap, summary);
    }

    /** The floor: a bare streaming workbook filling the same cells (see {@link StreamingFloor}). */
    private static Run floor(int n, DossierSummary like, Path dir) throws IOException {
        Path file = dir.resolve("floor.xlsx");
        HeapWatch watch = HeapWatch.start();
        long cpu = processCpuNanos();
        long start = System.nanoTime();
        StreamingFloor.write(like, file);
        double seconds = (System.nanoTime() - start) * 1e-9;
        double cpuSeconds = (processCpuNanos() - cpu) * 1e-9;
        HeapWatch.Use heap = watch.stop();
        long bytes = Files.size(file);
        Files.delete(file);
        return new Run(n, seconds, cpuSeconds, like.cells(), bytes, heap, null);
    }
}
