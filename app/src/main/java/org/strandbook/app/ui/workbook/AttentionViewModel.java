package org.strandbook.app.ui.workbook;

import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import java.util.function.Consumer;

import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import org.strandbook.app.ui.task.TaskExecutor;
import org.strandbook.evaluation.Status;

/**
 * The site's attention view: the failing and review points with their findings and follow-ups,
 * and every point ranked by how soon it needs a crew (the {@code trend} command's ranking). The
 * whole site is evaluated in one background job with progress, which Cancel stops; the lists are
 * replaced only when it finishes.
 */
public final class AttentionViewModel {

    private final WorkbookService service;
    private final TaskExecutor tasks;
    private final Consumer<String> opener;
    private final ObservableList<AttentionRow> needing = FXCollections.observableArrayList();
    private final ObservableList<AttentionRow> ranking = FXCollections.observableArrayList();
    private final ObservableList<AttentionRow> shownNeeding = FXCollections.unmodifiableObservableList(needing);
    private final ObservableList<AttentionRow> shownRanking = FXCollections.unmodifiableObservableList(ranking);
    private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper(this, "summary",
            "Not ranked yet: rank the site to see what needs attention");
    private final ReadOnlyBooleanWrapper stale = new ReadOnlyBooleanWrapper(this, "stale", true);
    private final ReadOnlyIntegerWrapper changes = new ReadOnlyIntegerWrapper(this, "changes", 0);
    private int run;

    /** @param opener told the tag of a point the user opens from the lists */
    AttentionViewModel(WorkbookService service, TaskExecutor tasks, Consumer<String> opener) {
        this.service = service;
        this.tasks = tasks;
        this.opener = opener;
    }

    /** Failing, review and unevaluated points, most urgent first. */
    public ObservableList<AttentionRow> needing() {
        return shownNeeding;
    }

    /** Every point, most urgent first. */
    public ObservableList<AttentionRow> ranking() {
        return shownRanking;
    }

    public ReadOnlyStringProperty summaryProperty() {
        return summary.getReadOnlyProperty();
    }

    /** True until the lists reflect the workbook as it is now. */
    public ReadOnlyBooleanProperty staleProperty() {
        return stale.getReadOnlyProperty();
    }

    /** Counts the changes that made the lists out of date; a shown view re-ranks on each. */
    public ReadOnlyIntegerProperty changesProperty() {
        return changes.getReadOnlyProperty();
    }

    /** Evaluates and ranks every point in the background. */
    public void refresh() {
        int mine = ++run;
        tasks.submit("Ranking the site by urgency", p -> {
            p.update(0, "evaluating the points");
            List<AttentionRow> rows = service.attention((done, total) -> {
                p.update((double) done / total, done + " of " + total + " points");
                return !p.isCancelled();
            });
            p.stopIfCancelled();
            return rows;
        }, rows -> {
            if (mine != run) {
                return;
            }
            ranking.setAll(rows);
            needing.setAll(rows.stream().filter(AttentionRow::needsAttention).toList());
            stale.set(false);
            long failing = rows.stream().filter(r -> r.status().filter(st -> st == Status.FAIL).isPresent()).count();
            summary.set(String.format(Locale.ROOT, "%d points: %d need attention (%d failing); most urgent: %s",
                    rows.size(), needing.size(), failing, rows.isEmpty() ? "none" : rows.get(0).pointTag()));
        }, e -> {
            if (!(e instanceof CancellationException)) {
                summary.set("Not ranked: " + e.getMessage());
            }
        });
    }

    /** Marks the lists out of date (a workbook was opened, a record changed what they show). */
    void invalidate() {
        run++;
        stale.set(true);
        changes.set(changes.get() + 1);
    }

    /** Empties the lists (no workbook open). */
    void clear() {
        run++;
        stale.set(true);
        needing.clear();
        ranking.clear();
        summary.set("Not ranked yet: rank the site to see what needs attention");
    }

    /** Opens a point of the lists in the window. */
    public void open(AttentionRow row) {
        if (row != null) {
            opener.accept(row.pointTag());
        }
    }
}
