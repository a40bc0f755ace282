package org.strandbook.samplesite;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CancellationException;

import org.strandbook.intake.ScanFileImporter;
import org.strandbook.intake.ScheduleImporter;
import org.strandbook.scanfile.DelimitedSpectrumWriter;
import org.strandbook.scanfile.JcampDxWriter;
import org.strandbook.scanfile.SpectrumFile;
import org.strandbook.scanfile.XUnit;
import org.strandbook.schedule.CableSchedule;
import org.strandbook.schedule.CableScheduleWriter;
import org.strandbook.schedule.ComponentCatalog;
import org.strandbook.schedule.ScheduleProblem;
import org.strandbook.site.DetectorType;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanKind;
import org.strandbook.store.Workbook;

/**
 * Builds the demo plant as a technician would: the contractor's filled cable schedule (XLSX), the
 * analyzers' scan files (JCAMP-DX from the Fourier-transform NIR analyzer, semicolon-separated text
 * with decimal commas from the diode-array one), and a fresh workbook into which both are imported
 * through the same code paths as {@code strandbook import-schedule} and {@code import-scans}.
 */
public final class DemoSite {

    public static final String WORKBOOK_NAME = "saltmarsh-ridge.strandbook";
    public static final String SCHEDULE_NAME = "saltmarsh-ridge-cable-schedule.xlsx";
    public static final String USER = "demo";

    private static final DateTimeFormatter FILE_TIME = DateTimeFormatter.ofPattern("uuuuMMdd-HHmm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter JCAMP_TIME = DateTimeFormatter.ofPattern("uuuu/MM/dd HH:mm:ss",
            Locale.ROOT).withZone(ZoneOffset.UTC);

    /** Told what the build is doing, for a progress line; may ask the build to stop. */
    @FunctionalInterface
    public interface Progress {
        void step(String what);

        /** Asked between steps and between scan files: true stops the build, which then leaves no workbook. */
        default boolean stopRequested() {
            return false;
        }
    }

    /** What was built, and what the generator injected at each point. */
    public record Built(Path workbook, Path schedule, Path scanFolder, int scanFiles,
                        Map<String, InjectedFault> injected) {
    }

    private DemoSite() {
    }

    /**
     * Writes the schedule, the scan files and a new workbook into {@code folder}, which must not
     * already hold a demo workbook.
     */
    public static Built build(Path folder, long seed, Progress progress) throws IOException {
        Files.createDirectories(folder);
        Path workbookFile = folder.resolve(WORKBOOK_NAME);
        if (Files.exists(workbookFile)) {
            throw new IllegalArgumentException("a demo workbook already exists at " + workbookFile
                    + "; choose another folder or remove it");
        }
        DemoPlant plant = new DemoPlant();
        progress.step("writing the contractor's cable schedule");
        Path schedule = folder.resolve(SCHEDULE_NAME);
        CableScheduleWriter.write(schedule(plant), schedule);

        progress.step("generating scan files (seed " + seed + ")");
        ScanGenerator generator = new ScanGenerator(plant, seed);
        List<GeneratedScan> scans = generator.generate();
        Path scanFolder = folder.resolve("scans");
        Map<String, List<Path>> groups = new LinkedHashMap<>();
        for (GeneratedScan s : scans) {
            stopIfRequested(progress);
            Path file = writeScanFile(scanFolder, s, plant);
            groups.computeIfAbsent(s.pointTag() + "\u0000" + s.kind().name(), k -> new ArrayList<>()).add(file);
        }

        stopIfRequested(progress);
        progress.step("creating workbook " + workbookFile.getFileName());
        // built under a hidden name and moved into place when whole: a stopped or failed build
        // leaves no half-filled sample site for the next open to find
        Path draft = folder.resolve("." + WORKBOOK_NAME + ".building");
        deleteWorkbookFiles(draft);
        try {
            try (Workbook workbook = Workbook.create(draft, plant.site(), USER)) {
                fill(workbook, schedule, groups, scans.size(), progress);
                progress.step("recording inspections, notes, sign-offs and maintenance");
                DemoRecords.add(workbook, plant);
            }
            Files.move(draft, workbookFile);
        } finally {
            deleteWorkbookFiles(draft);
        }
        return new Built(workbookFile, schedule, scanFolder, scans.size(), generator.injected());
    }

    private static void fill(Workbook workbook, Path schedule, Map<String, List<Path>> groups, int scanFiles,
                             Progress progress) {
        progress.step("importing the cable schedule");
        ScheduleImporter.Outcome outcome = new ScheduleImporter().importFile(workbook, schedule);
        if (!outcome.written()) {
            throw new IllegalStateException("the demo's own schedule was refused: "
                    + outcome.problems().stream().map(ScheduleProblem::toString).toList());
        }
        int done = 0;
        for (Map.Entry<String, List<Path>> g : groups.entrySet()) {
            String[] key = g.getKey().split("\u0000");
            ScanFileImporter.Summary summary = new ScanFileImporter().importFiles(workbook,
                    new ScanFileImporter.Request(key[0], ScanKind.valueOf(key[1]), g.getValue(), Optional.empty(),
                            USER), (n, total, file) -> !progress.stopRequested());
            stopIfRequested(progress);
            if (!summary.rejected().isEmpty()) {
                throw new IllegalStateException("the demo's own scan file was refused: "
                        + summary.rejected().get(0).reason());
            }
            int before = done;
            done += g.getValue().size();
            if (done * 5 / scanFiles > before * 5 / scanFiles) {
                progress.step(String.format(Locale.ROOT, "imported %d of %d scan files", done, scanFiles));
            }
        }
    }

    private static void stopIfRequested(Progress progress) {
        if (progress.stopRequested()) {
            throw new CancellationException("the sample site build was stopped");
        }
    }

    private static void deleteWorkbookFiles(Path file) throws IOException {
        for (String suffix : new String[] {"", "-wal", "-shm", "-journal"}) {
            Files.deleteIfExists(file.resolveSibling(file.getFileName() + suffix));
        }
    }

    /** The demo plant as the contractor's schedule: its analyzers, points, legs and its own catalog. */
    public static CableSchedule schedule(DemoPlant plant) {
        List<PathLeg> legs = new ArrayList<>();
        plant.points().forEach(p -> {
            legs.add(p.send());
            legs.add(p.ret());
        });
        return new CableSchedule(plant.analyzers(), plant.points().stream().map(DemoPlant.DemoPoint::point).toList(),
                legs, new ComponentCatalog(plant.fiberTypes(), plant.connectorTypes(), plant.probeTypes()));
    }

    private static Path writeScanFile(Path folder, GeneratedScan s, DemoPlant plant) throws IOException {
        boolean diodeArray = plant.analyzers().stream().anyMatch(a -> a.tag().equals(s.analyzerTag())
                && a.detector() == DetectorType.SILICON);
        Path dir = folder.resolve(s.pointTag());
        Files.createDirectories(dir);
        String base = s.pointTag() + "_" + FILE_TIME.format(s.takenAt()) + "_" + s.kind().word();
        Map<String, String> meta = new LinkedHashMap<>();
        String title = s.pointTag() + " " + s.kind().word() + " scan, " + s.analyzerTag();
        if (diodeArray) {
            meta.put("taken_at", s.takenAt().toString());
            meta.put("operator", s.operator());
            meta.put("integration_ms", String.format(Locale.ROOT, "%.0f", s.integrationMs()));
            meta.put("analyzer", s.analyzerTag());
            SpectrumFile f = SpectrumFile.inMemory(title, XUnit.NM, "Counts", s.wavelengthsNm(), s.counts(), meta);
            Path file = dir.resolve(base + ".csv");
            DelimitedSpectrumWriter.of(DelimitedSpectrumWriter.Delimiter.SEMICOLON, true).write(f, file);
            return file;
        }
        meta.put("LONGDATE", JCAMP_TIME.format(s.takenAt()) + " +0000");
        meta.put("OWNER", s.operator());
        meta.put("$INTEGRATION TIME MS", String.format(Locale.ROOT, "%.0f", s.integrationMs()));
        meta.put("$ANALYZER", s.analyzerTag());
        SpectrumFile f = SpectrumFile.inMemory(title, XUnit.WAVENUMBER_CM, "COUNTS", s.wavelengthsNm(), s.counts(),
                meta);
        Path file = dir.resolve(base + ".jdx");
        JcampDxWriter.difDup().write(f, file);
        return file;
    }
}
