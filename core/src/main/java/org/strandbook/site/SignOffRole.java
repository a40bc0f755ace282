package org.strandbook.site;

/** The three signatures a commissioning record carries. */
public enum SignOffRole {
    PREPARED,
    CHECKED,
    APPROVED
}
