package org.strandbook.site;

import java.time.Instant;

/**
 * A stored scan without its spectrum: what listings show. The spectrum itself is fetched on demand,
 * so that a site with years of weekly scans never loads them all.
 *
 * @param id         workbook key
 * @param pointTag   the measurement point
 * @param kind       reference, loop or dark
 * @param takenAt    when the scan was taken
 * @param conditions operator and instrument settings
 * @param nPoints    number of spectrum points
 * @param minNm      shortest wavelength, nm
 * @param maxNm      longest wavelength, nm
 * @param sourceFile name of the imported file
 * @param sha256     SHA-256 of the imported file's bytes, hex
 * @param yUnit      the unit of the values as the file named it; empty if it named none
 */
public record ScanRecord(long id, String pointTag, ScanKind kind, Instant takenAt, ScanConditions conditions,
                         int nPoints, double minNm, double maxNm, String sourceFile, String sha256, String yUnit) {

    public ScanRecord {
        yUnit = yUnit == null ? "" : yUnit;
    }

    /** A scan whose file named no unit for its values. */
    public ScanRecord(long id, String pointTag, ScanKind kind, Instant takenAt, ScanConditions conditions,
                      int nPoints, double minNm, double maxNm, String sourceFile, String sha256) {
        this(id, pointTag, kind, takenAt, conditions, nPoints, minNm, maxNm, sourceFile, sha256, "");
    }
}
