package org.strandbook.uncertainty;

/** What a joint's loss in the budget rests on, which decides how uncertain it is. */
public enum JointSource {
    /** The typical loss of an air-gap connector type (SMA 905 class). */
    ASSUMED_AIR_GAP,
    /** The typical loss of a physical-contact connector type or a splice. */
    ASSUMED_CONTACT,
    /** A loss measured on site. */
    MEASURED
}
