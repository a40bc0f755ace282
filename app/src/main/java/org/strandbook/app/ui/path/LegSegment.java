package org.strandbook.app.ui.path;

import org.strandbook.site.CableSegment;
import org.strandbook.site.PathDirection;

/**
 * A cable segment as a row of a point's segment sheet.
 *
 * @param direction the leg it lies on
 * @param position  its place in the leg among segments and joints (1 is where light enters the
 *                  leg); rows inserted in the sheet take a place between their neighbours
 * @param segment   the segment
 */
public record LegSegment(PathDirection direction, double position, CableSegment segment) {

    public LegSegment {
        if (direction == null || segment == null) {
            throw new IllegalArgumentException("a leg segment needs a direction and a segment");
        }
    }

    public LegSegment with(CableSegment changed) {
        return new LegSegment(direction, position, changed);
    }
}
