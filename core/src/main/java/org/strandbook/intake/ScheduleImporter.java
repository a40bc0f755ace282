package org.strandbook.intake;

import java.nio.file.Path;
import java.util.List;

import org.strandbook.schedule.CableSchedule;
import org.strandbook.schedule.CableScheduleReader;
import org.strandbook.schedule.ComponentCatalog;
import org.strandbook.schedule.ScheduleProblem;
import org.strandbook.schedule.ScheduleReadResult;
import org.strandbook.site.Analyzer;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.store.Workbook;

/**
 * Imports a filled cable-schedule XLSX into a workbook. Every row is validated against the
 * workbook's catalogs first and every problem reported (sheet, row, column); only a clean schedule
 * is written, in one transaction. Re-importing a revised schedule updates the analyzers and points
 * it names and replaces their legs as a whole; types the contractor added join the catalogs.
 */
public final class ScheduleImporter {

    /** What an import did, or why it wrote nothing. */
    public record Outcome(List<ScheduleProblem> problems, int analyzers, int points, int legs, int catalogEntries) {

        public Outcome {
            problems = List.copyOf(problems);
        }

        public boolean written() {
            return problems.isEmpty();
        }
    }

    public Outcome importFile(Workbook workbook, Path file) {
        ComponentCatalog known = new ComponentCatalog(workbook.catalog().fiberTypes(),
                workbook.catalog().connectorTypes(), workbook.catalog().probeTypes());
        ScheduleReadResult result = new CableScheduleReader(known).read(file);
        if (result instanceof ScheduleReadResult.Rejected rejected) {
            return new Outcome(rejected.problems(), 0, 0, 0, 0);
        }
        CableSchedule schedule = ((ScheduleReadResult.Accepted) result).schedule();
        write(workbook, schedule);
        ComponentCatalog added = schedule.addedCatalog();
        return new Outcome(List.of(), schedule.analyzers().size(), schedule.points().size(), schedule.legs().size(),
                added.fiberTypes().size() + added.connectorTypes().size() + added.probeTypes().size());
    }

    /** Writes a validated schedule in one transaction. */
    public static void write(Workbook workbook, CableSchedule schedule) {
        workbook.inTransaction(() -> {
            ComponentCatalog added = schedule.addedCatalog();
            added.fiberTypes().forEach(workbook.catalog()::saveFiberType);
            added.connectorTypes().forEach(workbook.catalog()::saveConnectorType);
            added.probeTypes().forEach(workbook.catalog()::saveProbeType);
            for (Analyzer a : schedule.analyzers()) {
                workbook.site().saveAnalyzer(a);
            }
            for (MeasurementPoint p : schedule.points()) {
                if (workbook.points().get(p.tag()).isPresent()) {
                    workbook.points().save(p);
                } else {
                    workbook.points().add(p);
                }
            }
            for (MeasurementPoint p : schedule.points()) {
                List<PathLeg> legs = schedule.legs().stream().filter(l -> l.pointTag().equals(p.tag())).toList();
                workbook.paths().replaceLegs(p.tag(), legs);
            }
        });
    }
}
