package org.strandbook.site;

import java.util.List;

/**
 * One direction of a point's light path: its elements in the order light meets them (from the
 * analyzer for SEND, from the probe for RETURN).
 */
public record PathLeg(String pointTag, PathDirection direction, List<PathElement> elements) {

    public PathLeg {
        pointTag = Require.text(pointTag, "point tag");
        if (direction == null) {
            throw new IllegalArgumentException("point " + pointTag + ": leg direction missing");
        }
        elements = List.copyOf(elements);
    }

    public List<CableSegment> segments() {
        return elements.stream().filter(CableSegment.class::isInstance).map(CableSegment.class::cast).toList();
    }

    public List<Joint> joints() {
        return elements.stream().filter(Joint.class::isInstance).map(Joint.class::cast).toList();
    }

    public double totalLengthM() {
        return segments().stream().mapToDouble(CableSegment::lengthM).sum();
    }
}
