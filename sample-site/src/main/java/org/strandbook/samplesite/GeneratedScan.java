package org.strandbook.samplesite;

import java.time.Instant;

import org.strandbook.site.ScanKind;

/**
 * One scan the generator made, before it is written to a file.
 *
 * @param pointTag      the point
 * @param analyzerTag   the analyzer that took it
 * @param kind          reference, loop or dark
 * @param takenAt       when
 * @param operator      who (an invented name)
 * @param integrationMs detector integration time, ms
 * @param wavelengthsNm ascending axis, nm
 * @param counts        detector counts
 */
public record GeneratedScan(String pointTag, String analyzerTag, ScanKind kind, Instant takenAt, String operator,
                            double integrationMs, double[] wavelengthsNm, double[] counts) {
}
