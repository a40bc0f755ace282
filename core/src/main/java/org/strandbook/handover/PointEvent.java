package org.strandbook.handover;

import java.time.Instant;

/**
 * One entry of a point's history.
 *
 * @param at      when it happened
 * @param kind    what kind of record it is
 * @param subject the element it concerns (joint label, cable ID, scan kind), or empty for the point
 * @param who     who did it, as recorded
 * @param text    what happened, in one line
 */
public record PointEvent(Instant at, Kind kind, String subject, String who, String text) {

    public enum Kind {
        SCAN, INSPECTION, ACTION, NOTE, SIGN_OFF;

        public String word() {
            return this == SIGN_OFF ? "sign-off" : name().toLowerCase(java.util.Locale.ROOT);
        }
    }
}
