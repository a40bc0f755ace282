package org.strandbook.app.ui.workbook;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.function.IntPredicate;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.evaluation.PointInputs;
import org.strandbook.evaluation.Urgency;
import org.strandbook.evaluation.WorkbookInputs;
import org.strandbook.handover.FollowUps;
import org.strandbook.handover.PointEvent;
import org.strandbook.handover.PointHistory;
import org.strandbook.handover.PointSigning;
import org.strandbook.intake.ScanFileImporter;
import org.strandbook.site.Inspection;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.Note;
import org.strandbook.site.SignOff;
import org.strandbook.intake.ScheduleImporter;
import org.strandbook.samplesite.DemoSite;
import org.strandbook.samplesite.ScanGenerator;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;
import org.strandbook.server.PlantServer;
import org.strandbook.server.ServerLogin;
import org.strandbook.server.SiteClone;
import org.strandbook.server.SiteSync;
import org.strandbook.store.SyncLedger;
import org.strandbook.store.Workbook;
import org.strandbook.store.WithdrawnRecord;
import org.strandbook.store.WorkbookException;

/**
 * The window's workbook on a SQLite file through core's {@link Workbook}: one connection, opened,
 * used and closed by the task executor's single worker thread. Every change goes through the
 * store's repositories, so it is one transaction and lands in the audit trail under the user's name.
 */
public final class SqliteWorkbookService implements WorkbookService {

    private static final DateTimeFormatter SYNCED_AT = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    private static final Pattern COUNT = Pattern.compile("(\\d+) of (\\d+)");

    private final String user;
    private final PointEvaluator evaluator = PointEvaluator.withDefaults();
    private Workbook workbook;

    /** @param user the name the audit trail records for every change */
    public SqliteWorkbookService(String user) {
        this.user = user;
    }

    @Override
    public synchronized LoadedSite open(Path file, JobProgress progress) {
        progress.update(-1, "opening " + file.getFileName());
        return switchTo(Workbook.open(file, user), progress);
    }

    @Override
    public synchronized LoadedSite create(Path file, Site site, JobProgress progress) {
        progress.update(-1, "creating " + file.getFileName());
        return switchTo(Workbook.create(file, site, user), progress);
    }

    @Override
    public synchronized LoadedSite openSample(Path folder, JobProgress progress) {
        Path file = folder.resolve(DemoSite.WORKBOOK_NAME);
        if (!Files.exists(file)) {
            try {
                DemoSite.build(folder, ScanGenerator.DEMO_SEED, new DemoSite.Progress() {
                    @Override
                    public void step(String what) {
                        progress.update(fractionOf(what), what);
                    }

                    @Override
                    public boolean stopRequested() {
                        return progress.isCancelled();
                    }
                });
            } catch (IOException e) {
                throw new WorkbookProblem("cannot build the sample site in " + folder + " (" + e.getMessage() + ")", e);
            }
        }
        return open(file, progress);
    }

    /** The build says "imported 108 of 270 scan files" as it goes: enough for a progress bar. */
    private static double fractionOf(String step) {
        Matcher m = COUNT.matcher(step);
        return m.find() ? Double.parseDouble(m.group(1)) / Math.max(1, Double.parseDouble(m.group(2))) : -1;
    }

    @Override
    public synchronized LoadedSite reload(JobProgress progress) {
        return read(require(), progress);
    }

    private static LoadedSite read(Workbook wb, JobProgress progress) {
        Site site = wb.site().get();
        List<Analyzer> analyzers = wb.site().analyzers();
        List<MeasurementPoint> points = wb.points().list();
        Map<String, List<PathLeg>> legs = new HashMap<>();
        for (int i = 0; i < points.size(); i++) {
            String tag = points.get(i).tag();
            if (i % 25 == 0) {
                progress.update((double) i / points.size(), String.format(Locale.ROOT, "light paths, %d of %d points",
                        i, points.size()));
            }
            legs.put(tag, wb.paths().legs(tag));
        }
        return new LoadedSite(wb.file(), site, analyzers, points, wb.catalog().fiberTypes(),
                wb.catalog().connectorTypes(), wb.catalog().probeTypes(), legs, syncState(wb),
                wb.site().decisionRule());
    }

    /** The workbook's standing with its plant server, as the status bar says it. */
    static String syncState(Workbook wb) {
        Optional<SyncLedger.State> state = wb.syncLedger().peek();
        if (state.isEmpty() || state.get().syncedAt() == null) {
            return "Plant server: never synced";
        }
        long open = wb.syncLedger().conflicts().stream().filter(SyncLedger.Conflict::open).count();
        return "Plant server: synced " + SYNCED_AT.format(state.get().syncedAt()) + " UTC with " + state.get().server()
                + (open == 0 ? "" : "; " + open + " conflict(s) wait in Edits to settle");
    }

    @Override
    public synchronized Path saveAs(Path file, JobProgress progress) {
        Workbook wb = require();
        Path source = wb.file().toAbsolutePath().normalize();
        Path target = file.toAbsolutePath().normalize();
        if (source.equals(target)) {
            return target;
        }
        progress.update(-1, "copying to " + target.getFileName());
        // one consistent snapshot written beside the target and moved into place; the window then
        // works on in the copy, as Save As does in any editor
        try {
            wb.copyTo(target);
        } catch (WorkbookException e) {
            throw new WorkbookProblem(e.getMessage(), e);
        }
        Workbook copy = Workbook.open(target, user);
        wb.close();
        workbook = copy;
        return target;
    }

    @Override
    public synchronized Optional<Path> file() {
        return workbook == null ? Optional.empty() : Optional.of(workbook.file());
    }

    @Override
    public synchronized List<ScanRecord> scans(String pointTag) {
        return require().scans().list(pointTag);
    }

    @Override
    public synchronized void savePoints(List<MeasurementPoint> points) {
        Workbook wb = require();
        wb.inTransaction(() -> points.forEach(wb.points()::save));
    }

    @Override
    public synchronized void saveLegs(String pointTag, List<PathLeg> legs) {
        require().paths().replaceLegs(pointTag, legs);
    }

    @Override
    public synchronized void saveCatalog(List<FiberType> fibers, List<ConnectorType> connectors, List<ProbeType> probes) {
        Workbook wb = require();
        wb.inTransaction(() -> {
            fibers.forEach(wb.catalog()::saveFiberType);
            connectors.forEach(wb.catalog()::saveConnectorType);
            probes.forEach(wb.catalog()::saveProbeType);
        });
    }

    @Override
    public synchronized PointEvaluation evaluatePoint(String pointTag) {
        Workbook wb = require();
        Catalog catalog = Catalog.of(wb.catalog().fiberTypes(), wb.catalog().connectorTypes(), wb.catalog().probeTypes());
        return evaluator.evaluate(inputs(wb, wb.site().get(), catalog, pointTag), wb.site().decisionRule());
    }

    @Override
    public synchronized List<PointStatus> evaluatePoints(List<String> pointTags, IntPredicate pointDone) {
        Workbook wb = require();
        Site site = wb.site().get();
        Catalog catalog = Catalog.of(wb.catalog().fiberTypes(), wb.catalog().connectorTypes(), wb.catalog().probeTypes());
        DecisionRule rule = wb.site().decisionRule();
        List<PointStatus> out = new ArrayList<>();
        for (int i = 0; i < pointTags.size(); i++) {
            String tag = pointTags.get(i);
            try {
                PointEvaluation e = evaluator.evaluate(inputs(wb, site, catalog, tag), rule);
                out.add(new PointStatus(tag, Optional.of(e.status()), e.shortFinding()));
            } catch (IllegalArgumentException e) {
                out.add(new PointStatus(tag, Optional.empty(), e.getMessage()));
            }
            if (!pointDone.test(i + 1)) {
                break;
            }
        }
        return out;
    }

    @Override
    public synchronized WithdrawnRecord withdrawLatest(String pointTag) {
        return require().withdrawal().withdrawLatest(pointTag);
    }

    @Override
    public synchronized List<AttentionRow> attention(PointsDone progress) {
        Workbook wb = require();
        Site site = wb.site().get();
        Catalog catalog = Catalog.of(wb.catalog().fiberTypes(), wb.catalog().connectorTypes(), wb.catalog().probeTypes());
        List<MeasurementPoint> points = wb.points().list();
        List<PointEvaluation> evaluated = new ArrayList<>();
        Map<String, String> refused = new LinkedHashMap<>();
        DecisionRule rule = wb.site().decisionRule();
        for (int i = 0; i < points.size(); i++) {
            String tag = points.get(i).tag();
            try {
                evaluated.add(evaluator.evaluate(inputs(wb, site, catalog, tag), rule));
            } catch (IllegalArgumentException e) {
                refused.put(tag, e.getMessage());
            }
            if (!progress.done(i + 1, points.size())) {
                throw new CancellationException("ranking stopped");
            }
        }
        List<AttentionRow> rows = new ArrayList<>();
        for (PointEvaluation e : Urgency.rank(evaluated)) {
            String tag = e.point().tag();
            rows.add(new AttentionRow(rows.size() + 1, tag, Optional.of(e.status()),
                    e.worstBand().map(v -> v.band().name()).orElse(""), Urgency.leastMarginDb(e),
                    Urgency.runOutDate(e), e.shortFinding(), FollowUps.of(e, wb.maintenance().list(tag))));
        }
        refused.forEach((tag, why) -> rows.add(new AttentionRow(rows.size() + 1, tag, Optional.empty(), "", Double.NaN,
                Optional.empty(), why, List.of())));
        return rows;
    }

    private static PointInputs inputs(Workbook wb, Site site, Catalog catalog, String tag) {
        MeasurementPoint point = wb.points().get(tag)
                .orElseThrow(() -> new IllegalArgumentException("no point tagged '" + tag + "' in this workbook"));
        Analyzer analyzer = wb.site().analyzer(point.analyzerTag()).orElseThrow(() ->
                new IllegalArgumentException("point " + tag + ": unknown analyzer '" + point.analyzerTag() + "'"));
        return WorkbookInputs.of(wb, site, point, analyzer, catalog, wb.scans().list(tag));
    }

    @Override
    public synchronized List<PointEvent> history(String pointTag) {
        return PointHistory.read(require(), pointTag);
    }

    @Override
    public synchronized void addInspection(Inspection inspection) {
        require().inspections().add(inspection);
    }

    @Override
    public synchronized void addMaintenance(MaintenanceAction action) {
        require().maintenance().add(action);
    }

    @Override
    public synchronized void addNote(Note note) {
        require().notes().add(note);
    }

    @Override
    public synchronized void signOff(SignOff signOff) {
        PointSigning.sign(require(), signOff);
    }

    @Override
    public synchronized ScanFileImporter.Summary importScans(ScanFileImporter.Request request,
                                                             ScanFileImporter.Progress progress) {
        return new ScanFileImporter().importFiles(require(), request, progress);
    }

    @Override
    public synchronized ScheduleImporter.Outcome importSchedule(Path file) {
        return new ScheduleImporter().importFile(require(), file);
    }

    @Override
    public synchronized void exportDossier(DossierExport export, Path target, JobProgress progress) throws Exception {
        export.export(require(), target, progress);
    }

    @Override
    public List<String> serverSites(ServerLogin login) {
        PlantServer server = new PlantServer(login);
        server.migrate();
        return server.siteNames();
    }

    @Override
    public synchronized LoadedSite cloneFromServer(ServerLogin login, String siteName, Path target,
                                                   JobProgress progress) {
        if (Files.exists(target)) {
            throw new WorkbookProblem(target + " exists; a clone never overwrites a file: choose a new name");
        }
        progress.update(-1, "reaching " + login.displayUrl());
        PlantServer server = new PlantServer(login);
        server.migrate();
        SiteClone.run(server, siteName, target, user, new ServerJobProgress(progress));
        return switchTo(Workbook.open(target, user), progress);
    }

    @Override
    public synchronized SyncedSite sync(ServerLogin login, JobProgress progress) {
        Workbook wb = require();
        progress.update(-1, "reaching " + login.displayUrl());
        PlantServer server = new PlantServer(login);
        server.migrate();
        String siteName = wb.syncLedger().peek().map(SyncLedger.State::siteName)
                .orElseGet(() -> wb.site().get().name());
        SiteSync.Outcome outcome = new SiteSync(server, wb, siteName, new ServerJobProgress(progress)).run();
        return new SyncedSite(read(wb, progress), outcome);
    }

    @Override
    public synchronized Optional<String> syncedServer() {
        return require().syncLedger().peek().map(SyncLedger.State::server).filter(s -> !s.isBlank());
    }

    @Override
    public synchronized List<SyncLedger.Conflict> openConflicts() {
        return require().syncLedger().conflicts().stream().filter(SyncLedger.Conflict::open).toList();
    }

    @Override
    public synchronized LoadedSite settleConflict(long conflictId, boolean keepMine, JobProgress progress) {
        Workbook wb = require();
        SiteSync.resolve(wb, conflictId, keepMine, user);
        return read(wb, progress);
    }

    @Override
    public synchronized void close() {
        if (workbook != null) {
            workbook.close();
            workbook = null;
        }
    }

    /** Reads {@code next} and only then closes the workbook open before, so a failure leaves that one open. */
    private LoadedSite switchTo(Workbook next, JobProgress progress) {
        LoadedSite loaded;
        try {
            loaded = read(next, progress);
        } catch (RuntimeException e) {
            next.close();
            throw e;
        }
        Workbook before = workbook;
        workbook = next;
        if (before != null) {
            before.close();
        }
        return loaded;
    }

    private Workbook require() {
        if (workbook == null) {
            throw new WorkbookProblem("no workbook is open");
        }
        return workbook;
    }
}
