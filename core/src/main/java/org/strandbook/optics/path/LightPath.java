package org.strandbook.optics.path;

import java.util.List;
import java.util.Objects;

/**
 * An ordered light path from the analyzer's launch face through fibers, joints and the probe back to
 * the detector face. Order matters for reading the breakdown, not for the total.
 *
 * @param name e.g. the measurement point's tag
 * @param elements at least one element, in the order light meets them
 */
public record LightPath(String name, List<PathElement> elements) {

    public LightPath {
        Objects.requireNonNull(name, "name");
        elements = List.copyOf(elements);
        if (elements.isEmpty()) {
            throw new IllegalArgumentException("light path " + name + " has no elements");
        }
    }

    public static LightPath of(String name, PathElement... elements) {
        return new LightPath(name, List.of(elements));
    }
}
