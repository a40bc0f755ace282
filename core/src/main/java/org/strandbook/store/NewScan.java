package org.strandbook.store;

import java.time.Instant;

import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.Spectrum;

/**
 * A scan about to be stored: what a spectrum-file reader produced plus where and how it was taken.
 *
 * @param pointTag   the measurement point (must be in the workbook)
 * @param kind       reference, loop or dark
 * @param takenAt    when the scan was taken; stored to the millisecond
 * @param conditions operator and instrument settings
 * @param spectrum   wavelengths (nm) and values
 * @param sourceFile name of the imported file, as shown to users
 * @param sha256     SHA-256 of the imported file's bytes, 64 hex digits; a file is stored once
 * @param yUnit      the unit of the values as the file names it (counts, volts...); empty if it names
 *                   none; one line of at most {@value #MAX_Y_UNIT_LENGTH} characters
 */
public record NewScan(String pointTag, ScanKind kind, Instant takenAt, ScanConditions conditions, Spectrum spectrum,
                      String sourceFile, String sha256, String yUnit) {

    /** The longest unit text stored; longer labels are cut, as the column allows no more. */
    public static final int MAX_Y_UNIT_LENGTH = 200;

    /** A scan whose file names no unit for its values. */
    public NewScan(String pointTag, ScanKind kind, Instant takenAt, ScanConditions conditions, Spectrum spectrum,
                   String sourceFile, String sha256) {
        this(pointTag, kind, takenAt, conditions, spectrum, sourceFile, sha256, "");
    }

    public NewScan {
        if (pointTag == null || pointTag.isBlank()) {
            throw new IllegalArgumentException("scan: point tag must not be empty");
        }
        pointTag = pointTag.strip();
        if (kind == null) {
            throw new IllegalArgumentException("scan of point " + pointTag + ": kind missing");
        }
        if (takenAt == null) {
            throw new IllegalArgumentException("scan of point " + pointTag + ": time taken missing");
        }
        if (conditions == null) {
            throw new IllegalArgumentException("scan of point " + pointTag + ": conditions missing");
        }
        if (spectrum == null) {
            throw new IllegalArgumentException("scan of point " + pointTag + ": spectrum missing");
        }
        if (sourceFile == null || sourceFile.isBlank()) {
            throw new IllegalArgumentException("scan of point " + pointTag + ": source file name missing");
        }
        sourceFile = sourceFile.strip();
        sha256 = Sha256.normalized(sha256, "scan file " + sourceFile);
        yUnit = yUnit == null ? "" : oneLine(yUnit);
        if (yUnit.length() > MAX_Y_UNIT_LENGTH) {
            yUnit = yUnit.substring(0, MAX_Y_UNIT_LENGTH);
        }
    }

    private static String oneLine(String text) {
        for (int i = 0; i < text.length(); i++) {
            if (Character.isISOControl(text.charAt(i))) {
                return text.replaceAll("\\p{Cntrl}", " ").strip();
            }
        }
        return text.strip();
    }
}
