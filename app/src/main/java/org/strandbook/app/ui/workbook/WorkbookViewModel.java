package org.strandbook.app.ui.workbook;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Function;

import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import org.strandbook.app.ui.catalog.ConnectorSheet;
import org.strandbook.app.ui.catalog.FiberSheet;
import org.strandbook.app.ui.catalog.ProbeSheet;
import org.strandbook.app.ui.plot.PlotAxes;
import org.strandbook.app.ui.safety.SafetyCaution;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.app.ui.task.TaskExecutor;
import org.strandbook.intake.ScheduleImporter;
import org.strandbook.schedule.ScheduleProblem;
import org.strandbook.site.Analyzer;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ProbeType;
import org.strandbook.site.Site;

/**
 * The window's view model: which workbook is open, the site's sheets (points and catalogs), the
 * selected point ({@link PointViewModel}) and the messages. Every call to the
 * {@link WorkbookService} runs as a job of the {@link TaskExecutor}; results come back on the
 * executor's delivery thread (the FX thread in the window), where this class and its sheets live.
 *
 * <p>Each applied sheet change is taken into the site in memory at once, where the predictions
 * follow, and saved in the background (a workbook, not a document to remember to save). After a
 * workbook opens, its points are evaluated against their scans in small batches, so that a point
 * chosen meanwhile is not kept waiting behind the whole site.
 */
public final class WorkbookViewModel {

    /** Points evaluated per background job when the whole site is evaluated. */
    static final int SITE_BATCH = 5;

    private record ScheduleImport(ScheduleImporter.Outcome outcome, LoadedSite loaded) {
    }

    private record Batch(List<PointStatus> statuses, boolean stopped) {
    }

    private final WorkbookService service;
    private final TaskExecutor tasks;
    private final RecentFiles recent;
    private final Path sampleFolder;
    private final Optional<DossierExport> dossier;
    private final SafetyCaution caution = new SafetyCaution();
    private final OpenSite site = new OpenSite();
    private final Map<String, PointStatus> measured = new HashMap<>();
    private final Map<String, Integer> pointRow = new HashMap<>();
    private int siteRun;
    private boolean evaluateOnOpen = true;

    private final SheetModel<MeasurementPoint> points;
    private final SheetModel<FiberType> fibers = FiberSheet.create();
    private final SheetModel<ConnectorType> connectors = ConnectorSheet.create();
    private final SheetModel<ProbeType> probes = ProbeSheet.create();
    private final PointViewModel point;
    private final AttentionViewModel attention;
    private final PlantServerViewModel plantServer;

    private final ReadOnlyObjectWrapper<SiteOutline> outline = new ReadOnlyObjectWrapper<>(this, "outline",
            new SiteOutline(site.site(), List.of(), List.of()));
    private final ReadOnlyBooleanWrapper open = new ReadOnlyBooleanWrapper(this, "open", false);
    private final ReadOnlyStringWrapper selectedTag = new ReadOnlyStringWrapper(this, "selectedTag", "");
    private final ReadOnlyStringWrapper notice = new ReadOnlyStringWrapper(this, "notice", "");
    private final ReadOnlyStringWrapper syncState = new ReadOnlyStringWrapper(this, "syncState", "");
    private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "Strandbook \u2013 no workbook open");
    private final ReadOnlyObjectWrapper<List<Path>> recentFiles = new ReadOnlyObjectWrapper<>(this, "recentFiles", List.of());
    private final ReadOnlyObjectWrapper<List<String>> scheduleProblems = new ReadOnlyObjectWrapper<>(this,
            "scheduleProblems", List.of());
    private final ReadOnlyBooleanWrapper lightSourceOn = new ReadOnlyBooleanWrapper(this, "lightSourceOn", false);

    /**
     * @param sampleFolder where the sample site is built when the user asks for it
     * @param dossier      the dossier export, when this build has one
     */
    public WorkbookViewModel(WorkbookService service, TaskExecutor tasks, PlotAxes axes, RecentFiles recent,
                             Path sampleFolder, Optional<DossierExport> dossier) {
        this.service = service;
        this.tasks = tasks;
        this.recent = recent;
        this.sampleFolder = sampleFolder;
        this.dossier = dossier;
        this.points = PointSheet.create(() -> site.analyzers().stream().map(Analyzer::tag).toList(),
                () -> site.probes().stream().map(ProbeType::code).toList(),
                p -> PointSheet.figures(site.predict(p), measured.get(p.tag())));
        this.point = new PointViewModel(site, service, tasks, axes, new PointEvents() {
            @Override
            public void legsChanged(String pointTag) {
                attention.invalidate();
                recomputePointRow(pointTag);
            }

            @Override
            public void evaluated(PointStatus status) {
                measured.put(status.pointTag(), status);
                recomputePointRow(status.pointTag());
            }

            @Override
            public void scanSettingsRead(String pointTag, String words) {
                notice.set(pointTag + " latest scans: " + words);
            }

            @Override
            public void saveFailed(Exception e) {
                failAndReload(e);
            }

            @Override
            public void pathReplaced(String pointTag) {
                tasks.submit("Reading the workbook again", service::reload, WorkbookViewModel.this::onLoaded,
                        WorkbookViewModel.this::fail);
            }

            @Override
            public void recorded(String pointTag) {
                attention.invalidate();
            }

            @Override
            public void failed(Exception e) {
                fail(e);
            }
        });
        this.attention = new AttentionViewModel(service, tasks, this::selectPoint);
        this.plantServer = new PlantServerViewModel(service, tasks, System.getenv(),
                Path.of(System.getProperty("user.home")), this::onLoaded, notice::set);
        points.addChangeListener(this::pointsEdited);
        fibers.addChangeListener(rows -> catalogEdited(rows, site.connectors(), site.probes()));
        connectors.addChangeListener(rows -> catalogEdited(site.fibers(), rows, site.probes()));
        probes.addChangeListener(rows -> catalogEdited(site.fibers(), site.connectors(), rows));
        recentFiles.set(recent.list());
    }

    // ---- sheets, plots and properties

    public SheetModel<MeasurementPoint> points() {
        return points;
    }

    public SheetModel<FiberType> fibers() {
        return fibers;
    }

    public SheetModel<ConnectorType> connectors() {
        return connectors;
    }

    public SheetModel<ProbeType> probes() {
        return probes;
    }

    /** The site's attention view: what needs a crew, most urgent first. */
    public AttentionViewModel attention() {
        return attention;
    }

    /** Opening a site from the plant server, syncing with it, and the conflicts waiting for a choice. */
    public PlantServerViewModel plantServer() {
        return plantServer;
    }

    /** The selected point's sheets and plots. */
    public PointViewModel point() {
        return point;
    }

    public TaskExecutor tasks() {
        return tasks;
    }

    public SafetyCaution caution() {
        return caution;
    }

    public Path sampleFolder() {
        return sampleFolder;
    }

    public boolean dossierAvailable() {
        return dossier.isPresent();
    }

    public Optional<String> dossierExtension() {
        return dossier.map(DossierExport::extension);
    }

    public ReadOnlyObjectProperty<SiteOutline> outlineProperty() {
        return outline.getReadOnlyProperty();
    }

    /** True while a workbook is open; without one the window offers to open or start one. */
    public ReadOnlyBooleanProperty openProperty() {
        return open.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty selectedTagProperty() {
        return selectedTag.getReadOnlyProperty();
    }

    /** The open workbook's standing with its plant server, in words; empty when none is open. */
    public ReadOnlyStringProperty syncStateProperty() {
        return syncState.getReadOnlyProperty();
    }

    /** The last failure or refusal worth telling the user about. */
    public ReadOnlyStringProperty noticeProperty() {
        return notice.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty titleProperty() {
        return title.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<List<Path>> recentFilesProperty() {
        return recentFiles.getReadOnlyProperty();
    }

    /** The problems of the last refused cable schedule, one line each (sheet!cell: what is wrong). */
    public ReadOnlyObjectProperty<List<String>> scheduleProblemsProperty() {
        return scheduleProblems.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty lightSourceOnProperty() {
        return lightSourceOn.getReadOnlyProperty();
    }

    /** The open workbook's file. */
    public Optional<Path> file() {
        return site.file();
    }

    /** Whether opening a workbook evaluates its points against their scans at once (on by default). */
    public void setEvaluateOnOpen(boolean evaluate) {
        evaluateOnOpen = evaluate;
    }

    // ---- workbook actions

    /**
     * What the window does first: opens {@code requested}, else the most recent workbook that still
     * exists; with neither, the window offers the sample site.
     */
    public void start(Optional<Path> requested) {
        if (requested.isPresent()) {
            open(requested.get());
            return;
        }
        recent.list().stream().filter(Files::isRegularFile).findFirst().ifPresentOrElse(this::open,
                () -> notice.set("No workbook open: open one, start a new one, or look around the sample site"));
    }

    public void open(Path file) {
        run("Opening " + file.getFileName(), p -> service.open(file, p));
    }

    /** Opens the sample site in the given folder, building it there first when it is not there yet. */
    public void openSample(Path folder) {
        run("Opening the sample site", p -> service.openSample(folder, p));
    }

    public void createWorkbook(Path file, String siteName) {
        Site newSite;
        try {
            newSite = new Site(siteName);
        } catch (IllegalArgumentException e) {
            fail(e);
            return;
        }
        tasks.submit("Creating " + file.getFileName(), p -> service.create(file, newSite, p), loaded -> {
            onLoaded(loaded);
            notice.set("New workbook for " + newSite.name() + ": import the contractor's cable schedule "
                    + "(File \u25B8 Import cable schedule) to fill it");
        }, this::fail);
    }

    public void saveAs(Path file) {
        if (!site.isOpen()) {
            notice.set("No workbook is open to save");
            return;
        }
        tasks.submit("Saving a copy as " + file.getFileName(), p -> service.saveAs(file, p), saved -> {
            site.setFile(saved);
            remember(saved);
            updateTitle();
            notice.set("Saved as " + saved + "; you are now working in the copy");
        }, this::fail);
    }

    /** Imports a filled cable schedule; a refused schedule's problems appear in {@link #scheduleProblemsProperty()}. */
    public void importSchedule(Path file) {
        if (!site.isOpen()) {
            notice.set("Open or start a workbook before importing a cable schedule");
            return;
        }
        tasks.submit("Importing cable schedule " + file.getFileName(), p -> {
            ScheduleImporter.Outcome outcome = service.importSchedule(file);
            return new ScheduleImport(outcome, outcome.written() ? service.reload(p) : null);
        }, done -> {
            if (done.outcome().written()) {
                scheduleProblems.set(List.of());
                onLoaded(done.loaded());
                notice.set(String.format(Locale.ROOT, "Cable schedule imported: %d analyzers, %d points, %d legs, %d new catalog entries",
                        done.outcome().analyzers(), done.outcome().points(), done.outcome().legs(),
                        done.outcome().catalogEntries()));
            } else {
                scheduleProblems.set(done.outcome().problems().stream().map(ScheduleProblem::toString).toList());
                notice.set("Cable schedule " + file.getFileName() + " refused with " + done.outcome().problems().size()
                        + " problem(s); nothing was written");
            }
        }, this::fail);
    }

    public void exportDossier(Path target) {
        if (dossier.isEmpty() || !site.isOpen()) {
            notice.set("The dossier export is not part of this build");
            return;
        }
        tasks.submit("Writing the dossier " + target.getFileName(), p -> {
            service.exportDossier(dossier.get(), target, p);
            return target;
        }, done -> notice.set("Dossier written to " + done), this::fail);
    }

    /** Evaluates every point against its scans, a few points per background job; Cancel stops it. */
    public void evaluateSite() {
        if (!site.isOpen()) {
            return;
        }
        int run = ++siteRun;
        evaluateBatch(run, site.points().stream().map(MeasurementPoint::tag).toList(), 0);
    }

    private void evaluateBatch(int run, List<String> tags, int from) {
        if (from >= tags.size()) {
            return;
        }
        int to = Math.min(tags.size(), from + SITE_BATCH);
        List<String> batch = List.copyOf(tags.subList(from, to));
        int total = tags.size();
        tasks.submit("Evaluating the site", p -> {
            p.update((double) from / total, from + " of " + total + " points");
            List<PointStatus> done = service.evaluatePoints(batch, n -> {
                p.update((double) (from + n) / total, (from + n) + " of " + total + " points");
                return !p.isCancelled();
            });
            return new Batch(done, p.isCancelled());
        }, batchDone -> {
            if (run != siteRun) {
                return;
            }
            batchDone.statuses().forEach(s -> {
                measured.put(s.pointTag(), s);
                recomputePointRow(s.pointTag());
            });
            int reached = from + batchDone.statuses().size();
            if (batchDone.stopped()) {
                notice.set("Site evaluation stopped after " + reached + " of " + total + " points");
            } else if (reached < total) {
                evaluateBatch(run, tags, reached);
            } else {
                long failing = measured.values().stream().filter(s -> s.status().map(st -> st.name().equals("FAIL"))
                        .orElse(false)).count();
                notice.set("Site evaluated: " + total + " points, " + failing + " failing");
            }
        }, this::fail);
    }

    public void selectPoint(String tag) {
        if (tag == null || tag.equals(selectedTag.get())) {
            return;
        }
        site.point(tag).ifPresent(p -> {
            selectedTag.set(p.tag());
            point.show(p);
        });
    }

    /** Closes the workbook file once the jobs before this one are done. */
    public void close() {
        siteRun++;
        attention.clear();
        plantServer.workbookClosed();
        tasks.submit("Closing the workbook", p -> {
            service.close();
            return Boolean.TRUE;
        }, done -> { }, this::fail);
    }

    // ---- safety

    /** Why the user must read the safety caution before recording a measurement now, if they must. */
    public Optional<String> cautionBeforeRecording() {
        return point.point().filter(p -> p.hazardousArea() && caution.needed())
                .map(p -> SafetyCaution.reasonForHazardousPoint(p.tag()));
    }

    /** Why the user must read the safety caution before switching the light source on, if they must. */
    public Optional<String> cautionBeforeLightSource() {
        return caution.needed() ? Optional.of(SafetyCaution.REASON_LIGHT_SOURCE) : Optional.empty();
    }

    /** Records the light-source step; the view asks {@link #cautionBeforeLightSource()} first. */
    public void setLightSource(boolean on) {
        lightSourceOn.set(on);
        notice.set(on ? "Light source step: ON \u2013 do not view fiber ends or open joints" : "Light source step: off");
    }

    /**
     * The scan import for the selected point; the view asks {@link #cautionBeforeRecording()} first.
     * Empty when no point is selected.
     */
    public Optional<ScanImportViewModel> recordMeasurement() {
        return point.point().map(p -> new ScanImportViewModel(service, tasks, p.tag(), operator(), summary ->
                point.refreshMeasurements()));
    }

    private static String operator() {
        return Objects.requireNonNullElse(System.getProperty("user.name"), "");
    }

    // ---- internals

    private void run(String title, Function<JobProgress, LoadedSite> load) {
        tasks.submit(title, load::apply, this::onLoaded, this::fail);
    }

    private void onLoaded(LoadedSite loaded) {
        boolean sameFile = site.file().map(f -> f.equals(loaded.file())).orElse(false);
        String keep = sameFile ? selectedTag.get() : "";
        site.load(loaded);
        syncState.set(loaded.syncState());
        plantServer.workbookLoaded(loaded.file());
        if (!sameFile) {
            measured.clear();
        }
        pointRow.clear();
        List<MeasurementPoint> list = site.points();
        for (int i = 0; i < list.size(); i++) {
            pointRow.put(list.get(i).tag(), i);
        }
        points.load(list);
        fibers.load(site.fibers());
        connectors.load(site.connectors());
        probes.load(site.probes());
        outline.set(new SiteOutline(site.site(), site.analyzers(), list));
        open.set(true);
        attention.invalidate();
        remember(loaded.file());
        updateTitle();
        selectedTag.set("");
        Optional<MeasurementPoint> show = site.point(keep).or(() -> list.stream().findFirst());
        if (show.isPresent()) {
            selectedTag.set(show.get().tag());
            point.show(show.get());
        } else {
            point.clear();
        }
        if (evaluateOnOpen) {
            evaluateSite();
        }
    }

    private void pointsEdited(List<MeasurementPoint> rows) {
        List<MeasurementPoint> changed = site.replacePoints(rows);
        if (changed.isEmpty()) {
            return;
        }
        changed.forEach(point::pointEdited);
        if (changed.stream().anyMatch(this::treeChanged)) {
            outline.set(new SiteOutline(site.site(), site.analyzers(), site.points()));
        }
        tasks.submit("Saving " + changed.size() + " point" + (changed.size() == 1 ? "" : "s"), p -> {
            service.savePoints(changed);
            return changed;
        }, done -> { }, this::failAndReload);
    }

    private boolean treeChanged(MeasurementPoint changed) {
        return outline.get().point(changed.tag()).map(before -> !before.analyzerTag().equals(changed.analyzerTag())
                || before.channel() != changed.channel() || before.hazardousArea() != changed.hazardousArea()).orElse(true);
    }

    private void catalogEdited(List<FiberType> f, List<ConnectorType> c, List<ProbeType> p) {
        List<FiberType> changedFibers = changed(site.fibers(), f);
        List<ConnectorType> changedConnectors = changed(site.connectors(), c);
        List<ProbeType> changedProbes = changed(site.probes(), p);
        site.setCatalog(f, c, p);
        points.recompute();
        point.catalogChanged();
        tasks.submit("Saving the catalog", job -> {
            service.saveCatalog(changedFibers, changedConnectors, changedProbes);
            return Boolean.TRUE;
        }, done -> { }, this::failAndReload);
    }

    private static <T> List<T> changed(List<T> before, List<T> after) {
        List<T> out = new ArrayList<>();
        for (int i = 0; i < after.size(); i++) {
            if (i >= before.size() || !after.get(i).equals(before.get(i))) {
                out.add(after.get(i));
            }
        }
        return out;
    }

    private void recomputePointRow(String tag) {
        Integer row = pointRow.get(tag);
        if (row != null) {
            points.recomputeRow(row);
        }
    }

    private void failAndReload(Exception e) {
        notice.set("Not saved: " + message(e) + ". The sheets now show what the workbook holds.");
        tasks.submit("Reading the workbook again", service::reload, this::onLoaded, this::fail);
    }

    private void remember(Path file) {
        recent.add(file);
        recentFiles.set(recent.list());
    }

    private void updateTitle() {
        title.set("Strandbook \u2013 " + site.site().name() + " \u2013 "
                + site.file().map(f -> f.getFileName().toString()).orElse("no file"));
    }

    private void fail(Exception e) {
        notice.set(message(e));
    }

    private static String message(Exception e) {
        return Objects.requireNonNullElse(e.getMessage(), e.getClass().getSimpleName());
    }
}
