package org.strandbook.evaluation;

import java.time.LocalDate;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import org.strandbook.trend.MarginForecast;

/**
 * Ranks points by how soon they need a crew: failing points first (least margin first), then
 * points whose margin is forecast to run out, soonest first, then the rest by smallest margin.
 */
public final class Urgency {

    private Urgency() {
    }

    /** The earliest forecast date at which any band of the point runs out of margin. */
    public static Optional<LocalDate> runOutDate(PointEvaluation e) {
        return e.trends().stream()
                .flatMap(t -> t.outlook().stream())
                .filter(o -> o.status() == MarginForecast.Status.PROJECTED)
                .flatMap(o -> o.expectedDate().stream())
                .min(Comparator.naturalOrder());
    }

    /** The smallest band margin of the latest scan, dB; −∞ when a band returned no light. */
    public static double leastMarginDb(PointEvaluation e) {
        return e.verdicts().stream()
                .mapToDouble(v -> Double.isNaN(v.marginDb()) ? Double.NEGATIVE_INFINITY : v.marginDb())
                .min().orElse(Double.POSITIVE_INFINITY);
    }

    public static List<PointEvaluation> rank(List<PointEvaluation> evaluations) {
        Comparator<PointEvaluation> order = Comparator
                .comparing((PointEvaluation e) -> e.status() != Status.FAIL)
                .thenComparing(e -> runOutDate(e).orElse(LocalDate.MAX))
                .thenComparing(e -> e.status() != Status.REVIEW)
                .thenComparingDouble(Urgency::leastMarginDb)
                .thenComparing(e -> e.point().tag());
        return evaluations.stream().sorted(order).toList();
    }
}
