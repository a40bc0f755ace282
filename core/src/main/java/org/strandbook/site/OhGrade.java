package org.strandbook.site;

/** Low-OH ("dry") fiber serves the near infrared; high-OH ("wet") fiber serves the UV-visible. */
public enum OhGrade {
    LOW_OH,
    HIGH_OH
}
