package org.strandbook.throughput;

import java.util.Objects;

/**
 * The four scans of a one-cord reference throughput measurement, each on its own axis.
 *
 * @param loop          lamp light returned through the whole light path (probe loop)
 * @param loopDark      dark scan belonging to {@code loop} (lamp blocked, same settings)
 * @param reference     lamp light through the short launch cord alone, at the analyzer
 * @param referenceDark dark scan belonging to {@code reference}
 */
public record ThroughputScans(RawSpectrum loop, RawSpectrum loopDark, RawSpectrum reference,
                              RawSpectrum referenceDark) {

    public ThroughputScans {
        Objects.requireNonNull(loop, "loop scan");
        Objects.requireNonNull(loopDark, "loop dark scan");
        Objects.requireNonNull(reference, "reference scan");
        Objects.requireNonNull(referenceDark, "reference dark scan");
    }
}
