package org.strandbook.site;

/**
 * Bends of one radius along a cable segment, as walked on the route.
 *
 * @param radiusMm bend radius of the fiber axis, mm
 * @param count    how many such bends (each taken as a 90° turn or more)
 */
public record Bend(double radiusMm, int count) {

    public Bend {
        Require.positive(radiusMm, "bend radius (mm)");
        if (count < 1) {
            throw new IllegalArgumentException("bend count must be 1 or more, was " + count);
        }
    }
}
