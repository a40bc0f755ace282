package org.strandbook.app.ui.workbook;

import org.strandbook.site.CableSegment;
import org.strandbook.site.PathDirection;

/** A cable segment as a row of a point's segment sheet: which leg it is on, and the segment. */
public record LegSegment(PathDirection direction, CableSegment segment) {

    public LegSegment {
        if (direction == null || segment == null) {
            throw new IllegalArgumentException("a leg segment needs a direction and a segment");
        }
    }
}
