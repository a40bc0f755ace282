package org.strandbook.schedule;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.apache.poi.ss.usermodel.Workbook;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;

/**
 * Applies every schedule rule to an opened workbook. Sheets are read in dependency order (catalogs,
 * analyzers, points, bands, segments, bends, joints) so that references can be checked as each row
 * is read, and every row is read even after problems, so the user gets the whole list at once.
 */
final class ScheduleWorkbook {

    private ScheduleWorkbook() {
    }

    static ScheduleReadResult check(Workbook workbook, ComponentCatalog known) {
        ProblemLog log = new ProblemLog();
        CatalogSheets.Result catalog = CatalogSheets.read(workbook, known, log);
        PlantSheets.Result plant = PlantSheets.read(workbook, catalog, log);
        LegSheets.Result legs = LegSheets.read(workbook, plant, catalog, log);
        if (!log.isEmpty()) {
            return new ScheduleReadResult.Rejected(log.toList());
        }
        List<MeasurementPoint> points = new ArrayList<>();
        List<PathLeg> orderedLegs = new ArrayList<>();
        for (PlantSheets.PointDraft draft : plant.points().values()) {
            MeasurementPoint point = draft.row.guard(ScheduleColumn.POINT_TAG, draft::build);
            if (point != null) {
                points.add(point);
            }
            Map<PathDirection, PathLeg> byDirection = legs.legs().get(draft.tag);
            for (PathDirection d : PathDirection.values()) {
                orderedLegs.add(byDirection.get(d));
            }
        }
        if (!log.isEmpty()) {
            return new ScheduleReadResult.Rejected(log.toList());
        }
        ScheduleOrigins origins = new ScheduleOrigins(plant.analyzerTags(), plant.pointTags(), legs.cableIds(),
                legs.jointsByPoint(), catalog.fiberCodes(), catalog.connectorCodes(), catalog.probeCodes());
        return new ScheduleReadResult.Accepted(new CableSchedule(List.copyOf(plant.analyzers().values()), points,
                orderedLegs, catalog.added()), origins);
    }
}
