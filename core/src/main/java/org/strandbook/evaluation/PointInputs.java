package org.strandbook.evaluation;

import java.util.List;

import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;

/**
 * Everything the evaluation of one point reads: its records, its catalog, its scans' listing and a
 * way to fetch a scan's spectrum on demand (so that years of scans are never all in memory).
 * {@code send} and {@code ret} are the path of today; {@code history} gives the path at the time
 * of a scan; {@code actions} are the point's maintenance actions, whose repairs restart the trend.
 */
public record PointInputs(Site site, MeasurementPoint point, Analyzer analyzer, PathLeg send, PathLeg ret,
                          Catalog catalog, List<ScanRecord> scans, SpectrumSource spectra, PathTimeline history,
                          List<MaintenanceAction> actions) {

    public PointInputs {
        scans = List.copyOf(scans);
        history = history == null ? PathTimeline.fixed(send, ret) : history;
        actions = actions == null ? List.of() : List.copyOf(actions);
    }

    /** Inputs with a path history and no maintenance recorded. */
    public PointInputs(Site site, MeasurementPoint point, Analyzer analyzer, PathLeg send, PathLeg ret,
                       Catalog catalog, List<ScanRecord> scans, SpectrumSource spectra, PathTimeline history) {
        this(site, point, analyzer, send, ret, catalog, scans, spectra, history, List.of());
    }

    /** Inputs of a point whose path has no recorded history. */
    public PointInputs(Site site, MeasurementPoint point, Analyzer analyzer, PathLeg send, PathLeg ret,
                       Catalog catalog, List<ScanRecord> scans, SpectrumSource spectra) {
        this(site, point, analyzer, send, ret, catalog, scans, spectra, null, List.of());
    }
}
