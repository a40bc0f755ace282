package org.strandbook.app.ui.workbook;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import org.strandbook.app.ui.plot.SpectrumPlotModel;
import org.strandbook.app.ui.safety.SafetyCaution;
import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.RowFigures;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.app.ui.sheet.Verdict;
import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.app.ui.task.TaskExecutor;
import org.strandbook.site.Analyzer;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;
import org.strandbook.site.WavelengthBand;

/**
 * The window's view model: which workbook and point are shown, the sheets of that point, the plot
 * and the messages. Every call to the {@link WorkbookService} runs as a job of the
 * {@link TaskExecutor}; results come back on the executor's delivery thread (the FX thread in the
 * window), where this class and its sheets live.
 *
 * <p>Each applied sheet change is saved at once (a workbook, not a document to remember to save)
 * and the point re-evaluated; the points sheet's computed columns follow from the last evaluation
 * and the row's own tolerance and analyzer, so they change as soon as either is typed.
 */
public final class WorkbookViewModel {

    private record Loaded(SiteOutline outline, Catalog catalog, Map<String, PointBudget> budgets, Optional<Path> file) {
    }

    private final WorkbookService service;
    private final TaskExecutor tasks;
    private final SpectrumPlotModel plot;
    private final RecentFiles recent;
    private final SafetyCaution caution = new SafetyCaution();

    private SiteOutline outline = new SiteOutline(new Site("No workbook"), List.of(), List.of());
    private Catalog catalog = Catalog.EMPTY;
    private final Map<String, PointBudget> budgets = new HashMap<>();
    private MeasurementPoint point;
    private Optional<Path> file = Optional.empty();

    private final ReadOnlyObjectWrapper<SiteOutline> outlineProperty = new ReadOnlyObjectWrapper<>(this, "outline", outline);
    private final ReadOnlyStringWrapper selectedTag = new ReadOnlyStringWrapper(this, "selectedTag", "");
    private final ReadOnlyStringWrapper pointContext = new ReadOnlyStringWrapper(this, "pointContext", "No point selected");
    private final ReadOnlyStringWrapper budgetSummary = new ReadOnlyStringWrapper(this, "budgetSummary", "");
    private final ReadOnlyObjectWrapper<Verdict> budgetVerdict = new ReadOnlyObjectWrapper<>(this, "budgetVerdict");
    private final ReadOnlyStringWrapper notice = new ReadOnlyStringWrapper(this, "notice", "");
    private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "Strandbook");
    private final ReadOnlyObjectWrapper<List<Path>> recentFiles = new ReadOnlyObjectWrapper<>(this, "recentFiles", List.of());
    private final ReadOnlyBooleanWrapper lightSourceOn = new ReadOnlyBooleanWrapper(this, "lightSourceOn", false);

    private final SheetModel<MeasurementPoint> points;
    private final SheetModel<LegSegment> segments;
    private final SheetModel<LegJoint> joints;
    private final SheetModel<ScanRecord> scans;
    private final SheetModel<FiberType> fibers;

    public WorkbookViewModel(WorkbookService service, TaskExecutor tasks, SpectrumPlotModel plot, RecentFiles recent) {
        this.service = service;
        this.tasks = tasks;
        this.plot = plot;
        this.recent = recent;
        this.points = PointSheet.create(() -> outline, () -> catalog, this::pointFigures);
        this.segments = SegmentSheet.create(() -> catalog, this::centreNm);
        this.joints = JointSheet.create(() -> catalog);
        this.scans = ScanSheet.create();
        this.fibers = FiberSheet.create();
        points.addChangeListener(this::savePoints);
        segments.addChangeListener(rows -> saveLegs());
        joints.addChangeListener(rows -> saveLegs());
        fibers.addChangeListener(this::saveFibers);
        recentFiles.set(recent.list());
    }

    // ---- sheets and properties

    public SheetModel<MeasurementPoint> points() {
        return points;
    }

    public SheetModel<LegSegment> segments() {
        return segments;
    }

    public SheetModel<LegJoint> joints() {
        return joints;
    }

    public SheetModel<ScanRecord> scans() {
        return scans;
    }

    public SheetModel<FiberType> fibers() {
        return fibers;
    }

    public SpectrumPlotModel plot() {
        return plot;
    }

    public TaskExecutor tasks() {
        return tasks;
    }

    public SafetyCaution caution() {
        return caution;
    }

    public ReadOnlyObjectProperty<SiteOutline> outlineProperty() {
        return outlineProperty.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty selectedTagProperty() {
        return selectedTag.getReadOnlyProperty();
    }

    /** One line naming the point and its band, shown above its sheets. */
    public ReadOnlyStringProperty pointContextProperty() {
        return pointContext.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty budgetSummaryProperty() {
        return budgetSummary.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<Verdict> budgetVerdictProperty() {
        return budgetVerdict.getReadOnlyProperty();
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

    public ReadOnlyBooleanProperty lightSourceOnProperty() {
        return lightSourceOn.getReadOnlyProperty();
    }

    // ---- actions

    /** Loads the open workbook and shows its first point. */
    public void start() {
        tasks.submit("Opening workbook", this::loadAll, this::onLoaded, this::fail);
    }

    public void selectPoint(String tag) {
        if (tag == null || (point != null && tag.equals(point.tag()))) {
            return;
        }
        tasks.submit("Loading " + tag, p -> service.loadPoint(tag), this::showPoint, this::fail);
    }

    public void newWorkbook() {
        tasks.submit("New workbook", p -> {
            service.newWorkbook();
            return loadAll(p);
        }, this::onLoaded, this::fail);
    }

    public void open(Path file) {
        tasks.submit("Opening " + file.getFileName(), p -> {
            service.open(file);
            return loadAll(p);
        }, loaded -> {
            remember(file);
            onLoaded(loaded);
        }, this::fail);
    }

    public void saveAs(Path file) {
        tasks.submit("Saving as " + file.getFileName(), p -> {
            service.saveAs(file);
            return file;
        }, saved -> {
            remember(saved);
            this.file = Optional.of(saved);
            updateTitle();
        }, this::fail);
    }

    /** Why the user must read the safety caution before recording a measurement now, if they must. */
    public Optional<String> cautionBeforeRecording() {
        return point != null && point.hazardousArea() && caution.needed()
                ? Optional.of(SafetyCaution.reasonForHazardousPoint(point.tag())) : Optional.empty();
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

    /** Records measurement files for the shown point; the view asks {@link #cautionBeforeRecording()} first. */
    public void recordMeasurement(List<Path> files) {
        if (point == null || files.isEmpty()) {
            return;
        }
        String tag = point.tag();
        tasks.submit("Recording " + files.size() + " scan file" + (files.size() == 1 ? "" : "s") + " for " + tag,
                p -> service.importScans(tag, files, p), scans::load, this::fail);
    }

    // ---- internals

    private Loaded loadAll(JobProgress progress) {
        SiteOutline o = service.loadOutline();
        Catalog c = service.loadCatalog();
        return new Loaded(o, c, service.evaluateSite(progress), service.file());
    }

    private void onLoaded(Loaded loaded) {
        outline = loaded.outline();
        catalog = loaded.catalog();
        this.file = loaded.file();
        budgets.clear();
        budgets.putAll(loaded.budgets());
        points.load(outline.points());
        fibers.load(catalog.fibers());
        String keep = point == null ? null : point.tag();
        point = null;
        outlineProperty.set(outline);
        updateTitle();
        Optional<MeasurementPoint> next = keep == null ? Optional.empty() : outline.point(keep);
        if (next.isEmpty() && !outline.points().isEmpty()) {
            next = Optional.of(outline.points().get(0));
        }
        if (next.isPresent()) {
            selectPoint(next.get().tag());
        } else {
            selectedTag.set("");
            segments.load(List.of());
            joints.load(List.of());
            scans.load(List.of());
            pointContext.set("No point selected");
            budgetSummary.set("");
            budgetVerdict.set(null);
            plot.clear("No point selected");
        }
    }

    private void showPoint(PointRecords records) {
        point = records.point();
        selectedTag.set(point.tag());
        WavelengthBand band = point.bands().get(0);
        pointContext.set(point.tag() + " \u00B7 " + point.service() + " \u00B7 band " + PointSheet.bandText(band)
                + " nm, centre " + CellFormats.plain(band.centreNm()) + " nm"
                + (point.hazardousArea() ? " \u00B7 \u26A0 hazardous area" : ""));
        segments.load(records.segments());
        joints.load(records.joints());
        scans.load(records.scans());
        PointBudget known = budgets.get(point.tag());
        if (known != null) {
            showBudget(known);
        } else {
            String tag = point.tag();
            tasks.submit("Evaluating " + tag, p -> service.evaluate(tag, p), this::showBudget, this::fail);
        }
    }

    private void savePoints(List<MeasurementPoint> rows) {
        tasks.submit("Saving points", p -> {
            service.savePoints(rows);
            return loadAll(p);
        }, loaded -> {
            outline = loaded.outline();
            budgets.clear();
            budgets.putAll(loaded.budgets());
            outlineProperty.set(outline);
            if (point != null) {
                outline.point(point.tag()).ifPresent(p -> point = p);
                Optional.ofNullable(budgets.get(point.tag())).ifPresent(this::showBudget);
            }
            points.recompute();
        }, this::fail);
    }

    private void saveLegs() {
        if (point == null) {
            return;
        }
        String tag = point.tag();
        List<LegSegment> s = segments.records();
        List<LegJoint> j = joints.records();
        tasks.submit("Saving light path of " + tag, p -> {
            service.saveLegs(tag, s, j);
            return service.evaluate(tag, p);
        }, this::showBudget, this::fail);
    }

    private void saveFibers(List<FiberType> rows) {
        tasks.submit("Saving fiber catalog", p -> {
            service.saveFiberTypes(rows);
            return loadAll(p);
        }, loaded -> {
            catalog = loaded.catalog();
            budgets.clear();
            budgets.putAll(loaded.budgets());
            segments.recompute();
            joints.recompute();
            points.recompute();
            if (point != null) {
                Optional.ofNullable(budgets.get(point.tag())).ifPresent(this::showBudget);
            }
        }, this::fail);
    }

    private void showBudget(PointBudget budget) {
        budgets.put(budget.pointTag(), budget);
        points.recompute();
        if (point == null || !budget.pointTag().equals(point.tag())) {
            return;
        }
        double allowed = outline.analyzer(point.analyzerTag()).map(Analyzer::allowedLossDb).orElse(budget.allowedLossDb());
        double margin = allowed - budget.predictedLossDb();
        Verdict verdict = MarginVerdict.of(margin, point.effectiveToleranceDb(outline.site()));
        budgetVerdict.set(verdict);
        budgetSummary.set(String.format(Locale.ROOT,
                "%s  %s: predicted %.2f dB at %s nm, allowed %.1f dB, margin %.2f dB (%s)",
                verdict.label(), point.tag(), budget.predictedLossDb(), CellFormats.plain(budget.centreNm()),
                allowed, margin, budget.basis()));
        plot.show("Predicted round-trip loss, " + point.tag(), budget.wavelengthsNm(), budget.lossDb());
    }

    private List<RowFigures> pointFigures(List<MeasurementPoint> rows) {
        return rows.stream().map(p -> {
            PointBudget b = budgets.get(p.tag());
            Optional<Analyzer> a = outline.analyzer(p.analyzerTag());
            if (b == null || a.isEmpty()) {
                return new RowFigures(Map.of(PointSheet.STATUS, Figure.text("not evaluated")));
            }
            double margin = a.get().allowedLossDb() - b.predictedLossDb();
            return new RowFigures(Map.of(
                    PointSheet.PREDICTED, Figure.number(b.predictedLossDb(), 2),
                    PointSheet.ALLOWED, Figure.number(a.get().allowedLossDb(), 1),
                    PointSheet.MARGIN, Figure.number(margin, 2),
                    PointSheet.STATUS, Figure.of(MarginVerdict.of(margin, p.effectiveToleranceDb(outline.site())))));
        }).toList();
    }

    private double centreNm() {
        return point == null ? Double.NaN : point.bands().get(0).centreNm();
    }

    private void remember(Path file) {
        recent.add(file);
        recentFiles.set(recent.list());
    }

    private void updateTitle() {
        title.set("Strandbook \u2013 " + outline.site().name() + " \u2013 "
                + file.map(f -> f.getFileName().toString()).orElse("not saved to a file"));
    }

    private void fail(Exception e) {
        notice.set(Objects.requireNonNullElse(e.getMessage(), e.getClass().getSimpleName()));
    }
}
