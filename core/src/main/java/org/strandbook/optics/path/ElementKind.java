package org.strandbook.optics.path;

/** What a light-path element is, for grouping and colouring a loss breakdown. */
public enum ElementKind {
    /** A length of fiber, its bends included. */
    FIBER,
    /** A connector or splice between two fibers. */
    JOINT,
    /** A single glass face against another medium: the launch or the detector face. */
    FACE,
    /** The probe: windows, fixed loss, optical path through a medium. */
    PROBE
}
