package org.strandbook.site;

/** Whether a joint's loss was assumed from its connector type or measured on site. */
public enum LossBasis {
    ASSUMED,
    MEASURED
}
