package org.strandbook.site;

/** Send carries lamp light from the analyzer to the probe; return brings it back to the detector. */
public enum PathDirection {
    SEND,
    RETURN
}
