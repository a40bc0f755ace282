package org.strandbook.app.ui.workbook;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.FiberType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeType;
import org.strandbook.site.Site;

/**
 * What the window holds of an open workbook: every record except scans, which are listed per point
 * and whose spectra are fetched only to evaluate. A site of a thousand points and ten thousand
 * segments is a few megabytes of records.
 *
 * @param file       the workbook file
 * @param site       the site
 * @param analyzers  its analyzers, by tag
 * @param points     its measurement points, by tag
 * @param fibers     the fiber catalog, by code
 * @param connectors the connector catalog, by code
 * @param probes     the probe catalog, by code
 * @param legs       each point's send and return legs, by point tag
 * @param syncState  the workbook's standing with its plant server, in words (never synced, when last
 *                   synced and with what, conflicts waiting for a choice)
 * @param decisionRule how the site accepts a measured loss; its coverage is the window's too
 */
public record LoadedSite(Path file, Site site, List<Analyzer> analyzers, List<MeasurementPoint> points,
                         List<FiberType> fibers, List<ConnectorType> connectors, List<ProbeType> probes,
                         Map<String, List<PathLeg>> legs, String syncState, DecisionRule decisionRule) {

    public LoadedSite {
        analyzers = List.copyOf(analyzers);
        points = List.copyOf(points);
        fibers = List.copyOf(fibers);
        connectors = List.copyOf(connectors);
        probes = List.copyOf(probes);
        legs = Map.copyOf(legs);
        Objects.requireNonNull(decisionRule, "decisionRule");
    }

    public Catalog catalog() {
        return Catalog.of(fibers, connectors, probes);
    }
}
