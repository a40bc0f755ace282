package org.strandbook.dossier;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Optional;

/**
 * What a dossier covers: some points or all, and the scans taken on some days or all.
 *
 * @param pointTags the points, in any order; empty means every point of the workbook
 * @param fromDate  first day (UTC) whose scans count, if limited
 * @param toDate    last day (UTC) whose scans count, inclusive, if limited
 */
public record DossierScope(List<String> pointTags, Optional<LocalDate> fromDate, Optional<LocalDate> toDate) {

    public DossierScope {
        pointTags = pointTags.stream().map(String::strip).filter(t -> !t.isEmpty()).distinct().toList();
        if (fromDate.isPresent() && toDate.isPresent() && fromDate.get().isAfter(toDate.get())) {
            throw new IllegalArgumentException("the scan date range runs backwards: from " + fromDate.get()
                    + " to " + toDate.get());
        }
    }

    /** Every point, every scan. */
    public static DossierScope everything() {
        return new DossierScope(List.of(), Optional.empty(), Optional.empty());
    }

    /** True when a scan taken at {@code time} falls within the date range (days in UTC). */
    public boolean includes(Instant time) {
        LocalDate day = LocalDate.ofInstant(time, ZoneOffset.UTC);
        return fromDate.map(f -> !day.isBefore(f)).orElse(true) && toDate.map(t -> !day.isAfter(t)).orElse(true);
    }

    /** True when every point is in scope. */
    public boolean allPoints() {
        return pointTags.isEmpty();
    }

    /** The date range in words, e.g. "scans taken 2024-11-04 to 2025-06-30 (UTC)". */
    public String describeDates() {
        if (fromDate.isEmpty() && toDate.isEmpty()) {
            return "all scans in the workbook";
        }
        return "scans taken " + fromDate.map(DossierText::date).map(d -> "from " + d).orElse("up")
                + toDate.map(DossierText::date).map(d -> " to " + d).orElse(" onwards") + " (UTC days, inclusive)";
    }
}
