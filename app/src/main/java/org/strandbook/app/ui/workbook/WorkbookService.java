package org.strandbook.app.ui.workbook;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ScanRecord;

/**
 * Everything the window asks of the open workbook. View models call it only inside jobs of a
 * {@link org.strandbook.app.ui.task.TaskExecutor}, never on the FX thread, so an implementation
 * may block on the workbook file. Implementations must be safe to call from that one background
 * thread while the FX thread holds the records they returned (records are immutable).
 * Failures throw {@link WorkbookProblem} (or any exception) with a message for the status bar.
 */
public interface WorkbookService {

    SiteOutline loadOutline();

    Catalog loadCatalog();

    /** The rows of one point; throws {@link WorkbookProblem} for an unknown tag. */
    PointRecords loadPoint(String pointTag);

    /** Replaces the site's points (tags unchanged; the sheet does not rename points). */
    void savePoints(List<MeasurementPoint> points);

    /** Replaces one point's segments and joints, in the sheets' order within each leg. */
    void saveLegs(String pointTag, List<LegSegment> segments, List<LegJoint> joints);

    void saveFiberTypes(List<FiberType> fibers);

    /** The predicted loss of one point from what is stored now. */
    PointBudget evaluate(String pointTag, JobProgress progress);

    /** The predicted loss of every point, by tag. */
    Map<String, PointBudget> evaluateSite(JobProgress progress);

    /** Reads scan files for a point and stores them; returns the point's scans afterwards. */
    List<ScanRecord> importScans(String pointTag, List<Path> files, JobProgress progress);

    /** Starts an empty workbook (catalogs kept). */
    void newWorkbook();

    void open(Path file);

    void saveAs(Path file);

    /** The file the workbook was opened from or last saved to. */
    Optional<Path> file();
}
