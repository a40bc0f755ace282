package org.strandbook.site;

/** Detector family of an analyzer; it bounds the usable wavelength range. */
public enum DetectorType {
    SILICON,
    INGAAS,
    EXTENDED_INGAAS,
    PBS,
    MCT,
    OTHER
}
