package org.strandbook.site;

import java.util.List;

/**
 * A run of one fiber type between two joints.
 *
 * @param label         the cable ID on site, unique within the site
 * @param fiberTypeCode catalog code of the fiber type
 * @param lengthM       fiber length, m
 * @param bends         bends along the run; empty when none is tighter than the cable's own rating
 */
public record CableSegment(String label, String fiberTypeCode, double lengthM, List<Bend> bends)
        implements PathElement {

    public CableSegment {
        label = Require.text(label, "cable ID");
        fiberTypeCode = Require.text(fiberTypeCode, "cable " + label + ": fiber type");
        Require.positive(lengthM, "cable " + label + ": length (m)");
        bends = List.copyOf(bends);
    }
}
