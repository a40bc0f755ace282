package org.strandbook.evaluation;

import java.time.Instant;
import java.util.Optional;

import org.strandbook.site.PathLeg;

/**
 * A point's light path through time: the legs a scan taken at a moment went through, with each
 * joint graded as last inspected by then, and the probe it reached. Evaluations judge a scan against the path of its day,
 * not against a later repair.
 */
@FunctionalInterface
public interface PathTimeline {

    /**
     * The send and return legs at one moment, and the probe type fitted then (empty: the point's
     * probe type as recorded today).
     */
    record Legs(PathLeg send, PathLeg ret, Optional<String> probeTypeCode) {

        public Legs {
            probeTypeCode = probeTypeCode == null ? Optional.empty() : probeTypeCode;
        }

        /** Legs with the point's probe type as recorded today. */
        public Legs(PathLeg send, PathLeg ret) {
            this(send, ret, Optional.empty());
        }
    }

    Legs at(Instant when);

    /** A path that never changed. */
    static PathTimeline fixed(PathLeg send, PathLeg ret) {
        Legs legs = new Legs(send, ret);
        return when -> legs;
    }
}
