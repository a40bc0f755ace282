package org.strandbook.site;

import java.util.List;
import java.util.Set;

/**
 * A run of one fiber type between two joints.
 *
 * @param label         the cable ID on site, unique within the site
 * @param fiberTypeCode catalog code of the fiber type
 * @param lengthM       fiber length, m
 * @param bends         bends along the run; empty when none is tighter than the cable's own rating
 * @param spreads       this run's length tolerance and bend radius spread, if stated
 */
public record CableSegment(String label, String fiberTypeCode, double lengthM, List<Bend> bends, StatedSpreads spreads)
        implements PathElement {

    public CableSegment {
        label = Require.text(label, "cable ID");
        fiberTypeCode = Require.text(fiberTypeCode, "cable " + label + ": fiber type");
        Require.positive(lengthM, "cable " + label + ": length (m)");
        bends = List.copyOf(bends);
        spreads = spreads == null ? StatedSpreads.NONE
                : spreads.requireOnly(Set.of(SpreadInput.LENGTH, SpreadInput.BEND_RADIUS), "cable " + label);
    }

    /** A segment with no spread of its own: the shipped defaults apply. */
    public CableSegment(String label, String fiberTypeCode, double lengthM, List<Bend> bends) {
        this(label, fiberTypeCode, lengthM, bends, StatedSpreads.NONE);
    }

    public CableSegment withSpreads(StatedSpreads stated) {
        return new CableSegment(label, fiberTypeCode, lengthM, bends, stated);
    }
}
