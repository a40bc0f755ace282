package org.strandbook.evaluation;

import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.InspectionHistory;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;
import org.strandbook.store.Workbook;

/**
 * A point's evaluation inputs as a workbook holds them: today's path with each joint graded by its
 * latest inspection, and the path's history, so that every evaluation (command line, window,
 * dossier) judges a scan against the path of its day.
 */
public final class WorkbookInputs {

    private WorkbookInputs() {
    }

    /**
     * @param scans the scans to evaluate (all of the point's, or those of a dossier's date range)
     * @throws IllegalArgumentException when the point lacks a send or a return leg
     */
    public static PointInputs of(Workbook workbook, Site site, MeasurementPoint point, Analyzer analyzer,
                                 Catalog catalog, List<ScanRecord> scans) {
        String tag = point.tag();
        InspectionHistory inspected = new InspectionHistory(workbook.inspections().list(tag));
        List<MaintenanceAction> actions = workbook.maintenance().list(tag);
        PathTimeline history = when -> {
            PathTimeline.Legs then = legs(tag, workbook.paths().legsAt(tag, when), inspected, when);
            return new PathTimeline.Legs(then.send(), then.ret(), Optional.of(probeTypeAt(point, actions, when)));
        };
        PathTimeline.Legs today = legs(tag, workbook.paths().legs(tag), inspected, Instant.MAX);
        return new PointInputs(site, point, analyzer, today.send(), today.ret(), catalog, scans,
                id -> workbook.scans().spectrum(id), history, actions);
    }

    /**
     * The probe type a scan taken at {@code when} went through, from the actions already read: the
     * type removed by the first probe replacement after it, or the point's probe type today.
     */
    private static String probeTypeAt(MeasurementPoint point, List<MaintenanceAction> actions, Instant when) {
        return actions.stream()
                .filter(a -> a.kind() == MaintenanceKind.REPLACE_PROBE && !a.elementLabel().isEmpty()
                        && a.performedAt().isAfter(when))
                .findFirst().map(MaintenanceAction::elementLabel).orElse(point.probeTypeCode());
    }

    /** Send and return legs from a point's legs, each joint graded as inspected by {@code when}. */
    private static PathTimeline.Legs legs(String tag, List<PathLeg> legs, InspectionHistory inspected, Instant when) {
        return new PathTimeline.Legs(inspected.gradedAt(leg(tag, legs, PathDirection.SEND), when),
                inspected.gradedAt(leg(tag, legs, PathDirection.RETURN), when));
    }

    private static PathLeg leg(String tag, List<PathLeg> legs, PathDirection direction) {
        return legs.stream().filter(l -> l.direction() == direction).findFirst().orElseThrow(() ->
                new IllegalArgumentException("point " + tag + ": no " + direction.name().toLowerCase(Locale.ROOT)
                        + " leg recorded"));
    }
}
