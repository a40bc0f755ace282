package org.strandbook.app.ui.workbook;

import org.strandbook.site.Joint;
import org.strandbook.site.PathDirection;

/** A joint as a row of a point's joint sheet: which leg it is on, and the joint. */
public record LegJoint(PathDirection direction, Joint joint) {

    public LegJoint {
        if (direction == null || joint == null) {
            throw new IllegalArgumentException("a leg joint needs a direction and a joint");
        }
    }
}
