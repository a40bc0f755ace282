package org.strandbook.app.ui.workbook;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.function.IntPredicate;

import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.intake.ScanFileImporter;
import org.strandbook.intake.ScheduleImporter;
import org.strandbook.handover.PointEvent;
import org.strandbook.site.Inspection;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.Note;
import org.strandbook.site.SignOff;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;
import org.strandbook.server.ServerLogin;
import org.strandbook.store.SyncLedger;
import org.strandbook.store.WithdrawnRecord;

/**
 * Everything the window asks of the open workbook file. View models call it only inside jobs of a
 * {@link org.strandbook.app.ui.task.TaskExecutor}, never on the FX thread, so an implementation
 * may block on the file; the executor's single worker thread is the only thread that reaches the
 * workbook connection. Values returned are immutable records the FX thread may keep.
 * Failures throw {@link WorkbookProblem} or the store's exceptions, with a message for the user.
 */
public interface WorkbookService extends AutoCloseable {

    /** Opens a workbook; the one open before stays open if this fails. */
    LoadedSite open(Path file, JobProgress progress);

    /** Creates an empty workbook for {@code site} at {@code file} (which must not exist) and opens it. */
    LoadedSite create(Path file, Site site, JobProgress progress);

    /** Opens the invented sample plant in {@code folder}, building it there first if it is not there yet. */
    LoadedSite openSample(Path folder, JobProgress progress);

    /** Reads the open workbook again. */
    LoadedSite reload(JobProgress progress);

    /**
     * Copies the open workbook to {@code file}, complete or not at all, and continues in the copy.
     *
     * @return the copy, now open
     */
    Path saveAs(Path file, JobProgress progress);

    /** The open workbook's file, if one is open. */
    Optional<Path> file();

    /** The point's scans, without spectra, oldest first. */
    List<ScanRecord> scans(String pointTag);

    /** Saves changed points (tags unchanged) in one transaction. */
    void savePoints(List<MeasurementPoint> points);

    /** Replaces the point's legs as a whole. */
    void saveLegs(String pointTag, List<PathLeg> legs);

    /** Saves changed catalog entries (codes unchanged) in one transaction. */
    void saveCatalog(List<FiberType> fibers, List<ConnectorType> connectors, List<ProbeType> probes);

    /** Evaluates one point from what is stored: prediction, latest measurement, diagnosis, trends. */
    PointEvaluation evaluatePoint(String pointTag);

    /**
     * Evaluates the given points in order, telling {@code pointDone} the count done after each;
     * it returns false to stop. Points that cannot be evaluated get a status saying why.
     */
    List<PointStatus> evaluatePoints(List<String> pointTags, IntPredicate pointDone);

    /** Told the count of points done and their total after each point; returns false to stop. */
    @FunctionalInterface
    interface PointsDone {
        boolean done(int done, int total);
    }

    /**
     * Evaluates every point and ranks them as the {@code trend} command does (failing first, then by
     * margin run-out date, then review, then least margin), each with its follow-ups. A point that
     * cannot be evaluated comes last, saying why. Stopped by {@code progress}: throws
     * {@link java.util.concurrent.CancellationException}.
     */
    List<AttentionRow> attention(PointsDone progress);

    ScanFileImporter.Summary importScans(ScanFileImporter.Request request, ScanFileImporter.Progress progress);

    /** Imports a filled cable schedule; nothing is written when it has problems. */
    ScheduleImporter.Outcome importSchedule(Path file);

    void exportDossier(DossierExport export, Path target, JobProgress progress) throws Exception;

    /** The point's records in time order: scans, inspections, actions, notes, sign-offs. */
    List<PointEvent> history(String pointTag);

    /** Records an end-face inspection. */
    void addInspection(Inspection inspection);

    /** Records a maintenance action (a replacement changes the path from its date on). */
    void addMaintenance(MaintenanceAction action);

    /** Records a note. */
    void addNote(Note note);

    /**
     * Withdraws the point's latest-entered inspection, action or note as an audited change, putting
     * back a path or probe it replaced; refused when a later signature covers it.
     *
     * @return what was withdrawn
     */
    WithdrawnRecord withdrawLatest(String pointTag);

    /** Signs a point (only once it has been evaluated) or the site record. */
    void signOff(SignOff signOff);

    // ---- plant server

    /** The names of the sites {@code login} may open on its server. */
    List<String> serverSites(ServerLogin login);

    /**
     * Starts a workbook at {@code target} (which must not exist) holding one site from the plant
     * server, and opens it. A clone cut off (Cancel, a lost server) leaves no file at {@code target}.
     */
    LoadedSite cloneFromServer(ServerLogin login, String siteName, Path target, JobProgress progress);

    /**
     * Pushes what is new in the open workbook to its site on the server and pulls what others
     * recorded; refused (nothing changed) when the workbook fails its audit check.
     */
    SyncedSite sync(ServerLogin login, JobProgress progress);

    /** The server the open workbook last synced with, without parameters; empty if it never did. */
    Optional<String> syncedServer();

    /** The open workbook's conflicts that wait for a choice, in the order they were found. */
    List<SyncLedger.Conflict> openConflicts();

    /**
     * Keeps this workbook's value ({@code keepMine}) or the server's for one open conflict, as an
     * audited change; the workbook read again, since keeping theirs changes a record.
     */
    LoadedSite settleConflict(long conflictId, boolean keepMine, JobProgress progress);

    /** Closes the workbook file. */
    @Override
    void close();
}
