package org.strandbook.evaluation;

import java.time.Instant;

import org.strandbook.site.PathLeg;

/**
 * A point's light path through time: the legs a scan taken at a moment went through, with each
 * joint graded as last inspected by then. Evaluations judge a scan against the path of its day,
 * not against a later repair.
 */
@FunctionalInterface
public interface PathTimeline {

    /** The send and return legs at one moment. */
    record Legs(PathLeg send, PathLeg ret) {
    }

    Legs at(Instant when);

    /** A path that never changed. */
    static PathTimeline fixed(PathLeg send, PathLeg ret) {
        Legs legs = new Legs(send, ret);
        return when -> legs;
    }
}
