package org.strandbook.app.ui.workbook;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicReference;
import java.util.stream.Collectors;

import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import org.strandbook.app.ui.budget.BandPrediction;
import org.strandbook.app.ui.budget.PointPrediction;
import org.strandbook.app.ui.path.JointSheet;
import org.strandbook.app.ui.path.LegJoint;
import org.strandbook.app.ui.path.LegRows;
import org.strandbook.app.ui.path.LegSegment;
import org.strandbook.app.ui.path.PathFigures;
import org.strandbook.app.ui.path.SegmentSheet;
import org.strandbook.app.ui.plot.PlotAxes;
import org.strandbook.app.ui.plot.CoverageBand;
import org.strandbook.app.ui.plot.CurveStyle;
import org.strandbook.app.ui.plot.PointCurves;
import org.strandbook.app.ui.plot.SpectrumPlotModel;
import org.strandbook.app.ui.plot.TrendPlotModel;
import org.strandbook.handover.PointEvent;
import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.RowFigures;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.app.ui.sheet.Verdict;
import org.strandbook.app.ui.task.TaskExecutor;
import org.strandbook.app.ui.uncertainty.UncertaintyViewModel;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.PredictedBudget;
import org.strandbook.evaluation.PredictionSpread;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.WavelengthBand;
import org.strandbook.uncertainty.PathUncertainty;

/**
 * The selected point: its segment, joint and scan sheets, its three plots and the lines that sum
 * them up. An edit of a segment or joint is taken into the site in memory, its prediction and the
 * plots follow on the FX thread at once, and the legs are saved and the point re-evaluated in the
 * background. Measurements (scans, the latest evaluation) arrive from background jobs.
 */
public final class PointViewModel {

    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("yyyy-MM-dd", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter TAKEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    /** What a background job fetched of a point's measurements. */
    private record Measurements(String pointTag, List<ScanRecord> scans, Optional<PointEvaluation> evaluation,
                                String problem) {
    }

    private final OpenSite site;
    private final WorkbookService service;
    private final TaskExecutor tasks;
    private final PointEvents events;

    private MeasurementPoint point;
    private List<LegSegment> segmentRows = List.of();
    private List<LegJoint> jointRows = List.of();
    private PointEvaluation evaluation;
    /** The point whose evaluation is queued and not yet started, so edits in a row ask for one. */
    private final AtomicReference<String> evaluationQueued = new AtomicReference<>();

    private final SheetModel<LegSegment> segments;
    private final SheetModel<LegJoint> joints;
    private final SheetModel<ScanRecord> scans = ScanSheet.create();
    private final SpectrumPlotModel budgetPlot;
    private final SpectrumPlotModel measuredPlot;
    private final TrendPlotModel trendPlot;
    private final PointHistoryViewModel history;
    private final UncertaintyViewModel uncertainty;
    /** The prediction's coverage band as the plots shade it, once worked out. */
    private CoverageBand coverageBand;
    /** Whether the latest scan went through the path shown today, so that today's coverage band fits its plot. */
    private boolean measuredOnTodaysPath;

    private final ReadOnlyStringWrapper context = new ReadOnlyStringWrapper(this, "context", "No point selected");
    private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper(this, "summary", "");
    private final ReadOnlyObjectWrapper<Verdict> summaryVerdict = new ReadOnlyObjectWrapper<>(this, "summaryVerdict");
    private final ReadOnlyStringWrapper finding = new ReadOnlyStringWrapper(this, "finding", "");
    private final ReadOnlyObjectWrapper<Verdict> findingVerdict = new ReadOnlyObjectWrapper<>(this, "findingVerdict");

    PointViewModel(OpenSite site, WorkbookService service, TaskExecutor tasks, PlotAxes axes, PointEvents events) {
        this.site = site;
        this.service = service;
        this.tasks = tasks;
        this.events = events;
        this.budgetPlot = new SpectrumPlotModel(axes);
        this.measuredPlot = new SpectrumPlotModel(axes);
        this.trendPlot = new TrendPlotModel(axes);
        PathUncertainty engine = PathUncertainty.standard();
        this.uncertainty = new UncertaintyViewModel(tasks, () -> engine.withCoverage(site.coverage()));
        uncertainty.spreadProperty().addListener((o, was, is) -> shade(is));
        this.history = new PointHistoryViewModel(service, tasks, () -> point == null ? List.of() : shownLegs(),
                events::pathReplaced, events::recorded);
        history.events().addListener((javafx.collections.ListChangeListener<PointEvent>) c -> trendPlot.marks(
                history.events().stream().filter(e -> e.kind() == PointEvent.Kind.ACTION
                                || e.kind() == PointEvent.Kind.INSPECTION)
                        .map(e -> new TrendPlotModel.Mark(e.at(), e.kind().word() + (e.subject().isEmpty() ? "" : " "
                                + e.subject()) + ": " + e.text())).toList()));
        this.segments = SegmentSheet.create(() -> site.fibers().stream().map(FiberType::code).toList(),
                label -> point == null ? Optional.empty() : site.cableOwnerOtherThan(label, point.tag()),
                this::segmentFigures);
        this.joints = JointSheet.create(() -> site.connectors().stream().map(ConnectorType::code).toList(),
                this::jointFigures);
        segments.addChangeListener(rows -> {
            segmentRows = rows;
            joints.recompute();
            legsEdited();
        });
        joints.addChangeListener(rows -> {
            jointRows = rows;
            segments.recompute();
            legsEdited();
        });
    }

    // ---- what the view binds to

    public SheetModel<LegSegment> segments() {
        return segments;
    }

    public SheetModel<LegJoint> joints() {
        return joints;
    }

    /** The point's history and the records made from the window. */
    public PointHistoryViewModel history() {
        return history;
    }

    public SheetModel<ScanRecord> scans() {
        return scans;
    }

    /** Predicted loss spectrum with each element's contribution. */
    /** The selected point's prediction uncertainty: the Uncertainty tab and the plots' shaded band. */
    public UncertaintyViewModel uncertainty() {
        return uncertainty;
    }

    public SpectrumPlotModel budgetPlot() {
        return budgetPlot;
    }

    /** The latest measured loss against the prediction, with the deviation and the fitted signatures. */
    public SpectrumPlotModel measuredPlot() {
        return measuredPlot;
    }

    /** Loss over time per band, with the trend line and the forecast. */
    public TrendPlotModel trendPlot() {
        return trendPlot;
    }

    /** One line naming the point and the band the sheets' losses are stated at. */
    public ReadOnlyStringProperty contextProperty() {
        return context.getReadOnlyProperty();
    }

    /** The predicted round trip at each band centre, margin and status. */
    public ReadOnlyStringProperty summaryProperty() {
        return summary.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<Verdict> summaryVerdictProperty() {
        return summaryVerdict.getReadOnlyProperty();
    }

    /** The latest measurement's status and diagnosis in words. */
    public ReadOnlyStringProperty findingProperty() {
        return finding.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<Verdict> findingVerdictProperty() {
        return findingVerdict.getReadOnlyProperty();
    }

    public Optional<MeasurementPoint> point() {
        return Optional.ofNullable(point);
    }

    /** The shown point's prediction from its legs as the sheets hold them now. */
    public Optional<PointPrediction> prediction() {
        return point == null ? Optional.empty() : Optional.of(site.predict(point, shownLegs()));
    }

    /** The latest evaluation of the shown point, once it has arrived. */
    public Optional<PointEvaluation> evaluation() {
        return Optional.ofNullable(evaluation);
    }

    // ---- what the workbook's view model calls

    /** Shows a point from the site in memory; its measurements follow from the workbook. */
    void show(MeasurementPoint p) {
        boolean other = point == null || !point.tag().equals(p.tag());
        point = p;
        LegRows.Split split = LegRows.split(site.legs(p.tag()));
        segmentRows = split.segments();
        jointRows = split.joints();
        segments.load(segmentRows);
        joints.load(jointRows);
        WavelengthBand first = p.bands().get(0);
        context.set(p.tag() + " \u00B7 " + p.service() + " \u00B7 losses stated at the 1st band's centre, "
                + first.name() + " " + CellFormats.plain(first.centreNm()) + " nm"
                + (p.hazardousArea() ? " \u00B7 \u26A0 hazardous area" : ""));
        if (other) {
            evaluation = null;
            scans.load(List.of());
            measuredPlot.clear(measuredTitle(), "Reading the latest scans\u2026");
            trendPlot.clear(trendTitle(), "Reading the scans\u2026");
            finding.set("Reading the latest scans of " + p.tag() + "\u2026");
            findingVerdict.set(null);
            fetchMeasurements(p.tag());
            history.show(p.tag());
        }
        showPrediction();
    }

    void clear() {
        point = null;
        evaluation = null;
        segmentRows = List.of();
        jointRows = List.of();
        segments.load(List.of());
        joints.load(List.of());
        scans.load(List.of());
        context.set("No point selected");
        summary.set("");
        summaryVerdict.set(null);
        finding.set("");
        findingVerdict.set(null);
        budgetPlot.clear("", "No point selected");
        measuredPlot.clear("", "No point selected");
        trendPlot.clear("", "No point selected");
        history.clear();
        uncertainty.clear("No point selected");
    }

    /** The point's own record changed (tolerance, probe, analyzer): the prediction follows. */
    void pointEdited(MeasurementPoint p) {
        if (point != null && point.tag().equals(p.tag())) {
            point = p;
            segments.recompute();
            joints.recompute();
            showPrediction();
        }
    }

    /** A catalog entry changed: every figure follows. */
    void catalogChanged() {
        if (point != null) {
            segments.recompute();
            joints.recompute();
            showPrediction();
        }
    }

    /** Reads the point's scans and evaluation again, e.g. after scans were recorded. */
    void refreshMeasurements() {
        if (point != null) {
            fetchMeasurements(point.tag());
        }
    }

    // ---- internals

    private List<PathLeg> shownLegs() {
        return LegRows.join(point.tag(), segmentRows, jointRows);
    }

    private List<RowFigures> segmentFigures(List<LegSegment> rows) {
        if (point == null) {
            return Collections.nCopies(rows.size(), RowFigures.NONE);
        }
        List<PathLeg> legs = LegRows.join(point.tag(), rows, jointRows);
        return PathFigures.segments(rows, legs, site.predict(point, legs), point.bands().get(0).centreNm());
    }

    private List<RowFigures> jointFigures(List<LegJoint> rows) {
        if (point == null) {
            return Collections.nCopies(rows.size(), RowFigures.NONE);
        }
        List<PathLeg> legs = LegRows.join(point.tag(), segmentRows, rows);
        return PathFigures.joints(rows, legs, site.predict(point, legs), point.bands().get(0).centreNm());
    }

    private void legsEdited() {
        if (point == null) {
            return;
        }
        String tag = point.tag();
        List<PathLeg> legs = shownLegs();
        site.setLegs(tag, legs);
        showPrediction();
        events.legsChanged(tag);
        tasks.submit("Saving the light path of " + tag, p -> {
            service.saveLegs(tag, legs);
            return tag;
        }, this::requestEvaluation, events::saveFailed);
    }

    private void showPrediction() {
        PointPrediction prediction = site.predict(point, shownLegs());
        summaryVerdict.set(prediction.verdict().orElse(null));
        summary.set(summaryText(prediction));
        Optional<PredictedBudget> budget = prediction.budget();
        if (budget.isPresent()) {
            budgetPlot.show(budgetTitle(), PointCurves.budget(budget.get()), ceilingDb());
            uncertainty.show(point.tag(), budget.get(), point.bands(),
                    site.analyzer(point.analyzerTag()).map(a -> a.allowedLossDb()).orElse(Double.NaN));
        } else {
            budgetPlot.clear(budgetTitle(), "No prediction: " + prediction.problem());
            uncertainty.clear("No prediction: " + prediction.problem());
        }
        showMeasuredPlot(prediction);
    }

    private String summaryText(PointPrediction prediction) {
        if (prediction.bands().isEmpty()) {
            return "? " + point.tag() + ": no prediction: " + prediction.problem();
        }
        String bands = prediction.bands().stream().map(this::bandText).collect(Collectors.joining(" \u00B7 "));
        BandPrediction first = prediction.bands().get(0);
        return String.format(Locale.ROOT, "%s  %s predicted round trip: %s \u00B7 allowed %.1f dB, tolerance %.2f dB%s",
                prediction.verdict().map(Verdict::label).orElse("?"), point.tag(), bands, first.allowedLossDb(),
                point.effectiveToleranceDb(site.site()), prediction.problem().isEmpty() ? "" : " \u00B7 " + prediction.problem());
    }

    private String bandText(BandPrediction b) {
        if (Double.isNaN(b.predictedLossDb())) {
            return CellFormats.plain(b.centreNm()) + " nm: outside the analyzer's range";
        }
        return String.format(Locale.ROOT, "%s nm %.2f dB (margin %.2f dB %s)", CellFormats.plain(b.centreNm()),
                b.predictedLossDb(), b.marginDb(), b.verdict().symbol());
    }

    private void fetchMeasurements(String tag) {
        tasks.submit("Reading the scans of " + tag, p -> measurements(tag), this::showMeasurements, events::failed);
    }

    private void requestEvaluation(String tag) {
        if (tag.equals(evaluationQueued.getAndSet(tag))) {
            return;
        }
        tasks.submit("Evaluating " + tag, p -> {
            evaluationQueued.compareAndSet(tag, null);
            return measurements(tag);
        }, this::showMeasurements, events::failed);
    }

    /** Runs in the background: the only place this class reaches the workbook for reading. */
    private Measurements measurements(String tag) {
        List<ScanRecord> list = service.scans(tag);
        try {
            return new Measurements(tag, list, Optional.of(service.evaluatePoint(tag)), "");
        } catch (IllegalArgumentException e) {
            return new Measurements(tag, list, Optional.empty(), e.getMessage());
        }
    }

    private void showMeasurements(Measurements m) {
        if (point == null || !point.tag().equals(m.pointTag())) {
            return;
        }
        List<ScanRecord> newestFirst = new ArrayList<>(m.scans());
        Collections.reverse(newestFirst);
        scans.load(newestFirst);
        evaluation = m.evaluation().orElse(null);
        if (evaluation == null) {
            finding.set("Cannot evaluate " + m.pointTag() + ": " + m.problem());
            findingVerdict.set(null);
            measuredPlot.clear(measuredTitle(), "Cannot evaluate: " + m.problem());
            trendPlot.clear(trendTitle(), "Cannot evaluate: " + m.problem());
            events.evaluated(new PointStatus(m.pointTag(), Optional.empty(), m.problem()));
            return;
        }
        Verdict verdict = Verdict.valueOf(evaluation.status().name());
        findingVerdict.set(evaluation.measured().isPresent() ? verdict : null);
        finding.set(evaluation.latest().map(pair -> "Latest loop scan " + TAKEN.format(pair.loop().takenAt()) + ": "
                + verdict.label() + " \u2013 ").orElse("") + evaluation.finding());
        showMeasuredPlot(site.predict(point, shownLegs()));
        double allowed = site.analyzer(point.analyzerTag()).map(a -> a.allowedLossDb()).orElse(Double.NaN);
        trendPlot.show(trendTitle(), evaluation.trends(), allowed);
        events.evaluated(new PointStatus(m.pointTag(), Optional.of(evaluation.status()), evaluation.shortFinding()));
        evaluation.latest().ifPresent(pair -> events.scanSettingsRead(m.pointTag(),
                pair.exposure().describeNormalisation()));
    }

    private void showMeasuredPlot(PointPrediction prediction) {
        if (evaluation == null) {
            return;
        }
        if (evaluation.measured().isEmpty()) {
            measuredPlot.clear(measuredTitle(), evaluation.finding());
            return;
        }
        // the scan is drawn against the path it went through, as the verdict judged it: a replacement
        // recorded after the scan changes today's path, not the light that scan saw
        PredictedBudget budget = evaluation.predicted();
        measuredOnTodaysPath = prediction.budget().map(today -> !today.grid().equals(budget.grid())
                || Arrays.equals(today.totalLossDb(), budget.totalLossDb())).orElse(false);
        measuredPlot.show(measuredTitle() + evaluation.latest().map(p -> ", scan of "
                        + DAY.format(p.loop().takenAt())).orElse(""),
                PointCurves.deviation(budget, evaluation.measured().get(),
                        evaluation.diagnosis().map(d -> d.fitted()).orElse(List.of())), ceilingDb());
        measuredPlot.showBand(measuredOnTodaysPath ? coverageBand : null);
    }

    /** Shades the prediction's coverage band in both spectral plots, or removes it (null). */
    private void shade(PredictionSpread spread) {
        coverageBand = spread == null ? null : new CoverageBand(String.format(Locale.ROOT,
                "predicted, %.0f %% coverage interval", 100 * spread.coverageProbability()), CurveStyle.GREY,
                spread.grid().wavelengthsNm(), spread.lowDb(), spread.highDb());
        budgetPlot.showBand(coverageBand);
        // the band is today's path's: it belongs on the scan's plot only when the scan went through that path
        measuredPlot.showBand(evaluation == null || evaluation.measured().isEmpty() || !measuredOnTodaysPath ? null
                : coverageBand);
    }

    /**
     * Where the loss axes stop: twice what the analyzer allows. Beyond that the analyzer sees no
     * light anyway, and silica's infrared edge would otherwise squash the few dB that matter.
     */
    private double ceilingDb() {
        return site.analyzer(point.analyzerTag()).map(a -> 2 * a.allowedLossDb()).orElse(Double.POSITIVE_INFINITY);
    }

    private String budgetTitle() {
        return "Predicted loss, " + point.tag() + ", by element";
    }

    private String measuredTitle() {
        return "Measured vs predicted, " + (point == null ? "" : point.tag());
    }

    private String trendTitle() {
        return "Loss over time, " + (point == null ? "" : point.tag());
    }
}
