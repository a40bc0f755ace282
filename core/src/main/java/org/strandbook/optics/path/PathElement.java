package org.strandbook.optics.path;

/**
 * One element of a {@link LightPath}. Every element contributes a loss spectrum to the budget.
 * Elements are immutable values; equal elements have equal losses (the label only names them).
 */
public sealed interface PathElement permits FiberSegment, JointElement, FaceElement, ProbeElement {

    /** Name shown in a breakdown, e.g. "field cable F-101". */
    String label();

    ElementKind kind();
}
