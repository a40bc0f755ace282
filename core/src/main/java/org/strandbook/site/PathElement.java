package org.strandbook.site;

/** One element of a leg, in the order light meets it. */
public sealed interface PathElement permits CableSegment, Joint {

    /** The element's label on site: cable ID for segments, joint label (J1, J2 ...) for joints. */
    String label();
}
