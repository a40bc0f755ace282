package org.strandbook.site;

import java.util.Locale;

/** What a maintenance crew did at a point, and on which kind of element. */
public enum MaintenanceKind {
    CLEAN_JOINT(ElementRole.JOINT, false),
    RETERMINATE(ElementRole.JOINT, true),
    REPLACE_CONNECTOR(ElementRole.JOINT, true),
    REPLACE_SEGMENT(ElementRole.SEGMENT, true),
    REROUTE(ElementRole.SEGMENT, true),
    REPLACE_PROBE(ElementRole.NONE, false),
    RETAKE_REFERENCE(ElementRole.NONE, false);

    /** The kind of path element the action names. */
    public enum ElementRole {
        JOINT, SEGMENT, NONE
    }

    private final ElementRole role;
    private final boolean mayChangePath;

    MaintenanceKind(ElementRole role, boolean mayChangePath) {
        this.role = role;
        this.mayChangePath = mayChangePath;
    }

    public ElementRole role() {
        return role;
    }

    /** True when the action may come with a new element (length, fiber, connector, bends) for the path. */
    public boolean mayChangePath() {
        return mayChangePath;
    }

    /** As a technician says it: "replace segment". */
    public String words() {
        return name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }

    /** The kind for a word as typed ("clean-joint", "replace segment", "REROUTE"). */
    public static MaintenanceKind parse(String text) {
        String key = text == null ? "" : text.strip().toUpperCase(Locale.ROOT).replace('-', '_').replace(' ', '_');
        for (MaintenanceKind k : values()) {
            if (k.name().equals(key)) {
                return k;
            }
        }
        throw new IllegalArgumentException("unknown maintenance action '" + text + "' (one of: "
                + String.join(", ", java.util.Arrays.stream(values()).map(k -> k.name().toLowerCase(Locale.ROOT)
                        .replace('_', '-')).toList()) + ")");
    }
}
