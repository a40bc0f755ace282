package org.strandbook.app.ui.uncertainty;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;
import java.util.Optional;

import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.StringProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.app.ui.task.TaskExecutor;
import org.strandbook.evaluation.BandUncertainty;
import org.strandbook.evaluation.PredictedBudget;
import org.strandbook.evaluation.PredictionSpread;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.WavelengthBand;
import org.strandbook.uncertainty.BudgetRow;
import org.strandbook.uncertainty.Chance;
import org.strandbook.uncertainty.PathUncertainty;

/**
 * The selected point's prediction with its uncertainty. Each new prediction (a point selected, a
 * path edited) starts one background job that works out the coverage band over the analyzer's
 * range and the uncertainty budget at every band centre; a job overtaken by a newer prediction
 * stops at its next Monte Carlo station, and only the newest result is shown.
 */
public final class UncertaintyViewModel {

    /** The wavelength the design question is asked at unless the user says otherwise, nm: design choice. */
    static final double DEFAULT_QUESTION_NM = 2300;

    /** Thrown inside a job whose prediction was replaced; its result is dropped, not reported. */
    private static final class Superseded extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Superseded() {
            super("superseded by a newer prediction", null, false, false);
        }
    }

    /** What one job worked out for one prediction. */
    private record Result(long generation, PredictionSpread spread, List<UncertaintyRow> rows) {
    }

    /** What the shown prediction is: the budget and what the questions need of the point. */
    private record Shown(long generation, String pointTag, PredictedBudget budget, List<WavelengthBand> bands) {
    }

    private final TaskExecutor tasks;
    /** The engine at the site's coverage, asked afresh for each job (the site's rule may change). */
    private final Supplier<PathUncertainty> engines;
    private final ObservableList<UncertaintyRow> rows = FXCollections.observableArrayList();
    private final ObservableList<UncertaintyRow> shownRows = FXCollections.unmodifiableObservableList(rows);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "No point selected");
    private final ReadOnlyStringWrapper answer = new ReadOnlyStringWrapper(this, "answer", "");
    private final ReadOnlyObjectWrapper<PredictionSpread> spread = new ReadOnlyObjectWrapper<>(this, "spread");
    private final StringProperty allowedLossText = new SimpleStringProperty(this, "allowedLossText", "");
    private final StringProperty questionNmText = new SimpleStringProperty(this, "questionNmText", "");
    /** Read by jobs on the background thread to see whether they were overtaken. */
    private volatile long generation;
    private Shown shown;

    public UncertaintyViewModel(TaskExecutor tasks, Supplier<PathUncertainty> engines) {
        this.tasks = tasks;
        this.engines = engines;
    }


    /** Per band, its uncertainty budget rows, largest contribution first. */
    public ObservableList<UncertaintyRow> rows() {
        return shownRows;
    }

    /** What is being worked out, or what the table shows. */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** The answer to the design question, or why it was refused. */
    public ReadOnlyStringProperty answerProperty() {
        return answer.getReadOnlyProperty();
    }

    /**
     * The shown prediction's coverage band, for the plots to shade; null while it is worked out or
     * when there is none.
     */
    public ReadOnlyObjectProperty<PredictionSpread> spreadProperty() {
        return spread.getReadOnlyProperty();
    }

    /** The design question's allowed loss as typed, dB. */
    public StringProperty allowedLossTextProperty() {
        return allowedLossText;
    }

    /** The design question's wavelength as typed, nm. */
    public StringProperty questionNmTextProperty() {
        return questionNmText;
    }

    /**
     * A new prediction for the point {@code pointTag}: its band and budget are worked out again.
     *
     * @param allowedLossDb what the analyzer allows, the design question's default limit
     */
    public void show(String pointTag, PredictedBudget budget, List<WavelengthBand> bands, double allowedLossDb) {
        long g = ++generation;
        boolean otherPoint = shown == null || !shown.pointTag().equals(pointTag);
        shown = new Shown(g, pointTag, budget, List.copyOf(bands));
        if (otherPoint) {
            WavelengthGrid grid = budget.grid();
            allowedLossText.set(Double.isFinite(allowedLossDb) ? plain(allowedLossDb) : "");
            questionNmText.set(plain(grid.covers(DEFAULT_QUESTION_NM) ? DEFAULT_QUESTION_NM
                    : bands.isEmpty() ? grid.wavelengthNm(grid.size() / 2) : bands.get(0).centreNm()));
            answer.set("");
        }
        publish(null);
        rows.clear();
        message.set("Working out the uncertainty of " + pointTag + "'s prediction\u2026");
        PathUncertainty engine = engines.get();
        tasks.submit("Uncertainty of " + pointTag, p -> work(g, engine, budget, bands, p), this::deliver, e -> {
            if (!(e instanceof Superseded) && g == generation) {
                message.set("Cannot work out the uncertainty of " + pointTag + ": " + e.getMessage());
            }
        });
    }

    /** No point, or a point without a prediction. */
    public void clear(String why) {
        generation++;
        shown = null;
        rows.clear();
        publish(null);
        message.set(why);
        answer.set("");
    }

    /**
     * Asks the design question of the shown prediction: the chance that the loop stays within the
     * typed allowed loss at the typed wavelength. Refused, with the reason as the answer, when a
     * field is not a number or the wavelength lies outside the analyzer's range.
     */
    public void askChance() {
        Shown s = shown;
        if (s == null) {
            answer.set("Select a point with a prediction first.");
            return;
        }
        Optional<Double> allowed = number(allowedLossText.get());
        Optional<Double> nm = number(questionNmText.get());
        if (allowed.isEmpty() || allowed.get() < 0) {
            answer.set("Not asked: the allowed loss '" + allowedLossText.get().strip()
                    + "' is not a loss in dB (a number, 0 or more).");
            return;
        }
        WavelengthGrid grid = s.budget().grid();
        if (nm.isEmpty() || !grid.covers(nm.get())) {
            answer.set(String.format(Locale.ROOT, "Not asked: '%s' is not a wavelength in the analyzer's range, "
                    + "%s\u2013%s nm.", questionNmText.get().strip(), plain(grid.firstNm()), plain(grid.lastNm())));
            return;
        }
        int index = grid.nearestIndex(nm.get());
        double limitDb = allowed.get();
        answer.set("Working out the chance\u2026");
        PathUncertainty engine = engines.get();
        tasks.submit("Chance of " + s.pointTag() + " within " + plain(limitDb) + " dB", p -> engine.chanceWithin(
                s.budget().budget(), index, s.budget().allowances(), limitDb), c -> {
                    if (s.generation() == generation) {
                        answer.set(chanceText(limitDb, grid.wavelengthNm(index),
                                s.budget().budget().totalLossDbAt(index), c));
                    } else {
                        answer.set("The prediction changed while the chance was worked out: ask again.");
                    }
                }, e -> answer.set("Not asked: " + e.getMessage()));
    }

    static String chanceText(double limitDb, double atNm, double predictedDb, Chance c) {
        return String.format(Locale.ROOT, "chance the loop stays within %s dB at %s nm: %.1f %% (predicted %.2f dB; "
                + "Monte Carlo, %d trials, JCGM 101:2008; scatter \u00B1%.1f %%)", plain(limitDb), plain(atNm),
                100 * c.probability(), predictedDb, c.trials(), 100 * c.standardError());
    }

    /** Runs in the background: Monte Carlo only, from the prediction in memory. */
    private Result work(long g, PathUncertainty engine, PredictedBudget budget, List<WavelengthBand> bands,
            JobProgress p) {
        WavelengthGrid grid = budget.grid();
        List<WavelengthBand> inRange = bands.stream().filter(b -> grid.covers(b.centreNm())).toList();
        p.update(0, "coverage band over the analyzer's range");
        PredictionSpread band = PredictionSpread.of(budget, engine, (done, of) -> {
            check(g, p);
            p.update(0.8 * done / of, "coverage band: Monte Carlo " + done + " of " + of);
        });
        List<UncertaintyRow> out = new ArrayList<>();
        int i = 0;
        for (BandUncertainty u : BandUncertainty.of(budget, inRange, engine)) {
            check(g, p);
            for (BudgetRow r : u.atCentre().budget().rowsByContribution()) {
                out.add(UncertaintyRow.of(u.band().name(), u.atCentre().wavelengthNm(), r));
            }
            p.update(0.8 + 0.2 * ++i / inRange.size(), "uncertainty budget of band " + u.band().name());
        }
        return new Result(g, band, out);
    }

    private void check(long g, JobProgress p) {
        p.stopIfCancelled();
        if (g != generation) {
            throw new Superseded();
        }
    }

    private void deliver(Result r) {
        if (r.generation() != generation || shown == null) {
            return;
        }
        rows.setAll(r.rows());
        publish(r.spread());
        message.set(String.format(Locale.ROOT, "%s: %.0f %% coverage interval of the prediction by Monte Carlo "
                + "(JCGM 101:2008), budget by the law of propagation (JCGM 100:2008) at each band's centre; "
                + "inputs taken as independent.", shown.pointTag(), 100 * r.spread().coverageProbability()));
    }

    private void publish(PredictionSpread s) {
        spread.set(s);
    }

    private static Optional<Double> number(String text) {
        if (text == null) {
            return Optional.empty();
        }
        try {
            double v = Double.parseDouble(text.strip());
            return Double.isFinite(v) ? Optional.of(v) : Optional.empty();
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }

    private static String plain(double v) {
        return CellFormats.plain(v);
    }
}
