package org.strandbook.app.ui.workbook;

import java.util.List;
import java.util.function.Consumer;
import java.util.function.Supplier;

import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import org.strandbook.app.ui.task.TaskExecutor;
import org.strandbook.handover.PointEvent;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Inspection;
import org.strandbook.site.Joint;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.Note;
import org.strandbook.site.PathLeg;
import org.strandbook.site.SignOff;
import org.strandbook.store.WithdrawnRecord;

/**
 * The selected point's history and the records made from the window. Every read and write runs as
 * a background job; a refusal from the workbook (an unknown joint, a date in the future, a point not
 * yet evaluated) comes back as the panel's message, and nothing is written.
 */
public final class PointHistoryViewModel {

    private final WorkbookService service;
    private final TaskExecutor tasks;
    private final Supplier<List<PathLeg>> legs;
    private final Consumer<String> pathChanged;
    private final Consumer<String> recorded;
    private final ObservableList<PointEvent> events = FXCollections.observableArrayList();
    /** One read-only view, kept: listeners on a view that is dropped would go with it. */
    private final ObservableList<PointEvent> shownEvents = FXCollections.unmodifiableObservableList(events);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private String pointTag;

    /**
     * @param legs        the shown point's legs, for the dialogs' choices
     * @param pathChanged told the point's tag after a recorded replacement changed its path
     * @param recorded    told the point's tag after any record was written or withdrawn
     */
    PointHistoryViewModel(WorkbookService service, TaskExecutor tasks, Supplier<List<PathLeg>> legs,
                          Consumer<String> pathChanged, Consumer<String> recorded) {
        this.service = service;
        this.tasks = tasks;
        this.legs = legs;
        this.pathChanged = pathChanged;
        this.recorded = recorded;
    }

    public ObservableList<PointEvent> events() {
        return shownEvents;
    }

    /** The outcome of the latest record, or why it was refused. */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** The selected point's tag, empty when none is selected. */
    public String pointTag() {
        return pointTag == null ? "" : pointTag;
    }

    /** The shown point's joint labels, in light order. */
    public List<String> jointLabels() {
        return legs.get().stream().flatMap(l -> l.joints().stream()).map(Joint::label).toList();
    }

    /** The fiber type code of a cable of the shown point; empty when it has no such cable. */
    public String cableFiber(String cableId) {
        return legs.get().stream().flatMap(l -> l.segments().stream()).filter(s -> s.label().equalsIgnoreCase(cableId))
                .map(CableSegment::fiberTypeCode).findFirst().orElse("");
    }

    void show(String tag) {
        if (!tag.equals(pointTag)) {
            // the outcome of a record stays while the same point is shown again (the workbook re-read)
            message.set("");
        }
        pointTag = tag;
        events.clear();
        tasks.submit("Reading the history of " + tag, p -> service.history(tag), list -> {
            if (tag.equals(pointTag)) {
                events.setAll(list);
            }
        }, e -> message.set(e.getMessage()));
    }

    void clear() {
        pointTag = null;
        events.clear();
        message.set("");
    }

    public void recordInspection(Inspection inspection) {
        record("inspection of " + inspection.jointLabel(), s -> s.addInspection(inspection), false);
    }

    public void recordMaintenance(MaintenanceAction action) {
        record(action.kind().words(), s -> s.addMaintenance(action), action.changesPath() || action.changesProbe());
    }

    public void recordNote(Note note) {
        record("note on " + note.subject(), s -> s.addNote(note), false);
    }

    public void recordSignOff(SignOff signOff) {
        record("sign-off by " + signOff.name(), s -> s.signOff(signOff), false);
    }

    /**
     * Withdraws the point's latest-entered inspection, action or note (the undo of a record); the
     * workbook is read again, since a withdrawn replacement puts the old path or probe back.
     */
    public void withdrawLatest() {
        String tag = pointTag;
        if (tag == null) {
            message.set("select a point first");
            return;
        }
        tasks.submit("Withdrawing the latest record at " + tag, p -> {
            WithdrawnRecord what = service.withdrawLatest(tag);
            return new Withdrawn(what, service.history(tag));
        }, done -> {
            if (tag.equals(pointTag)) {
                events.setAll(done.history());
            }
            message.set("withdrawn: " + done.what().description() + "; the audit trail keeps it");
            recorded.accept(tag);
            if (done.what().pathRestored()) {
                pathChanged.accept(tag);
            }
        }, e -> message.set("not withdrawn: " + e.getMessage()));
    }

    private record Withdrawn(WithdrawnRecord what, List<PointEvent> history) {
    }

    private void record(String what, Consumer<WorkbookService> write, boolean changesPath) {
        String tag = pointTag;
        if (tag == null) {
            message.set("select a point first");
            return;
        }
        tasks.submit("Recording the " + what + " at " + tag, p -> {
            write.accept(service);
            return service.history(tag);
        }, list -> {
            if (tag.equals(pointTag)) {
                events.setAll(list);
            }
            message.set("recorded: " + what + " at " + tag);
            recorded.accept(tag);
            if (changesPath) {
                pathChanged.accept(tag);
            }
        }, e -> message.set("not recorded: " + e.getMessage()));
    }
}
