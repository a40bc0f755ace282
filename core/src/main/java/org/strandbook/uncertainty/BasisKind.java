package org.strandbook.uncertainty;

/** Where an input's uncertainty comes from, as the project labels every number it ships. */
public enum BasisKind {
    /** A published standard, handbook or paper, named in the basis text. */
    PUBLISHED,
    /** Measured on this site (its own measurement uncertainty). */
    MEASURED,
    /** A trade rule of thumb. */
    COMMON_PRACTICE,
    /** A value recalled without a source at hand. */
    FROM_MEMORY,
    /** A default of our own. */
    DESIGN_CHOICE,
    /** Stated in the workbook by the site (a catalog row or one element), with its basis in its words. */
    STATED
}
