package org.strandbook.site;

/** How light crosses the process at the probe. */
public enum ProbeKind {
    TRANSMISSION,
    TRANSFLECTANCE,
    DIFFUSE_REFLECTANCE,
    ATTENUATED_TOTAL_REFLECTANCE
}
