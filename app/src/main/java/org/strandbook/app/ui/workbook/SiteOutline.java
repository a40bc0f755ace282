package org.strandbook.app.ui.workbook;

import java.util.List;
import java.util.Optional;

import org.strandbook.site.Analyzer;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.Site;

/** The site tree: the site, its analyzers and its measurement points. */
public record SiteOutline(Site site, List<Analyzer> analyzers, List<MeasurementPoint> points) {

    public SiteOutline {
        analyzers = List.copyOf(analyzers);
        points = List.copyOf(points);
    }

    public Optional<Analyzer> analyzer(String tag) {
        return analyzers.stream().filter(a -> a.tag().equalsIgnoreCase(tag)).findFirst();
    }

    public Optional<MeasurementPoint> point(String tag) {
        return points.stream().filter(p -> p.tag().equalsIgnoreCase(tag)).findFirst();
    }

    public List<MeasurementPoint> pointsOf(String analyzerTag) {
        return points.stream().filter(p -> p.analyzerTag().equalsIgnoreCase(analyzerTag)).toList();
    }
}
