package org.strandbook.dossier;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

import org.apache.poi.ss.usermodel.Row;
import org.strandbook.diagnosis.Cause;
import org.strandbook.diagnosis.Diagnosis;
import org.strandbook.diagnosis.Finding;
import org.strandbook.evaluation.BandTrend;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.handover.StepAttribution;
import org.strandbook.site.Inspection;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.Joint;
import org.strandbook.site.Note;
import org.strandbook.site.PathLeg;
import org.strandbook.trend.MarginForecast;
import org.strandbook.trend.StepEvent;

/**
 * Findings and actions: what the diagnosis of the latest deviation found (cause, size at a
 * wavelength, the element to check first), what could not be evaluated, what the prediction and
 * inspections flagged, steps and forecasts of the trend. Beside them, one per row, the notes
 * recorded on the point: the technician's record of what was done, when and by whom. The fix
 * columns stay empty for a pen where there is no note.
 */
final class FindingRows {

    static final String SOURCE_DIAGNOSIS = "Diagnosis";
    static final String SOURCE_EVALUATION = "Evaluation";
    static final String SOURCE_PREDICTION = "Prediction";
    static final String SOURCE_INSPECTION = "Inspection";
    static final String SOURCE_TREND = "Trend";
    static final String SOURCE_NOTE = "Note";
    /** The size of a finding that took all the light (a break). */
    static final String ALL_LIGHT_LOST = "all light";
    /** The point-tag cell of notes on the whole site. */
    static final String SITE_TAG = "(site)";

    /** One row before it is written. */
    private record Line(String source, String text, Optional<Finding> finding, String checkFirst) {
    }

    /** What was done, in the fix columns: a note or a maintenance action. */
    private record Fix(String text, java.time.Instant when, String by) {
    }

    private FindingRows() {
    }

    static void fill(TableSheet t, DossierContent content) {
        for (DossierPoint p : content.points()) {
            List<Line> lines = lines(p);
            if (lines.isEmpty()) {
                lines.add(new Line("", "No finding: the loop behaves as predicted.", Optional.empty(), ""));
            }
            List<Fix> notes = fixes(p);
            for (int i = 0; i < Math.max(lines.size(), notes.size()); i++) {
                Row r = t.newRowStyled();
                t.text(r, DossierColumn.FINDING_TAG, p.tag());
                t.text(r, DossierColumn.FINDING_STATUS, p.status().label());
                t.number(r, DossierColumn.FINDING_NUMBER, i + 1);
                if (i < lines.size()) {
                    Line line = lines.get(i);
                    t.text(r, DossierColumn.FINDING_SOURCE, line.source());
                    t.text(r, DossierColumn.FINDING_TEXT, line.text());
                    t.text(r, DossierColumn.FINDING_CHECK_FIRST, line.checkFirst());
                    line.finding().ifPresent(f -> finding(t, r, f));
                } else {
                    t.text(r, DossierColumn.FINDING_SOURCE, SOURCE_NOTE);
                }
                if (i < notes.size()) {
                    fix(t, r, notes.get(i));
                }
            }
        }
        List<Note> siteNotes = content.siteNotes();
        for (int i = 0; i < siteNotes.size(); i++) {
            Row r = t.newRowStyled();
            t.text(r, DossierColumn.FINDING_TAG, SITE_TAG);
            t.text(r, DossierColumn.FINDING_SOURCE, SOURCE_NOTE);
            t.number(r, DossierColumn.FINDING_NUMBER, i + 1);
            note(t, r, siteNotes.get(i));
        }
    }

    /** The point's notes and maintenance actions in time order: what was done about its findings. */
    private static List<Fix> fixes(DossierPoint p) {
        List<Fix> out = new ArrayList<>();
        p.notes().forEach(n -> out.add(new Fix((n.elementLabel().isEmpty() ? "" : n.elementLabel() + ": ") + n.text(),
                n.writtenAt(), n.author())));
        for (MaintenanceAction a : p.actions()) {
            out.add(new Fix(a.kind().words() + (a.elementLabel().isEmpty() ? "" : " " + a.elementLabel())
                    + (a.what().isEmpty() ? "" : ": " + a.what()) + (a.why().isEmpty() ? "" : "; why: " + a.why()),
                    a.performedAt(), a.performedBy()));
        }
        out.sort(java.util.Comparator.comparing(Fix::when));
        return out;
    }

    private static void fix(TableSheet t, Row r, Fix f) {
        t.text(r, DossierColumn.FINDING_FIX_RECORDED, f.text());
        t.time(r, DossierColumn.FINDING_FIX_WHEN, f.when());
        t.text(r, DossierColumn.FINDING_FIX_BY, f.by());
    }

    /** A note in the fix columns: what was done, when, by whom. */
    private static void note(TableSheet t, Row r, Note n) {
        t.text(r, DossierColumn.FINDING_FIX_RECORDED, n.text());
        t.time(r, DossierColumn.FINDING_FIX_WHEN, n.writtenAt());
        t.text(r, DossierColumn.FINDING_FIX_BY, n.author());
    }

    private static void finding(TableSheet t, Row r, Finding f) {
        t.text(r, DossierColumn.FINDING_CAUSE, f.cause().words());
        t.text(r, DossierColumn.FINDING_OTHER_CAUSES, f.candidates().stream().skip(1).map(Cause::words)
                .collect(Collectors.joining("; ")));
        if (Double.isInfinite(f.amountDb())) {
            t.text(r, DossierColumn.FINDING_AMOUNT_DB, ALL_LIGHT_LOST);
        } else {
            t.number(r, DossierColumn.FINDING_AMOUNT_DB, f.amountDb());
        }
        t.number(r, DossierColumn.FINDING_AT_NM, f.atNm());
        t.number(r, DossierColumn.FINDING_SHARE_PERCENT, f.sharePercent());
    }

    private static List<Line> lines(DossierPoint p) {
        List<Line> out = new ArrayList<>();
        Optional<PointEvaluation> e = p.evaluation();
        Optional<Diagnosis> diagnosis = e.flatMap(PointEvaluation::diagnosis);
        diagnosis.ifPresent(d -> {
            for (Finding f : d.findings()) {
                out.add(new Line(SOURCE_DIAGNOSIS, f.text(), Optional.of(f), f.checkFirst()));
            }
            if (d.findings().isEmpty() && p.status() != org.strandbook.evaluation.Status.PASS) {
                out.add(new Line(SOURCE_DIAGNOSIS, d.summary(), Optional.empty(), ""));
            }
        });
        p.allProblems().forEach(problem -> out.add(new Line(SOURCE_EVALUATION, problem, Optional.empty(), "")));
        e.ifPresent(ev -> ev.predicted().notes().forEach(n -> out.add(new Line(SOURCE_PREDICTION, n, Optional.empty(),
                ""))));
        inspections(p, out);
        e.ifPresent(ev -> ev.trends().forEach(trend -> trend(trend, p.actions(), out)));
        return out;
    }

    private static void inspections(DossierPoint p, List<Line> out) {
        Set<String> labels = new LinkedHashSet<>();
        for (PathLeg leg : p.legs()) {
            leg.joints().forEach(j -> labels.add(j.label()));
        }
        for (String label : labels) {
            Optional<Inspection> last = CableScheduleRows.latest(p.inspections(), label);
            if (last.isPresent()) {
                Inspection i = last.get();
                if (i.grade().needsAction()) {
                    out.add(new Line(SOURCE_INSPECTION, "joint " + label + " graded " + i.grade().name() + " on "
                            + DossierText.time(i.inspectedAt()) + (i.inspector().isEmpty() ? "" : " by " + i.inspector())
                            + (i.remark().isBlank() ? "" : ": " + i.remark()), Optional.empty(), label));
                }
                continue;
            }
            p.legs().stream().flatMap(l -> l.joints().stream()).filter(j -> j.label().equals(label))
                    .map(Joint::grade).filter(g -> g.needsAction()).findFirst()
                    .ifPresent(g -> out.add(new Line(SOURCE_INSPECTION, "joint " + label + " recorded as " + g.name()
                            + " in the cable schedule", Optional.empty(), label)));
        }
    }

    private static void trend(BandTrend trend, List<MaintenanceAction> actions, List<Line> out) {
        String band = trend.band().name();
        for (StepEvent s : trend.steps()) {
            String what = s.kind() == StepEvent.Kind.STEP ? "step" : "single outlying reading";
            out.add(new Line(SOURCE_TREND, band + ": " + what + " of " + DossierText.signed(s.stepDb(), 2) + " dB between "
                    + DossierText.date(s.before()) + " and " + DossierText.date(s.after()) + " ("
                    + DossierText.decimal(s.sizeInNoiseWidths(), 1) + " noise widths)"
                    + StepAttribution.cause(s, actions).map(a -> "; " + StepAttribution.describe(s, actions)).orElse(""),
                    Optional.empty(), ""));
        }
        trend.outlook().filter(o -> o.status() == MarginForecast.Status.PROJECTED
                        || o.status() == MarginForecast.Status.ALREADY_EXHAUSTED)
                .ifPresent(o -> out.add(new Line(SOURCE_TREND, band + ": " + TrendRows.outlook(o), Optional.empty(), "")));
    }

}
