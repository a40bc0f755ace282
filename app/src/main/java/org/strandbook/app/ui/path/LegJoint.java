package org.strandbook.app.ui.path;

import org.strandbook.site.Joint;
import org.strandbook.site.PathDirection;

/**
 * A joint as a row of a point's joint sheet.
 *
 * @param direction the leg it lies on
 * @param position  its place in the leg among segments and joints (see {@link LegSegment})
 * @param joint     the joint
 */
public record LegJoint(PathDirection direction, double position, Joint joint) {

    public LegJoint {
        if (direction == null || joint == null) {
            throw new IllegalArgumentException("a leg joint needs a direction and a joint");
        }
    }

    public LegJoint with(Joint changed) {
        return new LegJoint(direction, position, changed);
    }
}
