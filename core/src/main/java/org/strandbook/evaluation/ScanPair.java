package org.strandbook.evaluation;

import org.strandbook.site.ScanRecord;

/**
 * The four scans one throughput measurement uses, and the rule that chose them, in words.
 *
 * @param loop          the loop scan through the whole point
 * @param reference     the lamp reference taken through the short patch cord at the analyzer
 * @param loopDark      the dark scan subtracted from the loop
 * @param referenceDark the dark scan subtracted from the reference (often the same scan)
 * @param rule          how they were paired, for the report
 */
public record ScanPair(ScanRecord loop, ScanRecord reference, ScanRecord loopDark, ScanRecord referenceDark,
                       String rule) {

    /** How the four scans' counts are put on one scale, or why they cannot be. */
    public ScanExposure exposure() {
        return ScanExposure.of(this);
    }
}
