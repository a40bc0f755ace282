package org.strandbook.optics.attenuation;

/**
 * The two grades of silica-core fiber by hydroxyl content. Low-OH ("IR grade") fiber serves the
 * near infrared; high-OH ("UV/VIS grade") fiber resists UV darkening but is opaque beyond ~2 µm.
 */
public enum SilicaFiberGrade {

    /** Typical 1 ppm; good low-OH fiber stays below ~15 ppm (common practice). */
    LOW_OH("low-OH", 1.0),

    /** Typical several hundred ppm; 800 ppm taken as typical (from memory: 600–1200 ppm quoted). */
    HIGH_OH("high-OH", 800.0);

    /** OH content (ppm) up to which a fiber counts as low-OH (common practice: good low-OH stays below ~15). */
    public static final double LOW_OH_LIMIT_PPM = 15.0;

    private final String label;
    private final double typicalOhPpm;

    SilicaFiberGrade(String label, double typicalOhPpm) {
        this.label = label;
        this.typicalOhPpm = typicalOhPpm;
    }

    /** The grade a fiber with this OH content (ppm) belongs to: low-OH up to {@link #LOW_OH_LIMIT_PPM}. */
    public static SilicaFiberGrade ofOhPpm(double ohPpm) {
        return ohPpm <= LOW_OH_LIMIT_PPM ? LOW_OH : HIGH_OH;
    }

    public String label() {
        return label;
    }

    /** OH content (ppm by weight) assumed when the user gives none. */
    public double typicalOhPpm() {
        return typicalOhPpm;
    }
}
