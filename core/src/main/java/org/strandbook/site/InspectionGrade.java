package org.strandbook.site;

/**
 * End-face inspection outcome, after the zone scheme of IEC 61300-3-35 (scaled to the core for
 * large-core fibers, a Strandbook design choice).
 */
public enum InspectionGrade {
    NOT_INSPECTED,
    CLEAN,
    ACCEPTABLE,
    DIRTY,
    DAMAGED;

    /** True for grades that call for cleaning or replacement before the joint is trusted. */
    public boolean needsAction() {
        return this == DIRTY || this == DAMAGED;
    }
}
